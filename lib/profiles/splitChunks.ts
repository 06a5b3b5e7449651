/** Splits 0…n−1 into `parts` contiguous runs of near-equal length (the first ones one longer). */
export function splitChunks(n: number, parts: number): number[][] {
  const k = Math.max(1, Math.min(Math.floor(parts), n));
  const out: number[][] = [];
  let start = 0;
  for (let c = 0; c < k; c++) {
    const len = Math.floor(n / k) + (c < n % k ? 1 : 0);
    out.push(Array.from({ length: len }, (_, i) => start + i));
    start += len;
  }
  return out.filter((c) => c.length > 0);
}
