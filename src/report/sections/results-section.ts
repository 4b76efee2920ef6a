// Section "Analysis results": per combination the iterations, convergence and base moment
// amplification, the displacements of the pole top and arm tips (with a caution when one moves beyond
// the small-displacement range), the base reactions (factored
// and service), the statics check, the envelopes per member and the natural modes.
import type { DesignAnalysis } from '../../analyse-design.ts';
import type { CombinationResult, EnvelopeComponent } from '../../analysis/analysis-types.ts';
import { envelope, extremeExtent, resultsOf } from '../../analysis/envelope.ts';
import type { LoadedDesign } from '../../design/design.ts';
import type { Combination } from '../../loads/load-types.ts';
import type { FrameModel, Vec3 } from '../../model/frame.ts';
import { formatNumber, formatPercent, formatTolerance } from '../../units/units.ts';
import type { Block, DocSection } from '../document.ts';
import { isFactored } from '../../design/combination-use.ts';
import { display, fractionText, memberText, type Display } from './display.ts';
import { largeMovements, SMALL_DISPLACEMENT_LIMIT, worstPerMember } from '../../analysis/displacement-range.ts';
import { templateBlocks } from './templates.ts';
import { vecText } from './vector-text.ts';
import { ROUND_OFF, roundOffShare, withoutRoundOff } from './round-off.ts';

export const RESULTS_TITLE = 'Analysis results';

/** A relative statics residual at or below this is called negligible (round-off of the solution). */
export const TINY_RESIDUAL = 1e-6;

/** Node at the tip end of a member (the j end of its last element). */
export function tipNode(model: FrameModel, member: string): number {
  const info = model.members.find((m) => m.id === member);
  if (!info || info.elements.length === 0) throw new Error(`member ${member} has no elements`);
  return model.elements[info.elements[info.elements.length - 1]].j;
}

function resultOf(analysis: DesignAnalysis, c: Combination): CombinationResult {
  const r = analysis.results[c.id];
  if (!r) throw new Error(`combination ${c.id} has no result`);
  return r;
}

function summaryBlocks(analysis: DesignAnalysis, d: Display): Block[] {
  const second = analysis.options.secondOrder;
  return [
    { kind: 'heading', level: 2, text: 'Analysis of each combination' },
    {
      kind: 'paragraph',
      text: second
        ? 'For each combination: the linear solutions the second-order iteration took, how far it converged, and the resultant base moment of the pole in first order and in second order with their ratio, the amplification.'
        : 'For each combination: the resultant base moment of the pole (first-order analysis, one linear solution each).',
    },
    {
      kind: 'table',
      title: second ? 'Second-order iteration and base moment amplification' : 'Base moment (first-order analysis)',
      header: ['Combination', 'Solutions', 'Last change', 'Residual', 'Base moment, 1st order', 'Base moment, final', 'Amplification'],
      widths: [104, 48, 58, 58, '*', '*', 66],
      rows: analysis.combinations.map((c) => {
        const r = resultOf(analysis, c);
        const b = r.baseMoment;
        return [
          c.id,
          `${r.iterations}`,
          r.secondOrder ? formatTolerance(r.convergence.change) : '–',
          r.secondOrder ? formatTolerance(r.convergence.residual) : '–',
          b ? d.q(b.firstOrder_Nm, 'moment') : '–',
          b ? d.q(b.final_Nm, 'moment') : '–',
          b && b.amplification !== null ? formatNumber(b.amplification, 4) : '–',
        ];
      }),
      note:
        'Solutions: linear solutions made (1 for first order). Last change: largest change of a displacement in the last iteration relative to the largest displacement (dimensionless). ' +
        'Residual: out-of-balance force of the final solution with the geometric stiffness rebuilt from its own axial forces, relative to the largest load (dimensionless). ' +
        'Base moment: resultant bending moment √(My² + Mz²) in the pole at the base; amplification = final / first order (dimensionless).',
    },
  ];
}

