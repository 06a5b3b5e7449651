/**
 * Sparse LU factorisation P A Q = L U of a matrix in compressed columns, and
 * the matching solve, written from the published algorithms:
 * - left-looking LU with threshold partial pivoting, each column a sparse
 *   triangular solve whose nonzero pattern is found by depth-first search
 *   (Gilbert & Peierls, SIAM J. Sci. Stat. Comput. 9, 862–874, 1988; as
 *   `cs_lu`, `cs_spsolve`, `cs_reach` in T. A. Davis, "Direct Methods for
 *   Sparse Linear Systems", SIAM 2006, §6.3 and §3.2);
 * - the diagonal is kept as pivot while it is at least `pivotTolerance` × the
 *   largest candidate of its column (Davis 2006, §6.3), so a fill-reducing
 *   symmetric ordering Q (minimumDegree.ts) is mostly kept;
 * - a refactorisation that reuses the pattern of L and U and the pivot order
 *   of an earlier factorisation and does only the arithmetic (as KLU's
 *   refactor: Davis & Palamadai Natarajan, ACM TOMS 37, 36, 2010), checked
 *   pivot by pivot and redone in full when a pivot has become too small.
 *
 * Units: none (pure linear algebra). Work buffers are typed arrays allocated
 * once per factor object.
 */

export const SPARSE_LU_DEFAULTS = {
  /** keep the diagonal as pivot while |a_kk| ≥ this × the largest candidate (Davis 2006 uses 0.001–0.1) */
  pivotTolerance: 0.1,
  /** in a refactorisation, a pivot below this × the largest candidate of its column forces a full factorisation */
  refactorTolerance: 1e-3,
};

/** The pattern of an n×n matrix in compressed columns: rows of column j at rowIndex[colStart[j]..colStart[j+1]). */
export interface SparsePattern {
  n: number;
  colStart: Int32Array;
  rowIndex: Int32Array;
}

/** LU factors of one pattern; `factor` and `refactor` fill them from values aligned with pattern.rowIndex. */
export class SparseLu {
  readonly n: number;
  readonly pattern: SparsePattern;
  /** column order: column k of A Q is column q[k] of A */
  readonly q: Int32Array;
  /** row i of A is row pinv[i] of P A (−1 before factorisation) */
  readonly pinv: Int32Array;
  private Lp: Int32Array;
  private Li: Int32Array = new Int32Array(0);
  private Lx: Float64Array = new Float64Array(0);
  private Up: Int32Array;
  private Ui: Int32Array = new Int32Array(0);
  private Ux: Float64Array = new Float64Array(0);
  private factored = false;
  private readonly x: Float64Array;
  private readonly xi: Int32Array;
  private readonly pstack: Int32Array;
  private readonly mark: Int32Array;
  private stamp = 0;
  /** full factorisations and refactorisations done (for benchmarks and tests) */
  factorisations = 0;
  refactorisations = 0;

  constructor(pattern: SparsePattern, q: Int32Array) {
    const { n, colStart, rowIndex } = pattern;
    if (colStart.length !== n + 1 || rowIndex.length < colStart[n])
      throw new RangeError(`SparseLu: pattern arrays do not describe a ${n}×${n} matrix`);
    if (q.length !== n) throw new RangeError(`SparseLu: column order has ${q.length} entries, expected ${n}`);
    this.n = n;
    this.pattern = pattern;
    this.q = q;
    this.pinv = new Int32Array(n).fill(-1);
    this.Lp = new Int32Array(n + 1);
    this.Up = new Int32Array(n + 1);
    this.x = new Float64Array(n);
    this.xi = new Int32Array(n);
    this.pstack = new Int32Array(n);
    this.mark = new Int32Array(n);
  }

  /** entries of L and U (with their diagonals) */
  get factorNonzeros(): number {
    return this.factored ? this.Lp[this.n] + this.Up[this.n] : 0;
  }

  /**
   * Factorises A (values aligned with pattern.rowIndex), refactorising with the
   * last pivot order when there is one. Returns −1, or the column k at which no
   * usable pivot was found (A singular to working precision).
   */
  factorise(values: Float64Array, singularTolerance = 1e-14): number {
    if (this.factored && this.refactor(values, singularTolerance)) return -1;
    return this.factor(values, singularTolerance);
  }

