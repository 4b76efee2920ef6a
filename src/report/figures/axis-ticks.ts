// Tick marks for plot axes: round values (1, 2 or 5 times a power of ten) that cover a range,
// and their labels with a fixed number of decimals, so every tick of an axis reads alike.

export interface Ticks {
  readonly values: readonly number[];
  /** Decimals used for every label of the axis. */
  readonly decimals: number;
  /** The axis range, widened to whole ticks. */
  readonly min: number;
  readonly max: number;
}

/** A round step near span / target: 1, 2 or 5 times a power of ten. */
export function niceStep(span: number, target: number): number {
  if (!(span > 0)) return 1;
  const raw = span / Math.max(target, 1);
  const p = 10 ** Math.floor(Math.log10(raw));
  const m = raw / p;
  const k = m <= 1 ? 1 : m <= 2 ? 2 : m <= 5 ? 5 : 10;
  return k * p;
}

/** Ticks covering [min, max] (about `target` intervals). A zero-width range is widened around its value. */
export function niceTicks(min: number, max: number, target = 5): Ticks {
  if (!Number.isFinite(min) || !Number.isFinite(max)) throw new RangeError(`axis range is not finite: ${min} to ${max}`);
  let lo = Math.min(min, max);
  let hi = Math.max(min, max);
  if (hi - lo < 1e-12 * Math.max(1, Math.abs(hi))) {
    const pad = Math.abs(hi) > 0 ? Math.abs(hi) * 0.5 : 1;
    lo -= pad;
    hi += pad;
  }
  const step = niceStep(hi - lo, target);
  const first = Math.floor(lo / step + 1e-9);
  const last = Math.ceil(hi / step - 1e-9);
  const values: number[] = [];
  for (let k = first; k <= last; k++) values.push(k * step);
  const decimals = Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
  return { values, decimals, min: first * step, max: last * step };
}

/** A tick label: fixed decimals, plain ASCII minus, no "-0". */
export function tickLabel(v: number, decimals: number): string {
  const s = v.toFixed(Math.min(decimals, 10));
  return /^-0(\.0*)?$/.test(s) ? s.slice(1) : s;
}