function displacementBlocks(loaded: LoadedDesign, analysis: DesignAnalysis, d: Display): Block[] {
  const { design } = loaded;
  const poleTop = tipNode(analysis.model, 'pole');
  const arms = design.arms.map((a) => ({ id: a.id, node: tipNode(analysis.model, a.id) }));
  return [
    { kind: 'heading', level: 2, text: 'Displacements of the pole top and the arm tips' },
    { kind: 'paragraph', text: 'Displacements of the pole top and of every arm tip under each combination, in global axes.' },
    {
      kind: 'table',
      title: 'Displacements at the pole top and the arm tips',
      header: ['Combination', 'Pole top, horizontal', ...arms.flatMap((a) => [`Arm ${a.id} tip, vertical`, `Arm ${a.id} tip, horizontal`])],
      widths: [118, ...Array.from({ length: 1 + 2 * arms.length }, () => '*' as const)],
      rows: analysis.combinations.map((c) => {
        const u = resultOf(analysis, c).displacements;
        const h = (n: number) => d.q(Math.hypot(u[n][0], u[n][1]), 'section');
        return [c.id, h(poleTop), ...arms.flatMap((a) => [d.q(u[a.node][2], 'section'), h(a.node)])];
      }),
      note: 'Horizontal: resultant of the X and Y translations. Vertical: Z translation, positive up, of the member axis, including the movement of the pole. The deflection checks of section "Design checks" read these: the arm tips vertical under the dead-alone service combination, the pole top horizontal under the service combinations (the arm tips horizontal without the movement they have with the pole), the arm tips vertical under the galloping and truck-gust fatigue loads.',
    },
    ...largeMovementBlocks(analysis, d),
  ];
}

/** A caution when a pole top or arm tip moves beyond the small-displacement range, worst combination per member. */
function largeMovementBlocks(analysis: DesignAnalysis, d: Display): Block[] {
  const all = largeMovements(analysis.model, analysis.results);
  if (all.length === 0) return [];
  const limit = fractionText(SMALL_DISPLACEMENT_LIMIT, 'L');
  const lines = worstPerMember(analysis.model, all).map((x) => {
    const others = all.filter((y) => y.member === x.member).length - 1;
    const tip = x.member === 'pole' ? 'The pole top' : `The tip of ${memberText(x.member)}`;
    return (
      `${tip} moves ${d.q(x.movement_m, 'length')} under combination ${x.combination}, ${formatNumber(x.ratio, 3)} of the member length L = ${d.q(x.length_m, 'length')}` +
      (others > 0 ? ` (beyond ${limit} under ${others} other combination${others === 1 ? '' : 's'} as well).` : '.')
    );
  });
  const method = analysis.options.secondOrder ? 'this second-order (P-delta) analysis' : 'this first-order analysis';
  return [
    {
      kind: 'caution',
      title: 'Results outside the small-displacement analysis',
      text:
        `${lines.join('\n\n')}\n\n` +
        'Movement: the total translation of the pole top or of the arm tip, for an arm with what it has with the pole. ' +
        `These movements exceed ${limit}, a limit of ours (common practice): beyond about a tenth of the length the small-displacement, small-rotation assumption of ${method} no longer holds. ` +
        'The forces, moments and checks of this package under these combinations are outside the method and are not to be relied on: stiffen the structure, or have it analysed by a method for large displacements.',
    },
  ];
}

function reactionRows(analysis: DesignAnalysis, list: readonly Combination[], d: Display): string[][] {
  const node = analysis.model.supports[0].node;
  const forces = list.map((c) => {
    const r = resultOf(analysis, c).reactions.find((x) => x.node === node);
    if (!r) throw new Error(`combination ${c.id} has no reaction at node ${node}`);
    return r.force;
  });
  // Round-off is judged against the whole table: the largest force, and the largest moment or
  // that force times the height of the structure, whichever is larger.
  const height = Math.max(...analysis.model.nodes.map((n) => Math.abs(n.xyz_m[2])));
  const bigF = Math.max(...forces.flatMap((f) => [f[0], f[1], f[2]].map(Math.abs)));
  const bigM = Math.max(bigF * height, ...forces.flatMap((f) => [f[3], f[4], f[5]].map(Math.abs)));
  return list.map((c, k) => {
    const f = forces[k]!;
    const noise = roundOffShare(analysis.options);
    return [c.id, ...vecText([f[0], f[1], f[2]], 'force', d, bigF, noise), ...vecText([f[3], f[4], f[5]], 'moment', d, bigM, noise)];
  });
}

