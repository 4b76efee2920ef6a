// The date printed on the package: from the input, else SOURCE_DATE_EPOCH, else the newest
// revision. Never the clock: the same input must give the same bytes.
import { error, type Problem } from './problem.ts';

export function packageDate(
  given: string | undefined,
  revisions: readonly { readonly date: string }[],
  env: { readonly SOURCE_DATE_EPOCH?: string },
  problems: Problem[],
): string {
  if (given !== undefined) return given;
  const epoch = env.SOURCE_DATE_EPOCH;
  if (epoch !== undefined && epoch !== '') {
    if (/^\d+$/.test(epoch)) return new Date(Number(epoch) * 1000).toISOString().slice(0, 10);
    problems.push(error(['project', 'date'], `SOURCE_DATE_EPOCH '${epoch}' is not a whole number of seconds; give project.date instead`));
    return '';
  }
  const newest = revisions.map((r) => r.date).sort().at(-1);
  if (newest !== undefined) return newest;
  problems.push(error(['project', 'date'], 'no date for the package: give project.date (yyyy-mm-dd), or a revision with a date (project.revisions[].date), or set SOURCE_DATE_EPOCH (seconds since 1970-01-01 UTC) in the environment'));
  return '';
}
