// Section "Structural model": the method, the axes and sign convention (with a sketch), the
// members and their segments, section properties at root and tip as calculation steps, the
// segment convergence study and the supports.
import type { DesignAnalysis } from '../../analyse-design.ts';
import type { LoadedDesign, TubeSection } from '../../design/design.ts';
import { armLengthShift, memberAxes } from '../../model/member-axes.ts';
import { segmentConvergence } from '../../model/segment-convergence.ts';
import { sectionAt } from '../../model/taper.ts';
import type { TubeProperties } from '../../model/tube-section.ts';
import { formatNumber, formatPercent, formatTolerance, toSI, displayUnit } from '../../units/units.ts';
import { baseText as restraintText } from '../../design/base-text.ts';
import { conventionsSketch } from '../figures/conventions-sketch.ts';
import { memberAxesSketch } from '../figures/member-axes-sketch.ts';
import type { Block, DocSection } from '../document.ts';
import { diameterText, display, DOF_NAMES, memberText, restrainedText, shapeText, type Display } from './display.ts';
import { stepsTable } from './step-table.ts';
import { templateBlocks } from './templates.ts';
import { MODEL_TABLES_TITLE } from './model-tables-section.ts';

export const STRUCTURAL_MODEL_TITLE = 'Structural model';



function sectionText(s: TubeSection, D_m: number, d: Display): string {
  return `${shapeText(s)}, ${diameterText(D_m, s, d)}, wall ${d.q(s.wall_m, 'section')}`;
}

function propertyRow(member: string, end: string, p: TubeProperties, d: Display): string[] {
  return [member, end, d.q(p.D_m, 'section'), d.q(p.A_m2, 'sectionArea'), d.q(p.I_m4, 'inertia'), d.q(p.J_m4, 'inertia'), d.q(p.c_m, 'section'), d.q(p.S_m3, 'modulus')];
}

function methodBlocks(loaded: LoadedDesign, analysis: DesignAnalysis, d: Display): Block[] {
  const o = analysis.options;
  const second = o.secondOrder
    ? templateBlocks('model-second-order', { tolerance: o.tolerance, maxIterations: o.maxIterations })
    : templateBlocks('model-first-order', {});
  return [
    ...templateBlocks('model-method', { segments: loaded.design.analysis.segmentsPerMember, stationSpacing: o.stationSpacing_m }, { units: d.units }).blocks,
    ...second.blocks,
  ];
}

function axesBlocks(): Block[] {
  const sketch = memberAxesSketch({ pole: 'pole', arm: 'arm' });
  return [
    { kind: 'heading', level: 2, text: 'Axes and sign convention' },
    {
      kind: 'figure',
      title: 'Global axes, member axes and positive internal forces',
      svg: sketch.svg,
      width_pt: sketch.width,
      caption: 'Not to scale. The arm is drawn along +X; for an arm in another plan direction its axes turn with it in plan.',
    },
    ...templateBlocks('model-axes', {}).blocks,
  ];
}

/** The conventions the input used, drawn, and each structure's own in words. */
function conventionBlocks(loaded: LoadedDesign, d: Display): Block[] {
  const { design } = loaded;
  const base = design.pole.base;
  const sketch = conventionsSketch({
    baseSprings: base.kind === 'spring' ? { aboutY: base.stiffnessY_Nm_per_rad !== undefined, torsion: base.torsion_Nm_per_rad !== undefined } : null,
  });
  const armLines = design.arms.map((a) => {
    const r = armLengthShift(design, a);
    return r > 0
      ? `arm ${a.id}: length and positions entered from the pole axis; r = ${d.q(r, 'section')} taken off (${d.q(a.length_m + r, 'length')} from the axis = ${d.q(a.length_m, 'length')} from the face), rise ${d.angle(a.rise_rad)}`
      : `arm ${a.id}: length and positions entered from the pole face (${d.q(a.length_m, 'length')}), rise ${d.angle(a.rise_rad)}`;
  });
  const raised = design.attachments.filter((a) => a.member === 'pole' && a.offset.vertical_m !== 0);
  const poleLine =
    raised.length > 0
      ? `on the pole, centroids offset vertically from their brackets: ${raised.map((a) => `${a.id} ${a.offset.vertical_m > 0 ? '+' : '−'}${d.q(Math.abs(a.offset.vertical_m), 'length')}`).join(', ')}`
      : 'no attachment on the pole is offset vertically from its bracket';
  const baseLine = `base: ${restraintText(base, (k) => d.q(k, 'rotStiffness'))}`;
  return [
    { kind: 'heading', level: 2, text: 'How the input dimensions the structure' },
    {
      kind: 'figure',
      title: 'Input conventions: arm lengths, attachments on the pole, the base',
      svg: sketch.svg,
      width_pt: sketch.width,
      caption: `Not to scale. This structure: ${[...armLines, poleLine, baseLine].join('; ')}.`,
    },
  ];
}

function memberBlocks(loaded: LoadedDesign, analysis: DesignAnalysis, d: Display): Block[] {
  const { design } = loaded;
  const rows = memberAxes(design).map((ax) => {
    const info = analysis.model.members.find((m) => m.id === ax.id);
    if (!info) throw new Error(`member ${ax.id} is missing from the frame model`);
    return [
      memberText(ax.id),
      d.q(ax.length_m, 'length'),
      `${info.elements.length} elements`,
      sectionText(ax.section, ax.section.rootDiameter_m, d),
      sectionText(ax.section, ax.section.tipDiameter_m, d),
    ];
  });
  return [
    { kind: 'heading', level: 2, text: 'Members' },
    {
      kind: 'table',
      title: 'Members of the frame model',
      header: ['Member', 'Length', 'Prismatic elements', 'Section at root', 'Section at tip'],
      widths: [50, 50, 58, '*', '*'],
      rows,
      note: `Length of the pole: base to top. Length of an arm: pole face to tip, along its axis (an arm entered from the pole axis is shown here from the face; see the input conventions above). The element count includes the extra nodes at attachments and arm connections. Every node and element in numbers: appendix "${MODEL_TABLES_TITLE}".`,
    },
  ];
}