  /** Full factorisation with threshold partial pivoting; returns −1 or the failing column. */
  factor(values: Float64Array, singularTolerance = 1e-14): number {
    const { n, q, pinv, x, xi } = this;
    const { colStart: Ap, rowIndex: Ai } = this.pattern;
    this.factorisations++;
    this.factored = false;
    const scale = maxAbs(values, Ap[n]);
    if (!(scale > 0) || !Number.isFinite(scale)) return 0;
    const tiny = singularTolerance * scale;
    let lcap = Math.max(4 * Ap[n], n);
    let ucap = lcap;
    let Li = new Int32Array(lcap);
    let Lx = new Float64Array(lcap);
    let Ui = new Int32Array(ucap);
    let Ux = new Float64Array(ucap);
    const Lp = this.Lp;
    const Up = this.Up;
    pinv.fill(-1);
    let lnz = 0;
    let unz = 0;
    for (let k = 0; k < n; k++) {
      Lp[k] = lnz;
      Up[k] = unz;
      if (lnz + n > lcap) {
        lcap = 2 * lcap + n;
        Li = grow(Li, lcap);
        Lx = grow(Lx, lcap);
      }
      if (unz + n > ucap) {
        ucap = 2 * ucap + n;
        Ui = grow(Ui, ucap);
        Ux = grow(Ux, ucap);
      }
      const col = q[k];
      // x = L \ A(:, col), pattern xi[top..n) in topological order
      const top = this.reach(Li, Lp, col, k);
      for (let p = top; p < n; p++) x[xi[p]] = 0;
      for (let p = Ap[col]; p < Ap[col + 1]; p++) x[Ai[p]] += values[p];
      for (let px = top; px < n; px++) {
        const j = xi[px];
        const J = pinv[j];
        if (J < 0) continue;
        const xj = x[j]; // L has a unit diagonal, stored first
        if (xj === 0) continue;
        for (let p = Lp[J] + 1; p < Lp[J + 1]; p++) x[Li[p]] -= Lx[p] * xj;
      }
      let ipiv = -1;
      let best = -1;
      for (let p = top; p < n; p++) {
        const i = xi[p];
        if (pinv[i] < 0) {
          const t = Math.abs(x[i]);
          if (t > best) {
            best = t;
            ipiv = i;
          }
        } else {
          Ui[unz] = pinv[i];
          Ux[unz++] = x[i];
        }
      }
      if (ipiv < 0 || !(best > tiny)) {
        x.fill(0);
        return k;
      }
      if (pinv[col] < 0 && Math.abs(x[col]) >= SPARSE_LU_DEFAULTS.pivotTolerance * best) ipiv = col;
      const pivot = x[ipiv];
      Ui[unz] = k;
      Ux[unz++] = pivot;
      pinv[ipiv] = k;
      Li[lnz] = ipiv;
      Lx[lnz++] = 1;
      for (let p = top; p < n; p++) {
        const i = xi[p];
        if (pinv[i] < 0) {
          Li[lnz] = i;
          Lx[lnz++] = x[i] / pivot;
        }
        x[i] = 0;
      }
    }
    Lp[n] = lnz;
    Up[n] = unz;
    for (let p = 0; p < lnz; p++) Li[p] = pinv[Li[p]];
    this.Li = Li;
    this.Lx = Lx;
    this.Ui = Ui;
    this.Ux = Ux;
    this.factored = true;
    return -1;
  }

