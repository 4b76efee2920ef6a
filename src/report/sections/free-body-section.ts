// Section "Free-body diagrams": for each combination that governs a check, the whole structure in
// elevation and plan with every applied load group and the base reactions, drawn to scale, with a
// table of the same loads so every arrow can be read as numbers, and the free body of each pole-arm
// joint drawn (figures/joint-free-body.ts) and in a table; then a load diagram of each load case
// (unfactored) on the elevation. Reads the loads and results; computes only the sums it prints.
import type { DesignAnalysis } from '../../analyse-design.ts';
import type { CheckResults } from '../../checks/check-types.ts';
import { CHECK_TITLES, verdictByType } from '../../checks/verdict.ts';
import type { Arm, LoadedDesign } from '../../design/design.ts';
import { combinedLoads } from '../../analysis/analyze.ts';
import { jointFreeBody, type JointFreeBody } from '../../analysis/joint-forces.ts';
import { localAxes } from '../../loads/load-resultant.ts';
import { scale } from '../../model/vec3.ts';
import { loadGroups, type LoadGroup } from '../../loads/load-groups.ts';
import type { Combination, LoadCase } from '../../loads/load-types.ts';
import type { FrameElement, FrameModel, Vec3 } from '../../model/frame.ts';
import type { Block, DocSection } from '../document.ts';
import { freeBodyDiagram, type FreeBodyOptions } from '../figures/free-body.ts';
import { jointFreeBodyFigure, type JointFigurePart } from '../figures/joint-free-body.ts';
import { display, type Display } from './display.ts';
import { buildScene, mainArm } from './elevation-plan-section.ts';
import { wholeId } from './check-text.ts';
import { ROUND_OFF, roundOffShare, withoutRoundOff } from './round-off.ts';
import { templateBlocks } from './templates.ts';

export const FREE_BODY_TITLE = 'Free-body diagrams';
/** At most this many governing combinations are drawn (the worst first); the rest are in the tables of the checks. */
const MAX_COMBINATIONS = 4;

const windVector = (rad: number): Vec3 => [Math.cos(rad), Math.sin(rad), 0];

