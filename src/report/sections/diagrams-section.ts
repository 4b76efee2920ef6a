// Section "Internal force and deflection diagrams": per member, Mres, Vres, T and N along it
// for its governing combination (largest Mres), then the deflected shape of the whole
// structure in elevation and plan under the governing service combination.
import type { DesignAnalysis } from '../../analyse-design.ts';
import type { CombinationResult, EnvelopeComponent, Station } from '../../analysis/analysis-types.ts';
import { envelope, stationValue } from '../../analysis/index.ts';
import type { Design, LoadedDesign } from '../../design/design.ts';
import type { Vec3 } from '../../model/frame.ts';
import { findAxis, pointOnAxis } from '../../model/member-axes.ts';
import { add, scale } from '../../model/vec3.ts';
import { displayUnit, fromSI, prettyUnit, type Dim, type UnitSystem } from '../../units/units.ts';
import { deflectedShapeView, magnificationFor, type ShapeLabel, type ShapeLine } from '../figures/deflected-shape.ts';
import { stackedLinePlots, type PlotPanel } from '../figures/line-plot.ts';
import type { Block, DocSection } from '../document.ts';
import { display, memberText, type Display } from './display.ts';
import { mainArm } from './elevation-plan-section.ts';
import { tipNode } from './results-section.ts';
import { templateBlocks } from './templates.ts';
import { withoutRoundOff } from './round-off.ts';
import type { MemberChart } from './member-charts.ts';

export const DIAGRAMS_TITLE = 'Internal force and deflection diagrams';

const PANELS: readonly { c: EnvelopeComponent; title: string; dim: 'moment' | 'force'; marks: readonly ('max' | 'min')[] }[] = [
  { c: 'Mres', title: 'Resultant moment Mres', dim: 'moment', marks: ['max'] },
  { c: 'Vres', title: 'Resultant shear Vres', dim: 'force', marks: ['max'] },
  { c: 'T', title: 'Torque T', dim: 'moment', marks: ['max', 'min'] },
  { c: 'N', title: 'Axial force N (tension +)', dim: 'force', marks: ['max', 'min'] },
];

/** Converts SI to the printed unit of a dimension (for plotting; the same factor as printing). */
const inUnits = (units: UnitSystem, dim: Dim) => (si: number) => fromSI(si, displayUnit(units, dim), dim);
const unitText = (units: UnitSystem, dim: Dim) => prettyUnit(displayUnit(units, dim));

function memberPlot(member: string, kind: 'pole' | 'arm', r: CombinationResult, length_m: number, units: UnitSystem, d: Display): Block {
  const ms = r.members[member];
  const x = inUnits(units, 'length');
  const placeText = (s: number) => d.q(s, 'length');
  // the member's largest force and moment in this combination: the scale of round-off for the others
  const scaleOf = (dim: 'moment' | 'force') =>
    Math.max(...PANELS.filter((p) => p.dim === dim).map((p) => Math.max(Math.abs(ms.extremes[p.c].max.value), Math.abs(ms.extremes[p.c].min.value))));
  const panels: PlotPanel[] = PANELS.map((p) => {
    const y = inUnits(units, p.dim);
    const scaleSI = scaleOf(p.dim);
    const ext = ms.extremes[p.c];
    const marks = p.marks
      .map((w) => ext[w])
      // an extreme at round-off level (no torque, say) needs no label, and a constant (max = min) needs one
      .filter((e, k, all) => withoutRoundOff(e.value, scaleSI) !== 0 && (k === 0 || withoutRoundOff(all[0].value - e.value, scaleSI) !== 0))
      .map((e) => ({ x: x(e.s_m), y: y(e.value), label: `${d.q(e.value, p.dim)} at ${placeText(e.s_m)}` }));
    const zero = marks.length === 0;
    return {
      title: `${p.title} (${unitText(units, p.dim)})${zero ? ': zero (round-off only)' : ''}`,
      points: ms.stations.map((s: Station) => [x(s.s_m), y(withoutRoundOff(stationValue(s, p.c), scaleSI))] as const),
      marks,
    };
  });
  const plot = stackedLinePlots(panels, {
    xTitle: `distance along the ${kind === 'pole' ? 'pole from the base' : 'arm from the pole face'} (${unitText(units, 'length')})`,
    xMin: 0,
    xMax: x(length_m),
  });
  return {
    kind: 'figure',
    title: `Internal forces in the ${memberText(member)}, combination ${r.combination}`,
    svg: plot.svg,
    width_pt: plot.width,
    caption: `Combination ${r.combination} gives the ${memberText(member)} its largest resultant moment. Member axes as in the section "Structural model".`,
  };
}

