/**
 * The diffuse field for an O3 factor between two cached columns is interpolated in ln(factor)
 * (lib/photolysis/radiativeColumn.ts, diffuseAtO3Scale). It must stay close to the column solved
 * at that factor exactly: this is an identity of the code, not an outside reference.
 */
import { describe, expect, it } from "vitest";
import { computeDiffuseField, DEFAULTS, diffuseAt, diffuseAtO3Scale } from "../../lib/photolysis/radiativeColumn";
import { WAVELENGTH_GRID } from "../../lib/photolysis/wavelengthGrid";

const light = { zenith_deg: 40, albedo: 0.3, aerosolOpticalDepth: 0.1, rayleigh: true };
const n = WAVELENGTH_GRID.n;

function compare(o3Scale: number, altitude_km: number) {
  const exact = new Float64Array(n);
  diffuseAt(computeDiffuseField({ ...light, o3Scale }), altitude_km, exact);
  const got = new Float64Array(n);
  diffuseAtO3Scale(light, o3Scale, altitude_km, got, new Float64Array(n));
  const peak = Math.max(...exact);
  let worst = 0;
  let sumGot = 0;
  let sumExact = 0;
  for (let i = 0; i < n; i++) {
    sumGot += got[i];
    sumExact += exact[i];
    if (exact[i] > 1e-3 * peak) worst = Math.max(worst, Math.abs(got[i] / exact[i] - 1));
  }
  return { worst, total: sumGot / sumExact - 1 };
}

describe("diffuse field between cached O3 factors", () => {
  it("is exact on a cached factor (a whole power of the step)", () => {
    const r = compare(DEFAULTS.o3ScaleStep ** 2, 20);
    expect(r.worst).toBe(0);
  });

  it("stays within 0.5 % per bin and 1e-4 in total of the exactly solved column (measured ≤ 0.34 %, 1.6e-5)", () => {
    for (const s of [0.6, 0.93, 1.024, 1.37])
      for (const z of [5, 20, 35]) {
        const r = compare(s, z);
        expect(r.worst, `factor ${s}, ${z} km`).toBeLessThan(5e-3);
        expect(Math.abs(r.total), `factor ${s}, ${z} km`).toBeLessThan(1e-4);
      }
  });

  it("reports no light for a column the sun does not reach", () => {
    const out = new Float64Array(n).fill(1);
    const lit = diffuseAtO3Scale({ ...light, zenith_deg: 120 }, 1.02, 20, out, new Float64Array(n));
    expect(lit).toBe(false);
  });
});
