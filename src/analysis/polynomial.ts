// Small polynomial tools for exact extremes: coefficients low to high, variable t on [-1, 1].

export type Poly = ArrayLike<number>;

export function evalPoly(c: Poly, t: number): number {
  let v = 0;
  for (let k = c.length - 1; k >= 0; k--) v = v * t + c[k];
  return v;
}

export function derivative(c: Poly): number[] {
  const out = new Array<number>(Math.max(c.length - 1, 0));
  for (let k = 1; k < c.length; k++) out[k - 1] = c[k] * k;
  return out;
}

export function multiply(a: Poly, b: Poly): number[] {
  const out = new Array<number>(a.length + b.length - 1).fill(0);
  for (let i = 0; i < a.length; i++) for (let j = 0; j < b.length; j++) out[i + j] += a[i] * b[j];
  return out;
}

/** Chebyshev points of the interpolating cubic (interior of [-1, 1], so one-sided values never enter). */
export const CHEB4 = [0, 1, 2, 3].map((k) => Math.cos(((2 * k + 1) * Math.PI) / 8));

/** Lagrange basis polynomials on CHEB4, expanded: LAGRANGE[k][j] is the t^j coefficient of basis k. */
const LAGRANGE: readonly number[][] = CHEB4.map((tk, k) => {
  let basis: number[] = [1];
  let denom = 1;
  CHEB4.forEach((tm, m) => {
    if (m === k) return;
    basis = multiply(basis, [-tm, 1]);
    denom *= tk - tm;
  });
  return basis.map((v) => v / denom);
});
const LAG = Float64Array.from(LAGRANGE.flat());

/** Coefficients of the cubic through (CHEB4[k], y[k]). */
export function cubicThrough(y: readonly number[]): number[] {
  const out = new Float64Array(4);
  cubicThroughInto(y, out, 0);
  return Array.from(out);
}

/** cubicThrough written into out[off .. off+3]. */
export function cubicThroughInto(y: ArrayLike<number>, out: Float64Array, off: number): void {
  let c0 = 0;
  let c1 = 0;
  let c2 = 0;
  let c3 = 0;
  for (let k = 0; k < 4; k++) {
    const yk = y[k];
    c0 += yk * LAG[4 * k];
    c1 += yk * LAG[4 * k + 1];
    c2 += yk * LAG[4 * k + 2];
    c3 += yk * LAG[4 * k + 3];
  }
  out[off] = c0;
  out[off + 1] = c1;
  out[off + 2] = c2;
  out[off + 3] = c3;
}

/**
 * Real roots of c inside (lo, hi): the roots of c' split the interval into monotone pieces; each
 * piece with a sign change holds one root, found by Newton's method kept inside the shrinking
 * bracket (a bisection step whenever Newton would leave it); exact to round-off for any degree.
 */
export function rootsIn(c: Poly, lo: number, hi: number): number[] {
  const out = new Float64Array(Math.max(c.length, 1));
  const n = rootsInto(c, c.length, lo, hi, out, 0);
  return Array.from(out.subarray(0, n));
}

/** Highest degree rootsIn handles without allocating (a sextic's derivative needs 5). */
const MAX_DEG = 8;
/** Per recursion depth: the trimmed polynomial, its derivative, and the derivative's roots. */
const work = Array.from({ length: MAX_DEG + 2 }, () => ({
  p: new Float64Array(MAX_DEG + 1),
  d: new Float64Array(MAX_DEG),
  cuts: new Float64Array(MAX_DEG),
}));

/** evalPoly of p[0..deg]. */
function evalDeg(p: Float64Array, deg: number, t: number): number {
  let v = 0;
  for (let k = deg; k >= 0; k--) v = v * t + p[k];
  return v;
}

/** Roots of c[0..len-1] inside (lo, hi), ascending, into out; returns how many. */
function rootsInto(c: Poly, len: number, lo: number, hi: number, out: Float64Array, depth: number): number {
  let deg = len - 1;
  if (deg > MAX_DEG) throw new Error(`rootsIn: degree ${deg} above ${MAX_DEG}`);
  let scale = 0;
  for (let k = 0; k < len; k++) scale = Math.max(scale, Math.abs(c[k]));
  while (deg > 0 && Math.abs(c[deg]) <= 1e-14 * scale) deg--;
  if (deg < 1) return 0;
  const ws = work[depth];
  const p = ws.p;
  for (let k = 0; k <= deg; k++) p[k] = c[k];
  if (deg === 1) {
    const r = -p[0] / p[1];
    if (r > lo && r < hi) {
      out[0] = r;
      return 1;
    }
    return 0;
  }
  for (let k = 1; k <= deg; k++) ws.d[k - 1] = p[k] * k;
  const inner = rootsInto(ws.d, deg, lo, hi, ws.cuts, depth + 1);
  let n = 0;
  let a = lo;
  let fa = evalDeg(p, deg, a);
  for (let k = 0; k <= inner; k++) {
    const b = k < inner ? ws.cuts[k] : hi;
    const fb = evalDeg(p, deg, b);
    if (fa === 0) {
      if (a > lo) out[n++] = a;
    } else if (fb === 0) {
      if (b < hi) out[n++] = b;
    } else if (fa * fb < 0) {
      const r = bracketedNewton(p, deg, a, fa, b);
      if (r > lo && r < hi) out[n++] = r;
    }
    a = b;
    fa = fb;
  }
  return n;
}

