// Exact extremes of the internal forces along a member. On each polynomial piece of an element
// (between load breakpoints) every component is a cubic in x, so a cubic through four interior
// Chebyshev samples is exact; the resultants sqrt(My² + Mz²), sqrt(Vy² + Vz²) are extreme where
// the sextic My² + Mz² (Vy² + Vz²) is. Stationary points are found by root finding, not sampling.
import type { EnvelopeComponent, Extreme } from './analysis-types.ts';
import { internalForcesInto, type ElementState } from './internal-forces.ts';
import { CHEB4, cubicThroughInto, extremaInto, type Extrema } from './polynomial.ts';

/** Running extremes of a member: per component c (COMPONENTS order) at 4 c: max, its s, min, its s. */
export type ExtremeAcc = Float64Array;

export const COMPONENTS: readonly EnvelopeComponent[] = ['N', 'Vy', 'Vz', 'T', 'My', 'Mz', 'Mres', 'Vres'];

export function emptyExtremes(): ExtremeAcc {
  const acc = new Float64Array(4 * COMPONENTS.length);
  for (let c = 0; c < COMPONENTS.length; c++) {
    acc[4 * c] = -Infinity;
    acc[4 * c + 2] = Infinity;
  }
  return acc;
}

/** The record MemberStations.extremes holds (frozen). */
export function extremesRecord(acc: ExtremeAcc): Readonly<Record<EnvelopeComponent, { readonly max: Extreme; readonly min: Extreme }>> {
  const out = {} as Record<EnvelopeComponent, { readonly max: Extreme; readonly min: Extreme }>;
  COMPONENTS.forEach((name, c) => {
    out[name] = Object.freeze({
      max: Object.freeze({ value: acc[4 * c], s_m: acc[4 * c + 1] }),
      min: Object.freeze({ value: acc[4 * c + 2], s_m: acc[4 * c + 3] }),
    });
  });
  return Object.freeze(out);
}

const sample = new Float64Array(6);
/** Samples per component: ys[c][p]. */
const ys = [0, 1, 2, 3, 4, 5].map(() => new Float64Array(4));
/** Cubic coefficients per component, 4 each. */
const cubics = new Float64Array(24);
const cubic = [0, 1, 2, 3, 4, 5].map((c) => cubics.subarray(4 * c, 4 * c + 4));
const sextic = new Float64Array(7);
const found: Extrema = { max: 0, tMax: 0, min: 0, tMin: 0 };

/** a² + b² for cubics a, b (same operation order as a product then a sum of coefficient lists). */
const sa = new Float64Array(7);
const sb = new Float64Array(7);
function sumOfSquares(a: Float64Array, b: Float64Array, out: Float64Array): void {
  sa.fill(0);
  sb.fill(0);
  for (let i = 0; i < 4; i++) {
    for (let j = 0; j < 4; j++) {
      sa[i + j] += a[i] * a[j];
      sb[i + j] += b[i] * b[j];
    }
  }
  for (let k = 0; k < 7; k++) out[k] = sa[k] + sb[k];
}

/** Folds the extremes of one element (breakpoints `breaks`) into acc; the element spans sI_m..sJ_m of
 * the member, s = sI_m + x (sJ_m - sI_m) / L. */
export function updateExtremes(acc: ExtremeAcc, st: ElementState, breaks: readonly number[]): void {
  const { sI_m, sJ_m } = st.pe.el;
  const L = st.pe.geo.L;
  for (let k = 0; k + 1 < breaks.length; k++) {
    const x0 = breaks[k];
    const x1 = breaks[k + 1];
    for (let p = 0; p < 4; p++) {
      internalForcesInto(st, x0 + ((CHEB4[p] + 1) * (x1 - x0)) / 2, 'both', sample);
      for (let c = 0; c < 6; c++) ys[c][p] = sample[c];
    }
    for (let c = 0; c < 6; c++) cubicThroughInto(ys[c], cubics, 4 * c);
    for (let c = 0; c < 8; c++) {
      let poly: Float64Array;
      if (c < 6) poly = cubic[c];
      else {
        if (c === 6) sumOfSquares(cubic[4], cubic[5], sextic);
        else sumOfSquares(cubic[1], cubic[2], sextic);
        poly = sextic;
      }
      extremaInto(poly, found);
      const root = c >= 6;
      const max = root ? Math.sqrt(Math.max(found.max, 0)) : found.max;
      const min = root ? Math.sqrt(Math.max(found.min, 0)) : found.min;
      const o = 4 * c;
      if (max > acc[o]) {
        acc[o] = max;
        acc[o + 1] = sI_m + ((x0 + ((found.tMax + 1) * (x1 - x0)) / 2) * (sJ_m - sI_m)) / L;
      }
      if (min < acc[o + 2]) {
        acc[o + 2] = min;
        acc[o + 3] = sI_m + ((x0 + ((found.tMin + 1) * (x1 - x0)) / 2) * (sJ_m - sI_m)) / L;
      }
    }
  }
}