export function freeBodySection(loaded: LoadedDesign, analysis: DesignAnalysis, checks: CheckResults): DocSection {
  const { design } = loaded;
  const d = display(design.units);
  const scene = buildScene(design, (m) => (m === 'pole' ? 'pole' : m), '');
  const main = mainArm(design);
  const phi = main ? main.direction_rad : 0;
  const horizontal: Vec3 = [Math.cos(phi), Math.sin(phi), 0];
  const rightName = main ? `along ${main.id}` : '+X';
  const base = (wind: Vec3 | null, windLabel: string, reaction: FreeBodyOptions['reaction']) => ({
    force: (N: number) => d.q(N, 'force'),
    moment: (Nm: number) => d.q(Nm, 'moment'),
    wind,
    windLabel,
    reaction,
  });
  // The combinations that govern a check, worst ratio first, each once.
  const governing = new Map<string, string[]>();
  for (const v of [...verdictByType(checks.records)].sort((a, b) => b.worst.ratio - a.worst.ratio)) {
    const id = v.worst.combination;
    if (id === null || !analysis.combinations.some((c) => c.id === id)) continue;
    governing.set(id, [...(governing.get(id) ?? []), CHECK_TITLES[v.type].toLowerCase()]);
  }
  const combos = [...governing.keys()].slice(0, MAX_COMBINATIONS).map((id) => analysis.combinations.find((c) => c.id === id)!);
  const shortName = shortNamer(design.attachments.map((a) => a.id));
  const blocks: Block[] = [...templateBlocks('free-body', { count: String(combos.length) }).blocks];
  for (const combo of combos) {
    const groups = loadGroups(analysis.model, combinedLoads(analysis.cases, combo));
    const wind = windOf(analysis.cases, combo);
    const r = analysis.results[combo.id]!.reactions[0]!;
    const reaction = { at: analysis.model.nodes[r.node]!.xyz_m, force: [r.force[0], r.force[1], r.force[2]] as Vec3, moment: [r.force[3], r.force[4], r.force[5]] as Vec3 };
    const windLabel = wind === null ? 'no wind' : `wind toward ${d.angle(wind)}`;
    const loads = groups.filter((g) => Math.hypot(...g.force_N) > 0).map((g) => ({ at: g.at_m, force: g.force_N, name: shortName(g.source) }));
    const elevation = freeBodyDiagram(scene, loads, { ...base(wind === null ? null : windVector(wind), windLabel, reaction), view: { kind: 'elevation', horizontal }, axisNames: [rightName, 'Z'], maxHeight: 300 });
    const plan = freeBodyDiagram(scene, loads, { ...base(wind === null ? null : windVector(wind), windLabel, reaction), view: { kind: 'plan' }, axisNames: ['X', 'Y'], maxHeight: 260 });
    blocks.push({ kind: 'heading', level: 2, text: `Combination ${wholeId(combo.id)}` });
    blocks.push({ kind: 'paragraph', text: `${combo.description}. It governs: ${governing.get(combo.id)!.join('; ')}.` });
    blocks.push({ kind: 'figure', title: `Free body, ${combo.id}, elevation`, svg: elevation.svg, width_pt: elevation.width, caption: `Looking square to ${main ? `arm ${main.id}` : 'the X axis'}. Factored loads (red), each the resultant of one load source at the centroid of its parts, with its component in this view; a dot or a cross marks a component toward or away from the reader. Base reactions on the structure (blue): force R and moment M (double-headed arrow, right-hand rule). To scale.` });
    // A plan only when something acts horizontally (not for a dead-load combination).
    const horizontalLoad = groups.some((g) => Math.hypot(g.force_N[0], g.force_N[1]) > 1e-6 * Math.hypot(...g.force_N));
    if (horizontalLoad) blocks.push({ kind: 'figure', title: `Free body, ${combo.id}, plan`, svg: plan.svg, width_pt: plan.width, caption: 'Looking down, X to the right. Horizontal components of the same loads and of the base reactions (vertical components are in the elevation). To scale.' });
    blocks.push(loadTable(combo, groups, r.force, d, analysis.options));
    // Arms that meet the pole at one node share one joint: it is drawn once, with the first of them.
    const drawnWith = new Map<number, string>();
    for (const arm of design.arms) blocks.push(...jointBlocks(analysis, combo, arm, d, drawnWith));
  }
  blocks.push({ kind: 'heading', level: 2, text: 'Load diagrams of the load cases' });
  blocks.push({ kind: 'paragraph', text: 'Each load case as applied, unfactored, on the elevation; the loads in numbers are in section "Loads" (sums) and in the appendix of load calculation steps.' });
  for (const lc of analysis.cases) {
    const groups = loadGroups(analysis.model, lc.loads.map((load) => ({ load, factor: 1 })));
    const loads = groups.filter((g) => Math.hypot(...g.force_N) > 0).map((g) => ({ at: g.at_m, force: g.force_N, name: shortName(g.source) }));
    const wind = lc.windAngle_rad;
    const fig = freeBodyDiagram(scene, loads, { ...base(wind === null ? null : windVector(wind), wind === null ? '' : `wind toward ${d.angle(wind)}`, null), view: { kind: 'elevation', horizontal }, axisNames: [rightName, 'Z'], maxHeight: 230 });
    blocks.push({ kind: 'figure', title: `Load case ${lc.id}`, svg: fig.svg, width_pt: fig.width, caption: `${lc.description}. Unfactored loads, each the resultant of one load source at the centroid of its parts, with its component in the view. To scale.` });
  }
  return { id: 'free-body', title: FREE_BODY_TITLE, blocks };
}

/** The plan angle of the combination's wind, or null without wind. */
function windOf(cases: readonly LoadCase[], combo: Combination): number | null {
  for (const f of combo.factors) {
    const lc = cases.find((c) => c.id === f.caseId);
    if (lc && lc.windAngle_rad !== null && f.factor !== 0) return lc.windAngle_rad;
  }
  return null;
}

