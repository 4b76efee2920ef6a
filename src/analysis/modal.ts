// Natural frequencies and mode shapes: K phi = omega^2 M phi with lumped translational masses
// (half of each element's steel mass to each end node, plus FrameModel.masses).
//
// Choice: rotational dofs stay in the problem with zero mass. Subspace iteration applies K^-1 M,
// which handles a singular M exactly: it is equivalent to statically condensing the massless
// rotations, with no artificial rotary inertia. K^-1 uses the same banded LDL^T as the static
// analysis; the small projected problem is solved densely with ml-matrix (Cholesky + symmetric
// EVD). A Sturm sequence count of K - sigma M then confirms that no mode below the last one
// reported was missed (Bathe, Finite Element Procedures, ch. 11, subspace iteration; from memory).
import { CholeskyDecomposition, EigenvalueDecomposition, inverse, Matrix } from 'ml-matrix';
import type { FrameModel, Vec3, Vec6 } from '../model/frame.ts';
import type { Mode } from './analysis-types.ts';
import { assemble, expand, factorOrThrow, prepareModel, restrict, type PreparedModel } from './frame-system.ts';

/** Lumped translational mass per global dof (node*6 + c). */
export function lumpedMass(prep: PreparedModel): Float64Array {
  const m = new Float64Array(prep.model.nodes.length * 6);
  for (const pe of prep.elements) {
    const half = (pe.el.massPerLength_kgm * pe.geo.L) / 2;
    for (let c = 0; c < 3; c++) {
      m[pe.el.i * 6 + c] += half;
      m[pe.el.j * 6 + c] += half;
    }
  }
  for (const lm of prep.model.masses) {
    if (!(lm.mass_kg >= 0)) throw new Error(`mass '${lm.origin}' at node ${lm.node} is negative or not a number`);
    for (let c = 0; c < 3; c++) m[lm.node * 6 + c] += lm.mass_kg;
  }
  return m;
}

/** Deterministic pseudo-random numbers for the last starting vector (same modes every run). */
function lcg(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 4294967296 - 0.5;
  };
}

const dotW = (a: Float64Array, w: Float64Array, b: Float64Array): number => {
  let s = 0;
  for (let k = 0; k < a.length; k++) s += a[k] * w[k] * b[k];
  return s;
};

const dot = (a: Float64Array, b: Float64Array): number => {
  let s = 0;
  for (let k = 0; k < a.length; k++) s += a[k] * b[k];
  return s;
};

/** x = sum over a of Y[a] * Q(a, col), skipping zero coefficients (small dense loops kept in their
 * own functions, which V8 optimises far better than inside the long iteration). */
function combine(Y: readonly Float64Array[], Q: Matrix, col: number, n: number): Float64Array {
  const x = new Float64Array(n);
  for (let a = 0; a < Y.length; a++) {
    const c = Q.get(a, col);
    if (c === 0) continue;
    const y = Y[a];
    for (let k = 0; k < n; k++) x[k] += y[k] * c;
  }
  return x;
}

/**
 * Mass-orthonormalises the iterated vectors Y (with K Y = MX kept true by applying the same
 * operations to MX), replacing any vector that has become dependent on the others by a fresh
 * one. Without this, a frame with one very heavy attachment drives several trial vectors into
 * the same direction and the projected mass matrix stops being positive definite.
 */
function keepIndependent(
  Y: Float64Array[],
  MX: Float64Array[],
  mv: Float64Array,
  solve: (mx: Float64Array) => Float64Array,
  rnd: () => number,
): void {
  const n = mv.length;
  for (let b = 0; b < Y.length; b++) {
    for (let attempt = 0; ; attempt++) {
      const y = Y[b];
      const mx = MX[b];
      const norm0 = Math.sqrt(dotW(y, mv, y));
      // Two passes of Gram-Schmidt against the vectors already accepted (twice is enough).
      for (let pass = 0; pass < 2; pass++) {
        for (let a = 0; a < b; a++) {
          const c = dotW(Y[a], mv, y);
          const ya = Y[a];
          const mxa = MX[a];
          for (let k = 0; k < n; k++) {
            y[k] -= c * ya[k];
            mx[k] -= c * mxa[k];
          }
        }
      }
      const norm = Math.sqrt(dotW(y, mv, y));
      if (norm > 1e-9 * norm0 && norm > 0) {
        for (let k = 0; k < n; k++) {
          y[k] /= norm;
          mx[k] /= norm;
        }
        break;
      }
      if (attempt === 5) throw new Error('modal analysis: could not find independent trial vectors');
      // A random load of even size on every dof with mass: weighted by the mass (as the
      // starting vectors are), a very heavy attachment dominates every fresh vector and each
      // comes out dependent again (found by tests/fuzz: density 1 g/m3, or a 100 t luminaire).
      const fresh = new Float64Array(n);
      for (let k = 0; k < n; k++) fresh[k] = mv[k] > 0 ? rnd() - 0.5 : 0;
      MX[b] = fresh;
      Y[b] = solve(fresh);
    }
  }
}

