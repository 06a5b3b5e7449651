import { describe, expect, test } from "vitest";
import { formatAnswer, formatMixingRatio, formatTolerance, sheetConditions } from "@/lib/assessment";
import { fakeResult } from "./fakeAnalysis";

// Invented resolved conditions from fakeAnalysis.ts; these tests check what is printed, not chemistry.

describe("formatMixingRatio", () => {
  test("prints a mixing ratio in the unit that keeps it between 0.1 and 1000", () => {
    expect(formatMixingRatio(3.4e-9)).toBe("3.40 ppbv");
    expect(formatMixingRatio(2e-11)).toBe("20.0 pptv");
    expect(formatMixingRatio(5e-6)).toBe("5.00 ppmv");
    expect(formatMixingRatio(0.21)).toBe("21.0 %");
    expect(formatMixingRatio(0)).toBe("0");
  });
});

describe("sheetConditions", () => {
  test("prints what the variant sets and the temperature and pressure it resolves to, with units", () => {
    const c = { altitude_km: 32, latitude_deg: -30, localSolarTime_h: 9.5, poolTotals: { Cly: 2.6e-9 } };
    const rows = sheetConditions(c, fakeResult({ mechanismId: "invented", condition: c }).condition);
    const at = (label: string) => rows.find((r) => r.label === label)?.value;
    expect(at("Altitude")).toBe("32.0 km");
    expect(at("Latitude")).toBe("30° S");
    expect(at("Local solar time")).toBe("09:30");
    expect(at("Temperature")).toMatch(/^\d+ K \(standard atmosphere\)$/);
    expect(at("Pressure")).toMatch(/ hPa \(standard atmosphere\)$/);
    expect(at("Total Cly")).toBe("2.60 ppbv");
  });

  test("prints a given zenith angle instead of place and time, and every override", () => {
    const c = {
      altitude_km: 40,
      zenith_deg: 60,
      T_K: 250,
      jScale: 0.5,
      held: { H2O: 5e-6 },
      J: { O2: 1e-9 },
      mode: "diurnal" as const,
      ozone: "solved" as const,
    };
    const rows = sheetConditions(c, fakeResult({ mechanismId: "invented", condition: c }).condition);
    const labels = rows.map((r) => r.label);
    expect(labels).not.toContain("Latitude");
    expect(rows.find((r) => r.label === "Solar zenith angle")?.value).toBe("60.0°");
    expect(rows.find((r) => r.label === "Temperature")?.value).toBe("250 K");
    expect(rows.find((r) => r.label === "H2O (held)")?.value).toBe("5.00 ppmv");
    expect(rows.find((r) => r.label === "J(O2)")?.value).toBe("1.00e-9 s⁻¹");
    expect(labels).toEqual(expect.arrayContaining(["Photolysis scaled by", "Averaging", "Ozone"]));
  });
});

describe("formatAnswer and formatTolerance", () => {
  test("print numbers to three significant figures with their unit, and named answers with their letter", () => {
    expect(formatAnswer(1216.876, "turnovers")).toBe("1220 turnovers");
    expect(formatAnswer(0.0123456, "dimensionless")).toBe("0.0123");
    expect(formatAnswer("Cl2", "", [{ letter: "b", value: "Cl2", text: "ClO + O → Cl + O2" }])).toBe(
      "(b) ClO + O → Cl + O2",
    );
    expect(formatTolerance({ kind: "relative", rel: 0.05 }, "dimensionless")).toBe("± 5.00 %");
    expect(formatTolerance({ kind: "absolute", abs: 2 }, "percentage points")).toBe("± 2.00 percentage points");
    expect(formatTolerance({ kind: "exact" }, "")).toBe("exact");
  });
});
