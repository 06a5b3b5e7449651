/**
 * The wavelength grid as the command line's bundle stores it (scripts/cli-bundle.mjs: V8's serialised form,
 * beside the spectral tables) comes back bit for bit, and a stored form of another shape is refused, so that
 * the engine builds the grid instead.
 */
import { deserialize, serialize } from "node:v8";
import { describe, expect, it } from "vitest";
import { prebuiltWavelengthGrid } from "@/lib/photolysis/prebuiltWavelengthGrid";
import { reviveWavelengthGrid, WAVELENGTH_GRID } from "@/lib/photolysis/wavelengthGrid";

const G = WAVELENGTH_GRID;

describe("stored wavelength grid", () => {
  it("is not stored in the source: the engine builds its own", () => {
    expect(prebuiltWavelengthGrid()).toBeUndefined();
  });

  it("comes back from V8's serialised form bit for bit", () => {
    const revived = reviveWavelengthGrid(deserialize(serialize(G)));
    expect(revived).toBeDefined();
    const r = revived as typeof G;
    expect([r.n, r.lymanAlpha, r.srFirst, r.srEnd]).toEqual([G.n, G.lymanAlpha, G.srFirst, G.srEnd]);
    for (const k of ["lower_nm", "upper_nm", "flux_cm2s"] as const) {
      expect(r[k]).toBeInstanceOf(Float64Array);
      expect(r[k].length).toBe(G.n);
      // Object.is tells -0 from 0: bit for bit but for NaN payloads
      expect(Array.from(r[k]).filter((x, i) => !Object.is(x, G[k][i]))).toEqual([]);
    }
  });

  it("is refused when its shape is not a grid's, so that the engine builds one", () => {
    const copy = () => deserialize(serialize(G)) as Record<string, unknown>;
    expect(reviveWavelengthGrid(undefined)).toBeUndefined();
    expect(reviveWavelengthGrid({})).toBeUndefined();
    const shorter = copy();
    shorter.flux_cm2s = new Float64Array(G.n - 1);
    expect(reviveWavelengthGrid(shorter)).toBeUndefined();
    const plain = copy();
    plain.lower_nm = Array.from(G.lower_nm);
    expect(reviveWavelengthGrid(plain)).toBeUndefined();
    const badIndex = copy();
    badIndex.srEnd = G.n + 1;
    expect(reviveWavelengthGrid(badIndex)).toBeUndefined();
    const fractional = copy();
    fractional.n = G.n + 0.5;
    expect(reviveWavelengthGrid(fractional)).toBeUndefined();
  });
});
