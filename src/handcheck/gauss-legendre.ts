// Composite Gauss-Legendre quadrature for the moment-area integrals. The integrands (M/EI
// along a tapered tube) are smooth between load points and kinked at them, so each integral
// is split at the kinks and every piece is cut into equal panels.
//
// Nodes and weights: the roots of the Legendre polynomial P_n found by Newton's iteration
// from the starting guess cos(π (i − 1/4)/(n + 1/2)), weights 2 / ((1 − x²) P_n'(x)²)
// (the classical construction, e.g. Press et al., Numerical Recipes, routine gauleg).

export interface GaussRule {
  readonly nodes: readonly number[];
  readonly weights: readonly number[];
}

const cache = new Map<number, GaussRule>();

/** The n-point Gauss-Legendre rule on [-1, 1]; exact for polynomials of degree 2n − 1. */
export function gaussLegendre(n: number): GaussRule {
  if (!Number.isInteger(n) || n < 1 || n > 64) throw new RangeError(`Gauss-Legendre order must be an integer 1..64; got ${n}`);
  const hit = cache.get(n);
  if (hit) return hit;
  const nodes: number[] = new Array<number>(n);
  const weights: number[] = new Array<number>(n);
  for (let i = 0; i < Math.ceil(n / 2); i++) {
    let x = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let dp = 0;
    for (let it = 0; it < 100; it++) {
      // Recurrence (k + 1) P_{k+1} = (2k + 1) x P_k − k P_{k−1}.
      let p0 = 1;
      let p1 = x;
      for (let k = 1; k < n; k++) {
        const p2 = ((2 * k + 1) * x * p1 - k * p0) / (k + 1);
        p0 = p1;
        p1 = p2;
      }
      // p1 = P_n(x), p0 = P_{n−1}(x); P_n' = n (x P_n − P_{n−1}) / (x² − 1).
      dp = (n * (x * p1 - p0)) / (x * x - 1);
      const dx = p1 / dp;
      x -= dx;
      if (Math.abs(dx) < 1e-16) break;
    }
    const w = 2 / ((1 - x * x) * dp * dp);
    nodes[i] = -x;
    nodes[n - 1 - i] = x;
    weights[i] = w;
    weights[n - 1 - i] = w;
  }
  if (n % 2 === 1) nodes[(n - 1) / 2] = 0;
  const rule = { nodes, weights };
  cache.set(n, rule);
  return rule;
}

export interface QuadratureSettings {
  /** Gauss points per panel. */
  readonly points: number;
  /** Equal panels per piece between breakpoints. */
  readonly panels: number;
}

/** ∫ f over [a, b], split at the breakpoints inside (a, b), each piece in equal panels. */
export function integratePiecewise(f: (x: number) => number, a: number, b: number, breaks: readonly number[], q: QuadratureSettings): number {
  if (!(b >= a)) throw new RangeError(`integration interval [${a}, ${b}] is reversed`);
  if (b === a) return 0;
  const tol = 1e-12 * Math.max(1, Math.abs(b));
  const cuts = [a, ...[...new Set(breaks)].filter((x) => x > a + tol && x < b - tol).sort((x, y) => x - y), b];
  const { nodes, weights } = gaussLegendre(q.points);
  let sum = 0;
  for (let k = 0; k + 1 < cuts.length; k++) {
    const h = (cuts[k + 1] - cuts[k]) / q.panels;
    for (let p = 0; p < q.panels; p++) {
      const mid = cuts[k] + (p + 0.5) * h;
      for (let g = 0; g < nodes.length; g++) sum += (weights[g] * h * f(mid + (nodes[g] * h) / 2)) / 2;
    }
  }
  return sum;
}
