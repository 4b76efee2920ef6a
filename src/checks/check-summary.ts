// Terminal lines after `polebook build`: the worst ratio of each check type and the verdict.
import type { Design } from '../design/design.ts';
import { formatQuantity } from '../units/units.ts';
import { memberName } from '../design/member-names.ts';
import type { CheckRecord, CheckResults } from './check-types.ts';
import { verdictByType } from './verdict.ts';

/** Where a record is, in words: "pole at 0 ft", "arm A1 at 36 ft", "anchor bolts". */
export function placeText(r: CheckRecord, design: Design): string {
  const who = memberName(r.member);
  return r.s_m === null ? who : `${who} at ${formatQuantity(r.s_m, 'length', design.units)}`;
}

export const ratioText = (r: CheckRecord): string => (Number.isFinite(r.ratio) ? r.ratio.toFixed(3) : 'not made');

export function checkSummaryLines(design: Design, checks: CheckResults): string[] {
  const lines: string[] = [];
  const verdict = verdictByType(checks.records);
  for (const v of verdict) {
    const w = v.worst;
    const status = w.status === 'fail' ? 'FAILS' : w.status === 'warn' ? 'warning' : 'ok';
    const where = `${placeText(w, design)}${w.combination !== null ? `, ${w.combination}` : ''}`;
    lines.push(`  ${v.title}: worst ratio ${ratioText(w)} (${where}) ${status}${w.status === 'fail' && !Number.isFinite(w.ratio) ? `: ${w.reason}` : ''}`);
  }
  const failing = verdict.filter((v) => v.failures > 0);
  const warned = verdict.filter((v) => v.warnings > 0);
  if (failing.length > 0) lines.push(`verdict: ${failing.length} check type${failing.length === 1 ? '' : 's'} FAIL (${failing.map((v) => v.title.toLowerCase()).join('; ')}); the package is written, exit code 1`);
  else lines.push(`verdict: every check made passes${warned.length > 0 ? `, with warnings to judge (${warned.map((v) => v.title.toLowerCase()).join('; ')})` : ''}`);
  return lines;
}
