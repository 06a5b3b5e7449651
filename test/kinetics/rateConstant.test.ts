import { describe, expect, it } from "vitest";
import { effectiveRateConstant, rateConstant } from "../../lib/kinetics";
import type { RateLaw } from "../../lib/kinetics/types";
import type { CompiledReaction } from "../../lib/mechanism/types";
import { expectClose } from "../helpers/close";

const env = { T_K: 230, M_cm3: 2e17, J_s: { NO2: 8e-3, O3_O1D: 2e-4 } };

function reaction(rate: RateLaw, thirdBody: boolean): CompiledReaction {
  return { index: 0, id: "R", equation: "", reactants: [], products: [], thirdBody, photolysis: false, rate };
}

describe("rateConstant", () => {
  it("reads J from the named channel, scaled by its factor", () => {
    expect(rateConstant({ law: "photolysis", channel: "NO2" }, env)).toBe(8e-3);
    expectClose(rateConstant({ law: "photolysis", channel: "O3_O1D", factor: 0.5 }, env), 1e-4, { rel: 1e-15 });
  });

  it("gives J = 0 for a channel the conditions do not name (night)", () => {
    expect(rateConstant({ law: "photolysis", channel: "Cl2O2" }, env)).toBe(0);
  });

  it("returns a fixed J as given", () => {
    expect(rateConstant({ law: "photolysis-fixed", J_s: 3e-5 }, env)).toBe(3e-5);
  });

  it("divides the forward law by K(T) for a reverse rate", () => {
    const forward: RateLaw = { law: "termolecular", k0_300: 2.4e-30, n: 3, kinf_300: 1.6e-12, m: -0.1 };
    const k = rateConstant({ law: "equilibrium-reverse", forward, Keq_A_cm3: 2.9e-27, Keq_B_K: 10840 }, env);
    expectClose(k, rateConstant(forward, env) / (2.9e-27 * Math.exp(10840 / 230)), { rel: 1e-14 });
  });

  it("throws a precise error for an unknown law", () => {
    expect(() => rateConstant({ law: "tabulated" } as unknown as RateLaw, env)).toThrow(/unknown rate law "tabulated"/);
  });
});

describe("effectiveRateConstant", () => {
  it("multiplies an Arrhenius law by [M] when the equation has + M (HO2 + HO2 + M)", () => {
    // JPL 19-5 (from memory): [M]-dependent part 2.1e-33 [M] exp(920/T)
    const law: RateLaw = { law: "arrhenius", A: 2.1e-33, EoverR_K: -920 };
    expectClose(effectiveRateConstant(reaction(law, true), env), 2.1e-33 * Math.exp(920 / 230) * 2e17, { rel: 1e-14 });
    expectClose(effectiveRateConstant(reaction(law, false), env), 2.1e-33 * Math.exp(920 / 230), { rel: 1e-14 });
  });

  it("does not multiply a termolecular or reverse law by [M] again", () => {
    const law: RateLaw = { law: "termolecular", k0_300: 6e-34, n: 2.4 };
    expect(effectiveRateConstant(reaction(law, true), env)).toBe(rateConstant(law, env));
    const rev: RateLaw = { law: "equilibrium-reverse", forward: law, Keq_A_cm3: 1e-27, Keq_B_K: 9000 };
    expect(effectiveRateConstant(reaction(rev, true), env)).toBe(rateConstant(rev, env));
  });
});
