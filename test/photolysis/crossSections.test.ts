import { describe, expect, it } from "vitest";
import {
  cl2CrossSection_cm2,
  expint1,
  expint2,
  n2oCrossSection_cm2,
  o1dQuantumYield,
  o3CrossSection_cm2,
  rayleighCrossSection_cm2,
  solarPhotonFlux_cm2snm,
  WAVELENGTH_GRID,
} from "../../lib/photolysis";
import { SPECTRAL_TABLES } from "../../lib/photolysis/spectralTables";
import { expectClose } from "../helpers/close";

describe("O3 cross section", () => {
  it("peaks in the Hartley band at about 1.1e-17 cm² near 255 nm", () => {
    // ≈ 1.15e-17 cm² near 255 nm at room temperature: JPL 19-5 §4, Molina & Molina, JGR 91, 14501 (1986),
    // (docs/references.md, Photolysis; from memory)
    let best = 0;
    let at = 0;
    for (let l = 230; l <= 280; l += 0.1) {
      const s = o3CrossSection_cm2(l, 295);
      if (s > best) [best, at] = [s, l];
    }
    expectClose(best, 1.13e-17, { rel: 0.03 }, "peak value");
    expectClose(at, 255, { abs: 2 }, "peak wavelength");
  });

  it("is 1.13e-17 cm² at the 253.65 nm mercury line within 2 %", () => {
    // consensus 1.1329e-17 cm²: Hodges et al., Metrologia 56, 034001 (2019) (value from memory)
    expectClose(o3CrossSection_cm2(253.65, 295), 1.1329e-17, { rel: 0.02 });
  });

  it("has a Chappuis maximum near 600 nm of about 5e-21 cm²", () => {
    // ~5e-21 cm² near 600 nm (JPL evaluation, from memory)
    expectClose(o3CrossSection_cm2(603, 295), 5e-21, { rel: 0.15 });
  });

  it("weakens on cooling in the Huggins bands and hardly changes in the Hartley band", () => {
    // the Huggins-band temperature dependence (JPL evaluation; common practice)
    expect(o3CrossSection_cm2(325, 218)).toBeLessThan(0.7 * o3CrossSection_cm2(325, 295));
    expectClose(o3CrossSection_cm2(255, 218), o3CrossSection_cm2(255, 295), { rel: 0.01 });
  });
});

describe("O(1D) quantum yield", () => {
  it("is 0.9 in the Hartley band and falls through 306–330 nm to a 0.08 tail, zero beyond 340 nm", () => {
    // Matsumi et al., JGR 107(D3), 4024 (2002), JPL recommendation (from memory)
    expect(o1dQuantumYield(280, 250)).toBe(0.9);
    expect(o1dQuantumYield(335, 250)).toBe(0.08);
    expect(o1dQuantumYield(345, 250)).toBe(0);
    let last = 1;
    for (let l = 306; l <= 328; l += 1) {
      const phi = o1dQuantumYield(l, 298);
      expect(phi).toBeLessThanOrEqual(last + 1e-12);
      last = phi;
    }
    expectClose(o1dQuantumYield(310, 298), 0.5, { abs: 0.1 }, "half-way near 310 nm");
  });

  it("is lower at low temperature in the falloff (fewer vibrationally excited O3)", () => {
    expect(o1dQuantumYield(318, 200)).toBeLessThan(o1dQuantumYield(318, 298));
  });
});

