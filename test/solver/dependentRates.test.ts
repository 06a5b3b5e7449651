/**
 * Reactions whose γ depends on amounts (the HCl partner of a surface
 * reaction, the HCl and water of a sulfate solution): their rate and
 * Jacobian through γ, against central finite differences (common practice),
 * on the reference mechanism in an invented cold vortex parcel with NAT.
 */
import { describe, expect, it } from "vitest";
import { resolveCondition, solveConditionsOf } from "@/lib/engine/resolveCondition";
import { loadBuiltinMechanism } from "@/lib/mechanism";
import { jacobianLinear, jacobianLog, reactionRates } from "@/lib/solver/massAction";
import { expectClose } from "../helpers/close";
import { offSteadyPoint } from "./offSteadyPoint";

const mech = loadBuiltinMechanism("reference").mechanism;
const cond = solveConditionsOf(
  resolveCondition(mech, { altitude_km: 19, T_K: 192, latitude_deg: 70, date: "2026-03-01", cloud: "NAT" }),
);
const { sys, kEff, n, state, x0, tendency } = offSteadyPoint(mech, cond);
const idx = (id: string) => mech.reactions.findIndex((r) => r.id === id);

describe("amount-dependent surface reactions", () => {
  it("lists the sulfate and partner-limited reactions, and no constant-γ uptake", () => {
    const ids = sys.dependent.map((d) => mech.reactions[d.reaction].id);
    expect(ids).toContain("HET_ClONO2_HCl_sulfate");
    expect(ids).toContain("HET_ClONO2_HCl_NAT");
    expect(ids).toContain("HET_ClONO2_H2O_sulfate");
    expect(ids).not.toContain("HET_N2O5");
    expect(ids).not.toContain("HET_ClONO2_H2O_NAT");
  });

  it("makes ClONO2 + HCl on NAT first order in ClONO2 while HCl is plentiful: rate = γ v̄ A/4 [ClONO2] (JPL 19-5 form)", () => {
    const j = idx("HET_ClONO2_HCl_NAT");
    const x = Float64Array.from(x0);
    x[sys.unknownOf[mech.speciesIndex.HCl]] = 1e12; // ≫ γ·0.612·[ClONO2]
    const rates = new Float64Array(sys.nReactions);
    reactionRates(sys, kEff, x, rates);
    const clono2 = x[sys.unknownOf[mech.speciesIndex.ClONO2]];
    expectClose(rates[j], 0.2 * kEff[j] * clono2, { rel: 1e-3 });
    x[sys.unknownOf[mech.speciesIndex.ClONO2]] *= 2;
    const twice = new Float64Array(sys.nReactions);
    reactionRates(sys, kEff, x, twice);
    expectClose(twice[j], 2 * rates[j], { rel: 2e-3 });
  });

  it("has a log Jacobian that matches central differences in ln x to 1e-5 relative, γ's HCl dependence included", () => {
    const rates = new Float64Array(sys.nReactions);
    reactionRates(sys, kEff, x0, rates);
    const J = new Float64Array(n * n);
    jacobianLog(sys, rates, J, x0);
    const h = 1e-4;
    const gross = new Float64Array(n);
    tendency(x0, gross);
    const hcl = sys.unknownOf[mech.speciesIndex.HCl];
    let checked = 0;
    for (const l of [hcl, sys.unknownOf[mech.speciesIndex.ClONO2], sys.unknownOf[mech.speciesIndex.HOCl]]) {
      const up = Float64Array.from(x0);
      const dn = Float64Array.from(x0);
      up[l] *= Math.exp(h);
      dn[l] *= Math.exp(-h);
      const fu = tendency(up);
      const fd = tendency(dn);
      for (let i = 0; i < n; i++) {
        const fdv = (fu[i] - fd[i]) / (2 * h);
        const bound = 1e-5 * Math.abs(J[i * n + l]) + (1e-14 * gross[i]) / h;
        expect(Math.abs(J[i * n + l] - fdv)).toBeLessThanOrEqual(bound);
        if (Math.abs(fdv) > 0) checked++;
      }
    }
    expect(checked).toBeGreaterThan(5);
  });

  it("has a linear Jacobian equal to the log form divided by x", () => {
    const rates = new Float64Array(sys.nReactions);
    reactionRates(sys, kEff, x0, rates);
    const Ju = new Float64Array(n * n);
    const Jx = new Float64Array(n * n);
    jacobianLog(sys, rates, Ju, x0);
    jacobianLinear(sys, kEff, x0, Jx);
    const hcl = sys.unknownOf[mech.speciesIndex.HCl];
    for (let i = 0; i < n; i++) expectClose(Jx[i * n + hcl] * x0[hcl], Ju[i * n + hcl], { rel: 1e-9, abs: 1e-300 });
  });

  it("converges to a steady state with a small residual and reports k as the first-order γ v̄ A / 4 at the state", () => {
    expect(state.status).toBe("converged");
    expect(state.residualNorm).toBeLessThan(1e-9);
    const j = idx("HET_ClONO2_HCl_NAT");
    const clono2 = state.numberDensity_cm3[mech.speciesIndex.ClONO2];
    expectClose(state.reactions[j].k * clono2, state.rate_cm3s[j], { rel: 1e-9 });
  });
});
