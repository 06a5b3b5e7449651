import { describe, expect, it } from "vitest";
import { standardAtmosphere, sunsetZenith_deg } from "../../lib/atmosphere";
import { InputError } from "../../lib/errors";
import { actinicFlux, photolysisChannels, photolysisFrequencies } from "../../lib/photolysis";
import { expectClose } from "../helpers/close";

// the shared channel names of the project (team convention)
// biome-ignore format: a compact list reads better
const SHARED = [
  "O2", "O3_O1D", "O3_O", "NO2", "NO3_NO", "NO3_NO2", "N2O5", "HNO3", "HO2NO2", "H2O2", "HOCl", "ClONO2_Cl",
  "ClONO2_ClO", "Cl2O2", "OClO", "Cl2", "HCl", "BrO", "HOBr", "BrONO2_Br", "BrONO2_BrO", "BrCl", "N2O", "H2O", "NO",
  "HCHO_H", "HCHO_H2", "CH3OOH", "CFCl3", "CF2Cl2",
];

const at = (z: number, zenith = 30) =>
  photolysisFrequencies({ altitude_km: z, zenith_deg: zenith, T_K: standardAtmosphere(z).T_K });

/**
 * Typical photolysis frequencies, mid-latitude, moderate sun: Brasseur &
 * Solomon, "Aeronomy of the Middle Atmosphere", 3rd ed. (2005), ch. 4 figures
 * of J against altitude (docs/references.md, Photolysis) — from memory,
 * order of magnitude. Each [low, high] is that table's range; the check
 * allows a factor of 2 beyond it on either side because the ranges are
 * remembered, not read.
 */
const RANGES: Record<string, Record<number, [number, number]>> = {
  O2: { 20: [1e-12, 1e-11], 30: [1e-11, 1e-10], 40: [3e-10, 3e-10], 50: [1e-9, 1e-9] },
  O3_O1D: { 20: [3e-5, 1e-4], 30: [2e-4, 5e-4], 40: [2e-3, 4e-3], 50: [5e-3, 8e-3] },
  O3_total: { 20: [5e-4, 5e-4], 30: [1e-3, 1e-3], 40: [3e-3, 5e-3], 50: [7e-3, 1e-2] },
  NO2: { 20: [8e-3, 1.2e-2], 30: [1e-2, 1e-2], 40: [1e-2, 1e-2], 50: [1e-2, 1e-2] },
  // ClONO2 at 50 km (~6e-4 here against ~2e-4) lies outside: its 200–240 nm cross sections are from memory
  ClONO2_total: { 20: [3e-5, 6e-5], 30: [1e-4, 1e-4], 40: [1e-4, 2e-4] },
  HOCl: { 20: [2e-4, 2e-4], 30: [3e-4, 3e-4], 40: [3e-4, 4e-4], 50: [4e-4, 4e-4] },
  Cl2O2: { 20: [1e-3, 1e-3], 30: [1e-3, 1e-3] },
};

