/**
 * Elementary pathways (Lehmann 2004, §"splitting"; the rank test of
 * elementary flux modes, Schuster & Hilgetag 1994 / Klamt et al. 2005):
 * a balanced non-negative flux vector v is elementary iff the stoichiometric
 * rows it must balance, restricted to the columns of its support, have a
 * null space of dimension exactly 1. A non-elementary vector is written as a
 * non-negative sum of elementary ones by the conformal greedy decomposition:
 * find an elementary vector e inside supp(v) (walk along a second null-space
 * direction until a component vanishes, repeat), subtract the largest β·e
 * that keeps v ≥ 0, repeat until v = 0. Each step empties at least one
 * component, so at most |supp v| steps.
 *
 * The null space N (n × d) of the full support is computed once per
 * decomposition by Gaussian elimination in a reused Float64Array; every
 * sub-support S is then handled in the d coordinates of N (the null space of
 * A restricted to S is {N c : (N c)_i = 0 for i ∉ S}), so the work after the
 * first elimination is on d × d systems, d the excess nullity (usually 2–4).
 * Floating point with a relative tolerance; the coefficients are small
 * integers.
 */
import { integerProportional } from "./rational";
import type { SparseVector } from "./sparseVector";

const DEFAULTS = {
  /** pivot and zero tolerance, relative */
  tolerance: 1e-9,
} as const;

/** Reused buffers of the elimination (one per findPathways call): species → row stamps and the dense matrix. */
export interface EliminationWork {
  /** row index of a species in the current matrix, valid where `stamp` equals `epoch` */
  rowOf: Int32Array;
  stamp: Int32Array;
  epoch: number;
  /** dense row-major matrix, grown on demand */
  a: Float64Array;
  pivots: Int32Array;
}

export function eliminationWork(nSpecies: number): EliminationWork {
  return {
    rowOf: new Int32Array(nSpecies),
    stamp: new Int32Array(nSpecies),
    epoch: 0,
    a: new Float64Array(1024),
    pivots: new Int32Array(64),
  };
}

/** Fills work.a with the rows `isRow` of the columns' nets; returns the shape. */
function fill(
  columns: ArrayLike<number>,
  nets: SparseVector[],
  isRow: (species: number) => boolean,
  work: EliminationWork,
): { m: number; n: number } {
  const epoch = ++work.epoch;
  const n = columns.length;
  let m = 0;
  for (let c = 0; c < n; c++) {
    const idx = nets[columns[c]].idx;
    for (let t = 0; t < idx.length; t++) {
      const s = idx[t];
      if (work.stamp[s] === epoch) continue;
      work.stamp[s] = epoch;
      work.rowOf[s] = isRow(s) ? m++ : -1;
    }
  }
  if (work.a.length < m * n) work.a = new Float64Array(2 * m * n);
  if (work.pivots.length < n) work.pivots = new Int32Array(2 * n);
  const a = work.a;
  a.fill(0, 0, m * n);
  for (let c = 0; c < n; c++) {
    const net = nets[columns[c]];
    for (let t = 0; t < net.idx.length; t++) {
      const r = work.rowOf[net.idx[t]];
      if (r >= 0) a[r * n + c] = net.val[t];
    }
  }
  return { m, n };
}

/** Reduced row echelon form of the m × n matrix in `a` in place; pivot columns into `pivots`; returns the rank. */
function rref(a: Float64Array, m: number, n: number, pivots: Int32Array): number {
  let row = 0;
  for (let col = 0; col < n && row < m; col++) {
    let best = row;
    let bestAbs = Math.abs(a[row * n + col]);
    for (let r = row + 1; r < m; r++) {
      const v = Math.abs(a[r * n + col]);
      if (v > bestAbs) {
        best = r;
        bestAbs = v;
      }
    }
    if (bestAbs <= DEFAULTS.tolerance) continue;
    if (best !== row)
      for (let c = col; c < n; c++) {
        const t = a[row * n + c];
        a[row * n + c] = a[best * n + c];
        a[best * n + c] = t;
      }
    const p = a[row * n + col];
    for (let c = col; c < n; c++) a[row * n + c] /= p;
    for (let r = 0; r < m; r++) {
      if (r === row) continue;
      const f = a[r * n + col];
      if (f === 0) continue;
      for (let c = col; c < n; c++) a[r * n + c] -= f * a[row * n + c];
      a[r * n + col] = 0;
    }
    pivots[row++] = col;
  }
  return row;
}

/** True when the pathway with support `columns` has no proper balanced sub-pathway (null space of dimension ≤ 1). */
export function isElementary(
  columns: ArrayLike<number>,
  nets: SparseVector[],
  isRow: (species: number) => boolean,
  work: EliminationWork,
): boolean {
  if (columns.length <= 1) return true;
  const { m, n } = fill(columns, nets, isRow, work);
  if (m < n - 1) return false; // rank ≤ m < n − 1
  return n - rref(work.a, m, n, work.pivots) <= 1;
}

/** Null-space basis of the support, as d column vectors of length n (free-variable form: 1 at its free column). */
function nullBasis(
  columns: ArrayLike<number>,
  nets: SparseVector[],
  isRow: (s: number) => boolean,
  work: EliminationWork,
): Float64Array[] {
  const { m, n } = fill(columns, nets, isRow, work);
  const rank = rref(work.a, m, n, work.pivots);
  const isPivot = new Uint8Array(n);
  for (let r = 0; r < rank; r++) isPivot[work.pivots[r]] = 1;
  const basis: Float64Array[] = [];
  for (let f = 0; f < n; f++) {
    if (isPivot[f]) continue;
    const w = new Float64Array(n);
    w[f] = 1;
    for (let r = 0; r < rank; r++) w[work.pivots[r]] = -work.a[r * n + f];
    basis.push(w);
  }
  return basis;
}

