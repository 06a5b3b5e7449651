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
  /** buffers of the current decomposition, grown on demand */
  split: Split;
}

export function eliminationWork(nSpecies: number): EliminationWork {
  return {
    rowOf: new Int32Array(nSpecies),
    stamp: new Int32Array(nSpecies),
    epoch: 0,
    a: new Float64Array(1024),
    pivots: new Int32Array(64),
    split: {
      n: 0,
      d: 0,
      basis: new Float64Array(0),
      r: new Float64Array(0),
      rPivots: new Int32Array(0),
      isPivot: new Uint8Array(0),
      inside: new Uint8Array(0),
      coords: new Float64Array(0),
      cand: new Float64Array(0),
      u: new Float64Array(0),
    },
  };
}

/** Fills work.a with the rows `isRow` of the columns' nets; returns the shape. */
function fill(
  columns: ArrayLike<number>,
  nets: readonly SparseVector[],
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
  nets: readonly SparseVector[],
  isRow: (species: number) => boolean,
  work: EliminationWork,
): boolean {
  if (columns.length <= 1) return true;
  const { m, n } = fill(columns, nets, isRow, work);
  if (m < n - 1) return false; // rank ≤ m < n − 1
  return n - rref(work.a, m, n, work.pivots) <= 1;
}

/** Buffers of one decomposition (n columns, d null-space dimensions), allocated once per call. */
interface Split {
  n: number;
  d: number;
  /** null-space basis, d rows of n (free-variable form); every buffer is longer than needed, only n (or d) entries count */
  basis: Float64Array;
  /** restricted system, up to n × d */
  r: Float64Array;
  rPivots: Int32Array;
  isPivot: Uint8Array;
  inside: Uint8Array;
  coords: Float64Array;
  cand: Float64Array;
  u: Float64Array;
}

function nullBasis(
  columns: ArrayLike<number>,
  nets: readonly SparseVector[],
  isRow: (s: number) => boolean,
  work: EliminationWork,
): Split {
  const { m, n } = fill(columns, nets, isRow, work);
  const rank = rref(work.a, m, n, work.pivots);
  const d = n - rank;
  let sp = work.split;
  if (sp.u.length < n || sp.basis.length < d * n || sp.rPivots.length < d) {
    const N = 2 * Math.max(n, 16);
    sp = {
      n: 0,
      d: 0,
      basis: new Float64Array(N * N),
      r: new Float64Array(N * N),
      rPivots: new Int32Array(N),
      isPivot: new Uint8Array(N),
      inside: new Uint8Array(N),
      coords: new Float64Array(N * N),
      cand: new Float64Array(N),
      u: new Float64Array(N),
    };
    work.split = sp;
  }
  sp.n = n;
  sp.d = d;
  const { basis, isPivot } = sp;
  basis.fill(0, 0, d * n);
  isPivot.fill(0, 0, n);
  for (let r = 0; r < rank; r++) isPivot[work.pivots[r]] = 1;
  let k = 0;
  for (let f = 0; f < n; f++) {
    if (isPivot[f]) continue;
    basis[k * n + f] = 1;
    for (let r = 0; r < rank; r++) basis[k * n + work.pivots[r]] = -work.a[r * n + f];
    k++;
  }
  return sp;
}

/**
 * Coordinates (rows of sp.coords, d each) of a basis of the vectors Σ c_k basis_k
 * that vanish outside sp.inside; returns how many.
 */
function restrictedCoordinates(sp: Split): number {
  const { n, d, basis, r, rPivots, isPivot, inside, coords } = sp;
  let m = 0;
  for (let i = 0; i < n; i++) {
    if (inside[i]) continue;
    for (let k = 0; k < d; k++) r[m * d + k] = basis[k * n + i];
    m++;
  }
  const rank = rref(r, m, d, rPivots);
  isPivot.fill(0, 0, d);
  for (let q = 0; q < rank; q++) isPivot[rPivots[q]] = 1;
  let count = 0;
  for (let f = 0; f < d; f++) {
    if (isPivot[f]) continue;
    const row = count * d;
    coords.fill(0, row, row + d);
    coords[row + f] = 1;
    for (let q = 0; q < rank; q++) coords[row + rPivots[q]] = -r[q * d + f];
    count++;
  }
  return count;
}

