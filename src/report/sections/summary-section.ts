// The summary page, read first: the verdict, a sketch of the structure, every check type's
// governing ratio with its place, the governing base reactions for the foundation (factored and
// service), the anchor-bolt forces and the first natural frequency. It restates results of
// later sections (and says where each is worked); it computes nothing new.
import type { DesignAnalysis } from '../../analyse-design.ts';
import type { CheckRecord, CheckResults } from '../../checks/check-types.ts';
import { CHECK_TITLES, verdictByType } from '../../checks/verdict.ts';
import { isFactored } from '../../design/combination-use.ts';
import type { Design, LoadedDesign } from '../../design/design.ts';
import type { Combination } from '../../loads/load-types.ts';
import type { Vec3 } from '../../model/frame.ts';
import type { Block, DocSection } from '../document.ts';
import { elevationDrawing } from '../figures/structure-drawing.ts';
import { display, type Display } from './display.ts';
import { buildScene, mainArm } from './elevation-plan-section.ts';
import { checkPlaceText, checkRatioText, PLACE_DATUM_SHORT, STATUS_TEXT, wholeId } from './check-text.ts';
import { roundOffShare, withoutRoundOff } from './round-off.ts';

export const SUMMARY_ID = 'summary';
export const SUMMARY_TITLE = 'Summary';

/** Where the detail is, by section title (the summary is printed before the numbered sections). */
export interface SummaryPointers {
  readonly checks: string;
  readonly results: string;
}

export function summarySection(loaded: LoadedDesign, analysis: DesignAnalysis, checks: CheckResults, where: SummaryPointers): DocSection {
  const { design } = loaded;
  const d = display(design.units);
  const verdict = verdictByType(checks.records);
  const failing = verdict.filter((v) => v.failures > 0);
  const verdictText =
    verdict.length === 0
      ? 'Verdict: no design check was made for this package.'
      : failing.length === 0
        ? `Verdict: PASS. All ${verdict.length} check types pass; the largest ratio is ${worstText(verdict.map((v) => v.worst), d)}.`
        : `Verdict: FAIL. ${failing.length} of ${verdict.length} check types fail: ${failing.map((v) => `${v.title} (${checkPlaceText(v.worst, d)}, ratio ${checkRatioText(v.worst)})`).join('; ')}.`;
  const sketch = summarySketch(design);
  const blocks: Block[] = [
    { kind: 'figure', title: 'The structure', svg: sketch.svg, width_pt: sketch.width, caption: 'Elevation to scale; dimensions in section "Structure elevation and plan".', beside: { text: verdictText, emphasis: true } },
    {
      kind: 'table',
      title: 'Governing ratio of every check type',
      header: ['Check', 'Ratio', 'Result', 'Where', 'Combination'],
      widths: ['*', 34, 36, 76, 134],
      rows: verdict.map((v) => [v.title, checkRatioText(v.worst), STATUS_TEXT[v.worst.status], checkPlaceText(v.worst, d), wholeId(v.worst.combination ?? '—')]),
      note: `Ratio = |demand| / capacity, worked in section "${where.checks}". ${PLACE_DATUM_SHORT}`,
    },
    ...reactionBlocks(analysis, d, where.results),
    ...otherResults(checks, analysis, d, where),
  ];
  return { id: SUMMARY_ID, title: SUMMARY_TITLE, label: 'S', blocks };
}

function worstText(records: readonly CheckRecord[], d: Display): string {
  const w = records.reduce((a, b) => (b.ratio > a.ratio ? b : a));
  return `${checkRatioText(w)} (${CHECK_TITLES[w.type].toLowerCase()}, ${checkPlaceText(w, d)})`;
}

function summarySketch(design: Design) {
  const main = mainArm(design);
  const phi = main ? main.direction_rad : 0;
  const horizontal: Vec3 = [Math.cos(phi), Math.sin(phi), 0];
  return elevationDrawing(buildScene(design, (m) => (m === 'pole' ? 'pole' : m), ''), {
    horizontal,
    horizontalLabel: main ? main.id : 'X',
    heightDims: [],
    memberDims: [],
    width: 220,
    maxHeight: 130,
  });
}

type Reaction6 = readonly [number, number, number, number, number, number];

