// Section "Design criteria and assumptions": material, limits, resistance factors, analysis
// settings, and every assumption with its value, whether it was given or defaulted, and its source.
import type { AnchorBolts, LoadedDesign } from '../../design/design.ts';
import { boltThread, threadName } from '../../design/thread-tables.ts';
import { bendingApplies } from '../../checks/anchor/bolt-bending.ts';
import { formatNumber, formatTolerance } from '../../units/units.ts';
import type { Block, DocSection } from '../document.ts';
import { assumptionValue, densityLabel, display, fractionText } from './display.ts';
import { templateBlocks } from './templates.ts';

export const CRITERIA_TITLE = 'Design criteria and assumptions';
export const ASSUMPTIONS_TABLE_TITLE = 'Assumptions and defaults';

const ITEM_VALUE = ['Item', 'Value'] as const;

export function criteriaSection(loaded: LoadedDesign, secondOrder: boolean): DocSection {
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
      [densityLabel(design.units), d.q(m.density_kgm3, 'density')],
    ],
  });

  blocks.push({
    kind: 'table',
    title: 'Limits and resistance factors',
    header: [...ITEM_VALUE],
    widths: ['*', 150],
    rows: [
      ['Arm tip vertical deflection, unfactored dead load (L = arm length)', fractionText(c.deflection.armTipDeadRatio, 'L')],
      ['Arm tip horizontal deflection, service combinations (L = arm length)', fractionText(c.deflection.armTipServiceRatio, 'L')],
      ['Pole top horizontal deflection, service combinations (H = pole height)', fractionText(c.deflection.poleTopServiceRatio, 'H')],
      ...(design.fatigue ? [['Arm tip vertical deflection, galloping and truck gust fatigue loads', d.q(c.deflection.armTipFatigue_m, 'section')]] : []),
      ['Effective length factor K of the pole and arms as cantilever columns (dimensionless)', formatNumber(c.columnK)],
      ['Resistance factor φ, flexure (dimensionless)', formatNumber(c.phi.flexure)],
      ['Resistance factor φ, shear (dimensionless)', formatNumber(c.phi.shear)],
      ['Resistance factor φ, torsion (dimensionless)', formatNumber(c.phi.torsion)],
      ['Resistance factor φ, axial compression (dimensionless)', formatNumber(c.phi.axial)],
      ['Resistance factor φ, axial tension (dimensionless)', formatNumber(c.phi.tension)],
      ['Resistance factor φ, anchor bolt tension (dimensionless)', formatNumber(c.phi.boltTension)],
      ['Resistance factor φ, anchor bolt shear (dimensionless)', formatNumber(c.phi.boltShear)],
    ],
  });

  const bolts = c.anchorBolts;
  if (bolts === null) {
    blocks.push({ kind: 'paragraph', text: 'No anchor bolts were entered (criteria.anchorBolts), so the anchor bolts and the base plate are not checked in this package: the factored base reactions and the foundation design envelope in the results are the forces to check them with.' });
  } else {
    blocks.push({ kind: 'paragraph', text: `The anchor bolts below${c.basePlate !== null ? ' and the base plate' : ''} are checked for every factored combination from the base reaction (see the design checks)${bendingApplies(bolts) ? ', the bolts also in bending over the stand-off' : ''}. Their embedment in the concrete and the foundation are not checked.` });
    blocks.push({
      kind: 'table',
      title: 'Anchor bolts',
      header: [...ITEM_VALUE],
      widths: ['*', 150],
      rows: [
        ['Number of bolts', `${bolts.count} bolts`],
        ['Bolt circle diameter', d.q(bolts.circleDiameter_m, 'section')],
        ['Bolt diameter', d.q(bolts.boltDiameter_m, 'section')],
        ['Thread', threadText(bolts)],
        ['Bolt steel', bolts.grade !== null ? `ASTM F1554 Grade ${bolts.grade}` : 'strengths as given'],
        ['Bolt tensile strength, Fu', d.q(bolts.Fu_Pa, 'stress')],
        ['Bolt yield strength, Fy', d.q(bolts.Fy_Pa, 'stress')],
        ['Clear stand-off below the leveling nut', d.q(bolts.standOff_m, 'section')],
      ],
    });
  }

  const plate = c.basePlate;
  blocks.push(
    plate === null
      ? { kind: 'paragraph', text: 'No base plate was entered (criteria.basePlate), so the base plate is not checked in this package.' }
      : { kind: 'table', title: 'Base plate', header: [...ITEM_VALUE], widths: ['*', 150], rows: [['Plate thickness', d.q(plate.thickness_m, 'section')], ['Plate yield strength, Fy', d.q(plate.Fy_Pa, 'stress')]] },
  );

  blocks.push({
    kind: 'table',
    title: 'Analysis settings',
    header: [...ITEM_VALUE],
    widths: ['*', 150],
    rows: [
      ['Prismatic segments per tapered member', `${a.segmentsPerMember} segments`],
      ['Second-order (P-delta) analysis', secondOrder ? 'yes' : a.secondOrder ? 'no: first order only, by the --first-order option of the command (the input asks for P-delta)' : 'no: first order only (analysis.secondOrder: false)'],
      ['P-delta convergence tolerance (relative, dimensionless)', formatTolerance(a.pDeltaTolerance)],
      ['P-delta iteration cap', `${a.pDeltaMaxIterations} iterations`],
      ['Regular spacing of result stations', d.q(a.stationSpacing_m, 'length')],
    ],
  });

  blocks.push({
    kind: 'table',
    title: ASSUMPTIONS_TABLE_TITLE,
    header: ['Item (input key)', 'Value', 'Basis', 'Source'],
    widths: ['*', 66, 40, '*'],
    rows: design.assumptions.map((x) => [`${x.label}\n(${breakableKey(x.key)})`, assumptionValue(x, d), x.defaulted ? 'default' : 'given', x.source]),
    note: '"given": taken from the input file. "default": not in the input; the program took the value shown, for the reason in the Source column.',
  });

  return { id: 'criteria', title: CRITERIA_TITLE, blocks };
}

/** A long input key may break after its dots (a zero-width space), so it cannot widen the table past the margin. */
const breakableKey = (key: string): string => key.replace(/\./g, '.\u200b');

/** The bolt thread as the anchor checks take it: given, from the coarse-thread table, or unknown. */
function threadText(bolts: AnchorBolts): string {
  const t = boltThread(bolts);
  if (t === null) return 'not a standard coarse-thread size and not given: the anchor checks cannot be made';
  return `${threadName(t)} (${t.from === 'table' ? 'standard coarse thread of the size' : 'as given'})`;
}
