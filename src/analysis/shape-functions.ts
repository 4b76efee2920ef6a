// Cubic Hermite (bending) and linear (axial, torsion) shape functions of a prismatic element.
// They are the exact fixed-fixed influence functions of an Euler-Bernoulli beam, so consistent
// nodal loads from them are exact fixed-end forces.

/** [N1, N2, N3, N4] at x on [0, L]: v = N1 v1 + N2 rz1 + N3 v2 + N4 rz2. */
export function hermite(x: number, L: number): [number, number, number, number] {
  const s = x / L;
  const s2 = s * s;
  const s3 = s2 * s;
  return [1 - 3 * s2 + 2 * s3, L * (s - 2 * s2 + s3), 3 * s2 - 2 * s3, L * (s3 - s2)];
}

/** d/dx of hermite(). */
export function hermiteSlope(x: number, L: number): [number, number, number, number] {
  const s = x / L;
  const s2 = s * s;
  return [(-6 * s + 6 * s2) / L, 1 - 4 * s + 3 * s2, (6 * s - 6 * s2) / L, 3 * s2 - 2 * s];
}

/** Local displacement [u, v, w] at x from the 12 local end displacements. */
export function localDisplacementAt(d: ArrayLike<number>, x: number, L: number): [number, number, number] {
  const s = x / L;
  const [n1, n2, n3, n4] = hermite(x, L);
  return [
    (1 - s) * d[0] + s * d[6],
    n1 * d[1] + n2 * d[5] + n3 * d[7] + n4 * d[11],
    n1 * d[2] - n2 * d[4] + n3 * d[8] - n4 * d[10],
  ];
}

/** Gauss-Legendre points and weights on [-1, 1]. */
export const GAUSS3 = {
  t: [-Math.sqrt(3 / 5), 0, Math.sqrt(3 / 5)],
  w: [5 / 9, 8 / 9, 5 / 9],
} as const;
