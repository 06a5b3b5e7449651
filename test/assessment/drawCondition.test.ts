import { describe, expect, test } from "vitest";
import { drawCondition, formatSignificant, roundToSignificant } from "@/lib/assessment";
import { expectClose } from "../helpers/close";

const base = { altitude_km: 30, latitude_deg: 45, date: "2026-03-20" };

describe("drawCondition", () => {
  test("keeps every drawn field inside its range and on its step", () => {
    for (let seed = 0; seed < 500; seed++) {
      const c = drawCondition(
        base,
        {
          altitude_km: { min: 20, max: 45 },
          localSolarTime_h: { min: 9, max: 15 },
          T_K: { min: 200, max: 260, step: 5 },
        },
        seed,
      );
      expect(c.altitude_km).toBeGreaterThanOrEqual(20);
      expect(c.altitude_km).toBeLessThanOrEqual(45);
      expect(Number.isInteger(c.altitude_km)).toBe(true);
      expect((c.localSolarTime_h as number) * 2).toBe(Math.round((c.localSolarTime_h as number) * 2));
      expect((c.T_K as number) % 5).toBe(0);
      expect(c.latitude_deg).toBe(45);
      expect(c.date).toBe("2026-03-20");
    }
  });

  test("reaches both ends of a range over many seeds", () => {
    const seen = new Set<number>();
    for (let seed = 0; seed < 400; seed++)
      seen.add(drawCondition(base, { altitude_km: { min: 20, max: 24 } }, seed).altitude_km);
    expect([...seen].sort()).toEqual([20, 21, 22, 23, 24]);
  });

  test("gives the same condition for the same seed", () => {
    const ranges = { altitude_km: { min: 20, max: 45 }, poolTotals: { Cly: { min: 1e-9, max: 4e-9 } } };
    expect(drawCondition(base, ranges, 99)).toEqual(drawCondition(base, ranges, 99));
  });

  test("does not change one field's draw when a range is added for another", () => {
    const a = drawCondition(base, { altitude_km: { min: 20, max: 45 } }, 5);
    const b = drawCondition(base, { altitude_km: { min: 20, max: 45 }, T_K: { min: 200, max: 260 } }, 5);
    expect(b.altitude_km).toBe(a.altitude_km);
  });

  test("rounds a drawn pool total to two significant figures inside its range, keeping other pools", () => {
    for (let seed = 0; seed < 200; seed++) {
      const c = drawCondition(
        { ...base, poolTotals: { Bry: 2e-11 } },
        { poolTotals: { Cly: { min: 1.5e-9, max: 3.5e-9 } } },
        seed,
      );
      const cly = c.poolTotals?.Cly as number;
      expect(cly).toBeGreaterThanOrEqual(1.5e-9);
      expect(cly).toBeLessThanOrEqual(3.5e-9);
      expect(roundToSignificant(cly, 2)).toBe(cly);
      expect(c.poolTotals?.Bry).toBe(2e-11);
    }
  });
});

describe("significant figures", () => {
  test("round and print as a reader expects", () => {
    expectClose(roundToSignificant(0.012345, 3), 0.0123, { rel: 1e-12 });
    expect(formatSignificant(12, 3)).toBe("12.0");
    expect(formatSignificant(0.0345678, 3)).toBe("0.0346");
    expect(formatSignificant(3.4567e-7, 3)).toBe("3.46e-7");
    expect(formatSignificant(123456, 3)).toBe("1.23e5");
    expect(formatSignificant(-2.5, 2)).toBe("-2.5");
    expect(formatSignificant(0, 3)).toBe("0");
  });
});
