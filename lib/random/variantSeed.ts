/**
 * Seed of variant n (attempt a) from the assessment seed, by the 32-bit
 * finaliser of MurmurHash3 (fmix32, Austin Appleby, public domain) applied to
 * the seed mixed with odd multiples of n and a: neighbouring variants get
 * unrelated seeds, and the same inputs always give the same seed.
 */

/** MurmurHash3's fmix32 avalanche step on an unsigned 32-bit integer. */
export function fmix32(h: number): number {
  let x = h >>> 0;
  x ^= x >>> 16;
  x = Math.imul(x, 0x85ebca6b);
  x ^= x >>> 13;
  x = Math.imul(x, 0xc2b2ae35);
  x ^= x >>> 16;
  return x >>> 0;
}

/** Unsigned 32-bit seed of variant `number` (1-based) at redraw `attempt` (0-based). */
export function variantSeed(assessmentSeed: number, number: number, attempt = 0): number {
  if (!Number.isInteger(assessmentSeed) || assessmentSeed < 0 || assessmentSeed > 0xffffffff)
    throw new RangeError(`variantSeed: invalid seed ${assessmentSeed}: expected an integer 0–4294967295`);
  if (!Number.isInteger(number) || number < 1) throw new RangeError(`variantSeed: invalid variant number ${number}`);
  if (!Number.isInteger(attempt) || attempt < 0) throw new RangeError(`variantSeed: invalid attempt ${attempt}`);
  return fmix32((fmix32(assessmentSeed) + Math.imul(number, 0x9e3779b1) + Math.imul(attempt, 0x27d4eb2f)) >>> 0);
}
