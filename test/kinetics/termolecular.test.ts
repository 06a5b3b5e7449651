import { describe, expect, it } from "vitest";
import { falloff, termolecular } from "../../lib/kinetics";
import { expectClose } from "../helpers/close";

describe("termolecular (JPL 19-5 falloff form)", () => {
  it("matches ClO + NO2 + M at 220 K and [M] = 1e18 cm⁻³ worked by hand from the published formula", () => {
    // JPL 19-5, Table 2-1 (from memory): k0(300) = 1.8e-31, n = 3.4, k∞(300) = 1.5e-11, m = 1.9.
    // By hand: k0[M] = 1.8e-31 (220/300)^-3.4 × 1e18 = 5.1671e-13; k∞ = 1.5e-11 (220/300)^-1.9 = 2.7041e-11;
    // x = 0.019109, log10 x = −1.71877, exponent 1/(1 + 2.95420) = 0.25290,
    // k = 5.1671e-13/1.019109 × 0.6^0.25290 = 5.0702e-13 × 0.87881 = 4.4558e-13.
    const k = termolecular({ k0_300: 1.8e-31, n: 3.4, kinf_300: 1.5e-11, m: 1.9 }, 220, 1e18);
    expectClose(k, 4.4558e-13, { rel: 2e-4 });
    // docs/references.md, Kinetics, gives the same computed value, 4.46e-13
    expectClose(k, 4.46e-13, { rel: 0.002 });
  });

  it("matches OH + NO2 + M at 220 K and [M] = 1e18 cm⁻³ worked by hand", () => {
    // JPL 19-5, Table 2-1 (from memory): 1.8e-30, n = 3.0, 2.8e-11, m = 0.
    // By hand: k0[M] = 4.5642e-12, x = 0.16301, log10 x = −0.78779, exponent 0.61705,
    // k = 4.5642e-12/1.16301 × 0.6^0.61705 = 3.9245e-12 × 0.72964 = 2.8635e-12.
    const k = termolecular({ k0_300: 1.8e-30, n: 3, kinf_300: 2.8e-11, m: 0 }, 220, 1e18);
    expectClose(k, 2.8635e-12, { rel: 2e-4 });
  });

  it("uses Fc = 0.6 unless another broadening factor is given", () => {
    const p = { k0_300: 1.8e-30, n: 3, kinf_300: 2.8e-11, m: 0 };
    expect(termolecular(p, 250, 3e17)).toBe(termolecular({ ...p, Fc: 0.6 }, 250, 3e17));
    expect(termolecular({ ...p, Fc: 0.45 }, 250, 3e17)).toBeLessThan(termolecular(p, 250, 3e17));
  });

  it("gives k∞/2 · Fc exactly where k0[M] = k∞ (the centre of the falloff curve)", () => {
    // identity of the published formula: x = 1 → log10 x = 0 → Fc^1
    expectClose(falloff(3e-12, 3e-12, 0.6), 0.5 * 3e-12 * 0.6, { rel: 1e-14 });
  });

  it("tends to the low-pressure limit k0[M] at low density and to k∞ at high density", () => {
    // the broadening factor approaches 1 only logarithmically, so the limits are taken far out
    const p = { k0_300: 1.8e-31, n: 3.4, kinf_300: 1.5e-11, m: 1.9 };
    const lowLimit = termolecular({ k0_300: p.k0_300, n: p.n }, 230, 1);
    expectClose(termolecular(p, 230, 1), lowLimit, { rel: 2e-3 });
    const kinf = 1.5e-11 * (230 / 300) ** -1.9;
    expectClose(termolecular(p, 230, 1e40), kinf, { rel: 2e-3 });
    expect(termolecular(p, 230, 1e18)).toBeLessThan(termolecular({ k0_300: p.k0_300, n: p.n }, 230, 1e18));
  });

  it("returns the low-pressure limit k0(T)[M] when k∞ is omitted (O + O2 + M)", () => {
    // JPL 19-5 (from memory): 6.0e-34 (T/300)^-2.4; by hand at 220 K: 6.0e-34 × 2.10512 = 1.2631e-33
    // (docs/references.md, Kinetics: k0(220) = 1.263e-33)
    expectClose(termolecular({ k0_300: 6.0e-34, n: 2.4 }, 220, 1), 1.2631e-33, { rel: 2e-4 });
    expectClose(termolecular({ k0_300: 6.0e-34, n: 2.4 }, 220, 5e17), 1.2631e-33 * 5e17, { rel: 2e-4 });
  });

  it("is 0 when there is no third body", () => {
    expect(termolecular({ k0_300: 1.8e-31, n: 3.4, kinf_300: 1.5e-11, m: 1.9 }, 220, 0)).toBe(0);
  });
});