/** Per group (factored, service): the combination that governs each of moment, shear, torque and axial, with the values that act with it. */
function reactionBlocks(analysis: DesignAnalysis, d: Display, resultsTitle: string): Block[] {
  const node = analysis.model.supports[0]?.node;
  if (node === undefined) return [];
  const of = (c: Combination): Reaction6 | null => {
    const r = analysis.results[c.id]?.reactions.find((x) => x.node === node);
    return r ? (r.force as unknown as Reaction6) : null;
  };
  // The shear that governs usually comes with the governing moment: moment, torque and axial rows.
  const measures: readonly [string, (f: Reaction6) => number][] = [
    ['moment', (f) => Math.hypot(f[3], f[4])],
    ['torque', (f) => Math.abs(f[5])],
    ['axial', (f) => Math.abs(f[2])],
  ];
  const rows: string[][] = [];
  const groups: readonly [string, readonly Combination[]][] = [
    ['Factored', analysis.combinations.filter((c) => isFactored(c.category))],
    ['Service', analysis.combinations.filter((c) => c.category === 'service')],
  ];
  // Round-off next to the largest force (or moment, or force times height) of the table prints as 0.
  const all = analysis.combinations.map(of).filter((f): f is Reaction6 => f !== null);
  const height = Math.max(...analysis.model.nodes.map((n) => Math.abs(n.xyz_m[2])));
  const bigF = Math.max(0, ...all.flatMap((f) => [f[0], f[1], f[2]].map(Math.abs)));
  const bigM = Math.max(bigF * height, ...all.flatMap((f) => [f[3], f[4], f[5]].map(Math.abs)));
  // In second order the iteration's noise (the P-delta tolerance) prints as 0 too.
  const noise = roundOffShare(analysis.options);
  const force = (v: number) => d.q(withoutRoundOff(v, bigF, noise), 'force');
  const moment = (v: number) => d.q(withoutRoundOff(v, bigM, noise), 'moment');
  for (const [group, list] of groups) {
    // The service axial force is the dead load's, next to the factored one: not repeated.
    const wanted = group === 'Service' ? measures.filter(([name]) => name !== 'axial') : measures;
    const withForces = list.map((c) => ({ c, f: of(c) })).filter((x): x is { c: Combination; f: Reaction6 } => x.f !== null);
    if (withForces.length === 0) continue;
    for (const [name, measure] of wanted) {
      const best = withForces.reduce((a, b) => (measure(b.f) > measure(a.f) ? b : a));
      const f = best.f;
      rows.push([`${group}, ${name}`, wholeId(best.c.id), force(f[2]), force(Math.hypot(f[0], f[1])), moment(Math.hypot(f[3], f[4])), moment(Math.abs(f[5]))]);
    }
  }
  if (rows.length === 0) return [];
  return [
    {
      kind: 'table',
      title: 'Base reactions for the foundation',
      header: ['Largest', 'Combination', 'Axial', 'Shear', 'Moment', 'Torque'],
      widths: [84, 134, '*', '*', '*', '*'],
      rows,
      note: `On the foundation at the centre of the pole base: axial force down +, shear and moment as horizontal resultants, torque about the pole axis; each row's forces act together. Every combination by component: section "${resultsTitle}".`,
    },
  ];
}

/** The anchor-bolt forces and the first frequency, in one paragraph to keep the summary on a page. */
function otherResults(checks: CheckResults, analysis: DesignAnalysis, d: Display, where: SummaryPointers): Block[] {
  const checksTitle = where.checks;
  const governing = (type: CheckRecord['type']) => {
    const list = checks.records.filter((r) => r.type === type && Number.isFinite(r.ratio));
    return list.length === 0 ? null : list.reduce((a, b) => (b.demand.si > a.demand.si ? b : a));
  };
  const axial = governing('bolt-tension');
  const shear = governing('bolt-shear');
  const sentences: string[] = [];
  const parts: string[] = [];
  if (axial) parts.push(`largest axial force, tension or compression, ${d.q(axial.demand.si, axial.demand.dim)} under ${axial.combination ?? '—'}`);
  if (shear) parts.push(`largest shear ${d.q(shear.demand.si, shear.demand.dim)} under ${shear.combination ?? '—'}`);
  if (parts.length > 0) sentences.push(`Anchor-bolt forces per bolt, factored: ${parts.join('; ')} (worked in section "${checksTitle}").`);
  const first = analysis.modes[0];
  if (first) sentences.push(`First natural frequency ${d.q(first.frequency_Hz, 'frequency')} (period ${first.period_s.toPrecision(3)} s; section "${where.results}").`);
  return sentences.length === 0 ? [] : [{ kind: 'paragraph', text: sentences.join(' ') }];
}