function propertyBlocks(loaded: LoadedDesign, d: Display): Block[] {
  const { design } = loaded;
  const ends = memberAxes(design).flatMap((ax) => {
    const name = memberText(ax.id);
    const [rootName, tipName] = ax.kind === 'pole' ? ['base', 'top'] : ['root', 'tip'];
    return [
      { name, end: rootName, p: sectionAt(ax.section, ax.length_m, 0) },
      { name, end: tipName, p: sectionAt(ax.section, ax.length_m, ax.length_m) },
    ];
  });
  const blocks: Block[] = [
    { kind: 'heading', level: 2, text: 'Section properties at root and tip' },
    {
      kind: 'table',
      title: 'Section properties at the member ends',
      header: ['Member', 'End', 'D', 'A', 'I', 'J', 'c', 'S = I/c'],
      widths: [44, 30, '*', '*', '*', '*', '*', '*'],
      rows: ends.map((e) => propertyRow(e.name, e.end, e.p, d)),
      note: 'D: outside diameter (across flats for a multisided tube). A: steel area. I: moment of inertia, the same about every centroidal axis. J: torsion constant. c: distance to the extreme fibre. S: elastic section modulus.',
    },
    { kind: 'paragraph', text: `Worked in full for the ${ends[0].name} at its ${ends[0].end}; the other ends follow the same steps, given in the tables after it.` },
    ...ends[0].p.steps.map((step): Block => ({ kind: 'step', step })),
  ];
  for (const e of ends.slice(1)) {
    blocks.push(stepsTable(`Section properties, ${e.name} at its ${e.end}`, e.p.steps, design.units));
  }
  return blocks;
}

function convergenceBlocks(loaded: LoadedDesign, analysis: DesignAnalysis, d: Display): Block[] {
  const { design } = loaded;
  const study = segmentConvergence(design, analysis.model);
  // A reference tip load of one unit of force in the user's system, to print flexibilities as deflections.
  const forceUnit = displayUnit(design.units, 'force');
  const P_N = toSI(1, forceUnit, 'force');
  return [
    { kind: 'heading', level: 2, text: 'Segment convergence' },
    ...templateBlocks('segment-convergence', { load: P_N }, { units: d.units }).blocks,
    {
      kind: 'table',
      title: 'Tip deflection under a tip load: elements against the continuous taper',
      header: ['Member', 'Elements', 'δ, elements', 'δ, continuous taper', 'Difference'],
      widths: ['*', 60, '*', '*', 70],
      rows: study.members.map((m) => [
        memberText(m.member),
        `${m.elements} elements`,
        d.q(m.chainFlexibility_mPerN * P_N, 'section'),
        d.q(m.continuousFlexibility_mPerN * P_N, 'section'),
        formatPercent(m.relativeDifference),
      ]),
      note: 'Difference = δ elements / δ continuous − 1. Positive: the chain of elements is slightly more flexible than the taper.',
    },
  ];
}

function supportBlocks(loaded: LoadedDesign, analysis: DesignAnalysis, d: Display): Block[] {
  const rows = analysis.model.supports.map((s) => {
    const node = analysis.model.nodes[s.node];
    const springs = DOF_NAMES.flatMap((name, k) => (s.springs[k] > 0 ? [`${name}: ${d.q(s.springs[k], k < 3 ? 'lineLoad' : 'rotStiffness')}`] : []));
    return [
      node.tag === 'base' ? 'pole base' : node.tag,
      `(${d.q(node.xyz_m[0], 'length')}, ${d.q(node.xyz_m[1], 'length')}, ${d.q(node.xyz_m[2], 'length')})`,
      restrainedText(s.fixed),
      springs.length > 0 ? springs.join('; ') : 'none',
    ];
  });
  const base = loaded.design.pole.base;
  return [
    { kind: 'heading', level: 2, text: 'Supports' },
    {
      kind: 'table',
      title: 'Support conditions',
      header: ['Support', 'Position (X, Y, Z)', 'Restrained', 'Springs'],
      widths: [60, '*', '*', '*'],
      rows,
      note:
        base.kind === 'fixed'
          ? 'ux, uy, uz: translations along X, Y, Z; rx, ry, rz: rotations about X, Y, Z. The base is taken as rigidly fixed: the flexibility of the base plate, the anchor bolts and the foundation is not modelled.'
          : 'ux, uy, uz: translations along X, Y, Z; rx, ry, rz: rotations about X, Y, Z. The rotational springs stand for the flexibility of the base plate, anchor bolts and foundation, as entered.',
    },
  ];
}

export function structuralModelSection(loaded: LoadedDesign, analysis: DesignAnalysis): DocSection {
  const d = display(loaded.design.units);
  return {
    id: 'structural-model',
    title: STRUCTURAL_MODEL_TITLE,
    blocks: [
      ...methodBlocks(loaded, analysis, d),
      ...axesBlocks(),
      ...conventionBlocks(loaded, d),
      ...memberBlocks(loaded, analysis, d),
      ...propertyBlocks(loaded, d),
      ...convergenceBlocks(loaded, analysis, d),
      ...supportBlocks(loaded, analysis, d),
    ],
  };
}
