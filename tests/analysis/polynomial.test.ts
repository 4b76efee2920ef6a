// Root finding and extremes of the polynomial pieces, against closed forms:
// - a polynomial built as a product of (t - r_i) has exactly the roots r_i (factor theorem);
// - the Chebyshev polynomial T_n has its extremes +-1 at t = cos(k pi / n) (e.g. Abramowitz &
//   Stegun, Handbook of Mathematical Functions, 22.16; from memory), so on [-1, 1] its interior
//   stationary points are cos(k pi / n), k = 1..n-1;
// - a cubic's extremes come from the closed-form roots of its derivative (calculus).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cubicThrough, CHEB4, evalPoly, extremaOn, multiply, rootsIn } from '../../src/analysis/polynomial.ts';

const fromRoots = (roots: readonly number[], lead = 1): number[] => roots.reduce<number[]>((p, r) => multiply(p, [-r, 1]), [lead]);

/** T_n coefficients by the recurrence T_{n+1} = 2 t T_n - T_{n-1}. */
function chebyshev(n: number): number[] {
  let a = [1];
  let b = [0, 1];
  if (n === 0) return a;
  for (let k = 1; k < n; k++) {
    const next = new Array<number>(b.length + 1).fill(0);
    b.forEach((c, j) => (next[j + 1] += 2 * c));
    a.forEach((c, j) => (next[j] -= c));
    a = b;
    b = next;
  }
  return b;
}

describe('rootsIn (factor theorem)', () => {
  it('finds every simple root inside the interval, and none outside', () => {
    fc.assert(
      fc.property(
        fc.uniqueArray(fc.double({ min: -0.98, max: 0.98, noNaN: true }), { minLength: 1, maxLength: 5, comparator: (a, b) => Math.abs(a - b) < 0.1 }),
        fc.double({ min: 1.05, max: 3, noNaN: true }),
        fc.double({ min: 0.1, max: 1e6, noNaN: true }),
        (inside, outside, lead) => {
          const roots = [...inside, outside].sort((a, b) => a - b);
          const found = rootsIn(fromRoots(roots, lead), -1, 1);
          const want = [...inside].sort((a, b) => a - b);
          expect(found.length).toBe(want.length);
          // 1e-9: roots at least 0.1 apart keep |p'(r)| >= 0.1 x 0.2 x 0.3 x 0.4 x lead, so round-off
          // of about 1e-14 in p moves a root by far less
          found.forEach((r, k) => expect(Math.abs(r - want[k])).toBeLessThan(1e-9));
        },
      ),
      { numRuns: 300 },
    );
  });
});

describe('extremaOn (Chebyshev polynomials, A&S 22.16)', () => {
  for (const n of [2, 3, 4, 5, 6]) {
    it(`T_${n}: max +1 and min -1, at cos(k pi / ${n})`, () => {
      const T = chebyshev(n);
      const e = extremaOn(T);
      expect(Math.abs(e.max - 1)).toBeLessThan(1e-13);
      expect(Math.abs(e.min + 1)).toBeLessThan(1e-13);
      const nodes = Array.from({ length: n + 1 }, (_, k) => Math.cos((k * Math.PI) / n));
      expect(Math.min(...nodes.map((c) => Math.abs(c - e.tMax)))).toBeLessThan(1e-7);
      expect(Math.min(...nodes.map((c) => Math.abs(c - e.tMin)))).toBeLessThan(1e-7);
      // the stationary points are roots of T_n' (degree n - 1): cos(k pi / n), k = 1..n-1
      const dT = T.slice(1).map((c, k) => c * (k + 1));
      const stationary = rootsIn(dT, -1, 1);
      const want = Array.from({ length: n - 1 }, (_, k) => Math.cos(((k + 1) * Math.PI) / n)).sort((a, b) => a - b);
      expect(stationary.length).toBe(n - 1);
      stationary.forEach((t, k) => expect(Math.abs(t - want[k])).toBeLessThan(1e-12));
    });
  }

  it('a cubic: the extremes are at the ends or where the derivative vanishes (closed form)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -10, max: 10, noNaN: true }), { minLength: 4, maxLength: 4 }), (c) => {
        const e = extremaOn(c);
        const [, c1, c2, c3] = c;
        const cand = [-1, 1];
        const disc = 4 * c2 * c2 - 12 * c3 * c1;
        if (Math.abs(c3) > 1e-9 && disc >= 0) cand.push((-2 * c2 + Math.sqrt(disc)) / (6 * c3), (-2 * c2 - Math.sqrt(disc)) / (6 * c3));
        else if (Math.abs(c3) <= 1e-9 && Math.abs(c2) > 1e-9) cand.push(-c1 / (2 * c2));
        const values = cand.filter((t) => t >= -1 && t <= 1).map((t) => evalPoly(c, t));
        const scale = 1 + Math.max(...c.map(Math.abs));
        expect(Math.abs(e.max - Math.max(...values))).toBeLessThan(1e-9 * scale);
        expect(Math.abs(e.min - Math.min(...values))).toBeLessThan(1e-9 * scale);
      }),
      { numRuns: 300 },
    );
  });
});

describe('cubicThrough (Lagrange interpolation)', () => {
  it('reproduces any cubic from its values at the four Chebyshev points', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -1e3, max: 1e3, noNaN: true }), { minLength: 4, maxLength: 4 }), (c) => {
        const fit = cubicThrough(CHEB4.map((t) => evalPoly(c, t)));
        fit.forEach((v, k) => expect(Math.abs(v - c[k])).toBeLessThan(1e-9 * (1 + Math.max(...c.map(Math.abs)))));
      }),
      { numRuns: 200 },
    );
  });
});
