import { describe, expect, it } from "vitest";
import { deltaE, hexToOklab } from "@/lib/viz/colorSpace";
import { divergingColor } from "@/lib/viz/divergingColor";
import { sequentialColor } from "@/lib/viz/sequentialColor";
import { expectClose } from "../helpers/close";
import { MACHADO_2009, simulate } from "./cvd";

const samples = (n: number, lo: number, hi: number) =>
  Array.from({ length: n }, (_, i) => lo + ((hi - lo) * i) / (n - 1));

describe("the colour-deficiency matrices used by these tests", () => {
  it("keep white white: every row sums to 1 (Machado et al. 2009, from memory)", () => {
    for (const [kind, m] of Object.entries(MACHADO_2009)) {
      for (const row of m) expectClose(row[0] + row[1] + row[2], 1, { abs: 2e-4 }, kind);
    }
  });
});

describe("the sequential flux ramp", () => {
  it("gets strictly darker from low to high flux", () => {
    const L = samples(65, 0, 1).map((t) => hexToOklab(sequentialColor(t)).L);
    for (let i = 1; i < L.length; i++) expect(L[i]).toBeLessThan(L[i - 1]);
  });

  it("spans a lightness range of at least 0.55 so that the order reads in greyscale", () => {
    expect(hexToOklab(sequentialColor(0)).L - hexToOklab(sequentialColor(1)).L).toBeGreaterThan(0.55);
  });

  it("stays ordered in lightness for protan, deutan and tritan vision (simulated)", () => {
    for (const kind of ["protan", "deutan", "tritan"] as const) {
      const L = samples(17, 0, 1).map((t) => simulate(sequentialColor(t), kind).L);
      for (let i = 1; i < L.length; i++) expect(L[i], `${kind} at ${i}`).toBeLessThan(L[i - 1]);
    }
  });

  it("clamps values outside 0–1 and treats NaN as the low end", () => {
    expect(sequentialColor(-3)).toBe(sequentialColor(0));
    expect(sequentialColor(7)).toBe(sequentialColor(1));
    expect(sequentialColor(Number.NaN)).toBe(sequentialColor(0));
  });
});

describe("the diverging odd-oxygen ramp", () => {
  it("is nearly neutral at its centre", () => {
    const c = hexToOklab(divergingColor(0));
    expect(Math.hypot(c.a, c.b)).toBeLessThan(0.02);
  });

  it("has the same lightness at +t and −t", () => {
    for (const t of samples(11, 0, 1)) {
      expectClose(hexToOklab(divergingColor(t)).L, hexToOklab(divergingColor(-t)).L, { abs: 0.02 }, `t=${t}`);
    }
  });

  it("darkens away from the centre on both arms", () => {
    for (const sign of [1, -1]) {
      const L = samples(21, 0, 1).map((t) => hexToOklab(divergingColor(sign * t)).L);
      for (let i = 1; i < L.length; i++) expect(L[i]).toBeLessThan(L[i - 1]);
    }
  });

  it("puts produced on the blue side and destroyed on the orange side of the blue–yellow axis", () => {
    expect(hexToOklab(divergingColor(-1)).b).toBeLessThan(-0.05);
    expect(hexToOklab(divergingColor(1)).b).toBeGreaterThan(0.05);
  });

  it("keeps the two ends far apart for protan, deutan and tritan vision (simulated)", () => {
    for (const kind of ["protan", "deutan", "tritan"] as const) {
      expect(deltaE(simulate(divergingColor(-1), kind), simulate(divergingColor(1), kind)), kind).toBeGreaterThan(0.12);
      expect(deltaE(simulate(divergingColor(-0.5), kind), simulate(divergingColor(0.5), kind)), kind).toBeGreaterThan(
        0.06,
      );
    }
  });
});
