// Values that are round-off of the solution (a few units in the last digits of the largest
// value they are computed with) print as 0, not as "3.4e-13 kip". The threshold is stated
// here once; the tables that use it say so in their notes.

/** A value at or below this fraction of its reference scale is round-off. */
export const ROUND_OFF = 1e-9;

export function withoutRoundOff(v: number, scale: number): number {
  return Math.abs(v) <= ROUND_OFF * Math.abs(scale) ? 0 : v;
}
