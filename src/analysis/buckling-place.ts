// Where a structure that loses stability moves most: the first buckling mode of the axial forces
// of the failed iteration, found by inverse (power) iteration on K φ = μ (-Kg(N)) φ with the linear
// stiffness K already factorised; μ = 1/λ, so the largest μ is the lowest buckling load factor.
// The place is the element end (after rigid offsets) whose translation in the mode is largest.
import { memberName } from '../design/member-names.ts';
import { formatQuantity, type UnitSystem } from '../units/units.ts';
import type { BandedMatrix } from './banded-ldlt.ts';
import { assemble, expand, type PreparedModel } from './frame-system.ts';

export interface BucklingPlace {
  /** 'pole' or an arm id. */
  readonly member: string;
  /** Distance along the member from its root. */
  readonly s_m: number;
}

/** Enough for the modes of a pole and arms, whose lowest buckling loads lie far apart; the place,
 * not the shape to many digits, is what is wanted. */
const ITERATIONS = 200;
const SHAPE_TOLERANCE = 1e-8;

const maxAbs = (v: ArrayLike<number>): number => {
  let m = 0;
  for (let k = 0; k < v.length; k++) m = Math.max(m, Math.abs(v[k]));
  return m;
};

/** Power iteration of φ -> K⁻¹(-Kg)φ - σφ, normalised to a largest entry of 1; returns φ and μ. */
function powerIteration(
  linear: BandedMatrix,
  minusKg: (x: Float64Array) => Float64Array,
  start: Float64Array,
  shift: number,
): { phi: Float64Array; mu: number } {
  let phi = start;
  let mu = 0;
  for (let it = 0; it < ITERATIONS; it++) {
    const next = linear.solve(minusKg(phi));
    for (let k = 0; k < next.length; k++) next[k] -= shift * phi[k];
    // signed scale: the entry of next at phi's largest entry keeps the sign of the eigenvalue
    let at = 0;
    for (let k = 1; k < phi.length; k++) if (Math.abs(phi[k]) > Math.abs(phi[at])) at = k;
    const scale = next[at] !== 0 ? next[at] / phi[at] : maxAbs(next);
    if (!(Math.abs(scale) > 0)) break;
    let change = 0;
    for (let k = 0; k < next.length; k++) {
      next[k] /= scale;
      change = Math.max(change, Math.abs(next[k] - phi[k]));
    }
    const m = maxAbs(next);
    for (let k = 0; k < next.length; k++) next[k] /= m;
    phi = next;
    mu = scale + shift;
    if (change < SHAPE_TOLERANCE) break;
  }
  return { phi, mu };
}

/**
 * The member and place of the largest movement of the first buckling mode under the element axial
 * forces N (tension +). `linear` is K factorised; `start` a displacement vector to start from (the
 * last iterate: already close to the mode). Null when N holds no compression to buckle under.
 */
export function bucklingPlace(prep: PreparedModel, linear: BandedMatrix, N: Float64Array, start: ArrayLike<number>): BucklingPlace | null {
  const K = assemble(prep, null);
  const KKg = assemble(prep, N);
  const minusKg = (x: Float64Array): Float64Array => {
    const a = K.multiply(x);
    const b = KKg.multiply(x);
    for (let k = 0; k < a.length; k++) a[k] -= b[k];
    return a;
  };
  let phi0 = Float64Array.from(start);
  if (!(maxAbs(phi0) > 0)) phi0 = new Float64Array(phi0.length).fill(1);
  let { phi, mu } = powerIteration(linear, minusKg, phi0, 0);
  // A dominant negative μ is buckling under the reversed forces (a member in tension); shifting by it
  // makes the largest positive μ dominant.
  if (mu < 0) ({ phi, mu } = powerIteration(linear, minusKg, phi, mu));
  if (!(mu > 0)) return null;
  return largestMovement(prep, expand(prep, phi));
}

/** The element end whose translation u + θ × r (r: the rigid offset) is largest; first one on ties. */
function largestMovement(prep: PreparedModel, U: ArrayLike<number>): BucklingPlace | null {
  let best: BucklingPlace | null = null;
  let most = 0;
  for (const { el } of prep.elements) {
    for (const [node, r, s_m] of [[el.i, el.offsetI_m, el.sI_m], [el.j, el.offsetJ_m, el.sJ_m]] as const) {
      const n = node * 6;
      const ux = U[n] + U[n + 4] * r[2] - U[n + 5] * r[1];
      const uy = U[n + 1] + U[n + 5] * r[0] - U[n + 3] * r[2];
      const uz = U[n + 2] + U[n + 3] * r[1] - U[n + 4] * r[0];
      const m = Math.hypot(ux, uy, uz);
      if (m > most * (1 + 1e-9)) {
        most = m;
        best = { member: el.member, s_m };
      }
    }
  }
  return best;
}

/** "the buckling mode moves most on arm A1, 4.5 m from pole face", the length in `units`. */
export function placeText(place: BucklingPlace, units: UnitSystem): string {
  const from = place.member === 'pole' ? 'above base' : 'from pole face';
  return `the buckling mode moves most on ${memberName(place.member)}, ${formatQuantity(place.s_m, 'length', units)} ${from}`;
}