  /**
   * Numeric factorisation on the pattern and pivot order of the last `factor`.
   * Returns false (factors invalid) when a pivot fell below the tolerances.
   */
  refactor(values: Float64Array, singularTolerance = 1e-14): boolean {
    const { n, q, pinv, x, Lp, Li, Lx, Up, Ui, Ux } = this;
    const { colStart: Ap, rowIndex: Ai } = this.pattern;
    this.refactorisations++;
    const scale = maxAbs(values, Ap[n]);
    if (!(scale > 0) || !Number.isFinite(scale)) {
      this.factored = false;
      return false;
    }
    const tiny = singularTolerance * scale;
    for (let k = 0; k < n; k++) {
      const col = q[k];
      for (let p = Ap[col]; p < Ap[col + 1]; p++) x[pinv[Ai[p]]] += values[p];
      const uEnd = Up[k + 1] - 1;
      for (let p = Up[k]; p < uEnd; p++) {
        const J = Ui[p];
        const xj = x[J];
        Ux[p] = xj;
        x[J] = 0;
        if (xj === 0) continue;
        for (let t = Lp[J] + 1; t < Lp[J + 1]; t++) x[Li[t]] -= Lx[t] * xj;
      }
      const pivot = x[k];
      x[k] = 0;
      let best = Math.abs(pivot);
      for (let t = Lp[k] + 1; t < Lp[k + 1]; t++) best = Math.max(best, Math.abs(x[Li[t]]));
      if (!(Math.abs(pivot) > tiny) || Math.abs(pivot) < SPARSE_LU_DEFAULTS.refactorTolerance * best) {
        x.fill(0);
        this.factored = false;
        return false;
      }
      Ux[uEnd] = pivot;
      for (let t = Lp[k] + 1; t < Lp[k + 1]; t++) {
        const i = Li[t];
        Lx[t] = x[i] / pivot;
        x[i] = 0;
      }
    }
    return true;
  }

  /** Solves A x = b with the current factors; `b` is overwritten by x. */
  solve(b: Float64Array): void {
    if (!this.factored) throw new Error("SparseLu.solve: no valid factorisation");
    const { n, q, pinv, x, Lp, Li, Lx, Up, Ui, Ux } = this;
    for (let i = 0; i < n; i++) x[pinv[i]] = b[i];
    for (let j = 0; j < n; j++) {
      const xj = x[j];
      if (xj === 0) continue;
      for (let p = Lp[j] + 1; p < Lp[j + 1]; p++) x[Li[p]] -= Lx[p] * xj;
    }
    for (let j = n - 1; j >= 0; j--) {
      const d = Up[j + 1] - 1;
      const xj = x[j] / Ux[d];
      x[j] = xj;
      if (xj === 0) continue;
      for (let p = Up[j]; p < d; p++) x[Ui[p]] -= Ux[p] * xj;
    }
    for (let k = 0; k < n; k++) b[q[k]] = x[k];
    x.fill(0);
  }

  /**
   * Pattern of L \ A(:, col) by depth-first search from the rows of the column
   * through the columns of L built so far (Davis 2006, cs_reach / cs_dfs);
   * fills xi[top..n) and returns top.
   */
  private reach(Li: Int32Array, Lp: Int32Array, col: number, k: number): number {
    const { n, xi, pstack, mark, pinv } = this;
    const { colStart: Ap, rowIndex: Ai } = this.pattern;
    const stamp = ++this.stamp;
    // columns j < k end at Lp[j + 1]; column k − 1 ends where column k starts
    const end = (J: number) => Lp[J + 1];
    let top = n;
    for (let p0 = Ap[col]; p0 < Ap[col + 1]; p0++) {
      const start = Ai[p0];
      if (mark[start] === stamp) continue;
      // iterative depth-first search; xi[0..head] is the stack of nodes
      let head = 0;
      xi[0] = start;
      while (head >= 0) {
        const j = xi[head];
        const J = pinv[j];
        if (mark[j] !== stamp) {
          mark[j] = stamp;
          pstack[head] = J < 0 ? 0 : Lp[J] + 1;
        }
        let done = true;
        const pEnd = J < 0 || J >= k ? 0 : end(J);
        for (let p = pstack[head]; p < pEnd; p++) {
          const i = Li[p];
          if (mark[i] === stamp) continue;
          pstack[head] = p + 1;
          xi[++head] = i;
          done = false;
          break;
        }
        if (done) {
          head--;
          xi[--top] = j;
        }
      }
    }
    return top;
  }
}

function maxAbs(v: Float64Array, len: number): number {
  let m = 0;
  for (let p = 0; p < len; p++) {
    const a = Math.abs(v[p]);
    if (!(a <= m)) m = a;
  }
  return m;
}

function grow<T extends Int32Array | Float64Array>(a: T, size: number): T {
  const b = new (a.constructor as { new (n: number): T })(size);
  b.set(a);
  return b;
}
