import { describe, expect, it } from "vitest";
import { defaultOzoneDensity_cm3 } from "../../lib/atmosphere";
import { InputError } from "../../lib/errors";
import { photolysisFrequencies, photolysisProfile } from "../../lib/photolysis";
import { expectClose } from "../helpers/close";

const LEVELS = Array.from({ length: 61 }, (_, i) => 10 + (50 * i) / 60);

describe("photolysisProfile", () => {
  it("equals single-level calls with the default climatology", () => {
    const rows = photolysisProfile({ altitudes_km: [20, 35], zenith_deg: 45, T_K: [217, 236] });
    const one = photolysisFrequencies({ altitude_km: 35, zenith_deg: 45, T_K: 236 });
    expect(rows[1]).toEqual(one);
  });

  // within 1 %: where the beam is nearly spent (J(O2) at 10 km, τ ≈ 20) the ~0.05 % column
  // difference of the 0.83 km level spacing against the 0.25 km table is amplified 20-fold
  it("reproduces the climatology's J within 1 % when given the climatology's own O3 on 61 levels", () => {
    const fromClimatology = photolysisProfile({ altitudes_km: LEVELS, zenith_deg: 30 });
    const fromLevels = photolysisProfile({
      altitudes_km: LEVELS,
      zenith_deg: 30,
      o3_cm3: LEVELS.map(defaultOzoneDensity_cm3),
    });
    LEVELS.forEach((z, i) => {
      for (const id of ["O3_O1D", "O2", "NO2", "ClONO2_Cl"]) {
        expectClose(fromLevels[i][id], fromClimatology[i][id], { rel: 1e-2 }, `${id} at ${z.toFixed(2)} km`);
      }
    });
  });

  it("takes the overhead ozone from the levels above: doubling O3 aloft lowers J(O1D) below", () => {
    const z = [20, 25, 30, 35, 40];
    const base = z.map(defaultOzoneDensity_cm3);
    const more = base.map((n, i) => (z[i] >= 30 ? 2 * n : n));
    const a = photolysisProfile({ altitudes_km: z, zenith_deg: 30, o3_cm3: base });
    const b = photolysisProfile({ altitudes_km: z, zenith_deg: 30, o3_cm3: more });
    expect(b[0].O3_O1D).toBeLessThan(0.8 * a[0].O3_O1D);
    expectClose(b[4].O3_O1D, a[4].O3_O1D, { rel: 0.05 }, "top level barely changes");
  });

  it("throws if the per-level arrays do not match the altitudes", () => {
    expect(() => photolysisProfile({ altitudes_km: [20, 30], zenith_deg: 30, T_K: [220] })).toThrow(InputError);
    expect(() => photolysisProfile({ altitudes_km: [20, 30], zenith_deg: 30, o3_cm3: [1e12] })).toThrow(/o3_cm3/);
  });
});
