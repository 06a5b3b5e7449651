/**
 * Dense LU factorisation with partial (row) pivoting, in place on a row-major
 * Float64Array, and the matching forward/back substitution.
 *
 * Method: Doolittle elimination with row interchanges (Golub & Van Loan,
 * "Matrix Computations", 4th ed., Algorithm 3.4.1). The Newton step uses it
 * below NEWTON_DEFAULTS.sparseFromUnknowns, where it beats the sparse LU
 * (sparseLu.ts); the Rosenbrock integrator and the adjoint solves use it always.
 */

/**
 * Factorises the n×n row-major matrix `a` in place into L (unit lower, below the
 * diagonal) and U (on and above it); `pivot[k]` is the row swapped into row k.
 * Returns −1 on success, else the elimination step k at which the largest
 * available pivot was below `singularTolerance` × the largest |entry| of `a`.
 */
export function luFactor(a: Float64Array, n: number, pivot: Int32Array, singularTolerance = 1e-14): number {
  let scale = 0;
  for (let i = 0; i < n * n; i++) {
    const v = Math.abs(a[i]);
    if (v > scale) scale = v;
  }
  if (!(scale > 0) || !Number.isFinite(scale)) return 0;
  const tiny = singularTolerance * scale;
  for (let k = 0; k < n; k++) {
    let p = k;
    let best = Math.abs(a[k * n + k]);
    for (let i = k + 1; i < n; i++) {
      const v = Math.abs(a[i * n + k]);
      if (v > best) {
        best = v;
        p = i;
      }
    }
    pivot[k] = p;
    if (!(best > tiny)) return k;
    if (p !== k) {
      const rk = k * n;
      const rp = p * n;
      for (let j = 0; j < n; j++) {
        const t = a[rk + j];
        a[rk + j] = a[rp + j];
        a[rp + j] = t;
      }
    }
    const rk = k * n;
    const inv = 1 / a[rk + k];
    for (let i = k + 1; i < n; i++) {
      const ri = i * n;
      const f = a[ri + k] * inv;
      if (f === 0) continue;
      a[ri + k] = f;
      for (let j = k + 1; j < n; j++) a[ri + j] -= f * a[rk + j];
    }
  }
  return -1;
}

/** Solves A x = b with the factors from `luFactor`; `b` is overwritten by x. */
export function luSolve(a: Float64Array, n: number, pivot: Int32Array, b: Float64Array): void {
  for (let k = 0; k < n; k++) {
    const p = pivot[k];
    if (p !== k) {
      const t = b[k];
      b[k] = b[p];
      b[p] = t;
    }
  }
  for (let i = 1; i < n; i++) {
    const ri = i * n;
    let s = b[i];
    for (let j = 0; j < i; j++) s -= a[ri + j] * b[j];
    b[i] = s;
  }
  for (let i = n - 1; i >= 0; i--) {
    const ri = i * n;
    let s = b[i];
    for (let j = i + 1; j < n; j++) s -= a[ri + j] * b[j];
    b[i] = s / a[ri + i];
  }
}

/** Solves Aᵀ x = b with the factors of A from `luFactor`; `b` is overwritten by x (for adjoint solves). */
export function luSolveTransposed(a: Float64Array, n: number, pivot: Int32Array, b: Float64Array): void {
  // Aᵀ = Uᵀ Lᵀ Pᵀ... with P A = L U:  Aᵀ = Uᵀ Lᵀ P, so solve Uᵀ z = b, Lᵀ w = z, x = Pᵀ w.
  for (let i = 0; i < n; i++) {
    let s = b[i];
    for (let j = 0; j < i; j++) s -= a[j * n + i] * b[j];
    b[i] = s / a[i * n + i];
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = b[i];
    for (let j = i + 1; j < n; j++) s -= a[j * n + i] * b[j];
    b[i] = s;
  }
  for (let k = n - 1; k >= 0; k--) {
    const p = pivot[k];
    if (p !== k) {
      const t = b[k];
      b[k] = b[p];
      b[p] = t;
    }
  }
}

/**
 * Solves A X = B for an n×m row-major right-hand side B (overwritten by X)
 * with the factors from `luFactor`; rows of B are combined whole, so the inner
 * loops run over contiguous memory.
 */
export function luSolveMatrix(a: Float64Array, n: number, pivot: Int32Array, b: Float64Array, m: number): void {
  for (let k = 0; k < n; k++) {
    const p = pivot[k];
    if (p !== k) {
      const rk = k * m;
      const rp = p * m;
      for (let c = 0; c < m; c++) {
        const t = b[rk + c];
        b[rk + c] = b[rp + c];
        b[rp + c] = t;
      }
    }
  }
  for (let i = 1; i < n; i++) {
    const ri = i * m;
    for (let j = 0; j < i; j++) {
      const f = a[i * n + j];
      if (f === 0) continue;
      const rj = j * m;
      for (let c = 0; c < m; c++) b[ri + c] -= f * b[rj + c];
    }
  }
  for (let i = n - 1; i >= 0; i--) {
    const ri = i * m;
    for (let j = i + 1; j < n; j++) {
      const f = a[i * n + j];
      if (f === 0) continue;
      const rj = j * m;
      for (let c = 0; c < m; c++) b[ri + c] -= f * b[rj + c];
    }
    const inv = 1 / a[i * n + i];
    for (let c = 0; c < m; c++) b[ri + c] *= inv;
  }
}
