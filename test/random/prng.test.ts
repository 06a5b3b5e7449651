import { describe, expect, test } from "vitest";
import { fmix32, mulberry32, variantSeed } from "@/lib/random";

// Independent re-implementations of the published C code in BigInt arithmetic (mod 2³²), used only as test oracles.
// mulberry32: Tommy Ettinger, 2017 (public domain). fmix32: MurmurHash3 finaliser, Austin Appleby (public domain).
const M32 = (1n << 32n) - 1n;
function mulberry32Reference(seed: number): () => number {
  let x = BigInt(seed >>> 0);
  return () => {
    x = (x + 0x6d2b79f5n) & M32;
    let z = x;
    z = ((z ^ (z >> 15n)) * (z | 1n)) & M32;
    z = (z ^ (z + (((z ^ (z >> 7n)) * (z | 61n)) & M32))) & M32;
    return Number(z ^ (z >> 14n)) / 2 ** 32;
  };
}
function fmix32Reference(h: number): number {
  let x = BigInt(h >>> 0);
  x ^= x >> 16n;
  x = (x * 0x85ebca6bn) & M32;
  x ^= x >> 13n;
  x = (x * 0xc2b2ae35n) & M32;
  x ^= x >> 16n;
  return Number(x);
}

describe("mulberry32", () => {
  test("agrees with a BigInt re-implementation of the published C code for 1000 draws from several seeds", () => {
    for (const seed of [0, 1, 42, 0xdeadbeef, 0xffffffff]) {
      const a = mulberry32(seed);
      const b = mulberry32Reference(seed);
      for (let i = 0; i < 1000; i++) expect(a()).toBe(b());
    }
  });

  test("gives the same stream for the same seed and a different one for another seed", () => {
    const a = mulberry32(7);
    const b = mulberry32(7);
    const c = mulberry32(8);
    const sa = Array.from({ length: 20 }, a);
    expect(Array.from({ length: 20 }, b)).toEqual(sa);
    expect(Array.from({ length: 20 }, c)).not.toEqual(sa);
  });

  test("draws in [0, 1) and passes a chi-square test of uniformity over 10 bins", () => {
    const next = mulberry32(2026);
    const bins = new Array(10).fill(0);
    const n = 20_000;
    let lo = 1;
    let hi = 0;
    for (let i = 0; i < n; i++) {
      const u = next();
      lo = Math.min(lo, u);
      hi = Math.max(hi, u);
      bins[Math.floor(u * 10)]++;
    }
    expect(lo).toBeGreaterThanOrEqual(0);
    expect(hi).toBeLessThan(1);
    const chi2 = bins.reduce((s, k) => s + (k - n / 10) ** 2 / (n / 10), 0);
    // 21.67 is the 0.99 quantile of chi-square with 9 degrees of freedom (standard statistical tables).
    expect(chi2).toBeLessThan(21.67);
  });
});

describe("variantSeed", () => {
  test("fmix32 agrees with a BigInt re-implementation of the MurmurHash3 finaliser", () => {
    for (const h of [0, 1, 2, 12345, 0x80000000, 0xffffffff]) expect(fmix32(h)).toBe(fmix32Reference(h));
  });

  test("is reproducible and gives distinct seeds to 40 variants × 6 draws", () => {
    const seeds = new Set<number>();
    for (let n = 1; n <= 40; n++)
      for (let a = 0; a < 6; a++) {
        const s = variantSeed(123456789, n, a);
        expect(s).toBe(variantSeed(123456789, n, a));
        expect(Number.isInteger(s) && s >= 0 && s <= 0xffffffff).toBe(true);
        seeds.add(s);
      }
    expect(seeds.size).toBe(240);
  });

  test("gives different seeds for different assessment seeds", () => {
    expect(variantSeed(1, 1)).not.toBe(variantSeed(2, 1));
  });

  test("throws if the seed, the variant number or the attempt is invalid", () => {
    expect(() => variantSeed(-1, 1)).toThrow(/variantSeed: invalid seed/);
    expect(() => variantSeed(2 ** 32, 1)).toThrow(/invalid seed/);
    expect(() => variantSeed(1.5, 1)).toThrow(/invalid seed/);
    expect(() => variantSeed(1, 0)).toThrow(/invalid variant number/);
    expect(() => variantSeed(1, 1, -1)).toThrow(/invalid attempt/);
  });
});