/**
 * Basis (in the d coordinates of `basis`) of the vectors Σ c_k basis_k that
 * vanish outside `inside` (a mask over the n components).
 */
function restrictedCoordinates(basis: Float64Array[], inside: Uint8Array): Float64Array[] {
  const d = basis.length;
  const n = inside.length;
  const rows: number[] = [];
  for (let i = 0; i < n; i++) if (!inside[i]) rows.push(i);
  const m = rows.length;
  const a = new Float64Array(Math.max(1, m * d));
  rows.forEach((i, r) => {
    for (let k = 0; k < d; k++) a[r * d + k] = basis[k][i];
  });
  const pivots = new Int32Array(d);
  const rank = rref(a, m, d, pivots);
  const isPivot = new Uint8Array(d);
  for (let r = 0; r < rank; r++) isPivot[pivots[r]] = 1;
  const out: Float64Array[] = [];
  for (let f = 0; f < d; f++) {
    if (isPivot[f]) continue;
    const c = new Float64Array(d);
    c[f] = 1;
    for (let r = 0; r < rank; r++) c[pivots[r]] = -a[r * d + f];
    out.push(c);
  }
  return out;
}

function combine(basis: Float64Array[], c: Float64Array, n: number): Float64Array {
  const v = new Float64Array(n);
  for (let k = 0; k < basis.length; k++) {
    const ck = c[k];
    if (ck === 0) continue;
    const b = basis[k];
    for (let i = 0; i < n; i++) v[i] += ck * b[i];
  }
  return v;
}

function proportional(u: Float64Array, w: Float64Array): boolean {
  let ratio = Number.NaN;
  for (let i = 0; i < u.length; i++) {
    const zu = Math.abs(u[i]) <= DEFAULTS.tolerance;
    const zw = Math.abs(w[i]) <= DEFAULTS.tolerance;
    if (zu && zw) continue;
    if (zu || zw) return false;
    const r = w[i] / u[i];
    if (Number.isNaN(ratio)) ratio = r;
    else if (Math.abs(r - ratio) > DEFAULTS.tolerance * Math.max(1, Math.abs(ratio)) * 1e3) return false;
  }
  return true;
}

/** One elementary vector inside the support of the balanced vector `v` (≥ 0, in the span of `basis`). */
function elementaryInside(v: Float64Array, basis: Float64Array[]): Float64Array | null {
  const n = v.length;
  let u = v;
  for (let guard = 0; guard <= n; guard++) {
    let scale = 0;
    for (let i = 0; i < n; i++) scale = Math.max(scale, u[i]);
    const inside = new Uint8Array(n);
    for (let i = 0; i < n; i++) if (u[i] > DEFAULTS.tolerance * scale) inside[i] = 1;
    const coords = restrictedCoordinates(basis, inside);
    if (coords.length <= 1) {
      const e = new Float64Array(n);
      for (let i = 0; i < n; i++) if (inside[i]) e[i] = u[i];
      return e;
    }
    let w: Float64Array | undefined;
    for (const c of coords) {
      const cand = combine(basis, c, n);
      if (!proportional(u, cand)) {
        w = cand;
        break;
      }
    }
    if (!w) return null;
    if (!w.some((x) => x > DEFAULTS.tolerance)) for (let i = 0; i < n; i++) w[i] = -w[i];
    let t = Number.POSITIVE_INFINITY;
    for (let i = 0; i < n; i++) if (inside[i] && w[i] > DEFAULTS.tolerance) t = Math.min(t, u[i] / w[i]);
    const next = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      if (!inside[i]) continue;
      const x = u[i] - t * w[i];
      next[i] = x > DEFAULTS.tolerance * scale ? x : 0;
    }
    u = next;
  }
  return null;
}

/**
 * Decomposes the flux vector `flux` (per entry of `columns`, molecules cm⁻³ s⁻¹
 * through each reaction) into elementary pathways: integer multiplicities
 * aligned with `columns` and a rate. Returns null when the decomposition fails
 * (non-rational ratios), in which case the caller keeps the pathway whole.
 */
export function decomposeElementary(
  flux: number[],
  columns: number[],
  nets: SparseVector[],
  isRow: (species: number) => boolean,
  work: EliminationWork,
): { multiplicity: number[]; rate: number }[] | null {
  const basis = nullBasis(columns, nets, isRow, work);
  const out: { multiplicity: number[]; rate: number }[] = [];
  let v = Float64Array.from(flux);
  const scale = Math.max(...flux);
  for (let guard = 0; guard <= flux.length; guard++) {
    if (!v.some((x) => x > DEFAULTS.tolerance * scale)) return out;
    const e = elementaryInside(v, basis);
    if (!e) return null;
    const ints = integerProportional(Array.from(e));
    if (!ints) return null;
    let beta = Number.POSITIVE_INFINITY;
    ints.forEach((m, i) => {
      if (m > 0) beta = Math.min(beta, v[i] / m);
    });
    out.push({ multiplicity: ints, rate: beta });
    v = v.map((x, i) => {
      const y = x - beta * ints[i];
      return y > DEFAULTS.tolerance * scale ? y : 0;
    });
  }
  return v.some((x) => x > DEFAULTS.tolerance * scale) ? null : out;
}
