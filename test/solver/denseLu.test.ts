/**
 * The dense LU with partial pivoting (lib/solver/denseLu.ts) on seeded random
 * matrices: the identity P·A = L·U (Golub & Van Loan, "Matrix Computations",
 * 4th ed., Theorem 3.4.1), |L| ≤ 1 below the diagonal (the defining property
 * of partial pivoting, same source, §3.4.3), and the residuals of the three
 * solves. Expected values are exact identities, so no outside source applies
 * beyond the theorems named.
 */
import { describe, expect, it } from "vitest";
import { mulberry32 } from "@/lib/random";
import { luFactor, luSolve, luSolveMatrix, luSolveTransposed } from "@/lib/solver/denseLu";
import { expectClose } from "../helpers/close";

/** An n×n row-major matrix with entries uniform in (−1, 1). */
function randomMatrix(n: number, seed: number): Float64Array {
  const rand = mulberry32(seed);
  return Float64Array.from({ length: n * n }, () => rand() * 2 - 1);
}

/** Row-major A with the factorisation's row interchanges applied in order: P·A. */
function permuted(a: Float64Array, n: number, pivot: Int32Array): Float64Array {
  const pa = Float64Array.from(a);
  for (let k = 0; k < n; k++) {
    const p = pivot[k];
    if (p === k) continue;
    for (let j = 0; j < n; j++) {
      const t = pa[k * n + j];
      pa[k * n + j] = pa[p * n + j];
      pa[p * n + j] = t;
    }
  }
  return pa;
}

/** L·U from the packed factors (L unit lower below the diagonal, U on and above it). */
function multiplyFactors(f: Float64Array, n: number): Float64Array {
  const out = new Float64Array(n * n);
  for (let i = 0; i < n; i++)
    for (let j = 0; j < n; j++) {
      let s = 0;
      for (let k = 0; k <= Math.min(i, j); k++) s += (k === i ? 1 : f[i * n + k]) * f[k * n + j];
      out[i * n + j] = s;
    }
  return out;
}

function factorised(a: Float64Array, n: number) {
  const f = Float64Array.from(a);
  const pivot = new Int32Array(n);
  const bad = luFactor(f, n, pivot);
  return { f, pivot, bad };
}

const CASES = [
  { n: 1, seed: 1 },
  { n: 2, seed: 2 },
  { n: 7, seed: 3 },
  { n: 24, seed: 4 },
  { n: 60, seed: 5 },
];

describe("luFactor", () => {
  for (const { n, seed } of CASES) {
    it(`factorises a random ${n}×${n} matrix (seed ${seed}) so that P·A = L·U, with |L| ≤ 1`, () => {
      const a = randomMatrix(n, seed);
      const { f, pivot, bad } = factorised(a, n);
      expect(bad).toBe(-1);
      const pa = permuted(a, n, pivot);
      const lu = multiplyFactors(f, n);
      // backward error of LU with partial pivoting: a small multiple of n·ε·max|A| for random matrices
      for (let i = 0; i < n * n; i++)
        expectClose(lu[i], pa[i], { abs: 1e-13 * n }, `(P·A)[${Math.floor(i / n)},${i % n}]`);
      for (let i = 0; i < n; i++) for (let j = 0; j < i; j++) expect(Math.abs(f[i * n + j])).toBeLessThanOrEqual(1);
      for (let k = 0; k < n; k++) expect(pivot[k]).toBeGreaterThanOrEqual(k);
    });
  }

  it("picks the largest entry of the column as the pivot: a zero in the corner needs a row interchange", () => {
    const a = Float64Array.from([0, 1, 2, 3]);
    const { f, pivot, bad } = factorised(a, 2);
    expect(bad).toBe(-1);
    expect(Array.from(pivot)).toEqual([1, 1]);
    // P·A = [[2, 3], [0, 1]]: L = I, U = P·A, exactly
    expect(Array.from(f)).toEqual([2, 3, 0, 1]);
  });

  it("reports a singular matrix by the elimination step where no pivot is left, instead of dividing by zero", () => {
    // row 3 = row 1 + row 2: rank 2, so the third step has nothing to pivot on
    const a = Float64Array.from([1, 2, 3, 4, 5, 6, 5, 7, 9]);
    const { f, bad } = factorised(a, 3);
    expect(bad).toBe(2);
    expect(Array.from(f).every(Number.isFinite)).toBe(true);
    // a zero column at step 1
    expect(factorised(Float64Array.from([1, 0, 0, 2, 0, 0, 3, 0, 1]), 3).bad).toBe(1);
    // nothing to scale by: the zero matrix fails at step 0, as does a NaN where a pivot is sought
    expect(factorised(new Float64Array(4), 2).bad).toBe(0);
    expect(factorised(Float64Array.from([Number.NaN, 0, 0, 1]), 2).bad).toBe(0);
  });

  it("leaves a NaN off the pivot columns to show in the solution, which callers check (newtonLog.ts)", () => {
    const a = Float64Array.from([1, Number.NaN, 0, 1]);
    const { f, pivot, bad } = factorised(a, 2);
    expect(bad).toBe(-1);
    const b = Float64Array.from([1, 1]);
    luSolve(f, 2, pivot, b);
    expect(Number.isNaN(b[0])).toBe(true);
  });

  it("treats a pivot below singularTolerance × max|A| as singular", () => {
    const a = Float64Array.from([1, 0, 0, 1e-15]);
    expect(factorised(a, 2).bad).toBe(1);
    const f = Float64Array.from(a);
    expect(luFactor(f, 2, new Int32Array(2), 1e-16)).toBe(-1);
  });
});

describe("luSolve, luSolveTransposed and luSolveMatrix", () => {
  const n = 30;
  const a = randomMatrix(n, 77);
  const { f, pivot } = factorised(a, n);
  const rand = mulberry32(78);
  const x = Float64Array.from({ length: n }, () => rand() * 2 - 1);
  const times = (m: Float64Array, v: Float64Array, transposed = false) =>
    Float64Array.from({ length: n }, (_, i) => {
      let s = 0;
      for (let j = 0; j < n; j++) s += (transposed ? m[j * n + i] : m[i * n + j]) * v[j];
      return s;
    });

  it("solves A·x = b back to the x that made b", () => {
    const b = times(a, x);
    luSolve(f, n, pivot, b);
    for (let i = 0; i < n; i++) expectClose(b[i], x[i], { abs: 1e-11 }, `x[${i}]`);
  });

  it("solves Aᵀ·x = b with the factors of A", () => {
    const b = times(a, x, true);
    luSolveTransposed(f, n, pivot, b);
    for (let i = 0; i < n; i++) expectClose(b[i], x[i], { abs: 1e-11 }, `x[${i}]`);
  });

  it("solves A·X = B column by column as luSolve does", () => {
    const m = 3;
    const X = Float64Array.from({ length: n * m }, () => rand() * 2 - 1);
    const B = new Float64Array(n * m);
    for (let c = 0; c < m; c++) {
      const col = times(
        a,
        Float64Array.from({ length: n }, (_, i) => X[i * m + c]),
      );
      for (let i = 0; i < n; i++) B[i * m + c] = col[i];
    }
    luSolveMatrix(f, n, pivot, B, m);
    for (let i = 0; i < n * m; i++) expectClose(B[i], X[i], { abs: 1e-11 }, `X[${Math.floor(i / m)},${i % m}]`);
  });
});
