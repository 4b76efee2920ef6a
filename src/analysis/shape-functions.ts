// Cubic Hermite (bending) and linear (axial, torsion) shape functions of a prismatic element.
// They are the exact fixed-fixed influence functions of an Euler-Bernoulli beam, so consistent
// nodal loads from them are exact fixed-end forces.

/** [N1, N2, N3, N4] at x on [0, L]: v = N1 v1 + N2 rz1 + N3 v2 + N4 rz2. */
export function hermite(x: number, L: number): [number, number, number, number] {
  const n = new Float64Array(4);
  hermiteInto(x, L, n);
  return [n[0], n[1], n[2], n[3]];
}

/** hermite() written into out[0..3] (no allocation: it runs for every station and load). */
export function hermiteInto(x: number, L: number, out: Float64Array): void {
  const s = x / L;
  const s2 = s * s;
  const s3 = s2 * s;
  out[0] = 1 - 3 * s2 + 2 * s3;
  out[1] = L * (s - 2 * s2 + s3);
  out[2] = 3 * s2 - 2 * s3;
  out[3] = L * (s3 - s2);
}

/** d/dx of hermite(). */
export function hermiteSlope(x: number, L: number): [number, number, number, number] {
  const s = x / L;
  const s2 = s * s;
  return [(-6 * s + 6 * s2) / L, 1 - 4 * s + 3 * s2, (6 * s - 6 * s2) / L, 3 * s2 - 2 * s];
}

/** Local displacement [u, v, w] at x from the 12 local end displacements. */
export function localDisplacementAt(d: ArrayLike<number>, x: number, L: number): [number, number, number] {
  const u = new Float64Array(3);
  localDisplacementInto(d, x, L, u);
  return [u[0], u[1], u[2]];
}

const n4 = new Float64Array(4);

/** localDisplacementAt() written into out[0..2]. */
export function localDisplacementInto(d: ArrayLike<number>, x: number, L: number, out: Float64Array): void {
  const s = x / L;
  hermiteInto(x, L, n4);
  out[0] = (1 - s) * d[0] + s * d[6];
  out[1] = n4[0] * d[1] + n4[1] * d[5] + n4[2] * d[7] + n4[3] * d[11];
  out[2] = n4[0] * d[2] - n4[1] * d[4] + n4[2] * d[8] - n4[3] * d[10];
}

/** Gauss-Legendre points and weights on [-1, 1]. */
export const GAUSS3 = {
  t: [-Math.sqrt(3 / 5), 0, Math.sqrt(3 / 5)],
  w: [5 / 9, 8 / 9, 5 / 9],
} as const;
