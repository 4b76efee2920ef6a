// Repeated timing with a robust summary: the median, and the quartiles as the band that
// shows how much a shared machine disturbed the runs.
import { performance } from 'node:perf_hooks';

export interface Timing {
  readonly median_ms: number;
  /** 25th and 75th percentiles. */
  readonly p25_ms: number;
  readonly p75_ms: number;
  /** Fastest run: the cost with the least interference from other work on the machine. */
  readonly min_ms: number;
  readonly runs: number;
}

export function quantile(sorted: readonly number[], q: number): number {
  const pos = (sorted.length - 1) * q;
  const lo = Math.floor(pos);
  const hi = Math.ceil(pos);
  return sorted[lo]! + (sorted[hi]! - sorted[lo]!) * (pos - lo);
}

export function summarise(times: readonly number[]): Timing {
  const s = [...times].sort((a, b) => a - b);
  return { median_ms: quantile(s, 0.5), p25_ms: quantile(s, 0.25), p75_ms: quantile(s, 0.75), min_ms: s[0]!, runs: s.length };
}

/** Runs fn `warmup` times untimed (JIT), then `repeats` times timed. */
export function timeRepeated(fn: () => void, repeats: number, warmup = 3): Timing {
  for (let k = 0; k < warmup; k++) fn();
  const t: number[] = [];
  for (let k = 0; k < repeats; k++) {
    const t0 = performance.now();
    fn();
    t.push(performance.now() - t0);
  }
  return summarise(t);
}

/** "12.34 (11.9-13.1)": median with the quartile band. */
export const fmtTiming = (t: Timing, digits = 2): string =>
  `${t.median_ms.toFixed(digits)} (${t.p25_ms.toFixed(digits)}-${t.p75_ms.toFixed(digits)})`;

/**
 * Per-run time of a fast fn: each timed sample runs it `batch` times back to back, so that every
 * sample lasts about as long as a sample of a slower case. On a shared machine a sample's chance of
 * being interrupted grows with its length; equal sample lengths keep that bias out of a ratio.
 */
export function timeBatched(fn: () => void, samples: number, batch: number, warmup = 3): Timing {
  for (let k = 0; k < warmup; k++) fn();
  const t: number[] = [];
  for (let k = 0; k < samples; k++) {
    const t0 = performance.now();
    for (let b = 0; b < batch; b++) fn();
    t.push((performance.now() - t0) / batch);
  }
  return summarise(t);
}