/** The label of a load source: an attachment's id, or "weight, pole" / "wind, arm SA" for a member. */
function shortNamer(ids: readonly string[]): (source: string) => string {
  return (source) => {
    const last = source.split(' ').at(-1) ?? source;
    if (ids.includes(last) && !/\b(pole|arm)\b/.test(source.slice(0, -last.length))) return last;
    const s = source.replace(/^self-weight of (the )?/, 'weight, ').replace(/^(wind|natural gust|truck gust|galloping) on (the )?/, '$1, ');
    return s.length > 28 ? `${s.slice(0, 26)}…` : s;
  };
}

/** The free body of the joint where an arm meets the pole, drawn and in a table: every member end's force and moment on the joint node, and their sum. */
function jointBlocks(analysis: DesignAnalysis, combo: Combination, arm: Arm, d: Display, drawnWith: Map<number, string>): Block[] {
  const j = jointFreeBody(analysis.model, analysis.results[combo.id]!, arm.id, combinedLoads(analysis.cases, combo));
  const bigF = Math.max(...j.parts.map((p) => Math.hypot(...p.force_N)));
  const bigM = Math.max(...j.parts.map((p) => Math.hypot(...p.moment_Nm)));
  // Noise of the solution prints as 0: below 1e-9 of the largest part, or in second order below the
  // P-delta tolerance of it (the iteration stops there). The drawing leaves the same values out.
  const tol = roundOffShare(analysis.options);
  const f = (v: number) => d.q(withoutRoundOff(v, bigF, tol), 'force');
  const m = (v: number) => d.q(withoutRoundOff(v, bigM, tol), 'moment');
  const rows = j.parts.map((p) => [p.what, f(p.force_N[0]), f(p.force_N[1]), f(p.force_N[2]), m(p.moment_Nm[0]), m(p.moment_Nm[1]), m(p.moment_Nm[2])]);
  rows.push(['Sum (equilibrium of the joint)', f(j.sumForce_N[0]), f(j.sumForce_N[1]), f(j.sumForce_N[2]), m(j.sumMoment_Nm[0]), m(j.sumMoment_Nm[1]), m(j.sumMoment_Nm[2])]);
  const table: Block = {
    kind: 'table',
    title: `Free body of the joint of arm ${arm.id} and the pole, ${combo.id}`,
    header: ['On the joint', 'Fx', 'Fy', 'Fz', 'Mx', 'My', 'Mz'],
    // Room for the values (a power of ten and its unit on two lines at most); the names wrap.
    widths: [96, '*', '*', '*', '*', '*', '*'],
    rows,
    note: `Global axes; forces and moments that each member end exerts on the joint node (node ${j.node}), moments about the node: the arm's end at the pole face is carried to the node through its rigid offset. They balance: the last row is round-off. Values below ${tol === ROUND_OFF ? '1e-9' : `the P-delta tolerance (${tol})`} of the largest print as 0.${drawnWith.has(j.node) ? ` This joint is drawn above with arm ${drawnWith.get(j.node)!}.` : ''}`,
  };
  if (drawnWith.has(j.node)) return [table];
  drawnWith.set(j.node, arm.id);
  const fig = jointFreeBodyFigure(jointFigureParts(analysis.model, j), {
    arm: arm.id,
    horizontal: [Math.cos(arm.direction_rad), Math.sin(arm.direction_rad), 0],
    force: (N) => d.q(N, 'force'),
    moment: (Nm) => d.q(Nm, 'moment'),
    roundOff: tol,
    maxHeight: 200,
  });
  const views = fig.views.length === 2 ? 'Elevation and plan' : 'Elevation only: nothing acts out of its plane';
  const names = fig.obliqueNames ? ' Components along the arm in plan are named h, normal to it n.' : '';
  return [
    {
      kind: 'figure',
      title: `Joint of arm ${arm.id} and the pole, ${combo.id}`,
      svg: fig.svg,
      width_pt: fig.width,
      withNext: true,
      caption: `${views}. Forces (blue) and moments (purple) that the member ends exert on the joint, the values of the table that follows; moments about the node, right-hand rule (curved arrow counter-clockwise: toward the reader). Stubs schematic; arrows sized per kind against the largest force and the largest moment, not to scale.${names}`,
    },
    table,
  ];
}

