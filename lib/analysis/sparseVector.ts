/**
 * Sorted sparse vectors (index → value) and the one operation the pathway
 * algebra needs: a·x + c·y with exact cancellation of small integers.
 */

export interface SparseVector {
  /** strictly increasing indices */
  idx: number[];
  val: number[];
}

/** Values this close to an integer are snapped to it; smaller magnitudes are dropped. */
const SNAP = 1e-9;

/** `v` snapped to the nearest integer when within SNAP of it. */
export function snap(v: number): number {
  const r = Math.round(v);
  return Math.abs(v - r) <= SNAP * Math.max(1, Math.abs(v)) ? r : v;
}

/** a·x + c·y, entries that cancel removed. */
export function axpy(a: number, x: SparseVector, c: number, y: SparseVector): SparseVector {
  const idx: number[] = [];
  const val: number[] = [];
  let i = 0;
  let j = 0;
  while (i < x.idx.length || j < y.idx.length) {
    const xi = i < x.idx.length ? x.idx[i] : Number.POSITIVE_INFINITY;
    const yj = j < y.idx.length ? y.idx[j] : Number.POSITIVE_INFINITY;
    let k: number;
    let v: number;
    if (xi === yj) {
      k = xi;
      v = a * x.val[i++] + c * y.val[j++];
    } else if (xi < yj) {
      k = xi;
      v = a * x.val[i++];
    } else {
      k = yj;
      v = c * y.val[j++];
    }
    v = snap(v);
    if (v !== 0) {
      idx.push(k);
      val.push(v);
    }
  }
  return { idx, val };
}

/** Value at index `k` (0 when absent), by binary search. */
export function valueAt(x: SparseVector, k: number): number {
  let lo = 0;
  let hi = x.idx.length - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    const m = x.idx[mid];
    if (m === k) return x.val[mid];
    if (m < k) lo = mid + 1;
    else hi = mid - 1;
  }
  return 0;
}

/** Σ weight[idx]·val. */
export function weightedSum(x: SparseVector, weight: ArrayLike<number>): number {
  let s = 0;
  for (let i = 0; i < x.idx.length; i++) s += weight[x.idx[i]] * x.val[i];
  return s;
}