describe("photolysisFrequencies", () => {
  it("returns every shared channel, finite and ≥ 0, and lists them in photolysisChannels", () => {
    expect([...photolysisChannels].sort()).toEqual([...SHARED].sort());
    for (const z of [0, 15, 30, 60, 86]) {
      for (const zenith of [0, 45, 80, 89, 92]) {
        const J = photolysisFrequencies({ altitude_km: z, zenith_deg: zenith, T_K: 230 });
        for (const id of SHARED)
          expect(Number.isFinite(J[id]) && J[id] >= 0, `${id} at ${z} km, ${zenith}°`).toBe(true);
      }
    }
  });

  for (const z of [20, 30, 40, 50]) {
    it(`lands inside the published ranges at ${z} km for a 30° zenith angle`, () => {
      const J = at(z);
      const value: Record<string, number> = {
        ...J,
        O3_total: J.O3_O1D + J.O3_O,
        ClONO2_total: J.ClONO2_Cl + J.ClONO2_ClO,
      };
      for (const [id, byZ] of Object.entries(RANGES)) {
        const r = byZ[z];
        if (!r) continue;
        expect(value[id], `${id} at ${z} km`).toBeGreaterThanOrEqual(r[0] / 2);
        expect(value[id], `${id} at ${z} km`).toBeLessThanOrEqual(r[1] * 2);
      }
    });
  }

  it("gives a J(NO2) nearly independent of altitude in the stratosphere and 3–20 × J(O3) at 30–40 km", () => {
    // docs/references.md, Photolysis, reading notes (Brasseur & Solomon 2005, from memory)
    const j = [20, 30, 40, 50].map((z) => at(z).NO2);
    expect(Math.max(...j) / Math.min(...j)).toBeLessThan(1.2);
    for (const z of [30, 40]) {
      const J = at(z);
      const ratio = J.NO2 / (J.O3_O1D + J.O3_O);
      expect(ratio).toBeGreaterThan(3);
      expect(ratio).toBeLessThan(20);
    }
  });

  it("raises J(O2) by roughly an order of magnitude per 10 km between 20 and 50 km", () => {
    // Brasseur & Solomon 2005 (docs/references.md, Photolysis): ~1e-12–1e-11 at 20 km to ~1e-9 at 50 km (from memory)
    const j = [20, 30, 40, 50].map((z) => at(z).O2);
    for (let k = 1; k < j.length; k++) {
      expect(j[k] / j[k - 1]).toBeGreaterThan(2);
      expect(j[k] / j[k - 1]).toBeLessThan(100);
    }
  });

  it("gives J(O2) = 0 when only wavelengths above the 242 nm threshold are lit", () => {
    // O2 photodissociation threshold λ < 242 nm = hc/D0(O2) (docs/references.md, Photolysis; recomputed)
    const input = { altitude_km: 40, zenith_deg: 30, T_K: 250 };
    const J = photolysisFrequencies(input, { wavelengthRange_nm: [242, 750] });
    expect(J.O2).toBe(0);
    expect(J.O3_O1D).toBeGreaterThan(0);
    expect(J.NO2).toBeGreaterThan(0);
    expect(photolysisFrequencies(input, { wavelengthRange_nm: [175, 242] }).O2).toBeGreaterThan(1e-11);
  });

  it("is zero for every channel beyond the geometric sunset for the altitude and positive just before", () => {
    const z = 30;
    const set = sunsetZenith_deg(z);
    const before = photolysisFrequencies({ altitude_km: z, zenith_deg: set - 0.1, T_K: 230 });
    const after = photolysisFrequencies({ altitude_km: z, zenith_deg: set + 0.1, T_K: 230 });
    expect(before.NO2).toBeGreaterThan(0);
    for (const id of SHARED) expect(after[id], id).toBe(0);
  });

  it("decreases with the zenith angle and with more ozone overhead", () => {
    const T = 226.5;
    let last = Number.POSITIVE_INFINITY;
    for (const zenith of [0, 30, 60, 80, 88, 92, 94]) {
      const j = photolysisFrequencies({ altitude_km: 30, zenith_deg: zenith, T_K: T }).O3_O1D;
      expect(j).toBeLessThan(last);
      last = j;
    }
    const thin = photolysisFrequencies({ altitude_km: 30, zenith_deg: 30, T_K: T, o3ColumnAbove_cm2: 1e18 });
    const thick = photolysisFrequencies({ altitude_km: 30, zenith_deg: 30, T_K: T, o3ColumnAbove_cm2: 3e18 });
    expect(thick.O3_O1D).toBeLessThan(thin.O3_O1D / 2);
    expect(thick.NO2).toBeGreaterThan(0.9 * thin.NO2);
  });

  it("assigns about 0.9 of unattenuated O3 photolysis below 306 nm to O(1D)", () => {
    // Hartley-band O(1D) yield 0.9 (JPL evaluation, from memory)
    const J = photolysisFrequencies(
      { altitude_km: 60, zenith_deg: 0, T_K: 250, o3ColumnAbove_cm2: 0 },
      { wavelengthRange_nm: [200, 300], albedo: 0 },
    );
    expectClose(J.O3_O1D / (J.O3_O1D + J.O3_O), 0.9, { abs: 5e-7 }, "O(1D) yield");
  });

  it("sums J as Σ σφF: doubling the sun doubles every J (jScale), and fixed values pass through unscaled", () => {
    const input = { altitude_km: 35, zenith_deg: 40, T_K: 236 };
    const one = photolysisFrequencies(input);
    const two = photolysisFrequencies(input, { jScale: 2, fixed: { NO2: 0.005 } });
    for (const id of SHARED) {
      if (id === "NO2") expect(two.NO2).toBe(0.005);
      else expectClose(two[id], 2 * one[id], { rel: 1e-12 }, id);
    }
    const some = photolysisFrequencies(input, { channels: ["O2", "NO2"] });
    expect(Object.keys(some).sort()).toEqual(["NO2", "O2"]);
    expect(some.O2).toBe(one.O2);
  });

  it("adds ground-reflected light: between 80 % and 100 % of the Lambertian 1 + 2Aμ0 where the air is nearly clear, none in the Schumann–Runge bands", () => {
    const input = { altitude_km: 20, zenith_deg: 30, T_K: 216.65 };
    const dark = photolysisFrequencies(input, { albedo: 0 });
    const bright = photolysisFrequencies(input, { albedo: 0.5 });
    // 1 + 2·A·μ0 for light the atmosphere neither absorbs nor scatters (Madronich 1987, J. Geophys. Res. 92, 9740;
    // from memory); Rayleigh scattering (τ ≈ 0.09 at 600 nm, common practice) and Chappuis absorption take some of it
    const lambertian = 2 * 0.5 * Math.cos(Math.PI / 6);
    const gain = bright.NO3_NO2 / dark.NO3_NO2 - 1;
    expect(gain).toBeGreaterThan(0.8 * lambertian);
    expect(gain).toBeLessThan(lambertian);
    const sr = photolysisFrequencies(input, { albedo: 0, wavelengthRange_nm: [175, 205] }).O2;
    expect(photolysisFrequencies(input, { albedo: 0.5, wavelengthRange_nm: [175, 205] }).O2).toBe(sr);
  });

  it("exposes the actinic flux per bin as the direct beam plus a diffuse part that is ≥ 0 and absent when switched off", () => {
    const input = { altitude_km: 25, zenith_deg: 50, T_K: 222 };
    const f = actinicFlux(input);
    const direct = actinicFlux(input, { diffuse: false });
    let diffuseSum = 0;
    for (let i = 0; i < f.actinic_cm2s.length; i++) {
      expect(f.diffuse_cm2s[i]).toBeGreaterThanOrEqual(0);
      expectClose(f.actinic_cm2s[i], direct.actinic_cm2s[i] + f.diffuse_cm2s[i], { rel: 1e-12, abs: 1e-300 });
      expect(direct.diffuse_cm2s[i]).toBe(0);
      if (f.upper_nm[i] <= 206) expect(f.diffuse_cm2s[i]).toBe(0);
      diffuseSum += f.diffuse_cm2s[i];
    }
    expect(diffuseSum).toBeGreaterThan(0);
  });

  it("dims the direct beam by the delta-scaled aerosol extinction, Beer–Lambert with f = g² (Joseph et al. 1976)", () => {
    const input = { altitude_km: 0, zenith_deg: 0, T_K: 288.15 };
    const opts = { diffuse: false, wavelengthRange_nm: [545, 555] as [number, number] };
    const clear = photolysisFrequencies(input, opts).NO3_NO2;
    const hazy = photolysisFrequencies(input, { ...opts, aerosolOpticalDepth: 0.3 }).NO3_NO2;
    // two 5 nm bins at 547.5 and 552.5 nm, Ångström exponent 1, ω 0.99, g 0.7: τ' = 0.3·(550/λ)·(1 − 0.99·0.49)
    const t = (l: number) => Math.exp(-0.3 * (550 / l) * (1 - 0.99 * 0.49));
    expectClose(hazy / clear, 0.5 * (t(547.5) + t(552.5)), { rel: 3e-3 });
    // with the scattered light on, the aerosol sends part of what it takes out of the beam on as diffuse light
    const all = photolysisFrequencies(input, { wavelengthRange_nm: [545, 555], aerosolOpticalDepth: 0.3 }).NO3_NO2;
    expect(all).toBeGreaterThan(hazy);
  });

  it("gives J(NO2) at the ground under a high sun in the band of the Trebs et al. (2009) fit, and more aloft", () => {
    // Trebs et al. 2009 (Atmos. Meas. Tech. 2, 725): j(NO2) = (1 + α)(B1·G + B2·G²); with G = 900–1000 W m⁻² and a
    // UV-A albedo α = 0.1 this is 1.02–1.09e-2 s⁻¹ (computed from the published fit). 10 % more or less is allowed for
    // the two-stream method and the remembered cross sections and solar spectrum.
    const ground = photolysisFrequencies({ altitude_km: 0, zenith_deg: 10, T_K: 288.15 }, { albedo: 0.1 }).NO2;
    expect(ground).toBeGreaterThan(0.9 * 1.02e-2);
    expect(ground).toBeLessThan(1.1 * 1.09e-2);
    // scattered light from below and less extinction above: J(NO2) rises from the ground to 20 km (common practice)
    const aloft = photolysisFrequencies({ altitude_km: 20, zenith_deg: 10, T_K: 216.65 }, { albedo: 0.1 }).NO2;
    expect(aloft / ground).toBeGreaterThan(1.1);
    expect(aloft / ground).toBeLessThan(1.6);
  });

  it("uses the local temperature: colder air gives a smaller J(O1D) at 30 km", () => {
    // Huggins-band cross sections and the O(1D) yield fall on cooling (JPL evaluation; common practice)
    const cold = photolysisFrequencies({ altitude_km: 30, zenith_deg: 30, T_K: 200 }).O3_O1D;
    const warm = photolysisFrequencies({ altitude_km: 30, zenith_deg: 30, T_K: 250 }).O3_O1D;
    expect(cold).toBeLessThan(warm);
  });

  it("throws an InputError naming the field for bad input", () => {
    const ok = { altitude_km: 30, zenith_deg: 30, T_K: 230 };
    expect(() => photolysisFrequencies({ ...ok, altitude_km: 90 })).toThrow(InputError);
    expect(() => photolysisFrequencies({ ...ok, zenith_deg: -1 })).toThrow(/zenith_deg/);
    expect(() => photolysisFrequencies({ ...ok, T_K: 100 })).toThrow(/T_K/);
    expect(() => photolysisFrequencies({ ...ok, o3ColumnAbove_cm2: -1 })).toThrow(/o3ColumnAbove_cm2/);
    expect(() => photolysisFrequencies(ok, { channels: ["O4"] })).toThrow(/channels\[0\]/);
    expect(() => photolysisFrequencies(ok, { fixed: { NO2: Number.NaN } })).toThrow(/fixed\.NO2/);
    expect(() => photolysisFrequencies(ok, { albedo: 2 })).toThrow(/albedo/);
    expect(() => photolysisFrequencies(ok, { aerosolOpticalDepth: -1 })).toThrow(/aerosolOpticalDepth/);
    expect(() => photolysisFrequencies(ok, { jScale: -1 })).toThrow(/jScale/);
    expect(() => photolysisFrequencies(ok, { wavelengthRange_nm: [500, 300] })).toThrow(/wavelengthRange_nm/);
  });
});