function reactionBlocks(analysis: DesignAnalysis, d: Display): Block[] {
  const header = ['Combination', 'Fx', 'Fy', 'Fz', 'Mx', 'My', 'Mz'];
  const widths = [118, '*', '*', '*', '*', '*', '*'] as const;
  const note =
    'Forces and moments exerted by the support on the structure at the centre of the pole base, global axes. The foundation receives the same values with opposite signs. ' +
    `A value within ${formatTolerance(roundOffShare(analysis.options))} of the largest force, or of the largest moment or that force times the height, in its table prints as 0.`;
  const groups: { title: string; list: Combination[] }[] = [
    { title: 'Base reactions, factored combinations (strength and extreme)', list: analysis.combinations.filter((c) => isFactored(c.category)) },
    { title: 'Base reactions, service combinations (unfactored)', list: analysis.combinations.filter((c) => c.category === 'service') },
    { title: 'Base reactions, fatigue combinations', list: analysis.combinations.filter((c) => c.category === 'fatigue') },
  ];
  const blocks: Block[] = [
    { kind: 'heading', level: 2, text: 'Base reactions' },
    { kind: 'paragraph', text: 'The reactions at the pole base for the foundation design: factored combinations (strength and extreme) first, then service combinations, each combination analysed on its own.' },
  ];
  for (const g of groups) {
    if (g.list.length === 0) continue;
    blocks.push({ kind: 'table', title: g.title, header, widths: [...widths], rows: reactionRows(analysis, g.list, d), note });
  }
  return blocks;
}

/** The three components of a vector, one per line: x, y, z. */
const componentLines = (xyz: readonly string[]): string => xyz.map((v, k) => `${'xyz'[k]}: ${v}`).join('\n');

function staticsBlocks(analysis: DesignAnalysis, d: Display): Block[] {
  const deformed = analysis.options.secondOrder;
  const rows = analysis.combinations.map((c) => resultOf(analysis, c));
  const share = (v: number | null) => (v === null ? '–' : formatPercent(v));
  const blocks: Block[] = [
    { kind: 'heading', level: 2, text: 'Statics check' },
    ...templateBlocks('statics-check', { deformed }).blocks,
    { kind: 'paragraph', text: `The sums and residuals of every combination are tabled in the appendix "${STATICS_TABLES_TITLE}".` },
  ];
  const worstBy = (key: (r: CombinationResult) => number) => rows.reduce((a, b) => (key(b) > key(a) ? b : a));
  const wf = worstBy((r) => r.statics.relativeForceResidual);
  const wm = worstBy((r) => r.statics.relativeMomentResidual);
  if (wf.statics.relativeForceResidual > TINY_RESIDUAL) {
    blocks.push({
      kind: 'caution',
      title: 'Force balance not met',
      text:
        `Under combination ${wf.combination} the reactions do not balance the applied forces: relative force residual ${formatTolerance(wf.statics.relativeForceResidual)}, ` +
        `residual (${vecText(wf.statics.residualForce_N, 'force', d).join(', ')}). The sum of forces balances to round-off in a correct analysis in either configuration; do not use these results before the cause is found.`,
    });
  }
  if (wm.statics.relativeMomentResidual > TINY_RESIDUAL && wm.statics.configuration === 'deformed') {
    const t = templateBlocks(
      'statics-deformed',
      {
        forceResidual: wf.statics.relativeForceResidual,
        forceCombination: wf.combination,
        momentResidual: Math.hypot(...wm.statics.residualMoment_Nm),
        momentCombination: wm.combination,
        momentRelative: wm.statics.relativeMomentResidual,
        momentShare: share(wm.statics.momentResidualShare),
        displacementMoment: wm.statics.displacementMoment_Nm,
      },
      { units: d.units },
    );
    blocks.push({ kind: 'caution', title: 'Statics residual in the deformed configuration', text: t.blocks.map((b) => (b.kind === 'paragraph' ? b.text : '')).join('\n\n') });
  } else if (wm.statics.relativeMomentResidual > TINY_RESIDUAL) {
    blocks.push({
      kind: 'caution',
      title: 'Moment balance not met',
      text:
        `Under combination ${wm.combination} the relative moment residual is ${formatTolerance(wm.statics.relativeMomentResidual)} on the undeformed structure, ` +
        `residual moment (${vecText(wm.statics.residualMoment_Nm, 'moment', d).join(', ')}). A first-order analysis balances to round-off: do not use these results before the cause is found.`,
    });
  } else {
    blocks.push(
      ...templateBlocks('statics-balanced', {
        forceResidual: wf.statics.relativeForceResidual,
        forceCombination: wf.combination,
        momentResidual: wm.statics.relativeMomentResidual,
        momentCombination: wm.combination,
        deformed: wm.statics.configuration === 'deformed',
      }).blocks,
    );
  }
  return blocks;
}