/** The root of p[0..deg] in (a, b), where p is monotone and p(a) = fa has the opposite sign of p(b). */
function bracketedNewton(p: Float64Array, deg: number, a: number, fa: number, b: number): number {
  let x = (a + b) / 2;
  for (let it = 0; it < 200; it++) {
    let v = 0;
    let dv = 0;
    for (let k = deg; k >= 0; k--) {
      dv = dv * x + v;
      v = v * x + p[k];
    }
    if (v === 0) return x;
    if (v * fa > 0) {
      a = x;
      fa = v;
    } else b = x;
    let next = x - v / dv;
    if (!(next > a && next < b)) next = (a + b) / 2;
    if (Math.abs(next - x) <= 1e-15 * (1 + Math.abs(x)) || b - a <= 1e-15 * (1 + Math.abs(a))) return next;
    x = next;
  }
  return x;
}

export interface Extrema {
  max: number;
  tMax: number;
  min: number;
  tMin: number;
}

/** Max and min of c on [-1, 1] with their t. */
export function extremaOn(c: Poly): Extrema {
  const out: Extrema = { max: 0, tMax: 0, min: 0, tMin: 0 };
  extremaInto(c, out);
  return out;
}

/** Candidate t of an extremum: the ends, then the stationary points (at most 5 for a sextic). */
const cand = new Float64Array(MAX_DEG + 2);
const dc = new Float64Array(MAX_DEG);
const stationary = new Float64Array(MAX_DEG);

/** extremaOn written into out (for the hot loop). Candidates: the ends, then the stationary points. */
export function extremaInto(c: Poly, out: Extrema): void {
  cand[0] = -1;
  cand[1] = 1;
  let n = 2;
  if (c.length <= 4) {
    n += quadraticRoots(c.length > 1 ? c[1] : 0, c.length > 2 ? c[2] * 2 : 0, c.length > 3 ? c[3] * 3 : 0, cand, 2);
  } else {
    const len = c.length - 1;
    for (let k = 1; k <= len; k++) dc[k - 1] = c[k] * k;
    n += rootsInto(dc, len, -1, 1, stationary, 0);
    for (let k = 2; k < n; k++) cand[k] = stationary[k - 2];
  }
  let max = -Infinity;
  let min = Infinity;
  let tMax = -1;
  let tMin = -1;
  for (let k = 0; k < n; k++) {
    const t = cand[k];
    const v = evalPoly(c, t);
    if (v > max) {
      max = v;
      tMax = t;
    }
    if (v < min) {
      min = v;
      tMin = t;
    }
  }
  out.max = max;
  out.tMax = tMax;
  out.min = min;
  out.tMin = tMin;
}

/** Real roots in (-1, 1) of c0 + c1 t + c2 t² (closed form, stable variant), into out from off;
 * returns how many. */
function quadraticRoots(c0: number, c1: number, c2: number, out: Float64Array, off: number): number {
  const scale = Math.max(Math.abs(c0), Math.abs(c1), Math.abs(c2));
  if (scale === 0) return 0;
  let n = 0;
  if (Math.abs(c2) <= 1e-14 * scale) {
    if (!(Math.abs(c1) <= 1e-14 * scale)) {
      const t = -c0 / c1;
      if (t > -1 && t < 1) out[off + n++] = t;
    }
  } else {
    const disc = c1 * c1 - 4 * c2 * c0;
    if (disc < 0) return 0;
    const q = -0.5 * (c1 + Math.sign(c1 || 1) * Math.sqrt(disc));
    if (q === 0) out[off + n++] = 0;
    else {
      const t1 = q / c2;
      if (t1 > -1 && t1 < 1) out[off + n++] = t1;
      const t2 = c0 / q;
      if (t2 > -1 && t2 < 1) out[off + n++] = t2;
    }
  }
  return n;
}
