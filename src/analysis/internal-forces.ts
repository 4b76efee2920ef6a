// Internal forces and displacements at a point of one element, written into caller-owned arrays
// (no allocation: they run for every station and every polynomial sample of every combination).
//
// On an element, the internal resultant at x comes from the statics of the segment [0, x]:
//   forces  S(x) = -f_i - (loads on [0, x])
//   moments M(x) = -(M_i + (r_i - r_x) x f_i + moments of the loads about the cut)
// where f_i is the end force on the element at end i. In a second-order analysis the lever
// arm of the axial force includes the displaced shape, r_i - r_x = (-x, -(v(x)-v_i), -(w(x)-w_i)),
// with v, w the Hermite cubics and the axial force N of the geometric stiffness; this is the
// P-delta moment N (v(x) - v_i) that the consistent geometric stiffness carries, so the
// statics at x = L reproduce the end forces at end j exactly.
// Displacements: Hermite cubic (transverse) and linear (axial) interpolation of the end
// displacements, plus the particular solution of the element's own loads with both ends held
// (first order; in a second-order analysis that small in-element part is not amplified).
import type { StationSide } from './analysis-types.ts';
import { intensityInto, SNAP_M, type LocalLoad } from './element-loads.ts';
import type { PreparedElement } from './frame-system.ts';
import { CHEB4, cubicThroughInto } from './polynomial.ts';
import { GAUSS3, localDisplacementInto } from './shape-functions.ts';

export interface ElementState {
  readonly pe: PreparedElement;
  /** Local end displacements. */
  readonly d: Float64Array;
  /** Local end forces on the element. */
  readonly f: Float64Array;
  /** Axial force used in the geometric stiffness (0 for first order). */
  readonly N: number;
  readonly loads: readonly LocalLoad[];
  /** Fixed-end forces of the element loads (local), null when unloaded. */
  readonly fixedEnd: Float64Array | null;
}

const disp = new Float64Array(3);
const q = new Float64Array(3);

/** 2-point Gauss abscissae: exact for a linear load and for (xi - x) times it. */
const GAUSS2 = [-1 / Math.sqrt(3), 1 / Math.sqrt(3)] as const;

/** [N, Vy, Vz, T, My, Mz] at x into out; point loads at x count only on the 'right' side. */
export function internalForcesInto(st: ElementState, x: number, side: StationSide, out: Float64Array): void {
  const { d, f, N, loads } = st;
  const L = st.pe.geo.L;
  let F0 = -f[0];
  let F1 = -f[1];
  let F2 = -f[2];
  let dv = 0;
  let dw = 0;
  if (N !== 0) {
    localDisplacementInto(d, x, L, disp);
    dv = disp[1] - d[1];
    dw = disp[2] - d[2];
  }
  // M(x) = -(M_i + c_i + load moments), c_i = (r_i - r_x) x f_i with the axial force N of Kg
  let M0 = -f[3];
  let M1 = -(f[4] + x * f[2] + dw * N);
  let M2 = -(f[5] - x * f[1] - dv * N);
  for (let k = 0; k < loads.length; k++) {
    const l = loads[k];
    if (l.kind === 'distributed') {
      const c = Math.min(l.b, x);
      if (c <= l.a) continue;
      const h = (c - l.a) / 2;
      for (let g = 0; g < 2; g++) {
        const xi = l.a + h * (1 + GAUSS2[g]);
        intensityInto(l, xi, q);
        const q0 = q[0];
        const q1 = q[1];
        const q2 = q[2];
        const lever = xi - x;
        F0 -= h * q0;
        F1 -= h * q1;
        F2 -= h * q2;
        M1 -= h * -lever * q2;
        M2 -= h * lever * q1;
      }
      continue;
    }
    const inside = l.a < x - SNAP_M || (Math.abs(l.a - x) <= SNAP_M && side === 'right');
    if (!inside) continue;
    if (l.kind === 'force') {
      const lever = l.a - x;
      F0 -= l.vA[0];
      F1 -= l.vA[1];
      F2 -= l.vA[2];
      M1 -= -lever * l.vA[2];
      M2 -= lever * l.vA[1];
    } else {
      M0 -= l.vA[0];
      M1 -= l.vA[1];
      M2 -= l.vA[2];
    }
  }
  out[0] = F0;
  out[1] = F1;
  out[2] = F2;
  out[3] = M0;
  out[4] = M1;
  out[5] = M2;
}

