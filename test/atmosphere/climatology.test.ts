import { describe, expect, it } from "vitest";
import {
  climatologyAt,
  climatologyMixingRatio,
  climatologySources,
  climatologySpecies,
  DOBSON_UNIT_cm2,
  defaultOzoneDensity_cm3,
  ozoneColumnAbove_cm2,
} from "../../lib/atmosphere";
import { InputError } from "../../lib/errors";
import { expectClose } from "../helpers/close";

const REQUIRED = ["O2", "N2", "H2O", "CH4", "N2O", "O3", "CO", "H2", "CFCl3", "CF2Cl2", "Cly", "Bry", "NOy"];

describe("climatologyAt", () => {
  it("gives a mixing ratio for every required species and pool at every altitude", () => {
    for (let z = 0; z <= 86; z += 0.5) {
      const c = climatologyAt(z);
      for (const id of REQUIRED) {
        expect(Number.isFinite(c[id]) && c[id] > 0 && c[id] < 1, `${id} at ${z} km`).toBe(true);
      }
    }
    expect([...climatologySpecies].sort()).toEqual([...REQUIRED].sort());
  });

  it("names a source, or says approximate from memory, for every profile", () => {
    for (const id of REQUIRED) {
      const s = climatologySources[id as keyof typeof climatologySources];
      expect(s.length).toBeGreaterThan(20);
      if (id !== "O2" && id !== "N2") expect(s).toMatch(/approximate, from memory/);
    }
    expect(climatologySources.O2).toMatch(/U\.S\. Standard Atmosphere 1976/);
  });

  it("uses the 1976 standard's dry-air O2 and N2 fractions", () => {
    // U.S. Standard Atmosphere 1976, sea-level composition: N2 0.78084, O2 0.209476 (from memory)
    const c = climatologyAt(30);
    expectClose(c.O2, 0.209476, { rel: 1e-9 });
    expectClose(c.N2, 0.78084, { rel: 1e-9 });
  });

  it("takes O3 at 10–70 km from the U.S. Standard Atmosphere 1976 mid-latitude ozone model", () => {
    // Krueger and Minzner 1976, J. Geophys. Res. 81, 4477, ppmv as in Anderson et al. 1986,
    // AFGL-TR-86-0110, table 1f (docs/references.md, Constants and composition)
    const published: Array<[number, number]> = [
      [10, 0.131e-6],
      [15, 0.651e-6],
      [20, 2.58e-6],
      [25, 5.12e-6],
      [30, 6.55e-6],
      [35, 7.84e-6],
      [40, 7.3e-6],
      [50, 3.1e-6],
      [60, 1.1e-6],
    ];
    for (const [z, x] of published) expectClose(climatologyMixingRatio("O3", z), x, { rel: 1e-9 });
  });

  it("puts the default ozone column above the global mean, at a mid-latitude annual mean of about 330–360 DU", () => {
    // global mean ~300 DU ("300 DU is a typical global average", CRC Handbook, "Dobson unit");
    // mid-latitude annual means ~330–350 DU (from memory; docs/references.md, Constants and composition)
    const du = ozoneColumnAbove_cm2(0) / DOBSON_UNIT_cm2;
    expect(du).toBeGreaterThan(330);
    expect(du).toBeLessThan(360);
  });

  it("peaks the ozone number density at 20–25 km and the mixing ratio higher, near 30–36 km", () => {
    // Encyclopaedia Britannica, "ozone layer" (number-density peak 20–25 km at mid-latitudes) [C];
    // mixing-ratio peak higher, ~8 ppmv near 30–35 km (from memory; docs/references.md, Constants and composition)
    let zn = 0;
    let zx = 0;
    for (let z = 10; z <= 50; z += 0.25) {
      if (defaultOzoneDensity_cm3(z) > defaultOzoneDensity_cm3(zn)) zn = z;
      if (climatologyMixingRatio("O3", z) > climatologyMixingRatio("O3", zx)) zx = z;
    }
    expect(zn).toBeGreaterThanOrEqual(20);
    expect(zn).toBeLessThanOrEqual(25);
    expect(zx).toBeGreaterThanOrEqual(30);
    expect(zx).toBeLessThanOrEqual(36);
    expectClose(climatologyMixingRatio("O3", zx), 8e-6, { rel: 0.25 }, "peak mixing ratio");
  });

  it("holds upper-stratospheric Cly near 3.3 ppbv and Bry near 20 pptv", () => {
    // Cly: 3.60 ppbv in early 2006 falling 0.78 %/yr (Froidevaux et al., GRL 33, L23812, 2006) [C]
    // Bry: 21.5 ± 2.5 pptv (Dorf et al., ACP 8, 7265, 2008) [C]
    expectClose(climatologyAt(45).Cly, 3.3e-9, { rel: 0.1 });
    expectClose(climatologyAt(30).Bry, 20e-12, { rel: 0.15 });
  });

  it("roughly conserves 2·CH4 + H2O at 7–8.5 ppmv through the stratosphere", () => {
    // from memory (docs/references.md, Constants and composition): 2·CH4 + H2O ≈ 7–7.5 ppmv roughly conserved
    for (const z of [20, 25, 30, 35, 40, 45, 50]) {
      const c = climatologyAt(z);
      const sum = 2 * c.CH4 + c.H2O;
      expect(sum, `z = ${z}`).toBeGreaterThan(7e-6);
      expect(sum, `z = ${z}`).toBeLessThan(8.5e-6);
    }
  });

  it("keeps NOy at its 15–20 ppbv peak between 30 and 40 km", () => {
    // ~15–20 ppbv near 30–40 km at mid-latitudes, from memory (docs/references.md, Constants and composition)
    for (const z of [30, 35, 40]) {
      expect(climatologyAt(z).NOy).toBeGreaterThanOrEqual(15e-9);
      expect(climatologyAt(z).NOy).toBeLessThanOrEqual(20e-9);
    }
  });

  it("interpolates between nodes without leaving the range of the neighbouring nodes", () => {
    const lo = climatologyMixingRatio("N2O", 30);
    const hi = climatologyMixingRatio("N2O", 25);
    const mid = climatologyMixingRatio("N2O", 27.5);
    expect(mid).toBeGreaterThan(lo);
    expect(mid).toBeLessThan(hi);
    expectClose(mid, Math.sqrt(lo * hi), { rel: 1e-12 }, "log-linear midpoint");
  });

  it("throws an InputError outside 0–86 km", () => {
    expect(() => climatologyAt(87)).toThrow(InputError);
    expect(() => climatologyMixingRatio("O3", -1)).toThrow(/outside the 0–86 km/);
  });
});
