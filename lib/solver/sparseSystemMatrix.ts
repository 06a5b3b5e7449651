/**
 * The sparsity structure of the Newton and Rosenbrock matrices of a
 * `ChemSystem`, worked out once and reused by every step: the pattern of
 * ∂F/∂x (reaction j couples its reactant unknowns to the unknowns whose net
 * stoichiometry it changes), the diagonal, and the rows a pool total may
 * replace (every member's row gets every member's column, since the replaced
 * member changes as the state moves); the position of every Jacobian term in
 * the loop order of massAction.ts (the entries of amount-dependent reactions,
 * dependentRates.ts, are in the pattern and found by `entryOf`); and a fill-reducing column order
 * (minimumDegree.ts). Rows are kept in compressed-row form for the row
 * scaling of the Newton step and mapped to the compressed columns the LU
 * takes.
 *
 * The structure depends on the mechanism and on which species are unknowns,
 * so it is cached per compiled mechanism (a WeakMap, dropped with it).
 */
import type { CompiledMechanism } from "../mechanism/types";
import type { ChemSystem } from "./buildSystem";
import { minimumDegreeOrder } from "./minimumDegree";
import type { SparsePattern } from "./sparseLu";

export interface SparseSystemMatrix {
  n: number;
  /** entries of the pattern */
  nnz: number;
  /** compressed rows: the columns of row i at colIndex[rowStart[i]..rowStart[i+1]), ascending */
  rowStart: Int32Array;
  colIndex: Int32Array;
  /** row-form entry e sits at cscPosition[e] in the compressed columns of `pattern` */
  cscPosition: Int32Array;
  /** the same pattern in compressed columns (what the LU factorises) */
  pattern: SparsePattern;
  /** row-form entry of (i, i) */
  diagonal: Int32Array;
  /**
   * row-form entry of each term of the Jacobian loops, reaction j's terms from
   * termStart[j]: for each reactant unknown (in order), for each unknown of its
   * net stoichiometry (in order)
   */
  termStart: Int32Array;
  termPosition: Int32Array;
  /** fill-reducing column (and row) order for the LU */
  order: Int32Array;
}

const CACHE = new WeakMap<CompiledMechanism, Map<string, SparseSystemMatrix>>();

/** Row-form entry of (row, col), or −1 when it is not in the pattern. */
export function entryOf(m: SparseSystemMatrix, row: number, col: number): number {
  let lo = m.rowStart[row];
  let hi = m.rowStart[row + 1] - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    const c = m.colIndex[mid];
    if (c === col) return mid;
    if (c < col) lo = mid + 1;
    else hi = mid - 1;
  }
  return -1;
}

/** The structure of this system's matrices (cached per mechanism and set of unknowns). */
export function sparseSystemMatrix(sys: ChemSystem): SparseSystemMatrix {
  const key = `${Array.from(sys.unknownSpecies).join(",")}|${sys.constraints.map((c) => Array.from(c.members).join(",")).join(";")}`;
  let byKey = CACHE.get(sys.mech);
  if (!byKey) {
    byKey = new Map();
    CACHE.set(sys.mech, byKey);
  }
  const hit = byKey.get(key);
  if (hit) return hit;
  const m = build(sys);
  byKey.set(key, m);
  return m;
}

function build(sys: ChemSystem): SparseSystemMatrix {
  const n = sys.n;
  const rows: Set<number>[] = Array.from({ length: n }, (_, i) => new Set([i]));
  const { rStart, rUnknown, sStart, sUnknown } = sys;
  for (let j = 0; j < sys.nReactions; j++) {
    for (let q = rStart[j]; q < rStart[j + 1]; q++) {
      const l = rUnknown[q];
      for (let s = sStart[j]; s < sStart[j + 1]; s++) rows[sUnknown[s]].add(l);
    }
  }
  // a reaction whose γ depends on amounts (dependentRates.ts) also couples its species to those amounts
  for (const d of sys.dependent) {
    for (const sp of d.species) {
      const l = sys.unknownOf[sp];
      if (l < 0) continue;
      for (let s = sStart[d.reaction]; s < sStart[d.reaction + 1]; s++) rows[sUnknown[s]].add(l);
    }
  }
  for (const c of sys.constraints) for (const a of c.members) for (const b of c.members) rows[a].add(b);

  const rowStart = new Int32Array(n + 1);
  for (let i = 0; i < n; i++) rowStart[i + 1] = rowStart[i] + rows[i].size;
  const nnz = rowStart[n];
  const colIndex = new Int32Array(nnz);
  for (let i = 0; i < n; i++) colIndex.set(Int32Array.from(rows[i]).sort(), rowStart[i]);

  const colCount = new Int32Array(n + 1);
  for (let e = 0; e < nnz; e++) colCount[colIndex[e] + 1]++;
  const colStart = new Int32Array(n + 1);
  for (let j = 0; j < n; j++) colStart[j + 1] = colStart[j] + colCount[j + 1];
  const fill = colStart.slice(0, n);
  const rowIndex = new Int32Array(nnz);
  const cscPosition = new Int32Array(nnz);
  for (let i = 0; i < n; i++) {
    for (let e = rowStart[i]; e < rowStart[i + 1]; e++) {
      const p = fill[colIndex[e]]++;
      rowIndex[p] = i;
      cscPosition[e] = p;
    }
  }

  const m: SparseSystemMatrix = {
    n,
    nnz,
    rowStart,
    colIndex,
    cscPosition,
    pattern: { n, colStart, rowIndex },
    diagonal: new Int32Array(n),
    termStart: new Int32Array(sys.nReactions + 1),
    termPosition: new Int32Array(0),
    order: minimumDegreeOrder(n, colStart, rowIndex),
  };
  for (let i = 0; i < n; i++) m.diagonal[i] = entryOf(m, i, i);
  let terms = 0;
  for (let j = 0; j < sys.nReactions; j++) {
    m.termStart[j] = terms;
    terms += (rStart[j + 1] - rStart[j]) * (sStart[j + 1] - sStart[j]);
  }
  m.termStart[sys.nReactions] = terms;
  const termPosition = new Int32Array(terms);
  let t = 0;
  for (let j = 0; j < sys.nReactions; j++) {
    for (let q = rStart[j]; q < rStart[j + 1]; q++) {
      for (let s = sStart[j]; s < sStart[j + 1]; s++) termPosition[t++] = entryOf(m, sUnknown[s], rUnknown[q]);
    }
  }
  m.termPosition = termPosition;
  return m;
}
