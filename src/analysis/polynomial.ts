// Small polynomial tools for exact extremes: coefficients low to high, variable t on [-1, 1].

export type Poly = number[];

export function evalPoly(c: Poly, t: number): number {
  let v = 0;
  for (let k = c.length - 1; k >= 0; k--) v = v * t + c[k];
  return v;
}

export function derivative(c: Poly): Poly {
  return c.slice(1).map((v, k) => v * (k + 1));
}

export function multiply(a: Poly, b: Poly): Poly {
  const out = new Array<number>(a.length + b.length - 1).fill(0);
  a.forEach((x, i) => b.forEach((y, j) => (out[i + j] += x * y)));
  return out;
}

export function addPoly(a: Poly, b: Poly): Poly {
  const out = new Array<number>(Math.max(a.length, b.length)).fill(0);
  a.forEach((x, i) => (out[i] += x));
  b.forEach((x, i) => (out[i] += x));
  return out;
}

/** Chebyshev points of the interpolating cubic (interior of [-1, 1], so one-sided values never enter). */
export const CHEB4 = [0, 1, 2, 3].map((k) => Math.cos(((2 * k + 1) * Math.PI) / 8));

/** Lagrange basis polynomials on CHEB4, expanded: LAGRANGE[k][j] is the t^j coefficient of basis k. */
const LAGRANGE: readonly Poly[] = CHEB4.map((tk, k) => {
  let basis: Poly = [1];
  let denom = 1;
  CHEB4.forEach((tm, m) => {
    if (m === k) return;
    basis = multiply(basis, [-tm, 1]);
    denom *= tk - tm;
  });
  return basis.map((v) => v / denom);
});

/** Coefficients of the cubic through (CHEB4[k], y[k]). */
export function cubicThrough(y: readonly number[]): Poly {
  const out = [0, 0, 0, 0];
  for (let k = 0; k < 4; k++) for (let j = 0; j < 4; j++) out[j] += y[k] * LAGRANGE[k][j];
  return out;
}

/** Real roots of c inside (lo, hi): the roots of c' split the interval into monotone pieces,
 * each searched by bisection; exact to round-off for any degree. */
export function rootsIn(c: Poly, lo: number, hi: number): number[] {
  let deg = c.length - 1;
  const scale = Math.max(...c.map(Math.abs));
  while (deg > 0 && Math.abs(c[deg]) <= 1e-14 * scale) deg--;
  const p = c.slice(0, deg + 1);
  if (deg < 1) return [];
  if (deg === 1) {
    const r = -p[0] / p[1];
    return r > lo && r < hi ? [r] : [];
  }
  const cuts = [lo, ...rootsIn(derivative(p), lo, hi), hi];
  const roots: number[] = [];
  for (let k = 0; k + 1 < cuts.length; k++) {
    let a = cuts[k];
    let b = cuts[k + 1];
    let fa = evalPoly(p, a);
    const fb = evalPoly(p, b);
    if (fa === 0) {
      if (a > lo) roots.push(a);
      continue;
    }
    if (fa * fb > 0) continue;
    for (let it = 0; it < 200 && b - a > 1e-15 * (1 + Math.abs(a)); it++) {
      const m = (a + b) / 2;
      const fm = evalPoly(p, m);
      if (fm * fa > 0) {
        a = m;
        fa = fm;
      } else b = m;
    }
    const r = (a + b) / 2;
    if (r > lo && r < hi) roots.push(r);
  }
  return roots;
}

/** Max and min of c on [-1, 1] with their t. */
export function extremaOn(c: Poly): { max: number; tMax: number; min: number; tMin: number } {
  const ts = [-1, 1, ...(c.length <= 4 ? quadraticRoots(derivative(c)) : rootsIn(derivative(c), -1, 1))];
  let max = -Infinity;
  let min = Infinity;
  let tMax = -1;
  let tMin = -1;
  for (const t of ts) {
    const v = evalPoly(c, t);
    if (v > max) [max, tMax] = [v, t];
    if (v < min) [min, tMin] = [v, t];
  }
  return { max, tMax, min, tMin };
}

/** Real roots in (-1, 1) of a polynomial of degree <= 2 (closed form, stable variant). */
function quadraticRoots(c: Poly): number[] {
  const [c0 = 0, c1 = 0, c2 = 0] = c;
  const scale = Math.max(Math.abs(c0), Math.abs(c1), Math.abs(c2));
  if (scale === 0) return [];
  let roots: number[];
  if (Math.abs(c2) <= 1e-14 * scale) roots = Math.abs(c1) <= 1e-14 * scale ? [] : [-c0 / c1];
  else {
    const disc = c1 * c1 - 4 * c2 * c0;
    if (disc < 0) return [];
    const q = -0.5 * (c1 + Math.sign(c1 || 1) * Math.sqrt(disc));
    roots = q === 0 ? [0] : [q / c2, c0 / q];
  }
  return roots.filter((t) => t > -1 && t < 1);
}
