// How a check record's result, ratio and place are written, shared by the checks section and the
// summary so both say the same thing the same way.
import type { CheckRecord } from '../../checks/check-types.ts';
import { memberText, type Display } from './display.ts';

export const STATUS_TEXT: Readonly<Record<CheckRecord['status'], string>> = { ok: 'pass', fail: 'FAIL', warn: 'warning' };

export const checkRatioText = (r: CheckRecord): string => (Number.isFinite(r.ratio) ? r.ratio.toFixed(3) : 'not made');

export function checkPlaceText(r: CheckRecord, d: Display): string {
  const who = memberText(r.member);
  return r.s_m === null ? who : `${who}, ${d.q(r.s_m, 'length')}`;
}

/** An id printed whole: its hyphens become non-breaking (U+2011, drawn by the embedded DejaVu font),
 * so a table cell never wraps "extreme-wind-max@wind-090" at a hyphen. */
export const wholeId = (id: string): string => id.replace(/-/g, '\u2011');
