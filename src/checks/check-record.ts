// Building check records and their governing selection: one place for the ratio, the status
// and the (type, member) grouping, so every check type behaves alike.
import type { CalcStep, Qty } from '../calc/step.ts';
import type { CheckRecord, CheckStatus, CheckType, GoverningCheck } from './check-types.ts';

/** What each check module returns: its records and, for each, the full steps made on demand
 * (only the governing ones are printed, so steps are not made for every station). */
export interface CheckedRecords {
  readonly records: CheckRecord[];
  readonly steps: Map<CheckRecord, () => CalcStep[]>;
}

export interface RecordInput {
  readonly type: CheckType;
  readonly label: string;
  readonly member: string;
  readonly s_m: number | null;
  readonly combination: string | null;
  readonly demand: Qty;
  readonly capacity: Qty;
  readonly equation: string;
  /** When given, the check could not be made: it fails with this reason. */
  readonly cannot?: string;
  /** A check whose exceedance is a warning for the engineer, not a failure (vortex susceptibility). */
  readonly warnOnly?: boolean;
  /** An explanation that goes with a pass, e.g. why a member is exempt. */
  readonly note?: string;
}

/** Ratios within this of 1 pass: the limit itself is met (round-off of the last digit). */
const RATIO_ROUND_OFF = 1e-9;

export function makeRecord(r: RecordInput): CheckRecord {
  // One object literal in the printed key order (a spread of a spread cost 2 µs a record, and a
  // build makes thousands).
  if (r.cannot !== undefined) {
    return { type: r.type, label: r.label, member: r.member, s_m: r.s_m, combination: r.combination, demand: r.demand, capacity: r.capacity, equation: r.equation, ratio: Infinity, status: 'fail', reason: r.cannot };
  }
  const ratio = r.capacity.si > 0 ? Math.abs(r.demand.si) / r.capacity.si : Infinity;
  const over = !(ratio <= 1 + RATIO_ROUND_OFF);
  const status: CheckStatus = over ? (r.warnOnly ? 'warn' : 'fail') : 'ok';
  const reason = over ? (r.warnOnly ? (r.note ?? 'beyond the limit: needs the engineer’s attention') : `the demand exceeds the capacity (ratio ${ratio.toFixed(3)})`) : (r.note ?? '');
  return { type: r.type, label: r.label, member: r.member, s_m: r.s_m, combination: r.combination, demand: r.demand, capacity: r.capacity, equation: r.equation, ratio, status, reason };
}

/** The key by which governing records are grouped. */
export const groupKey = (r: CheckRecord): string => `${r.type}\u0000${r.member}`;

/**
 * One governing record per (type, member): a failed check that cannot be made first, then the
 * largest ratio (the first of equal ratios). stepsOf makes the full steps of that record only.
 */
export function governingOf(records: readonly CheckRecord[], stepsOf: (r: CheckRecord) => readonly CalcStep[]): GoverningCheck[] {
  const best = new Map<string, CheckRecord>();
  for (const r of records) {
    const k = groupKey(r);
    const b = best.get(k);
    if (!b || r.ratio > b.ratio) best.set(k, r);
  }
  return [...best.values()].map((record) => ({ record, steps: stepsOf(record) }));
}
