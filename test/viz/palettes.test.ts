import { describe, expect, it } from "vitest";
import { deltaE, hexToOklab } from "@/lib/viz/colorSpace";
import { divergingColor } from "@/lib/viz/divergingColor";
import { sequentialColor } from "@/lib/viz/sequentialColor";
import { expectClose } from "../helpers/close";
import { deltaE76, hexToCielab, MACHADO_2009, simulate, simulateHex } from "./cvd";

const samples = (n: number, lo: number, hi: number) =>
  Array.from({ length: n }, (_, i) => lo + ((hi - lo) * i) / (n - 1));

describe("the colour-deficiency matrices used by these tests", () => {
  it("keep white white: every row sums to 1 (Machado et al. 2009, from memory)", () => {
    for (const [kind, m] of Object.entries(MACHADO_2009)) {
      for (const row of m) expectClose(row[0] + row[1] + row[2], 1, { abs: 2e-4 }, kind);
    }
  });
});

describe("the CIELAB conversion used by these tests", () => {
  it("puts sRGB white at L* 100, a* = b* = 0 and pure red at (53.24, 80.09, 67.20) (CIE 15:2004 with D65; the red values common practice, from memory)", () => {
    const white = hexToCielab("#ffffff");
    expectClose(white.L, 100, { abs: 1e-3 }, "white L*");
    expectClose(Math.hypot(white.a, white.b), 0, { abs: 0.02 }, "white chroma");
    const red = hexToCielab("#ff0000");
    expectClose(red.L, 53.24, { abs: 0.02 }, "red L*");
    expectClose(red.a, 80.09, { abs: 0.05 }, "red a*");
    expectClose(red.b, 67.2, { abs: 0.05 }, "red b*");
  });
});

/**
 * The legend's ramp steps (9 on the flux ramp, 17 on the Ox ramp: networkLegend), seen with deuteranopia
 * (Machado et al. 2009, severity 1.0) and with protanopia: every pair of neighbouring steps differs by more
 * than ΔE*ab 5, about twice the just-noticeable difference of 2.3 (Sharma & Trussell 1997, from memory), so
 * that a reader with red–green colour-vision deficiency tells one step from the next. Threshold: common practice.
 */
describe("neighbouring ramp steps under simulated red–green deficiency", () => {
  const MIN_DELTA_E = 5;
  const steps = (n: number, color: (t: number) => string, lo: number) =>
    Array.from({ length: n }, (_, i) => color(lo + ((1 - lo) * i) / (n - 1)));
  const ramps = { flux: steps(9, sequentialColor, 0), ox: steps(17, divergingColor, -1) };
  for (const kind of ["deutan", "protan"] as const) {
    for (const [name, ramp] of Object.entries(ramps)) {
      it(`keeps every neighbouring step of the ${name} ramp more than ΔE*ab ${MIN_DELTA_E} apart (${kind})`, () => {
        const seen = ramp.map((c) => hexToCielab(simulateHex(c, kind)));
        for (let i = 1; i < seen.length; i++)
          expect(deltaE76(seen[i - 1], seen[i]), `${name} steps ${i - 1}–${i}`).toBeGreaterThan(MIN_DELTA_E);
      });
    }
  }
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
