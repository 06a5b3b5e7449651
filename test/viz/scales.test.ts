import { describe, expect, it } from "vitest";
import { logScale } from "@/lib/viz/logScale";
import { signedLogScale } from "@/lib/viz/signedLogScale";
import { expectClose } from "../helpers/close";

describe("logScale", () => {
  it("spans whole decades from the smallest to the largest value", () => {
    const s = logScale([3e2, 4e5, 0, -1]);
    expect(s.lo).toBe(1e2);
    expect(s.hi).toBe(1e6);
    expectClose(s.normalize(1e4), 0.5, { abs: 1e-12 });
    expect(s.normalize(1e6)).toBe(1);
  });

  it("cuts the range to the given number of decades below the largest", () => {
    const s = logScale([1e-3, 1e7], { decades: 4 });
    expect(s.lo).toBe(1e3);
    expect(s.normalize(1e-3)).toBe(0);
  });

  it("maps zero, negative and non-finite values to 0", () => {
    const s = logScale([1, 100]);
    expect(s.normalize(0)).toBe(0);
    expect(s.normalize(-5)).toBe(0);
    expect(s.normalize(Number.NaN)).toBe(0);
  });

  it("is monotone", () => {
    const s = logScale([1e2, 1e9]);
    let prev = -1;
    for (let e = 2; e <= 9; e += 0.25) {
      const t = s.normalize(10 ** e);
      expect(t).toBeGreaterThan(prev);
      prev = t;
    }
  });

  it("labels its ticks with powers of ten from the low end to the high end", () => {
    const ticks = logScale([1e2, 1e6]).ticks(5);
    expect(ticks.map((t) => t.label)).toEqual(["10²", "10³", "10⁴", "10⁵", "10⁶"]);
    expect(ticks[0].offset).toBe(0);
    expect(ticks.at(-1)!.offset).toBe(1);
  });

  it("still has a range when all values are equal or absent", () => {
    expect(logScale([]).hi).toBeGreaterThan(logScale([]).lo);
    expect(logScale([5e5, 5e5]).normalize(5e5)).toBeGreaterThan(0);
  });

  it("throws if decades is not positive", () => {
    expect(() => logScale([1], { decades: 0 })).toThrow(/invalid decades/);
  });
});

describe("signedLogScale", () => {
  it("is odd: t(−v) = −t(v)", () => {
    const s = signedLogScale([-1e6, 3e3, 2e5]);
    for (const v of [1e1, 1e3, 5e4, 1e6]) expect(s.normalize(-v) + s.normalize(v)).toBe(0);
  });

  it("leaves the centre at the smallest resolved magnitude and reaches ±1 at the largest", () => {
    const s = signedLogScale([-1e6, 1e2], { decades: 4, floor: 0.2 });
    expect(s.normalize(0)).toBe(0);
    expect(s.normalize(1e6)).toBe(1);
    expect(s.normalize(-1e6)).toBe(-1);
    expectClose(s.normalize(1e2 * 1.0001), 0.2, { abs: 1e-4 }, "just above lo");
  });

  it("places zero in the middle of its ticks", () => {
    const ticks = signedLogScale([-1e4, 1e6]).ticks();
    const zero = ticks.find((t) => t.value === 0)!;
    expect(zero.offset).toBe(0.5);
    const offs = ticks.map((t) => t.offset);
    expect([...offs].sort((a, b) => a - b)).toEqual(offs);
  });

  it("throws if the floor is outside 0–1", () => {
    expect(() => signedLogScale([1], { floor: 1 })).toThrow(/invalid floor/);
  });
});
