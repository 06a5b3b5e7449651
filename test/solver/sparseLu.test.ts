/**
 * The sparse LU (lib/solver/sparseLu.ts) and its ordering against the dense
 * LU with partial pivoting (lib/solver/denseLu.ts) on seeded random sparse
 * systems, and the identity A x = b. Expected values are the dense solver's
 * or exact identities, so no outside source applies.
 */
import { describe, expect, it } from "vitest";
import { mulberry32 } from "@/lib/random";
import { luFactor, luSolve } from "@/lib/solver/denseLu";
import { minimumDegreeOrder } from "@/lib/solver/minimumDegree";
import { SparseLu, type SparsePattern } from "@/lib/solver/sparseLu";
import { expectClose } from "../helpers/close";

interface Sparse {
  pattern: SparsePattern;
  values: Float64Array;
  dense: Float64Array;
}

/** An n×n matrix with about `perRow` entries a row, a few dense "hub" rows and columns, and a diagonal of the given weight. */
function randomSparse(n: number, perRow: number, seed: number, diagonalWeight: number, hubs = 0): Sparse {
  const rand = mulberry32(seed);
  const dense = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    dense[i * n + i] = diagonalWeight * (1 + rand());
    for (let k = 0; k < perRow; k++) dense[i * n + Math.floor(rand() * n)] = rand() * 2 - 1;
  }
  for (let h = 0; h < hubs; h++) {
    const c = Math.floor(rand() * n);
    for (let i = 0; i < n; i += 3) {
      dense[i * n + c] = rand() - 0.5;
      dense[c * n + i] = rand() - 0.5;
    }
  }
  return fromDense(dense, n);
}

function fromDense(dense: Float64Array, n: number): Sparse {
  const colStart = new Int32Array(n + 1);
  const rows: number[] = [];
  const vals: number[] = [];
  for (let j = 0; j < n; j++) {
    for (let i = 0; i < n; i++) {
      const v = dense[i * n + j];
      if (v !== 0) {
        rows.push(i);
        vals.push(v);
      }
    }
    colStart[j + 1] = rows.length;
  }
  return { pattern: { n, colStart, rowIndex: Int32Array.from(rows) }, values: Float64Array.from(vals), dense };
}

function denseSolve(a: Float64Array, n: number, b: Float64Array): Float64Array {
  const lu = Float64Array.from(a);
  const pivot = new Int32Array(n);
  expect(luFactor(lu, n, pivot)).toBe(-1);
  const x = Float64Array.from(b);
  luSolve(lu, n, pivot, x);
  return x;
}

function residual(a: Float64Array, n: number, x: Float64Array, b: Float64Array): number {
  let worst = 0;
  for (let i = 0; i < n; i++) {
    let s = -b[i];
    let scale = Math.abs(b[i]);
    for (let j = 0; j < n; j++) {
      s += a[i * n + j] * x[j];
      scale += Math.abs(a[i * n + j] * x[j]);
    }
    worst = Math.max(worst, Math.abs(s) / scale);
  }
  return worst;
}

function order(s: Sparse): Int32Array {
  return minimumDegreeOrder(s.pattern.n, s.pattern.colStart, s.pattern.rowIndex);
}

