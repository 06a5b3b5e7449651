import { describe, expect, it } from "vitest";
import { InputError } from "@/lib/errors";
import { parseProfileCsv } from "@/lib/profiles/parseProfileCsv";
import { profileToCsv } from "@/lib/profiles/profileToCsv";
import { standardProfile } from "@/lib/profiles/standardProfile";
import { expectClose } from "../helpers/close";

const SAMPLE = [
  "# title: Invented test profile",
  "# note: made up for the tests",
  "altitude (km),T (K),p (hPa),H2O (ppmv),Cly (ppbv),O3 (cm-3)",
  "20,216.65,55.29,4.5,2.0,4.0e12",
  "25,221.55,25.49,5.0,2.8,",
  "30,226.51,11.97,5.5,3.2,3.0e12",
].join("\n");

function errorOf(text: string): InputError {
  try {
    parseProfileCsv(text);
  } catch (e) {
    if (e instanceof InputError) return e;
    throw e;
  }
  throw new Error("expected parseProfileCsv to throw");
}

describe("parseProfileCsv", () => {
  it("reads altitude, T, p, held species and pool totals, converting units on load", () => {
    const p = parseProfileCsv(SAMPLE);
    expect(p.title).toBe("Invented test profile");
    expect(p.note).toBe("made up for the tests");
    expect(p.levels.map((l) => l.altitude_km)).toEqual([20, 25, 30]);
    expect(p.levels[0].T_K).toBe(216.65);
    expect(p.levels[0].p_hPa).toBe(55.29);
    // ppmv = 1e-6 mol/mol, ppbv = 1e-9 (common practice)
    expectClose(p.levels[0].held?.H2O as number, 4.5e-6, { rel: 1e-12 });
    expectClose(p.levels[1].poolTotals?.Cly as number, 2.8e-9, { rel: 1e-12 });
    // cm-3 → mol/mol by [M] = p/(k_B T), k_B = 1.380649e-23 J/K (SI 2019, exact)
    const M = (55.29 * 100) / (1.380649e-23 * 216.65) / 1e6;
    expectClose(p.levels[0].held?.O3 as number, 4.0e12 / M, { rel: 1e-12 });
    expect(p.levels[1].held?.O3).toBeUndefined();
  });

  it("converts every pressure unit to hPa", () => {
    // 1 atm = 1013.25 hPa, 1 Torr = 1/760 atm, 1 mbar = 1 hPa = 100 Pa (definitions, BIPM SI brochure)
    const cases: [string, number, number][] = [
      ["Pa", 5529, 55.29],
      ["hPa", 55.29, 55.29],
      ["mbar", 55.29, 55.29],
      ["atm", 1, 1013.25],
      ["Torr", 760, 1013.25],
      ["kPa", 5.529, 55.29],
    ];
    for (const [unit, value, hPa] of cases) {
      const p = parseProfileCsv(`altitude (km),T (K),p (${unit})\n20,216.65,${value}\n`);
      expectClose(p.levels[0].p_hPa as number, hPa, { rel: 1e-12 }, unit);
    }
  });

  it("accepts altitudes in metres and in decreasing order, and returns them increasing", () => {
    const p = parseProfileCsv("altitude (m),T (K),p (hPa)\n30000,226.5,11.97\n20000,216.65,55.29\n");
    expect(p.levels.map((l) => l.altitude_km)).toEqual([20, 30]);
  });

  it("reads quoted header cells and prefixed pool and held columns", () => {
    const p = parseProfileCsv(
      `"altitude (km)","T (K)","p (hPa)","total:Iy (pptv)","held:NOy (ppbv)"\n20,216.65,55.29,1.5,3\n`,
    );
    // 1.5 pptv and 3 ppbv as mol/mol (unit conversion)
    expectClose(p.levels[0].poolTotals?.Iy as number, 1.5e-12, { rel: 1e-12 }, "total Iy");
    expectClose(p.levels[0].held?.NOy as number, 3e-9, { rel: 1e-12 }, "held NOy");
  });

  it("throws naming the header row when a required column is missing", () => {
    const e = errorOf("altitude (km),T (K),H2O (ppmv)\n20,216.65,4.5\n");
    expect(e.path).toBe("profile.csv row 1 (header)");
    expect(e.message).toContain('missing column "p (hPa)"');
  });

  it("throws naming the row and column of a non-numeric cell", () => {
    const e = errorOf("altitude (km),T (K),p (hPa)\n20,216.65,55.29\n# a comment\n25,warm,25.49\n");
    expect(e.path).toBe('profile.csv row 4, column "T (K)"');
    expect(e.message).toContain('"warm" is not a number');
  });

  it("throws naming the row and column where altitudes stop being monotonic", () => {
    const e = errorOf("altitude (km),T (K),p (hPa)\n20,216.65,55.29\n25,221.55,25.49\n24,221,27\n");
    expect(e.path).toBe('profile.csv row 4, column "altitude (km)"');
    expect(e.message).toMatch(/monotonic/);
    const dup = errorOf("altitude (km),T (K),p (hPa)\n20,216.65,55.29\n20,216.65,55.29\n");
    expect(dup.path).toBe('profile.csv row 3, column "altitude (km)"');
    expect(dup.message).toContain("repeats row 2");
  });

  it("throws naming the column of an unknown or missing unit", () => {
    const e = errorOf("altitude (km),T (K),p (psi)\n20,216.65,0.8\n");
    expect(e.path).toBe('profile.csv row 1, column 3 "p (psi)"');
    expect(e.message).toContain('unknown pressure unit "psi"');
    expect(e.message).toContain("hPa");
    const amount = errorOf("altitude (km),T (K),p (hPa),H2O (g/kg)\n20,216.65,55.29,3\n");
    expect(amount.message).toContain('unknown amount of H2O unit "g/kg"');
    const bare = errorOf("altitude (km),T (K),p\n20,216.65,55.29\n");
    expect(bare.message).toContain("unit in brackets");
    const celsius = errorOf("altitude (km),T (degC),p (hPa)\n20,-56.5,55.29\n");
    expect(celsius.message).toContain('unknown temperature unit "degC"; use one of K');
  });

  it("throws on out-of-range values, short rows, repeated columns and files without data", () => {
    expect(errorOf("altitude (km),T (K),p (hPa)\n20,400,55.29\n").message).toContain("outside 150–350 K");
    expect(errorOf("altitude (km),T (K),p (hPa)\n90,200,0.001\n").path).toBe(
      'profile.csv row 2, column "altitude (km)"',
    );
    expect(errorOf("altitude (km),T (K),p (hPa),H2O (ppmv)\n20,216.65,55.29,2e6\n").message).toContain("outside 0–1");
    expect(errorOf("altitude (km),T (K),p (hPa)\n20,216.65\n").message).toContain(
      "2 cells, but the header (row 1) has 3",
    );
    expect(errorOf("altitude (km),T (K),p (hPa),p (Pa)\n20,216.65,55.29,5529\n").message).toContain(
      'repeats column "p (hPa)"',
    );
    expect(errorOf("altitude (km),T (K),p (hPa)\n").message).toContain("no data rows");
    expect(errorOf("# only a comment\n").message).toContain("no header row");
    expect(errorOf("altitude (km),T (K),p (hPa)\n20,,55.29\n").message).toContain("empty cell");
  });

  it("names the file given in the options in every error", () => {
    expect(() => parseProfileCsv("altitude (km),T (K)\n", { fileName: "tropics.csv" })).toThrow(/^tropics\.csv row 1/);
  });
});

