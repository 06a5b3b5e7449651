import { describe, expect, it } from "vitest";
import {
  airColumnAbove_cm2,
  columnAboveFromProfile,
  columnsAboveLevels,
  DOBSON_UNIT_cm2,
  O2_FRACTION,
  o2ColumnAbove_cm2,
  ozoneColumnAbove_cm2,
  standardAtmosphere,
} from "../../lib/atmosphere";
import { InputError } from "../../lib/errors";
import { expectClose } from "../helpers/close";

describe("columns above an altitude", () => {
  it("defines the Dobson unit as the Loschmidt constant times 1e-3 cm", () => {
    // IUPAC Gold Book "Dobson unit"; Loschmidt constant 2.6867811e19 cm⁻³ (CODATA 2018)
    expectClose(DOBSON_UNIT_cm2, 2.6867811e19 * 1e-3, { rel: 1e-4 });
  });

  it("integrates an exponential profile to its analytic column n0·H·e^(−z/H)", () => {
    const n0 = 5e12;
    const H = 4.5;
    const profile = (z: number) => n0 * Math.exp(-(z - 20) / H);
    for (const z of [20, 30, 45]) {
      expectClose(
        columnAboveFromProfile(z, profile),
        n0 * H * 1e5 * Math.exp(-(z - 20) / H),
        { rel: 1e-4 },
        `z = ${z}`,
      );
      expectClose(ozoneColumnAbove_cm2(z, profile), columnAboveFromProfile(z, profile), { rel: 1e-12 });
    }
  });

  it("gives an air column equal to p/(m·g) within 1 % (hydrostatic identity)", () => {
    // p = ∫ρ g dz, so N = p/(m·g_eff) with g_eff slightly below g(z)
    const m = 28.9644e-3 / 6.02214076e23;
    for (const z of [0, 20, 40, 60]) {
      const s = standardAtmosphere(z);
      const g = 9.80665 * (6356.766 / (6356.766 + z)) ** 2;
      expectClose(airColumnAbove_cm2(z), s.p_Pa / (m * g) / 1e4, { rel: 0.01 }, `z = ${z}`);
    }
    expectClose(o2ColumnAbove_cm2(30), O2_FRACTION * airColumnAbove_cm2(30), { rel: 1e-12 });
  });

  it("decreases the default ozone column with altitude", () => {
    let last = Number.POSITIVE_INFINITY;
    for (let z = 0; z <= 86; z += 2) {
      const c = ozoneColumnAbove_cm2(z);
      expect(c).toBeLessThan(last);
      last = c;
    }
  });

  it("sums columns over discrete levels exactly for an exponential profile", () => {
    const z = [50, 20, 35, 25, 30, 40, 45];
    const H = 5;
    const n = z.map((zz) => 1e12 * Math.exp(-(zz - 20) / H));
    const col = columnsAboveLevels(z, n, { columnAboveTop_cm2: 1e12 * Math.exp(-30 / H) * H * 1e5 });
    z.forEach((zz, i) => {
      expectClose(col[i], 1e12 * H * 1e5 * Math.exp(-(zz - 20) / H), { rel: 1e-9 }, `z = ${zz}`);
    });
  });

  it("throws if the levels and densities do not match or a density is negative", () => {
    expect(() => columnsAboveLevels([1, 2], [1])).toThrow(InputError);
    expect(() => columnsAboveLevels([1, 2], [1, -1])).toThrow(/density_cm3\[1\]/);
    expect(() => ozoneColumnAbove_cm2(90)).toThrow(InputError);
  });
});
