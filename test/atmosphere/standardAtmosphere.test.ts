import { describe, expect, it } from "vitest";
import {
  airNumberDensity_cm3,
  BOLTZMANN_J_K,
  geometricToGeopotential_km,
  geopotentialToGeometric_km,
  standardAtmosphere,
} from "../../lib/atmosphere";
import { InputError } from "../../lib/errors";
import { expectClose } from "../helpers/close";

// U.S. Standard Atmosphere, 1976 (NOAA-S/T 76-1562), Table I at geometric
// altitude, as in docs/references.md, Standard atmosphere (recomputed):
// Z (km), H (km'), T (K), p (Pa), rho (kg m-3).
const TABLE_I: ReadonlyArray<[number, number, number, number, number]> = [
  [0, 0.0, 288.15, 1.01325e5, 1.225],
  [10, 9.9843, 223.252, 2.65e4, 4.1351e-1],
  [20, 19.9373, 216.65, 5.5293e3, 8.891e-2],
  [30, 29.8591, 226.509, 1.197e3, 1.841e-2],
  [40, 39.7499, 250.35, 2.8714e2, 3.9957e-3],
  [50, 49.6098, 270.65, 7.9779e1, 1.0269e-3],
  [60, 59.439, 247.021, 2.1959e1, 3.0968e-4],
  [70, 69.2376, 219.585, 5.2209, 8.2829e-5],
  [80, 79.0057, 198.639, 1.0525, 1.8458e-5],
];

// Layer bases (geopotential km', T_M K, p Pa), same standard, docs/references.md, Standard atmosphere (recomputed).
const LAYER_BASES: ReadonlyArray<[number, number, number]> = [
  [11, 216.65, 22632.1],
  [20, 216.65, 5474.89],
  [32, 228.65, 868.019],
  [47, 270.65, 110.906],
  [51, 270.65, 66.9389],
  [71, 214.65, 3.95642],
];

describe("standardAtmosphere", () => {
  for (const [z, H, T, p, rho] of TABLE_I) {
    it(`matches the 1976 standard's Table I at ${z} km (T within 0.01 K, p and density within 0.1 %)`, () => {
      const s = standardAtmosphere(z);
      expectClose(s.geopotential_km, H, { abs: 1e-4 }, "geopotential altitude");
      expectClose(s.T_K, T, { abs: 0.01 }, "temperature");
      expectClose(s.p_Pa, p, { rel: 1e-3 }, "pressure");
      expectClose(s.density_kgm3, rho, { rel: 1e-3 }, "density");
      expectClose(s.p_hPa, s.p_Pa / 100, { rel: 1e-12 }, "hPa");
    });
  }

  it("meets the standard's layer-base pressures at the base heights (within 0.01 %)", () => {
    for (const [Hb, Tb, pb] of LAYER_BASES) {
      const s = standardAtmosphere(geopotentialToGeometric_km(Hb));
      expectClose(s.T_K, Tb, { abs: 1e-6 }, `T at H = ${Hb}`);
      expectClose(s.p_Pa, pb, { rel: 1e-4 }, `p at H = ${Hb}`);
    }
  });

  it("gives the standard's 86 km top: kinetic T 186.87 K and p 0.37338 Pa", () => {
    // U.S. Standard Atmosphere 1976, layer table, top row (docs/references.md, Standard atmosphere; recomputed)
    const s = standardAtmosphere(86);
    expectClose(s.T_K, 186.87, { abs: 0.01 }, "kinetic temperature");
    expectClose(s.p_Pa, 0.37338, { rel: 1e-3 }, "pressure");
  });

  it("gives [M] = p/(k_B·T) with the exact SI Boltzmann constant, 2.547e19 cm⁻³ at sea level", () => {
    // n at 0 km from docs/references.md, Standard atmosphere (k = 1.380649e-23, SI Brochure 2019)
    const s = standardAtmosphere(0);
    expect(BOLTZMANN_J_K).toBe(1.380649e-23);
    expectClose(s.M_cm3, 2.547e19, { rel: 1e-3 }, "[M] at sea level");
    expectClose(s.M_cm3, 101325 / (1.380649e-23 * 288.15) / 1e6, { rel: 1e-12 }, "identity");
    expectClose(airNumberDensity_cm3(100, 250), 100 / (1.380649e-23 * 250) / 1e6, { rel: 1e-12 });
  });

  it("is hydrostatic: dp/dz = −ρ·g(z) between the tabulated points (within 0.1 %)", () => {
    for (const z of [5, 15, 25, 35, 45, 55, 65, 75]) {
      const h = 0.01;
      const dpdz = (standardAtmosphere(z + h).p_Pa - standardAtmosphere(z - h).p_Pa) / (2 * h * 1000);
      const g = 9.80665 * (6356.766 / (6356.766 + z)) ** 2;
      expectClose(dpdz, -standardAtmosphere(z).density_kgm3 * g, { rel: 1e-3 }, `z = ${z}`);
    }
  });

  it("converts geometric to geopotential altitude and back", () => {
    for (const z of [0, 11.019, 47.35, 86]) {
      expectClose(geopotentialToGeometric_km(geometricToGeopotential_km(z)), z, { abs: 1e-10 });
    }
    // H = r0 Z/(r0 + Z), r0 = 6356.766 km: 86 km → 84.852 km' (docs/references.md, Standard atmosphere)
    expectClose(geometricToGeopotential_km(86), 84.852, { abs: 1e-3 });
  });

  it("throws an InputError outside 0–86 km", () => {
    expect(() => standardAtmosphere(-0.1)).toThrow(InputError);
    expect(() => standardAtmosphere(86.5)).toThrow(/outside the 0–86 km/);
    expect(() => standardAtmosphere(Number.NaN)).toThrow(InputError);
  });
});