describe("the parameterized cross sections", () => {
  it("give N2O a peak near 182 nm of about 1.4e-19 cm², weaker at low temperature", () => {
    // JPL evaluation: peak ≈ 1.4e-19 cm² near 182 nm (from memory)
    expectClose(n2oCrossSection_cm2(182, 298), 1.4e-19, { rel: 0.15 });
    expect(n2oCrossSection_cm2(205, 220)).toBeLessThan(n2oCrossSection_cm2(205, 298));
    expect(n2oCrossSection_cm2(250, 298)).toBe(0);
  });

  it("give Cl2 its 330 nm band maximum of about 2.6e-19 cm²", () => {
    // JPL evaluation / Maric et al. 1993: ≈ 2.55e-19 cm² at 330 nm, 298 K (from memory)
    expectClose(cl2CrossSection_cm2(330, 298), 2.55e-19, { rel: 0.05 });
  });

  it("give air a Rayleigh cross section of 4.5e-27 cm² at 550 nm", () => {
    // ≈ 4.5e-27 cm² at 550 nm (Bates 1984; Nicolet 1984; from memory)
    expectClose(rayleighCrossSection_cm2(550), 4.5e-27, { rel: 0.05 });
    // λ^-4 to within the dispersion term
    const ratio = rayleighCrossSection_cm2(300) / rayleighCrossSection_cm2(600);
    expect(ratio).toBeGreaterThan(16);
    expect(ratio).toBeLessThan(22);
  });
});

describe("the O2 cross sections", () => {
  it("are zero in every bin above the 242 nm dissociation threshold", () => {
    // λ < 242 nm (D0(O2) = 5.115 eV → 242.4 nm; docs/references.md, Photolysis; recomputed)
    const G = WAVELENGTH_GRID;
    for (let i = 0; i < G.n; i++) {
      if (G.lower_nm[i] >= 242) expect(SPECTRAL_TABLES.fixed.O2[i], `bin ${G.lower_nm[i]} nm`).toBe(0);
      if (G.lower_nm[i] >= 242) expect(SPECTRAL_TABLES.srMax[i]).toBe(0);
    }
    expect(SPECTRAL_TABLES.fixed.O2[G.srEnd + 10]).toBeGreaterThan(0);
  });
});

describe("the solar spectrum", () => {
  it("carries about 53 % of the 1361 W m⁻² solar constant between 200 and 750 nm", () => {
    // total solar irradiance 1361 W m⁻² (Kopp & Lean, GRL 38, L01706, 2011); fraction below 750 nm ≈ 50–55 % (from memory)
    let sum_W = 0;
    const h = 6.62607015e-34;
    const c = 299792458;
    for (let l = 200; l < 750; l += 0.5) {
      sum_W += ((solarPhotonFlux_cm2snm(l + 0.25) * 1e4 * h * c) / ((l + 0.25) * 1e-9)) * 0.5;
    }
    expect(sum_W / 1361).toBeGreaterThan(0.48);
    expect(sum_W / 1361).toBeLessThan(0.58);
  });

  it("bins the photon flux so that the grid total equals the integral of the nodes", () => {
    const G = WAVELENGTH_GRID;
    let grid = 0;
    let direct = 0;
    for (let i = 0; i < G.n; i++) if (G.lower_nm[i] >= 300) grid += G.flux_cm2s[i];
    for (let l = 300; l < 750; l += 0.05) direct += solarPhotonFlux_cm2snm(l + 0.025) * 0.05;
    expectClose(grid, direct, { rel: 1e-3 });
  });
});

describe("exponential integrals", () => {
  function numeric(n: number, x: number): number {
    // ∫₁^∞ e^(−xt)/tⁿ dt by the midpoint rule in u = ln t
    let s = 0;
    const du = 1e-4;
    for (let u = du / 2; u < 40; u += du) {
      const t = Math.exp(u);
      const f = Math.exp(-x * t) / t ** (n - 1);
      s += f * du;
      if (x * t > 700) break;
    }
    return s;
  }
  for (const x of [1e-3, 0.1, 0.5, 1, 2, 5, 10]) {
    it(`match direct integration at x = ${x}`, () => {
      expectClose(expint1(x), numeric(1, x), { rel: 1e-4, abs: 1e-7 });
      expectClose(expint2(x), numeric(2, x), { rel: 5e-4, abs: 1e-7 });
    });
  }
  it("give E2(0) = 1", () => {
    expect(expint2(0)).toBe(1);
  });
});
