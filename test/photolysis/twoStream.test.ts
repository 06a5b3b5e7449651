import { describe, expect, it } from "vitest";
import { type TwoStreamColumn, twoStreamFluxes } from "../../lib/photolysis/twoStream";
import { expectClose } from "../helpers/close";
import { continuityFluxes } from "./continuitySystem";

/** A plane-parallel column: the slant optical depth is the vertical one over μ0. */
function column(
  layers: Array<{ tau: number; omega: number; g?: number }>,
  mu0: number,
  albedo: number,
): TwoStreamColumn {
  const N = layers.length;
  const slant = new Float64Array(N + 1);
  for (let k = 0; k < N; k++) slant[k + 1] = slant[k] + layers[k].tau / mu0;
  return {
    layers: N,
    dtau: Float64Array.from(layers, (l) => l.tau),
    omega: Float64Array.from(layers, (l) => l.omega),
    g: Float64Array.from(layers, (l) => l.g ?? 0),
    slant,
    beam: 1,
    mu0,
    albedo,
  };
}

/**
 * Reflectance and total transmittance (direct + diffuse) of one homogeneous
 * layer over a black ground for a collimated beam, both relative to μ0·F0:
 * the two-stream analytic solution of Meador and Weaver (1980, J. Atmos. Sci.
 * 37, 630, their eqs. 14–15, written here from memory) with the Eddington γ's.
 */
function meadorWeaver(tau: number, omega: number, g: number, mu0: number) {
  const g1 = (7 - omega * (4 + 3 * g)) / 4;
  const g2 = -(1 - omega * (4 - 3 * g)) / 4;
  const g3 = (2 - 3 * g * mu0) / 4;
  const g4 = 1 - g3;
  const a1 = g1 * g4 + g2 * g3;
  const a2 = g1 * g3 + g2 * g4;
  const k = Math.sqrt(g1 * g1 - g2 * g2);
  const ep = Math.exp(k * tau);
  const em = Math.exp(-k * tau);
  const d = (1 - k * k * mu0 * mu0) * ((k + g1) * ep + (k - g1) * em);
  const R =
    (omega / d) *
    ((1 - k * mu0) * (a2 + k * g3) * ep -
      (1 + k * mu0) * (a2 - k * g3) * em -
      2 * k * (g3 - a2 * mu0) * Math.exp(-tau / mu0));
  const T =
    Math.exp(-tau / mu0) *
    (1 -
      (omega / d) *
        ((1 + k * mu0) * (a1 + k * g4) * ep -
          (1 - k * mu0) * (a1 - k * g4) * em -
          2 * k * (g4 + a1 * mu0) * Math.exp(tau / mu0)));
  return { R, T };
}

describe("twoStream (delta-Eddington fluxes of a layered column)", () => {
  it("matches the analytic single-layer solution of Meador and Weaver (1980) for reflectance and transmittance", () => {
    for (const [tau, omega, g, mu0] of [
      [0.1, 0.9, 0, 0.8],
      [1, 0.99, 0.3, 0.5],
      [3, 0.5, 0.7, 0.3],
      [0.5, 1 - 1e-9, 0, 1],
    ]) {
      const { up, down } = twoStreamFluxes(column([{ tau, omega, g }], mu0, 0));
      const ref = meadorWeaver(tau, omega, g, mu0);
      const direct = mu0 * Math.exp(-tau / mu0);
      expectClose(up[0] / mu0, ref.R, { rel: 1e-9, abs: 1e-14 }, `R at τ ${tau}, ω ${omega}`);
      expectClose((down[1] + direct) / mu0, ref.T, { rel: 1e-9, abs: 1e-14 }, `T at τ ${tau}, ω ${omega}`);
    }
  });

  it("loses no light without absorption: over a white ground the column reflects the whole beam and no net flux crosses any level", () => {
    const mu0 = 0.6;
    const col = column(
      [
        { tau: 0.05, omega: 1 },
        { tau: 0.4, omega: 1, g: 0.7 },
        { tau: 2, omega: 1 },
      ],
      mu0,
      1,
    );
    const { up, down } = twoStreamFluxes(col);
    // (ω = 1 is solved as 1 − 1e-10, so "lossless" holds to about 1e-9 here)
    expectClose(up[0], mu0, { rel: 1e-8 }, "reflected at the top");
    for (let i = 0; i <= col.layers; i++) {
      const net = down[i] + mu0 * Math.exp(-col.slant[i]) - up[i];
      expect(Math.abs(net), `net flux at interface ${i}`).toBeLessThan(1e-8);
    }
    // over a black ground all that is not reflected comes out at the bottom
    const black = twoStreamFluxes({ ...col, albedo: 0 });
    expectClose(black.up[0] + black.down[3] + mu0 * Math.exp(-col.slant[3]), mu0, { rel: 1e-8 }, "R + T = 1");
  });

  it("agrees with the global continuity system of Toon et al. (1989) on random columns", () => {
    let seed = 7;
    const rand = () => {
      seed = (seed * 1103515245 + 12345) % 2147483648;
      return seed / 2147483648;
    };
    for (let trial = 0; trial < 20; trial++) {
      const N = 1 + Math.floor(rand() * 40);
      const layers = Array.from({ length: N }, () => ({
        tau: 10 ** (-3 + 4 * rand()),
        omega: rand() * 0.999,
        g: rand() < 0.5 ? 0 : 0.8 * rand(),
      }));
      const col = column(layers, 0.1 + 0.9 * rand(), rand());
      const adding = twoStreamFluxes(col);
      const global = continuityFluxes(col);
      for (let i = 0; i <= N; i++) {
        expectClose(adding.up[i], global.up[i], { rel: 1e-7, abs: 1e-13 }, `F↑ ${trial}/${i}`);
        expectClose(adding.down[i], global.down[i], { rel: 1e-7, abs: 1e-13 }, `F↓ ${trial}/${i}`);
      }
    }
  });

  it("gives the same fluxes whether a homogeneous slab is one layer or many", () => {
    const mu0 = 0.7;
    const one = twoStreamFluxes(column([{ tau: 1.3, omega: 0.95, g: 0.5 }], mu0, 0.3));
    const many = twoStreamFluxes(column(Array(13).fill({ tau: 0.1, omega: 0.95, g: 0.5 }), mu0, 0.3));
    expectClose(many.up[0], one.up[0], { rel: 1e-10 });
    expectClose(many.down[13], one.down[1], { rel: 1e-10 });
  });

  it("has no diffuse light in a purely absorbing column but what the ground reflects, which the Eddington form reflects back slightly negatively", () => {
    const mu0 = 0.5;
    const col = column(
      [
        { tau: 0.2, omega: 0 },
        { tau: 0.3, omega: 0 },
      ],
      mu0,
      0,
    );
    const { up, down } = twoStreamFluxes(col);
    for (let i = 0; i <= 2; i++) {
      expect(up[i]).toBe(0);
      expect(down[i]).toBe(0);
    }
    const lit = twoStreamFluxes({ ...col, albedo: 0.4 });
    // the Lambertian boundary condition at the ground
    expectClose(lit.up[2], 0.4 * (lit.down[2] + mu0 * Math.exp(-col.slant[2])), { rel: 1e-12 }, "ground");
    // a purely absorbing layer reflects Γ = γ2/(γ1 + √3) ≈ −0.072 of diffuse light in the Eddington form
    // (γ1 = 7/4, γ2 = −1/4 at ω = 0: Toon et al. 1989 Table 1), a known flaw of that closure
    expect(lit.down[2]).toBeLessThan(0);
    expect(-lit.down[2]).toBeLessThan(0.072 * lit.up[2]);
  });
});
