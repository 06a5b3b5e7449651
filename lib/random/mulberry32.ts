/**
 * mulberry32: a 32-bit-state pseudo-random generator by Tommy Ettinger
 * (2017, public domain). Period 2³², good enough to draw a handful of
 * classroom conditions; not for cryptography. Returns floats in [0, 1).
 */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
