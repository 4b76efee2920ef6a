// The banded LDL^T solver against ml-matrix's dense solvers (an independent general-purpose
// implementation): symmetric positive definite band matrices with ragged row profiles (zeros at
// the end of rows and inside them, which the solver skips), mechanisms, and the Sturm count.
import fc from 'fast-check';
import { EigenvalueDecomposition, Matrix, solve } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { BandedMatrix, PivotFailure } from '../../src/analysis/banded-ldlt.ts';

/** A symmetric band matrix from a seed: rows with random profiles, made diagonally dominant (SPD)
 * unless `shift` pulls the diagonal down. Returns the band form and the dense copy. */
function randomBand(n: number, bw: number, seed: number, shift = 0): { K: BandedMatrix; dense: Matrix } {
  let s = seed >>> 0;
  const rnd = (): number => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 4294967296;
  };
  const K = new BandedMatrix(n, bw);
  const dense = Matrix.zeros(n, n);
  for (let i = 0; i < n; i++) {
    const reach = Math.floor(rnd() * (bw + 1)); // this row's profile
    for (let k = 1; k <= reach && i + k < n; k++) {
      if (rnd() < 0.3) continue; // zeros inside the profile too
      const v = rnd() * 2 - 1;
      K.add(i, i + k, v);
      dense.set(i, i + k, v);
      dense.set(i + k, i, v);
    }
  }
  for (let i = 0; i < n; i++) {
    let sum = 0;
    for (let j = 0; j < n; j++) if (j !== i) sum += Math.abs(dense.get(i, j));
    const d = sum + 0.5 + rnd() - shift;
    K.add(i, i, d);
    dense.set(i, i, d);
  }
  return { K, dense };
}

describe('banded LDL^T against a dense solve (ml-matrix)', () => {
  it('solves ragged-profile SPD systems to round-off', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 60 }), fc.integer({ min: 0, max: 12 }), fc.integer(), (n, bw, seed) => {
        const { K, dense } = randomBand(n, bw, seed);
        const b = Array.from({ length: n }, (_, k) => Math.sin(k + seed));
        const product = K.multiply(b);
        const denseProduct = dense.mmul(Matrix.columnVector(b)).getColumn(0);
        for (let k = 0; k < n; k++) expect(Math.abs(product[k] - denseProduct[k])).toBeLessThan(1e-12 * (1 + Math.abs(denseProduct[k])));
        K.factor();
        const x = K.solve(b);
        const ref = solve(dense, Matrix.columnVector(b)).getColumn(0);
        const scale = Math.max(...ref.map(Math.abs), 1e-300);
        // diagonally dominant, so well conditioned: agreement to round-off (1e-12 relative)
        for (let k = 0; k < n; k++) expect(Math.abs(x[k] - ref[k]) / scale).toBeLessThan(1e-12);
      }),
      { numRuns: 200 },
    );
  });

  it('the same matrix factorised again after reset() gives the same solution (storage reused)', () => {
    const { K } = randomBand(40, 7, 99);
    const copy = K.clone();
    const b = Array.from({ length: 40 }, (_, k) => k - 20);
    K.factor();
    const x1 = K.solve(b);
    K.reset();
    for (let i = 0; i < 40; i++) for (let j = i; j <= Math.min(39, i + 7); j++) K.add(i, j, copy.get(i, j));
    K.factor();
    expect(Array.from(K.solve(b))).toEqual(Array.from(x1));
  });

  it('counts negative eigenvalues (Sturm sequence) as the dense eigenvalues do', () => {
    fc.assert(
      fc.property(fc.integer({ min: 2, max: 40 }), fc.integer({ min: 1, max: 8 }), fc.integer(), fc.double({ min: 0, max: 4, noNaN: true }), (n, bw, seed, shift) => {
        const { K, dense } = randomBand(n, bw, seed, shift);
        const eig = new EigenvalueDecomposition(dense, { assumeSymmetric: true }).realEigenvalues;
        // skip matrices with an eigenvalue at round-off distance from zero (the count is ambiguous)
        fc.pre(eig.every((v) => Math.abs(v) > 1e-8));
        expect(K.factor(true)).toBe(eig.filter((v) => v < 0).length);
      }),
      { numRuns: 200 },
    );
  });

  it('a singular matrix (a mechanism) throws PivotFailure at the dependent equation', () => {
    // [[1, 1], [1, 1]]: the second pivot is 1 - 1 = 0
    const K = new BandedMatrix(2, 1);
    K.add(0, 0, 1);
    K.add(0, 1, 1);
    K.add(1, 1, 1);
    let err: unknown = null;
    try {
      K.factor();
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(PivotFailure);
    expect((err as PivotFailure).eq).toBe(1);
  });
});
