// Section "Design checks": the verdict by check type, the governing check of each type and
// member worked in full, and for each member and combination the station that governs.
// Reads the check records; computes no engineering.
import { formatRatio } from '../../units/units.ts';
import { printedIds, withUnbrokenIds } from '../format/unbroken-ids.ts';
import { withoutRoundOff } from './round-off.ts';
import type { DesignAnalysis } from '../../analyse-design.ts';
import type { CheckRecord, CheckResults } from '../../checks/check-types.ts';
import { CHECK_TITLES, verdictByType } from '../../checks/verdict.ts';
import type { LoadedDesign } from '../../design/design.ts';
import type { Block, DocSection } from '../document.ts';
import { display, fractionText, memberText, type Display } from './display.ts';
import { largeMovements, SMALL_DISPLACEMENT_LIMIT } from '../../analysis/displacement-range.ts';
import { RESULTS_TITLE } from './results-section.ts';
import { templateBlocks } from './templates.ts';
import { checkPlaceText, checkRatioText, PLACE_DATUM_NOTE, STATUS_TEXT } from './check-text.ts';

export const CHECKS_TITLE = 'Design checks';

export function checkSections(loaded: LoadedDesign, analysis: DesignAnalysis, checks: CheckResults): DocSection[] {
  const { design } = loaded;
  const d = display(design.units);
  const blocks: Block[] = [
    ...templateBlocks('checks', { secondOrder: analysis.options.secondOrder }).blocks,
  ];
  const verdict = verdictByType(checks.records);
  blocks.push({
    kind: 'table',
    title: 'Verdict by check type',
    header: ['Check', 'Worst ratio', 'Result', 'Where', 'Combination', 'Records (failing, warnings)'],
    widths: ['*', 44, 40, 80, 90, 62],
    rows: verdict.map((v) => [v.title, ratioText(v.worst), STATUS_TEXT[v.worst.status], placeText(v.worst, d), v.worst.combination ?? '—', `${v.count} (${v.failures}, ${v.warnings})`]),
    note: `Ratio = |demand| / capacity; "not made" when the check cannot be made (it fails, with its reason below). ${PLACE_DATUM_NOTE}`,
  });
  blocks.push(...outsideMethodBlocks(analysis));
  for (const g of checks.governing) {
    const r = g.record;
    blocks.push({ kind: 'heading', level: 2, text: `${CHECK_TITLES[r.type]}: ${memberText(r.member)}` });
    blocks.push({ kind: 'paragraph', text: recordSentence(r, d) });
    for (const step of g.steps) blocks.push({ kind: 'step', step });
    const rows = worstPerCombination(checks.records.filter((x) => x.type === r.type && x.member === r.member));
    // Anchor bolts and base plate have no station: one record per combination, no station column.
    const stations = rows.some((x) => x.s_m !== null);
    if (rows.length > 1) {
      // a demand that is round-off next to the largest demand of the table prints as 0
      const big = Math.max(...rows.map((x) => Math.abs(x.demand.si)));
      blocks.push({
        kind: 'table',
        title: `${CHECK_TITLES[r.type]}, ${memberText(r.member)}: ${stations ? 'governing station of each combination' : 'each combination'}`,
        header: ['Combination', ...(stations ? ['Station'] : []), 'Demand', 'Capacity', 'Ratio', 'Result'],
        widths: ['*', ...(stations ? [60] : []), 70, 70, 40, 40],
        rows: rows.map((x) => [x.combination ?? '—', ...(stations ? [x.s_m === null ? '—' : d.q(x.s_m, 'length')] : []), d.q(withoutRoundOff(x.demand.si, big), x.demand.dim), d.q(x.capacity.si, x.capacity.dim), ratioText(x), STATUS_TEXT[x.status]]),
      });
    }
  }
  return withUnbrokenIds([{ id: 'checks', title: CHECKS_TITLE, blocks }], printedIds(analysis));
}

/** The checks rest on the analysis: say so when some of its results are outside the small-displacement method. */
function outsideMethodBlocks(analysis: DesignAnalysis): Block[] {
  const combos = [...new Set(largeMovements(analysis.model, analysis.results).map((x) => x.combination))];
  if (combos.length === 0) return [];
  return [
    {
      kind: 'caution',
      title: 'Checks on results outside the small-displacement analysis',
      text:
        `A pole top or arm tip moves more than ${fractionText(SMALL_DISPLACEMENT_LIMIT, 'L')} of its member length (section "${RESULTS_TITLE}", caution "Results outside the small-displacement analysis") ` +
        `under ${combos.length === 1 ? 'combination' : `${combos.length} combinations:`} ${combos.join(', ')}. The checks under ${combos.length === 1 ? 'it' : 'them'} rest on results outside the method, whatever their ratio.`,
    },
  ];
}

const ratioText = checkRatioText;
const placeText = checkPlaceText;

function recordSentence(r: CheckRecord, d: Display): string {
  // A member record names its place; an anchorage label already says what it is about.
  const at = r.s_m === null && (r.member === 'anchor-bolts' || r.member === 'base-plate') ? '' : ` at ${placeText(r, d)}`;
  const head = `${r.label}${at}${r.combination !== null ? `, under ${r.combination}` : ''}: demand ${d.q(r.demand.si, r.demand.dim)}, capacity ${d.q(r.capacity.si, r.capacity.dim)}, ratio ${ratioText(r)}: ${STATUS_TEXT[r.status]}. Equation: ${r.equation}.`;
  return r.reason === '' ? head : `${head} ${r.reason[0]!.toUpperCase()}${r.reason.slice(1)}.`;
}

/** The record with the largest ratio for each combination, in the order the combinations first appear. */
function worstPerCombination(list: readonly CheckRecord[]): CheckRecord[] {
  const best = new Map<string, CheckRecord>();
  for (const r of list) {
    const k = r.combination ?? '';
    const b = best.get(k);
    if (!b || r.ratio > b.ratio) best.set(k, r);
  }
  return [...best.values()];
}
