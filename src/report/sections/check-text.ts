// How a check record's result, ratio and place are written, shared by the checks section and the
// summary so both say the same thing the same way.
import type { CheckRecord } from '../../checks/check-types.ts';
import { formatRatio } from '../../units/units.ts';
import { unbrokenId } from '../format/unbroken-ids.ts';
import { memberText, type Display } from './display.ts';

export const STATUS_TEXT: Readonly<Record<CheckRecord['status'], string>> = { ok: 'pass', fail: 'FAIL', warn: 'warning' };

export const checkRatioText = (r: CheckRecord): string => (Number.isFinite(r.ratio) ? formatRatio(r.ratio) : 'not made');

/** How the distances in a "Where" column are measured, for the note under the table. */
export const PLACE_DATUM_NOTE = 'Where: distance up the pole from its base, or along an arm from its root at the pole face (an arm entered from the pole axis reads shorter here by the distance from the axis to the face).';
/** The same, short enough for the one-page summary. */
export const PLACE_DATUM_SHORT = 'Where: from the base; on an arm, from the pole face.';

export function checkPlaceText(r: CheckRecord, d: Display): string {
  const who = memberText(r.member);
  return r.s_m === null ? who : `${who}, ${d.q(r.s_m, 'length')}`;
}

/** A combination or case id printed whole (see format/unbroken-ids.ts). */
export const wholeId = unbrokenId;