const ENVELOPE_ROWS: readonly { c: EnvelopeComponent; which: 'max' | 'min'; label: string; dim: 'moment' | 'force' }[] = [
  { c: 'Mres', which: 'max', label: 'Resultant moment Mres, largest', dim: 'moment' },
  { c: 'Vres', which: 'max', label: 'Resultant shear Vres, largest', dim: 'force' },
  { c: 'T', which: 'max', label: 'Torque T, most positive', dim: 'moment' },
  { c: 'T', which: 'min', label: 'Torque T, most negative', dim: 'moment' },
  { c: 'N', which: 'max', label: 'Axial N, most tensile', dim: 'force' },
  { c: 'N', which: 'min', label: 'Axial N, most compressive', dim: 'force' },
];

function envelopeBlocks(analysis: DesignAnalysis, d: Display): Block[] {
  const factored = analysis.combinations.filter((c) => isFactored(c.category)).map((c) => c.id);
  if (factored.length === 0) return [];
  const results = resultsOf(analysis.results, factored);
  const rows: string[][] = [];
  for (const m of analysis.model.members) {
    const envs = ENVELOPE_ROWS.map((e) => ({ e, env: envelope(results, m.id, e.c)[e.which] }));
    // the member's largest force and moment: the scale of round-off for its other values
    const scaleOf = (dim: 'moment' | 'force') => Math.max(...envs.filter((x) => x.e.dim === dim).map((x) => Math.abs(x.env.value)));
    for (const { e, env } of envs) {
      const value = withoutRoundOff(env.value, scaleOf(e.dim));
      if (value === 0) {
        rows.push([memberText(m.id), e.label, d.q(0, e.dim), '– (none)', '–']);
        continue;
      }
      const stations = results[env.combination]!.members[m.id]!.stations;
      const span = extremeExtent(stations, e.c, env, CONSTANT_SHARE * scaleOf(e.dim));
      const from = m.kind === 'pole' ? 'above base' : 'from pole face';
      const place = span.to_m - span.from_m > 1e-9 * m.length_m ? `${d.q(span.from_m, 'length')} to ${d.q(span.to_m, 'length')} ${from}` : `${d.q(env.s_m, 'length')} ${from}`;
      rows.push([memberText(m.id), e.label, d.q(value, e.dim), env.combination, place]);
    }
  }
  return [
    { kind: 'heading', level: 2, text: 'Envelopes of internal forces' },
    { kind: 'paragraph', text: 'For each member, the governing internal forces over the factored combinations (strength, extreme wind, extreme wind with ice), with the combination and the place that give them. Service and fatigue combinations are not in these envelopes.' },
    {
      kind: 'table',
      title: 'Governing internal forces per member, factored combinations',
      header: ['Member', 'Quantity', 'Value', 'Combination', 'Place'],
      widths: [44, '*', 62, 118, 82],
      rows,
      note:
        'Member axes and signs as in the section "Structural model" (N > 0 tension). Extremes are exact along each element. ' +
        `Where the value holds over a length (within ${formatTolerance(CONSTANT_SHARE)} of the member's largest value of its kind), the place is that length. ` +
        `A value within ${formatTolerance(ROUND_OFF)} of the member's largest force or moment is round-off and printed as 0, with no combination named.`,
    },
  ];
}

/** Values within this share of the member's largest of their kind count as the same value (a constant run). */
const CONSTANT_SHARE = 1e-6;

