import { describe, expect, it } from "vitest";
import { DOBSON_UNIT_cm2, ozoneColumnAbove_cm2, solarZenithAngle, standardAtmosphere } from "../../lib/atmosphere";
import { InputError } from "../../lib/errors";
import { conditionAt, photolysisChannels } from "../../lib/photolysis";
import { expectClose } from "../helpers/close";

describe("conditionAt", () => {
  it("fills T, p and [M] from the U.S. Standard Atmosphere 1976 and the sun from latitude, date and time", () => {
    const c = conditionAt({ altitude_km: 30 });
    const s = standardAtmosphere(30);
    expect(c.T_K).toBe(s.T_K);
    expect(c.p_hPa).toBe(s.p_hPa);
    expectClose(c.M_cm3, s.M_cm3, { rel: 1e-12 });
    expect(c.latitude_deg).toBe(45);
    expect(c.date).toBe("2026-03-20");
    expect(c.dayOfYear).toBe(79);
    expect(c.zenith_deg).toBe(solarZenithAngle({ latitude_deg: 45, dayOfYear: 79, localSolarTime_h: 12, year: 2026 }));
    expectClose(c.o3ColumnAbove_DU, ozoneColumnAbove_cm2(30) / DOBSON_UNIT_cm2, { rel: 1e-12 });
    expect(Object.keys(c.J_s).sort()).toEqual([...photolysisChannels].sort());
    expect(c.sources.T_K).toMatch(/1976/);
  });

  it("overrides T and p separately and recomputes [M] = p/(k_B·T)", () => {
    const c = conditionAt({ altitude_km: 30, T_K: 240 });
    expect(c.p_hPa).toBe(standardAtmosphere(30).p_hPa);
    expectClose(c.M_cm3, (c.p_hPa * 100) / (1.380649e-23 * 240) / 1e6, { rel: 1e-12 });
    const d = conditionAt({ altitude_km: 30, p_hPa: 10 });
    expect(d.T_K).toBe(standardAtmosphere(30).T_K);
    expectClose(d.M_cm3, 1000 / (1.380649e-23 * d.T_K) / 1e6, { rel: 1e-12 });
    expect(d.sources.p_hPa).toBe("given");
  });

  it("takes a given zenith angle over latitude, date and time", () => {
    const c = conditionAt({ altitude_km: 25, zenith_deg: 70, latitude_deg: -10 });
    expect(c.zenith_deg).toBe(70);
    expect(c.sources.zenith_deg).toBe("given");
  });

  it("gives held amounts and pool totals as mixing ratio × [M], overridable, with their sources", () => {
    const c = conditionAt({ altitude_km: 40, held: { CH4: 1e-6, ClONO2: 1e-10 }, poolTotals: { Cly: 3.6e-9 } });
    expectClose(c.held_cm3.CH4, 1e-6 * c.M_cm3, { rel: 1e-12 });
    expectClose(c.held_cm3.ClONO2, 1e-10 * c.M_cm3, { rel: 1e-12 });
    expectClose(c.poolTotals_cm3.Cly, 3.6e-9 * c.M_cm3, { rel: 1e-12 });
    expect(c.sources.CH4).toBe("given");
    expect(c.sources.N2O).toMatch(/approximate, from memory/);
    expect(c.poolTotals_cm3.Bry).toBeGreaterThan(0);
    expect(c.held_cm3.Cly).toBeUndefined();
  });

  it("fixes a J or scales all computed ones", () => {
    const base = conditionAt({ altitude_km: 30, zenith_deg: 30 });
    const c = conditionAt({ altitude_km: 30, zenith_deg: 30, J: { NO2: 0.02 }, jScale: 0.5 });
    expect(c.J_s.NO2).toBe(0.02);
    expectClose(c.J_s.O3_O1D, 0.5 * base.J_s.O3_O1D, { rel: 1e-12 });
    expect(c.sources.J).toMatch(/fixed by the user: NO2/);
  });

  it("gives zero J at night", () => {
    const c = conditionAt({ altitude_km: 30, localSolarTime_h: 0 });
    expect(c.zenith_deg).toBeGreaterThan(120);
    for (const id of photolysisChannels) expect(c.J_s[id]).toBe(0);
  });

  it("throws an InputError with the path of the offending field", () => {
    expect(() => conditionAt({ altitude_km: 90 })).toThrow(InputError);
    expect(() => conditionAt({ altitude_km: 30, T_K: 400 })).toThrow(/condition\.T_K/);
    expect(() => conditionAt({ altitude_km: 30, p_hPa: 0 })).toThrow(/condition\.p_hPa/);
    expect(() => conditionAt({ altitude_km: 30, date: "2026-02-30" })).toThrow(/condition\.date/);
    expect(() => conditionAt({ altitude_km: 30, held: { CH4: 2 } })).toThrow(/condition\.held\.CH4/);
    expect(() => conditionAt({ altitude_km: 30, latitude_deg: 100 })).toThrow(/condition\.latitude_deg/);
    expect(() => conditionAt({ altitude_km: 30, albedo: 1.2 })).toThrow(/condition\.albedo/);
    expect(() => conditionAt({ altitude_km: 30, aerosolOpticalDepth: -0.1 })).toThrow(/condition\.aerosolOpticalDepth/);
  });

  it("takes the ground albedo and aerosol optical depth for the light, records them, and says so in the J source", () => {
    const base = conditionAt({ altitude_km: 20, zenith_deg: 30 });
    expect(base.albedo).toBe(0.3);
    expect(base.aerosolOpticalDepth).toBe(0);
    const snow = conditionAt({ altitude_km: 20, zenith_deg: 30, albedo: 0.9 });
    expect(snow.J_s.NO2).toBeGreaterThan(1.2 * base.J_s.NO2);
    expect(snow.sources.J).toMatch(/albedo 0\.9/);
    const hazy = conditionAt({ altitude_km: 12, zenith_deg: 30, aerosolOpticalDepth: 0.3 });
    const clear = conditionAt({ altitude_km: 12, zenith_deg: 30 });
    expect(hazy.J_s.NO2).not.toBe(clear.J_s.NO2);
    expect(hazy.sources.J).toMatch(/aerosol optical depth 0\.3/);
  });
});
