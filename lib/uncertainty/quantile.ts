/**
 * Sample quantile by linear interpolation between order statistics,
 * Q(p) = x₍ₕ₎ + (h − ⌊h⌋)(x₍ₕ₊₁₎ − x₍ₕ₎) with h = (n − 1)p on the sorted
 * sample (Hyndman & Fan, Am. Stat. 50, 361–365, 1996, definition 7; the
 * default of R and NumPy). `sorted` must be ascending and non-empty.
 */
export function quantile(sorted: ArrayLike<number>, p: number): number {
  const n = sorted.length;
  if (n === 0) throw new RangeError("quantile: empty sample");
  if (!(p >= 0 && p <= 1)) throw new RangeError(`quantile: invalid probability ${p}`);
  const h = (n - 1) * p;
  const lo = Math.floor(h);
  const hi = Math.min(n - 1, lo + 1);
  return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
}