/** The combination the deflected shape is drawn for: the service one with the largest displacement, else any. */
function shapeCombination(analysis: DesignAnalysis): { r: CombinationResult; service: boolean } {
  const service = analysis.combinations.filter((c) => c.category === 'service');
  const pool = service.length > 0 ? service : analysis.combinations;
  let best: CombinationResult | null = null;
  let bestU = -1;
  for (const c of pool) {
    const r = analysis.results[c.id];
    const u = Math.max(...r.displacements.map((v) => Math.hypot(v[0], v[1], v[2])));
    if (u > bestU) {
      bestU = u;
      best = r;
    }
  }
  if (!best) throw new Error('no combination to draw the deflected shape for');
  return { r: best, service: service.length > 0 };
}

function shapeBlocks(design: Design, analysis: DesignAnalysis, d: Display): Block[] {
  const { r, service } = shapeCombination(analysis);
  const members = analysis.model.members;
  const axisPoint = (member: string, s: number): Vec3 => pointOnAxis(findAxis(design, member), s);
  let maxU = 0;
  let size = 0;
  for (const m of members) {
    for (const s of r.members[m.id].stations) maxU = Math.max(maxU, Math.hypot(s.ux_m, s.uy_m, s.uz_m));
    size = Math.max(size, m.length_m);
  }
  // The largest displacement drawn at about a seventh of the structure's size: visible, still a sketch.
  const mag = magnificationFor(maxU, 0.15 * size);
  const lines: ShapeLine[] = [];
  for (const m of members) {
    const st = r.members[m.id].stations;
    const undeformed = st.map((s) => axisPoint(m.id, s.s_m));
    const deformed = st.map((s, k) => add(undeformed[k], scale([s.ux_m, s.uy_m, s.uz_m], mag)));
    const arm = design.arms.find((a) => a.id === m.id);
    if (arm) {
      // the rigid offset from the pole axis to the arm root, drawn from the displaced pole node
      const node = analysis.model.elements[m.elements[0]].i;
      const p0 = analysis.model.nodes[node].xyz_m;
      const u0 = r.displacements[node];
      undeformed.unshift(p0);
      deformed.unshift(add(p0, scale([u0[0], u0[1], u0[2]], mag)));
    }
    lines.push({ undeformed, deformed });
  }
  const displaced = (node: number): Vec3 => {
    const u = r.displacements[node];
    return add(analysis.model.nodes[node].xyz_m, scale([u[0], u[1], u[2]], mag));
  };
  const tips = members.map((m) => ({ m, node: tipNode(analysis.model, m.id) }));
  // true displacements for the labels, round-off of the largest one printed as 0
  const shown = (v: number) => d.q(withoutRoundOff(v, maxU), 'section');
  // the drawing names the points; their true displacements go in a table beside it
  const pointName = (m: { kind: 'pole' | 'arm'; id: string }) => (m.kind === 'pole' ? 'pole top' : `${m.id} tip`);
  const labels: ShapeLabel[] = tips.map(({ m, node }) => ({ at: displaced(node), text: pointName(m) }));
  const table: Block = {
    kind: 'table',
    title: `Displacements of the pole top and the arm tips, ${r.combination}`,
    header: ['Point', 'ux (along X)', 'uy (along Y)', 'uz (up)'],
    widths: ['*', 90, 90, 90],
    rows: tips.map(({ m, node }) => [pointName(m), shown(r.displacements[node][0]), shown(r.displacements[node][1]), shown(r.displacements[node][2])]),
    note: 'True displacements (not magnified), global axes.',
  };
  const main = mainArm(design);
  const phi = main ? main.direction_rad : 0;
  const elevation = deflectedShapeView(lines, labels, {
    view: { kind: 'elevation', horizontal: [Math.cos(phi), Math.sin(phi), 0] },
    axisNames: [main ? `arm ${main.id} direction` : '+X', 'Z'],
  });
  const plan = deflectedShapeView(lines, labels, { view: { kind: 'plan' }, axisNames: ['X', 'Y'], maxHeight: 260 });
  const which = service ? `the service combination ${r.combination}, which has the largest displacement of the service combinations` : `combination ${r.combination}, which has the largest displacement (there is no service combination)`;
  const magText =
    mag > 1
      ? `Displacements magnified ${mag} times; the largest displacement is ${d.q(maxU, 'section')}.`
      : `Displacements not magnified (magnification 1): the largest displacement, ${d.q(maxU, 'section')}, shows at the scale of the structure.`;
  // The view in which the largest movement lies comes first: the plan when the tips sway out of
  // the elevation's plane more than they move in it.
  const normal: Vec3 = [-Math.sin(phi), Math.cos(phi), 0];
  let outOf = 0;
  let inPlane = 0;
  for (const { node } of tips) {
    const u = r.displacements[node];
    const n = Math.abs(u[0] * normal[0] + u[1] * normal[1]);
    outOf = Math.max(outOf, n);
    inPlane = Math.max(inPlane, Math.sqrt(Math.max(0, Math.hypot(u[0], u[1], u[2]) ** 2 - n * n)));
  }
  const planFirst = outOf > inPlane;
  const elevationFigure: Block = { kind: 'figure', title: `Deflected shape in elevation, ${r.combination}`, svg: elevation.svg, width_pt: elevation.width, caption: `${magText} Undeformed axes dashed.` };
  const planFigure: Block = { kind: 'figure', title: `Deflected shape in plan, ${r.combination}`, svg: plan.svg, width_pt: plan.width, caption: `${magText} Undeformed axes dashed.` };
  const viewText = planFirst
    ? 'The largest movement of the tips is out of the plane of the elevation (sideways): the plan, first, shows it.'
    : 'The largest movement of the tips lies in the plane of the elevation, shown first; the plan shows the sideways part.';
  return [
    { kind: 'heading', level: 2, text: 'Deflected shape' },
    { kind: 'paragraph', text: `The deflected shape is drawn for ${which}. ${magText} ${viewText}` },
    ...(planFirst ? [planFigure, elevationFigure] : [elevationFigure, planFigure]),
    table,
  ];
}

/** With `charts` (vega-lite, rendered by the pipeline) each member gets its chart of every force
 * component, the check ratio and the displacements; without, the resultant plots drawn here. */
export function diagramsSection(loaded: LoadedDesign, analysis: DesignAnalysis, charts: readonly MemberChart[] | null = null): DocSection {
  const { design } = loaded;
  const d = display(design.units);
  const blocks: Block[] = [...templateBlocks('diagrams', {}).blocks];
  for (const m of analysis.model.members) {
    const gov = envelope(analysis.results, m.id, 'Mres').max.combination;
    blocks.push({ kind: 'heading', level: 2, text: `${m.kind === 'pole' ? 'Pole' : `Arm ${m.id}`}` });
    const mine = (charts ?? []).filter((c) => c.member === m.id);
    if (mine.length > 0) for (const c of mine) blocks.push({ kind: 'figure', title: c.title, svg: c.svg, width_pt: c.width_pt, caption: c.caption });
    else blocks.push(memberPlot(m.id, m.kind, analysis.results[gov], m.length_m, design.units, d));
  }
  blocks.push(...shapeBlocks(design, analysis, d));
  return { id: 'diagrams', title: DIAGRAMS_TITLE, blocks };
}