/** sp.cand = Σ_k coords[row k]·basis_k */
function combine(sp: Split, row: number): Float64Array {
  const { n, d, basis, coords, cand } = sp;
  cand.fill(0, 0, n);
  for (let k = 0; k < d; k++) {
    const ck = coords[row * d + k];
    if (ck === 0) continue;
    for (let i = 0; i < n; i++) cand[i] += ck * basis[k * n + i];
  }
  return cand;
}

function proportional(u: Float64Array, w: Float64Array, n: number): boolean {
  let ratio = Number.NaN;
  for (let i = 0; i < n; i++) {
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

/** One elementary vector inside the support of the balanced vector `v` (≥ 0, in the span of the basis), in sp.u. */
function elementaryInside(v: number[], sp: Split): Float64Array | null {
  const { n, u, inside } = sp;
  for (let i = 0; i < n; i++) u[i] = v[i];
  for (let guard = 0; guard <= n; guard++) {
    let scale = 0;
    for (let i = 0; i < n; i++) scale = Math.max(scale, u[i]);
    for (let i = 0; i < n; i++) {
      inside[i] = u[i] > DEFAULTS.tolerance * scale ? 1 : 0;
      if (!inside[i]) u[i] = 0;
    }
    const count = restrictedCoordinates(sp);
    if (count <= 1) return u;
    let w: Float64Array | undefined;
    for (let row = 0; row < count && !w; row++) {
      const cand = combine(sp, row);
      if (!proportional(u, cand, n)) w = cand;
    }
    if (!w) return null;
    let anyPositive = false;
    for (let i = 0; i < n; i++) if (w[i] > DEFAULTS.tolerance) anyPositive = true;
    if (!anyPositive) for (let i = 0; i < n; i++) w[i] = -w[i];
    let t = Number.POSITIVE_INFINITY;
    for (let i = 0; i < n; i++) if (inside[i] && w[i] > DEFAULTS.tolerance) t = Math.min(t, u[i] / w[i]);
    for (let i = 0; i < n; i++) {
      if (!inside[i]) continue;
      const x = u[i] - t * w[i];
      u[i] = x > DEFAULTS.tolerance * scale ? x : 0;
    }
  }
  return null;
}

/**
 * Null space of dimension 2: the non-negative vectors N c form a pointed
 * planar cone around v, whose two boundary rays are the only elementary
 * vectors inside supp(v), and v is their unique positive combination (the
 * greedy decomposition gives the same two). With c(θ) = cos θ ĉ_v + sin θ q̂
 * (q̂ ⟂ ĉ_v), component i stays ≥ 0 for θ between atan2(α_i, −β_i) − π and
 * atan2(α_i, −β_i), α_i = N_i·ĉ_v > 0, β_i = N_i·q̂; the rays are the tightest bounds.
 */
function decomposePlanar(flux: number[], sp: Split): { multiplicity: number[]; rate: number }[] | null {
  const { n, basis } = sp;
  // coordinates of v: the value at each basis vector's free column (1 there, 0 at the other's)
  let f0 = -1;
  let f1 = -1;
  for (let i = 0; i < n; i++) {
    if (basis[i] === 1 && basis[n + i] === 0 && f0 < 0) f0 = i;
    else if (basis[n + i] === 1 && basis[i] === 0 && f1 < 0) f1 = i;
  }
  if (f0 < 0 || f1 < 0) return null;
  const c0 = flux[f0];
  const c1 = flux[f1];
  const len = Math.hypot(c0, c1);
  const p0 = c0 / len;
  const p1 = c1 / len;
  let hi = Math.PI;
  let lo = -Math.PI;
  for (let i = 0; i < n; i++) {
    const a0 = basis[i];
    const a1 = basis[n + i];
    const alpha = a0 * p0 + a1 * p1;
    const beta = -a0 * p1 + a1 * p0;
    if (!(alpha > 0)) return null;
    const up = Math.atan2(alpha, -beta);
    hi = Math.min(hi, up);
    lo = Math.max(lo, up - Math.PI);
  }
  const out: { multiplicity: number[]; rate: number }[] = [];
  const rays: number[][] = [];
  for (const th of [hi, lo]) {
    const e0 = Math.cos(th) * p0 - Math.sin(th) * p1;
    const e1 = Math.cos(th) * p1 + Math.sin(th) * p0;
    const x: number[] = new Array(n);
    let scale = 0;
    for (let i = 0; i < n; i++) {
      x[i] = e0 * basis[i] + e1 * basis[n + i];
      scale = Math.max(scale, x[i]);
    }
    for (let i = 0; i < n; i++) if (!(x[i] > DEFAULTS.tolerance * 1e3 * scale)) x[i] = 0;
    rays.push(x);
  }
  // v = α·r0 + β·r1, solved on the two free columns
  const [r0, r1] = rays;
  const det = r0[f0] * r1[f1] - r0[f1] * r1[f0];
  if (!(Math.abs(det) > 0)) return null;
  const alpha = (flux[f0] * r1[f1] - flux[f1] * r1[f0]) / det;
  const beta = (r0[f0] * flux[f1] - r0[f1] * flux[f0]) / det;
  let scale = 0;
  for (const x of flux) scale = Math.max(scale, x);
  for (const [r, coef] of [
    [r0, alpha],
    [r1, beta],
  ] as const) {
    if (!(coef > 0)) return null;
    const ints = integerProportional(r);
    if (!ints) return null;
    let k = -1;
    for (let i = 0; i < n; i++) if (ints[i] > 0 && (k < 0 || r[i] > r[k])) k = i;
    out.push({ multiplicity: ints, rate: (coef * r[k]) / ints[k] });
  }
  // the two parts must give back the flux
  for (let i = 0; i < n; i++) {
    const back = out[0].rate * out[0].multiplicity[i] + out[1].rate * out[1].multiplicity[i];
    if (Math.abs(back - flux[i]) > 1e-7 * scale) return null;
  }
  return out;
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
  nets: readonly SparseVector[],
  isRow: (species: number) => boolean,
  work: EliminationWork,
): { multiplicity: number[]; rate: number }[] | null {
  const sp = nullBasis(columns, nets, isRow, work);
  if (sp.d === 2) {
    const two = decomposePlanar(flux, sp);
    if (two) return two;
  }
  const out: { multiplicity: number[]; rate: number }[] = [];
  const v = flux.slice();
  let scale = 0;
  for (const x of flux) scale = Math.max(scale, x);
  for (let guard = 0; guard <= flux.length; guard++) {
    let left = false;
    for (let i = 0; i < v.length; i++) if (v[i] > DEFAULTS.tolerance * scale) left = true;
    if (!left) return out;
    const e = elementaryInside(v, sp);
    if (!e) return null;
    const ints = integerProportional(e, sp.n);
    if (!ints) return null;
    let beta = Number.POSITIVE_INFINITY;
    for (let i = 0; i < ints.length; i++) if (ints[i] > 0) beta = Math.min(beta, v[i] / ints[i]);
    out.push({ multiplicity: ints, rate: beta });
    for (let i = 0; i < v.length; i++) {
      const y = v[i] - beta * ints[i];
      v[i] = y > DEFAULTS.tolerance * scale ? y : 0;
    }
  }
  for (let i = 0; i < v.length; i++) if (v[i] > DEFAULTS.tolerance * scale) return null;
  return out;
}