/** Each part of the joint free body with its short name and the direction of its member from the node (the member's axis; none for the loads at the node). */
export function jointFigureParts(model: FrameModel, j: JointFreeBody): JointFigurePart[] {
  const axisOf = (element: FrameElement | undefined, sign: 1 | -1): Vec3 => {
    if (!element) throw new Error(`joint ${j.node}: no element for a part of its free body`);
    return scale(localAxes(model, element.id).x, sign);
  };
  return j.parts.map((p) => {
    const arm = /^arm (.+) at its root$/.exec(p.what);
    let name: string;
    let toward: Vec3 | null;
    if (arm) {
      const member = model.members.find((mm) => mm.id === arm[1]);
      name = `arm ${arm[1]}`;
      toward = axisOf(member ? model.elements[member.elements[0]!] : undefined, 1);
    } else if (p.what === 'pole below the joint') {
      name = 'pole below';
      toward = axisOf(model.elements.find((e) => e.member === 'pole' && e.j === j.node), -1);
    } else if (p.what === 'pole above the joint') {
      name = 'pole above';
      toward = axisOf(model.elements.find((e) => e.member === 'pole' && e.i === j.node), 1);
    } else if (p.what === 'loads applied at the joint') {
      name = 'loads at the joint';
      toward = null;
    } else throw new Error(`joint ${j.node}: unknown part of its free body "${p.what}"`);
    return { name, toward, force_N: p.force_N, moment_Nm: p.moment_Nm };
  });
}

function loadTable(combo: Combination, groups: readonly LoadGroup[], reaction: readonly number[], d: Display, analysisOptions: { readonly secondOrder: boolean; readonly tolerance: number }): Block {
  const sum = [0, 0, 0];
  for (const g of groups) for (let k = 0; k < 3; k++) sum[k] += g.force_N[k];
  const big = Math.max(...groups.flatMap((g) => g.force_N.map(Math.abs)), ...reaction.slice(0, 3).map(Math.abs));
  const f = (v: number) => d.q(withoutRoundOff(v, big, roundOffShare(analysisOptions)), 'force');
  // A centroid on an axis at 90° comes out as 74 × 10⁻¹⁸ m (cos 90°): round-off of the geometry, printed as 0.
  const far = Math.max(...groups.flatMap((g) => g.at_m.map(Math.abs)));
  const len = (v: number) => d.q(withoutRoundOff(v, far), 'length');
  const rows = groups
    .filter((g) => Math.hypot(...g.force_N) > 0)
    .map((g) => [g.source, f(g.force_N[0]), f(g.force_N[1]), f(g.force_N[2]), `${len(g.at_m[0])}, ${len(g.at_m[1])}, ${len(g.at_m[2])}`]);
  const couples = groups.filter((g) => Math.hypot(...g.force_N) === 0).map((g) => g.source);
  rows.push(['Sum of the applied loads', f(sum[0]), f(sum[1]), f(sum[2]), '']);
  rows.push(['Base reaction (on the structure)', f(reaction[0]!), f(reaction[1]!), f(reaction[2]!), '0, 0, 0']);
  return {
    kind: 'table',
    title: `Applied loads of ${combo.id}, factored, and the base reaction`,
    header: ['Load source', 'Fx', 'Fy', 'Fz', 'Drawn at x, y, z'],
    widths: ['*', 52, 52, 52, 110],
    rows,
    note:
      'Global axes. Each source is the sum of its factored loads; it is drawn at the centroid of its parts, and the moment of its parts about that point (from attachment offsets) acts with it in the analysis.' +
      (couples.length > 0 ? ` Couples without force (${couples.length === 1 ? 'one source' : `${couples.length} sources`}, such as the offset moments of the attachments) are applied as well and are not drawn.` : '') +
      ' The sum of the applied loads and the reaction balance (statics check in section "Analysis results").',
  };
}