function subspace(prep: PreparedModel, mv: Float64Array, p: number, q: number): { lambdas: number[]; vectors: Float64Array[] } {
  const K = assemble(prep, null);
  const n = K.n;
  const diag = new Float64Array(n);
  for (let k = 0; k < n; k++) diag[k] = K.get(k, k);
  factorOrThrow(prep, K, undefined, false);
  // Starting vectors: the mass diagonal, unit vectors at the largest m/k ratios, one random vector.
  const ranked = [...Array(n).keys()].filter((k) => mv[k] > 0).sort((a, b) => mv[b] / diag[b] - mv[a] / diag[a]);
  let X: Float64Array[] = [new Float64Array(mv)];
  for (let k = 0; X.length < q - 1 && k < ranked.length; k++) {
    const e = new Float64Array(n);
    e[ranked[k]] = 1;
    X.push(e);
  }
  const rnd = lcg(12345);
  while (X.length < q) {
    const x = new Float64Array(n);
    for (let k = 0; k < n; k++) x[k] = mv[k] * rnd();
    X.push(x);
  }
  let prev: number[] = [];
  for (let it = 0; it < 200; it++) {
    // (typed-array loops: Float64Array.from with a mapping function is slow in V8)
    const MX = X.map((x) => {
      const mx = new Float64Array(n);
      for (let k = 0; k < n; k++) mx[k] = x[k] * mv[k];
      return mx;
    });
    const Y = MX.map((mx) => K.solve(mx));
    keepIndependent(Y, MX, mv, (mx) => K.solve(mx), rnd);
    const Kr = new Matrix(q, q);
    const Mr = new Matrix(q, q);
    for (let a = 0; a < q; a++) {
      for (let b = a; b < q; b++) {
        const kab = dot(Y[a], MX[b]);
        const mab = dotW(Y[a], mv, Y[b]);
        Kr.set(a, b, kab); Kr.set(b, a, kab);
        Mr.set(a, b, mab); Mr.set(b, a, mab);
      }
    }
    const chol = new CholeskyDecomposition(Mr);
    if (!chol.isPositiveDefinite()) throw new Error('modal analysis: the trial vectors became dependent (projected mass not positive definite)');
    const Linv = inverse(chol.lowerTriangularMatrix);
    const C = Linv.mmul(Kr).mmul(Linv.transpose());
    const Cs = C.add(C.transpose()).mul(0.5);
    const evd = new EigenvalueDecomposition(Cs, { assumeSymmetric: true });
    const order = evd.realEigenvalues.map((v, k) => [v, k] as const).sort((a, b) => a[0] - b[0]);
    const Q = Linv.transpose().mmul(evd.eigenvectorMatrix);
    const lambdas = order.map(([v]) => v);
    X = order.map(([, col]) => combine(Y, Q, col, n));
    const done = prev.length === q && lambdas.slice(0, p).every((l, k) => Math.abs(l - prev[k]) <= 1e-10 * Math.abs(l));
    prev = lambdas;
    if (done) return { lambdas, vectors: X };
  }
  throw new Error('modal analysis: subspace iteration did not converge in 200 iterations');
}

/** Number of eigenvalues below sigma (negative pivots of K - sigma M). */
function sturmCount(prep: PreparedModel, mv: Float64Array, sigma: number): number {
  const K = assemble(prep, null);
  for (let k = 0; k < K.n; k++) K.add(k, k, -sigma * mv[k]);
  return K.factor(true);
}

/** The first nModes natural modes, lowest frequency first. */
export function modalAnalysis(model: FrameModel, nModes: number): Mode[] {
  if (!(Number.isInteger(nModes) && nModes >= 1)) throw new Error(`modal analysis: nModes must be a positive integer (got ${nModes})`);
  const prep = prepareModel(model);
  const mFull = lumpedMass(prep);
  const mv = restrict(prep, mFull);
  const nm = mv.reduce((c, m) => c + (m > 0 ? 1 : 0), 0);
  if (nm === 0) throw new Error('modal analysis: the frame has no mass on any free dof');
  const p = Math.min(nModes, nm);
  let q = Math.min(Math.max(2 * p, p + 8), nm);
  for (;;) {
    const { lambdas, vectors } = subspace(prep, mv, p, q);
    const sigma = lambdas[p - 1] * (1 + 1e-6);
    const found = lambdas.filter((l) => l < sigma).length;
    if (sturmCount(prep, mv, sigma) === found) return lambdas.slice(0, p).map((l, k) => toMode(prep, mv, mFull, l, vectors[k], k + 1));
    if (q === nm) throw new Error('modal analysis: the Sturm sequence check found modes the iteration missed');
    q = Math.min(2 * q, nm);
  }
}

function toMode(prep: PreparedModel, mv: Float64Array, mFull: Float64Array, lambda: number, x: Float64Array, index: number): Mode {
  const full = expand(prep, x);
  let big = 0;
  for (let d = 0; d < full.length; d++) if (d % 6 < 3 && Math.abs(full[d]) > Math.abs(big)) big = full[d];
  const shape: Vec6[] = prep.model.nodes.map((_, nd) => {
    const s = full.subarray(nd * 6, nd * 6 + 6);
    return [s[0] / big, s[1] / big, s[2] / big, s[3] / big, s[4] / big, s[5] / big];
  });
  // Effective mass in each global direction: (phi^T M r)^2 / (phi^T M phi), over the moving mass.
  const phiMphi = dotW(x, mv, x);
  const ratio = [0, 1, 2].map((c) => {
    let l = 0;
    let total = 0;
    for (let nd = 0; nd < prep.model.nodes.length; nd++) {
      const d = nd * 6 + c;
      if (prep.dofs.eq[d] < 0) continue;
      l += mFull[d] * full[d];
      total += mFull[d];
    }
    return total > 0 ? (l * l) / phiMphi / total : 0;
  }) as unknown as Vec3;
  const omega = Math.sqrt(Math.max(lambda, 0));
  return {
    mode: index,
    omega_rad_s: omega,
    frequency_Hz: omega / (2 * Math.PI),
    period_s: (2 * Math.PI) / omega,
    shape,
    effectiveMassRatio: ratio,
  };
}