function foundationBlocks(analysis: DesignAnalysis, d: Display): Block[] {
  const node = analysis.model.supports[0]!.node;
  const groups = [
    { title: 'Foundation design envelope, factored combinations', list: analysis.combinations.filter((c) => isFactored(c.category)) },
    { title: 'Foundation design envelope, service combinations (unfactored)', list: analysis.combinations.filter((c) => c.category === 'service') },
  ];
  const blocks: Block[] = [];
  for (const g of groups) {
    if (g.list.length === 0) continue;
    const rows = g.list.map((c) => {
      const f = resultOf(analysis, c).reactions.find((x) => x.node === node)!.force;
      return { id: c.id, M: Math.hypot(f[3], f[4]), V: Math.hypot(f[0], f[1]), P: f[2], T: Math.abs(f[5]) };
    });
    const most = (key: 'M' | 'V' | 'P' | 'T', sign = 1) => rows.reduce((a, b) => (sign * b[key] > sign * a[key] ? b : a));
    // a value that is round-off (or, in second order, the iteration's noise) next to the largest
    // force or moment of the table prints as 0, with no combination named
    const height = Math.max(...analysis.model.nodes.map((n) => Math.abs(n.xyz_m[2])));
    const bigF = Math.max(...rows.flatMap((r) => [r.V, Math.abs(r.P)]));
    const bigM = Math.max(bigF * height, ...rows.map((r) => r.M));
    const noise = roundOffShare(analysis.options);
    const line = (label: string, key: 'M' | 'V' | 'P' | 'T', dim: 'moment' | 'force', sign = 1) => {
      const r = most(key, sign);
      const v = withoutRoundOff(r[key], dim === 'moment' ? bigM : bigF, noise);
      return [label, d.q(v, dim), v === 0 ? '—' : r.id];
    };
    blocks.push({
      kind: 'table',
      title: g.title,
      header: ['Quantity at the top of the foundation', 'Value', 'Combination'],
      widths: ['*', 90, 140],
      rows: [
        line('Largest overturning moment M = √(Mx² + My²)', 'M', 'moment'),
        line('Largest horizontal shear V = √(Fx² + Fy²)', 'V', 'force'),
        line('Largest vertical reaction Fz (up on the pole, down on the foundation)', 'P', 'force'),
        line('Smallest vertical reaction Fz (negative: uplift)', 'P', 'force', -1),
        line('Largest torque T = |Mz|', 'T', 'moment'),
      ],
      note: `From the reactions at the pole base (by the support on the structure; the foundation receives them with opposite signs). Each value with the combination that gives it; they need not occur together, and the combination rows above give the values that do. A value within ${formatTolerance(noise)} of the largest force or moment of the table prints as 0, with no combination named.`,
    });
  }
  return blocks;
}

function modeBlocks(analysis: DesignAnalysis, d: Display): Block[] {
  const pct = (v: number) => formatPercent(withoutRoundOff(v, 1));
  const total = (k: 0 | 1 | 2) => analysis.modes.reduce((s, m) => s + m.effectiveMassRatio[k], 0);
  const sum: Vec3 = [total(0), total(1), total(2)];
  return [
    { kind: 'heading', level: 2, text: 'Natural frequencies' },
    ...templateBlocks('natural-frequencies', {}).blocks,
    {
      kind: 'table',
      title: 'Natural frequencies, periods and effective mass ratios',
      header: ['Mode', 'Frequency', 'Period', 'Effective mass X', 'Effective mass Y', 'Effective mass Z'],
      widths: [36, '*', '*', '*', '*', '*'],
      rows: [
        ...analysis.modes.map((m) => [`${m.mode}`, d.q(m.frequency_Hz, 'frequency'), `${formatNumber(m.period_s)} s`, pct(m.effectiveMassRatio[0]), pct(m.effectiveMassRatio[1]), pct(m.effectiveMassRatio[2])]),
        ['Sum', '', '', pct(sum[0]), pct(sum[1]), pct(sum[2])],
      ],
      note: `Effective mass ratio: effective modal mass in the global direction as a share of the total moving mass; below ${formatTolerance(ROUND_OFF)} (round-off) it prints as 0.`,
    },
  ];
}

