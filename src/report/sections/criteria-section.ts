// Section "Design criteria and assumptions": material, limits, resistance factors, analysis
// settings, and every assumption with its value, whether it was given or defaulted, and its source.
import type { LoadedDesign } from '../../design/design.ts';
import { formatNumber } from '../../units/units.ts';
import type { Block, DocSection } from '../document.ts';
import { assumptionValue, display, fractionText } from './display.ts';
import { templateBlocks } from './templates.ts';

export const CRITERIA_TITLE = 'Design criteria and assumptions';
export const ASSUMPTIONS_TABLE_TITLE = 'Assumptions and defaults';

const ITEM_VALUE = ['Item', 'Value'] as const;

export function criteriaSection(loaded: LoadedDesign): DocSection {
  const { design } = loaded;
  const d = display(design.units);
  const m = design.material;
  const c = design.criteria;
  const a = design.analysis;
  const blocks: Block[] = [...templateBlocks('criteria', {}).blocks];

  blocks.push({
    kind: 'table',
    title: 'Material of the tubes',
    header: [...ITEM_VALUE],
    widths: ['*', 150],
    rows: [
      ['Modulus of elasticity, E', d.q(m.E_Pa, 'stress')],
      ['Shear modulus, G', d.q(m.G_Pa, 'stress')],
      ['Minimum yield strength, Fy', d.q(m.Fy_Pa, 'stress')],
      ['Density', d.q(m.density_kgm3, 'density')],
    ],
  });

  blocks.push({
    kind: 'table',
    title: 'Limits and resistance factors',
    header: [...ITEM_VALUE],
    widths: ['*', 150],
    rows: [
      ['Arm tip deflection limit, service (L = arm length)', fractionText(c.armTipDeflectionRatio, 'L')],
      ['Pole top horizontal deflection limit, service (H = pole height)', fractionText(c.poleTopDeflectionRatio, 'H')],
      ['Resistance factor φ, flexure (dimensionless)', formatNumber(c.phi.flexure)],
      ['Resistance factor φ, shear (dimensionless)', formatNumber(c.phi.shear)],
      ['Resistance factor φ, torsion (dimensionless)', formatNumber(c.phi.torsion)],
      ['Resistance factor φ, axial (dimensionless)', formatNumber(c.phi.axial)],
      ['Resistance factor φ, anchor bolt tension (dimensionless)', formatNumber(c.phi.boltTension)],
      ['Resistance factor φ, anchor bolt shear (dimensionless)', formatNumber(c.phi.boltShear)],
    ],
  });

  const bolts = c.anchorBolts;
  if (bolts === null) {
    blocks.push({ kind: 'paragraph', text: 'No anchor bolts were entered: the package gives no anchor-bolt forces.' });
  } else {
    blocks.push({
      kind: 'table',
      title: 'Anchor bolts',
      header: [...ITEM_VALUE],
      widths: ['*', 150],
      rows: [
        ['Number of bolts', `${bolts.count} bolts`],
        ['Bolt circle diameter', d.q(bolts.circleDiameter_m, 'section')],
        ['Bolt diameter', d.q(bolts.boltDiameter_m, 'section')],
        ['Bolt tensile strength', d.q(bolts.tensileStrength_Pa, 'stress')],
      ],
    });
  }

  blocks.push({
    kind: 'table',
    title: 'Analysis settings',
    header: [...ITEM_VALUE],
    widths: ['*', 150],
    rows: [
      ['Prismatic segments per tapered member', `${a.segmentsPerMember} segments`],
      ['Second-order (P-delta) analysis', a.secondOrder ? 'yes' : 'no (first order only)'],
      ['P-delta convergence tolerance (relative, dimensionless)', formatNumber(a.pDeltaTolerance)],
      ['P-delta iteration cap', `${a.pDeltaMaxIterations} iterations`],
      ['Regular spacing of result stations', d.q(a.stationSpacing_m, 'length')],
    ],
  });

  blocks.push({
    kind: 'table',
    title: ASSUMPTIONS_TABLE_TITLE,
    header: ['Item (input key)', 'Value', 'Basis', 'Source'],
    widths: ['*', 66, 40, '*'],
    rows: design.assumptions.map((x) => [`${x.label}\n(${x.key})`, assumptionValue(x, d), x.defaulted ? 'default' : 'given', x.source]),
    note: '"given": taken from the input file. "default": not in the input; the program took the value shown, for the reason in the Source column.',
  });

  return { id: 'criteria', title: CRITERIA_TITLE, blocks };
}
