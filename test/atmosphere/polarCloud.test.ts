/**
 * NAT existence temperature (Hanson and Mauersberger 1988, Geophys. Res.
 * Lett. 15, 855) and frost point (Marti and Mauersberger 1993, Geophys. Res.
 * Lett. 20, 363), fit constants from memory; values in docs/references.md,
 * "Heterogeneous chemistry".
 */
import { describe, expect, it } from "vitest";
import { CLOUD_DEFAULTS, frostPoint_K, natExistenceTemperature_K, polarCloud } from "@/lib/atmosphere";
import { expectClose } from "../helpers/close";

/** partial pressure (hPa) of a mixing ratio at 50 hPa */
const at50 = (x: number) => x * 50;

describe("NAT existence temperature and frost point", () => {
  it("puts T_NAT near 195.7 K at 50 hPa, 5 ppmv H2O and 10 ppbv HNO3, and 194.8 K at 5 ppbv (Hanson and Mauersberger 1988, recomputed from the fit)", () => {
    expectClose(natExistenceTemperature_K(at50(10e-9), at50(5e-6)), 195.7, { abs: 0.3 });
    expectClose(natExistenceTemperature_K(at50(5e-9), at50(5e-6)), 194.8, { abs: 0.3 });
  });

  it("puts the frost point near 188.4 K at 50 hPa and 5 ppmv H2O (Marti and Mauersberger 1993, recomputed from the fit)", () => {
    expectClose(frostPoint_K(at50(5e-6)), 188.4, { abs: 0.2 });
  });

  it("finds NAT about 7 K above the ice point at 3 ppmv H2O and 5 ppbv HNO3 (Hanson and Mauersberger 1988, abstract)", () => {
    const gap = natExistenceTemperature_K(at50(5e-9), at50(3e-6)) - frostPoint_K(at50(3e-6));
    expectClose(gap, 7, { abs: 1 });
  });

  it("throws if a partial pressure is not positive", () => {
    expect(() => natExistenceTemperature_K(0, 1e-4)).toThrow(RangeError);
    expect(() => frostPoint_K(-1)).toThrow(RangeError);
  });
});

describe("polarCloud", () => {
  const base = { T_K: 200, pH2O_hPa: at50(5e-6), pHNO3_hPa: at50(10e-9) };
  it("chooses none above T_NAT, NAT between T_NAT and the frost point, and ice below it when automatic", () => {
    expect(polarCloud({ ...base, type: "auto", T_K: 197 }).present).toBe("none");
    const nat = polarCloud({ ...base, type: "auto", T_K: 192 });
    expect(nat.present).toBe("NAT");
    expect(nat.natSurface_um2cm3).toBe(CLOUD_DEFAULTS.natSurface_um2cm3);
    expect(nat.iceSurface_um2cm3).toBe(0);
    const ice = polarCloud({ ...base, type: "auto", T_K: 187 });
    expect(ice.present).toBe("ice");
    expect(ice.iceSurface_um2cm3).toBe(CLOUD_DEFAULTS.iceSurface_um2cm3);
  });

  it("keeps the type asked for and the user's surface area", () => {
    const c = polarCloud({ ...base, type: "ice", surface_um2cm3: 500 });
    expect(c.present).toBe("ice");
    expect(c.iceSurface_um2cm3).toBe(500);
    expect(polarCloud({ ...base, type: "none" }).present).toBe("none");
  });

  it("throws if the surface area is outside its type's range", () => {
    expect(() => polarCloud({ ...base, type: "NAT", surface_um2cm3: 500 })).toThrow(/NAT cloud's surface area/);
    expect(() => polarCloud({ ...base, type: "ice", surface_um2cm3: 2e4 })).toThrow(RangeError);
  });
});
