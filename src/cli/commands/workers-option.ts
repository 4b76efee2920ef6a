// --workers N: a whole number of threads, at least 1; absent: as many as pay.
import { UsageError } from '../args.ts';

export function workersOption(text: string | undefined): number | null {
  if (text === undefined) return null;
  if (!/^\d+$/.test(text) || Number(text) < 1 || Number(text) > 64) throw new UsageError(`--workers '${text}': expected a whole number of threads from 1 to 64`);
  return Number(text);
}