export function resultsSection(loaded: LoadedDesign, analysis: DesignAnalysis): DocSection {
  const d = display(loaded.design.units);
  return {
    id: 'results',
    title: RESULTS_TITLE,
    blocks: [
      ...templateBlocks('analysis-results', {}).blocks,
      ...summaryBlocks(analysis, d),
      ...displacementBlocks(loaded, analysis, d),
      ...reactionBlocks(analysis, d),
      ...foundationBlocks(analysis, d),
      ...staticsBlocks(analysis, d),
      ...envelopeBlocks(analysis, d),
      ...modeBlocks(analysis, d),
    ],
  };
}


export const STATICS_TABLES_TITLE = 'Statics check by combination';

/** The appendix of the statics check: the sums of applied loads and reactions of every combination. */
export function staticsTablesSection(loaded: LoadedDesign, analysis: DesignAnalysis): DocSection {
  const d = display(loaded.design.units);
  const deformed = analysis.options.secondOrder;
  const rows = analysis.combinations.map((c) => resultOf(analysis, c));
  const share = (v: number | null) => (v === null ? '–' : formatPercent(v));
  // Round-off (and, in second order, the iteration's noise) is judged against the whole table:
  // the largest force, and the largest moment or that force times the height of the structure.
  const noise = roundOffShare(analysis.options);
  const height = Math.max(...analysis.model.nodes.map((n) => Math.abs(n.xyz_m[2])));
  const bigF = Math.max(...rows.flatMap((r) => [...r.statics.appliedForce_N, ...r.statics.reactionForce_N].map(Math.abs)));
  const bigM = Math.max(bigF * height, ...rows.flatMap((r) => [...r.statics.appliedMoment_Nm, ...r.statics.reactionMoment_Nm].map(Math.abs)));
  const blocks: Block[] = [
    { kind: 'paragraph', text: `The statics check of section "${RESULTS_TITLE}", combination by combination: forces, then moments about the origin.` },
    {
      kind: 'table',
      title: 'Statics check: forces',
      header: ['Combination', 'Applied ΣFx, ΣFy, ΣFz', 'Reactions ΣFx, ΣFy, ΣFz', '|Residual|', 'Relative'],
      widths: [110, '*', '*', '*', 58],
      rows: rows.map((r) => [
        r.combination,
        componentLines(vecText(r.statics.appliedForce_N, 'force', d, bigF, noise)),
        componentLines(vecText(r.statics.reactionForce_N, 'force', d, bigF, noise)),
        d.q(withoutRoundOff(Math.hypot(...r.statics.residualForce_N), bigF, noise), 'force'),
        formatTolerance(r.statics.relativeForceResidual),
      ]),
      note:
        `Configuration of the check: ${deformed ? 'deformed' : 'undeformed'}. Relative: |residual force| / Σ|applied forces| (dimensionless). ` +
        `A force or moment within ${formatTolerance(noise)} of the largest of its kind in these two tables prints as 0 (${deformed ? 'the P-delta iteration tolerance: below it a value is the iteration\'s noise' : 'round-off'}); the relative residuals are computed from the values before rounding.`,
    },
    {
      kind: 'table',
      title: 'Statics check: moments about the origin',
      header: ['Combination', 'Applied ΣMx, ΣMy, ΣMz', 'Reactions ΣMx, ΣMy, ΣMz', '|Residual|', 'Relative', ...(deformed ? ['Share'] : [])],
      widths: [110, '*', '*', '*', 58, ...(deformed ? [52] : [])],
      rows: rows.map((r) => [
        r.combination,
        componentLines(vecText(r.statics.appliedMoment_Nm, 'moment', d, bigM, noise)),
        componentLines(vecText(r.statics.reactionMoment_Nm, 'moment', d, bigM, noise)),
        d.q(withoutRoundOff(Math.hypot(...r.statics.residualMoment_Nm), bigM, noise), 'moment'),
        formatTolerance(r.statics.relativeMomentResidual),
        ...(deformed ? [share(r.statics.momentResidualShare)] : []),
      ]),
      note:
        `Configuration of the check: ${deformed ? 'deformed' : 'undeformed'}. Relative: as defined above (dimensionless).` +
        (deformed ? ' Share: |residual moment| / (Σ|applied forces| × largest node displacement), the part of the moment the displacements add that the method leaves unbalanced.' : ''),
    },
  ];
  return { id: 'statics-tables', title: STATICS_TABLES_TITLE, blocks, appendix: true };
}