describe("the sparse LU", () => {
  for (const [n, perRow, weight, hubs, seed] of [
    [40, 3, 4, 0, 1],
    [150, 4, 1, 3, 2],
    [300, 5, 0.05, 5, 3],
    [500, 3, 0, 2, 4],
  ] as const) {
    it(`solves random sparse systems as the dense LU does (n = ${n}, ${perRow} per row, diagonal ×${weight}, ${hubs} hubs)`, () => {
      const s = randomSparse(n, perRow, seed, weight, hubs);
      // weight 0: only the random entries sit on the diagonal, so rows must be interchanged
      if (weight === 0) for (let i = 0; i < n; i++) s.dense[i * n + ((i + 1) % n)] = 1;
      const m = weight === 0 ? fromDense(s.dense, n) : s;
      const b = Float64Array.from({ length: n }, (_, i) => Math.sin(i + 1));
      const lu = new SparseLu(m.pattern, order(m));
      expect(lu.factor(m.values)).toBe(-1);
      const x = Float64Array.from(b);
      lu.solve(x);
      expect(residual(m.dense, n, x, b)).toBeLessThan(1e-12);
      const xd = denseSolve(m.dense, n, b);
      let norm = 0;
      for (const v of xd) norm = Math.max(norm, Math.abs(v));
      for (let i = 0; i < n; i++) expectClose(x[i], xd[i], { abs: 1e-9 * norm }, `x[${i}]`);
    });
  }

  it("refactorises new values on the kept pattern, and agrees with a fresh factorisation", () => {
    const n = 200;
    const a = randomSparse(n, 4, 7, 2, 2);
    const lu = new SparseLu(a.pattern, order(a));
    expect(lu.factorise(a.values)).toBe(-1);
    const rand = mulberry32(8);
    const changed = a.values.map((v) => v * (0.8 + 0.4 * rand()));
    const denseChanged = new Float64Array(n * n);
    for (let j = 0; j < n; j++)
      for (let p = a.pattern.colStart[j]; p < a.pattern.colStart[j + 1]; p++)
        denseChanged[a.pattern.rowIndex[p] * n + j] = changed[p];
    expect(lu.factorise(changed)).toBe(-1);
    expect(lu.refactorisations).toBe(1);
    expect(lu.factorisations).toBe(1);
    const b = Float64Array.from({ length: n }, (_, i) => 1 / (i + 1));
    const x = Float64Array.from(b);
    lu.solve(x);
    expect(residual(denseChanged, n, x, b)).toBeLessThan(1e-12);
  });

  it("factorises afresh when the kept pivot order would divide by a vanishing pivot", () => {
    // [[1, 1], [1, 2]] keeps the diagonal; then a11 → 0 needs a row interchange
    const pattern: SparsePattern = {
      n: 2,
      colStart: Int32Array.from([0, 2, 4]),
      rowIndex: Int32Array.from([0, 1, 0, 1]),
    };
    const lu = new SparseLu(pattern, Int32Array.from([0, 1]));
    expect(lu.factorise(Float64Array.from([1, 1, 1, 2]))).toBe(-1);
    expect(lu.factorise(Float64Array.from([0, 1, 1, 2]))).toBe(-1);
    expect(lu.factorisations).toBe(2);
    const x = Float64Array.from([1, 3]);
    lu.solve(x); // 0·x0 + 1·x1 = 1, x0 + 2·x1 = 3
    expectClose(x[0], 1, { abs: 1e-15 });
    expectClose(x[1], 1, { abs: 1e-15 });
  });

  it("reports the column where a singular matrix breaks down", () => {
    // the second column is twice the first
    const pattern: SparsePattern = {
      n: 2,
      colStart: Int32Array.from([0, 2, 4]),
      rowIndex: Int32Array.from([0, 1, 0, 1]),
    };
    const lu = new SparseLu(pattern, Int32Array.from([0, 1]));
    expect(lu.factor(Float64Array.from([1, 2, 2, 4]))).toBe(1);
    expect(() => lu.solve(new Float64Array(2))).toThrow(/no valid factorisation/);
  });

  it("throws RangeError for a pattern or order of the wrong size", () => {
    const pattern: SparsePattern = { n: 2, colStart: Int32Array.from([0, 1]), rowIndex: Int32Array.from([0]) };
    expect(() => new SparseLu(pattern, Int32Array.from([0, 1]))).toThrow(RangeError);
    const ok: SparsePattern = { n: 1, colStart: Int32Array.from([0, 1]), rowIndex: Int32Array.from([0]) };
    expect(() => new SparseLu(ok, Int32Array.from([0, 1]))).toThrow(RangeError);
  });
});

describe("the minimum-degree order", () => {
  it("is a permutation and leaves a hub joined to every node to the last two", () => {
    // arrow matrix: node 0 is joined to all others, which are joined to nothing else
    const n = 30;
    const dense = new Float64Array(n * n);
    for (let i = 0; i < n; i++) {
      dense[i * n + i] = 4;
      dense[i * n] = 1;
      dense[i] = 1;
    }
    const s = fromDense(dense, n);
    const q = order(s);
    expect([...q].sort((a, b) => a - b)).toEqual(Array.from({ length: n }, (_, i) => i));
    // once only it and one leaf are left, the two tie at degree 1
    expect([...q].indexOf(0)).toBeGreaterThanOrEqual(n - 2);
    // eliminated last, the hub makes no fill: L and U hold exactly the pattern (George & Liu 1989, the arrow example)
    const lu = new SparseLu(s.pattern, q);
    expect(lu.factor(s.values)).toBe(-1);
    expect(lu.factorNonzeros).toBe(s.pattern.colStart[n] + n);
  });

  it("throws RangeError for a row index out of range", () => {
    expect(() => minimumDegreeOrder(2, Int32Array.from([0, 1, 2]), Int32Array.from([0, 5]))).toThrow(RangeError);
  });
});
