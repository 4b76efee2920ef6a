// Symmetric banded matrix with an in-place LDL^T factorisation and solve (no pivoting).
// Storage: row i holds K(i, i..i+bw) at data[i*(bw+1) + (j-i)]. Cost at most n*bw^2/2 (the work follows
// each row's profile inside the band), linear in n.

/** Thrown by factor() when a pivot is not clearly positive; the caller names the dof. */
export class PivotFailure extends Error {
  constructor(
    readonly eq: number,
    readonly pivot: number,
    readonly diagonal: number,
  ) {
    super(`pivot ${pivot} at equation ${eq} (diagonal ${diagonal})`);
  }
}

/** A pivot at or below this fraction of the dof's own diagonal means no stiffness against it:
 * a mechanism, or (with geometric stiffness) loss of stability. Round-off in a true mechanism
 * leaves about 1e-16..1e-13; a sound frame numbered outward from its supports keeps pivots far above. */
export const PIVOT_RATIO = 1e-10;

export class BandedMatrix {
  readonly data: Float64Array;
  private factored = false;
  /** Scratch for the diagonal before elimination, kept across refactorisations. */
  private diag0: Float64Array | null = null;
  /** Per factorised row, the offset of its last non-zero entry (the solve skips the zeros past it). */
  private rowTop: Int32Array | null = null;

  constructor(
    readonly n: number,
    readonly bw: number,
  ) {
    this.data = new Float64Array(n * (bw + 1));
  }

  /** Back to the zero matrix (not factorised), keeping the storage: no new allocation per assembly. */
  reset(): void {
    this.data.fill(0);
    this.factored = false;
  }

  clone(): BandedMatrix {
    const c = new BandedMatrix(this.n, this.bw);
    c.data.set(this.data);
    return c;
  }

  /** Adds v to K(i, j) (and by symmetry K(j, i)); call once per pair with i <= j or j <= i. */
  add(i: number, j: number, v: number): void {
    const a = i <= j ? i : j;
    const b = i <= j ? j : i;
    const off = b - a;
    if (off > this.bw) throw new Error(`entry (${a}, ${b}) outside the band ${this.bw}`);
    this.data[a * (this.bw + 1) + off] += v;
  }

  get(i: number, j: number): number {
    const a = Math.min(i, j);
    const off = Math.abs(i - j);
    return off > this.bw ? 0 : this.data[a * (this.bw + 1) + off];
  }

  /** y = K x (before factorisation). */
  multiply(x: ArrayLike<number>): Float64Array {
    if (this.factored) throw new Error('multiply after factor');
    const { n, bw, data } = this;
    const w = bw + 1;
    const y = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      y[i] += data[i * w] * x[i];
      const top = Math.min(bw, n - 1 - i);
      for (let k = 1; k <= top; k++) {
        const v = data[i * w + k];
        y[i] += v * x[i + k];
        y[i + k] += v * x[i];
      }
    }
    return y;
  }

  /**
   * Factorises in place into L D L^T. With `countNegative` it never throws and returns the number
   * of negative pivots (Sturm count); otherwise a pivot <= PIVOT_RATIO * diagonal throws PivotFailure.
   */
  factor(countNegative = false): number {
    const { n, bw, data } = this;
    const w = bw + 1;
    let negatives = 0;
    // Each pivot is judged against its dof's own diagonal before elimination. Row i is first
    // changed at step i - bw, so its diagonal is kept then (no separate pass over the band).
    const diag0 = (this.diag0 ??= new Float64Array(n));
    const rowTop = (this.rowTop ??= new Int32Array(n));
    for (let i = 0; i <= Math.min(bw, n - 1); i++) diag0[i] = Math.abs(data[i * w]);
    for (let j = 0; j < n; j++) {
      if (j > 0 && j + bw < n) diag0[j + bw] = Math.abs(data[(j + bw) * w]);
      const rowJ = j * w;
      const d = data[rowJ];
      if (countNegative) {
        if (d < 0) negatives++;
        if (d === 0) throw new PivotFailure(j, d, d);
      } else {
        if (!(d > PIVOT_RATIO * diag0[j]) || !(d > 0)) throw new PivotFailure(j, d, diag0[j]);
      }
      // Row j is final here; entries past its last non-zero are zeros that would change nothing,
      // so the work follows the profile of each row rather than the full band.
      let top = Math.min(bw, n - 1 - j);
      while (top > 0 && data[rowJ + top] === 0) top--;
      rowTop[j] = top;
      for (let k = 1; k <= top; k++) {
        const lk = data[rowJ + k] / d;
        if (lk === 0) continue;
        const rowI = (j + k) * w;
        for (let m = k; m <= top; m++) data[rowI + m - k] -= lk * data[rowJ + m];
      }
      for (let k = 1; k <= top; k++) data[rowJ + k] /= d;
    }
    this.factored = true;
    return negatives;
  }

  /** Solves K x = b after factor(). */
  solve(b: ArrayLike<number>): Float64Array {
    if (!this.factored) throw new Error('solve before factor');
    const { n, bw, data } = this;
    const rowTop = this.rowTop as Int32Array;
    const w = bw + 1;
    const x = new Float64Array(n);
    for (let k = 0; k < n; k++) x[k] = b[k];
    for (let j = 0; j < n; j++) {
      const xj = x[j];
      if (xj === 0) continue;
      const top = rowTop[j];
      for (let k = 1; k <= top; k++) x[j + k] -= data[j * w + k] * xj;
    }
    // D^-1 folded into the backward pass (one pass less over the band)
    for (let j = n - 1; j >= 0; j--) {
      const top = rowTop[j];
      let s = x[j] / data[j * w];
      for (let k = 1; k <= top; k++) s -= data[j * w + k] * x[j + k];
      x[j] = s;
    }
    return x;
  }
}