/** Breakpoints where the internal-force polynomials change: element ends and load starts/ends,
 * sorted, and dropped when within SNAP_M of the sorted value before them. */
export function pieceBreaks(st: ElementState): number[] {
  const xs = [0, st.pe.geo.L];
  const loads = st.loads;
  for (let k = 0; k < loads.length; k++) {
    const l = loads[k];
    if (l.kind === 'distributed') xs.push(l.a, l.b);
    else xs.push(l.a);
  }
  // insertion sort: a handful of values
  for (let i = 1; i < xs.length; i++) {
    const v = xs[i];
    let j = i - 1;
    while (j >= 0 && xs[j] > v) {
      xs[j + 1] = xs[j];
      j--;
    }
    xs[j + 1] = v;
  }
  const out = [xs[0]];
  for (let k = 1; k < xs.length; k++) if (xs[k] - xs[k - 1] > SNAP_M) out.push(xs[k]);
  return out;
}

/** Internal forces of one element with both ends held, as cubics in t on each piece [x0, x1]:
 * per piece k, at 14 k: x0, x1, then 4 coefficients (low to high) each of N, My and Mz. */
export interface HeldPieces {
  readonly count: number;
  readonly data: Float64Array;
}

const ZERO12 = new Float64Array(12);
const sample = new Float64Array(6);
const ys = [new Float64Array(4), new Float64Array(4), new Float64Array(4)];

/** Fits the held-ends internal forces on each piece between load breakpoints (exact: they are cubic). */
export function heldPieces(st: ElementState, breaks: readonly number[]): HeldPieces | null {
  if (!st.fixedEnd) return null;
  const held: ElementState = { pe: st.pe, d: ZERO12, f: st.fixedEnd, N: 0, loads: st.loads, fixedEnd: null };
  const count = breaks.length - 1;
  const data = new Float64Array(14 * count);
  for (let k = 0; k < count; k++) {
    const x0 = breaks[k];
    const x1 = breaks[k + 1];
    for (let p = 0; p < 4; p++) {
      internalForcesInto(held, x0 + ((CHEB4[p] + 1) * (x1 - x0)) / 2, 'both', sample);
      ys[0][p] = sample[0];
      ys[1][p] = sample[4];
      ys[2][p] = sample[5];
    }
    const o = 14 * k;
    data[o] = x0;
    data[o + 1] = x1;
    cubicThroughInto(ys[0], data, o + 2);
    cubicThroughInto(ys[1], data, o + 6);
    cubicThroughInto(ys[2], data, o + 10);
  }
  return { count, data };
}

const cubicAt = (c: Float64Array, off: number, t: number): number => ((c[off + 3] * t + c[off + 2]) * t + c[off + 1]) * t + c[off];

/**
 * Displacement inside the element from its loads with both ends held (the particular solution):
 * EIz v'' = Mz, EIy w'' = -My, EA u' = N of the fixed-fixed element, zero value and slope at end i
 * (and so at end j). The held forces are cubic on each piece, so 3-point Gauss integrates
 * (x - t) M(t) exactly. Adds [u, v, w] into out.
 */
export function addParticularDisplacement(st: ElementState, held: HeldPieces | null, x: number, out: Float64Array): void {
  if (!held || x <= 0) return;
  const { el } = st.pe;
  let u = 0;
  let v = 0;
  let w = 0;
  const hd = held.data;
  for (let k = 0; k < held.count; k++) {
    const o = 14 * k;
    const x0 = hd[o];
    const x1 = hd[o + 1];
    if (x0 >= x - SNAP_M) break;
    const b = Math.min(x1, x);
    const h = (b - x0) / 2;
    for (let g = 0; g < 3; g++) {
      const t = x0 + h * (1 + GAUSS3.t[g]);
      const tau = (2 * t - x0 - x1) / (x1 - x0);
      const wt = h * GAUSS3.w[g];
      u += (wt * cubicAt(hd, o + 2, tau)) / (el.E_Pa * el.A_m2);
      v += (wt * (x - t) * cubicAt(hd, o + 10, tau)) / (el.E_Pa * el.Iz_m4);
      w -= (wt * (x - t) * cubicAt(hd, o + 6, tau)) / (el.E_Pa * el.Iy_m4);
    }
  }
  out[0] += u;
  out[1] += v;
  out[2] += w;
}

