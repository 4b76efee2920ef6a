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

/** Coefficients of the cubic through (CHEB4[k], y[k]) (Lagrange form expanded). */
export function cubicThrough(y: readonly number[]): Poly {
  let out: Poly = [0, 0, 0, 0];
  for (let k = 0; k < 4; k++) {
    let basis: Poly = [1];
    let denom = 1;
    for (let m = 0; m < 4; m++) {
      if (m === k) continue;
      basis = multiply(basis, [-CHEB4[m], 1]);
      denom *= CHEB4[k] - CHEB4[m];
    }
    out = addPoly(out, basis.map((v) => (v * y[k]) / denom));
  }
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
  const ts = [-1, 1, ...rootsIn(derivative(c), -1, 1)];
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