describe("profileToCsv", () => {
  it("round-trips an uploaded profile in its own units", () => {
    const p = parseProfileCsv(SAMPLE);
    const text = profileToCsv(p);
    expect(text.split("\r\n")).toContain("altitude (km),T (K),p (hPa),H2O (ppmv),Cly (ppbv),O3 (cm-3)");
    const q = parseProfileCsv(text);
    expect(q.title).toBe(p.title);
    expect(q.levels.length).toBe(p.levels.length);
    p.levels.forEach((l, i) => {
      const m = q.levels[i];
      expect(m.altitude_km).toBe(l.altitude_km);
      expectClose(m.T_K as number, l.T_K as number, { rel: 1e-14 });
      expectClose(m.p_hPa as number, l.p_hPa as number, { rel: 1e-14 });
      for (const [id, x] of Object.entries(l.held ?? {})) expectClose(m.held?.[id] as number, x, { rel: 1e-12 }, id);
      for (const [id, x] of Object.entries(l.poolTotals ?? {}))
        expectClose(m.poolTotals?.[id] as number, x, { rel: 1e-12 }, id);
      expect(Object.keys(m.held ?? {}).sort()).toEqual(Object.keys(l.held ?? {}).sort());
    });
  });

  it("round-trips a profile without columns through the canonical units", () => {
    const p = { ...parseProfileCsv(SAMPLE), columns: undefined };
    const text = profileToCsv(p);
    expect(text).toContain("altitude (km),T (K),p (hPa),H2O (mol/mol),O3 (mol/mol),Cly (mol/mol)");
    const q = parseProfileCsv(text);
    expect(q.levels[2].held?.O3).toBe(p.levels[2].held?.O3);
    expect(q.levels[1].poolTotals?.Cly).toBe(p.levels[1].poolTotals?.Cly);
  });

  it("writes the default profile from the 1976 standard atmosphere", () => {
    const q = parseProfileCsv(profileToCsv(standardProfile()));
    expect(q.levels.length).toBe(87);
    // U.S. Standard Atmosphere 1976 (docs/references.md, Standard atmosphere, layers): isothermal 216.65 K from 11 to 20 km'; at 20 km
    // geometric (19.937 km' geopotential) p = 5474.89 Pa · exp(34.1632 K/km' · 0.0627 km' / 216.65 K) = 55.29 hPa
    expectClose(q.levels[20].T_K as number, 216.65, { abs: 0.01 });
    expectClose(q.levels[20].p_hPa as number, 55.293, { rel: 2e-4 });
  });
});
