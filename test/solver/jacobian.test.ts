/**
 * The analytic mass-action Jacobians against central finite differences
 * (common practice), on the reference mechanism near 30 km.
 */
import { describe, expect, it } from "vitest";
import { loadBuiltinMechanism } from "../../lib/mechanism";
import { jacobianLinear, jacobianLog, reactionRates } from "../../lib/solver/massAction";
import { expectClose } from "../helpers/close";
import { offSteadyPoint } from "./offSteadyPoint";
import { realisticConditions } from "./realistic";

const mech = loadBuiltinMechanism("reference").mechanism;
const cond = realisticConditions(mech, 30, 30, "solved");
const { sys, kEff, n, x0, tendency } = offSteadyPoint(mech, cond);

describe("mass-action Jacobian", () => {
  it("matches central differences in ln x to 1e-6 relative", () => {
    const rates = new Float64Array(sys.nReactions);
    reactionRates(sys, kEff, x0, rates);
    const J = new Float64Array(n * n);
    jacobianLog(sys, rates, J);
    const h = 1e-4;
    const gross = new Float64Array(n);
    tendency(x0, gross);
    for (let l = 0; l < n; l++) {
      const up = Float64Array.from(x0);
      const dn = Float64Array.from(x0);
      up[l] *= Math.exp(h);
      dn[l] *= Math.exp(-h);
      const fu = tendency(up);
      const fd = tendency(dn);
      for (let i = 0; i < n; i++) {
        const fdv = (fu[i] - fd[i]) / (2 * h);
        // truncation ~h² relative; round-off of the differenced tendency ~1e-16 (P + L) / h
        const bound = 1e-6 * Math.abs(J[i * n + l]) + (1e-14 * gross[i]) / h;
        expect(Math.abs(J[i * n + l] - fdv)).toBeLessThanOrEqual(bound);
      }
    }
  });

  it("in linear form equals the log form divided by x", () => {
    const rates = new Float64Array(sys.nReactions);
    reactionRates(sys, kEff, x0, rates);
    const Ju = new Float64Array(n * n);
    const Jx = new Float64Array(n * n);
    jacobianLog(sys, rates, Ju);
    jacobianLinear(sys, kEff, x0, Jx);
    for (let i = 0; i < n; i++) {
      for (let l = 0; l < n; l++) {
        expectClose(Jx[i * n + l] * x0[l], Ju[i * n + l], { rel: 1e-12, abs: 1e-300 }, `J[${i}][${l}]`);
      }
    }
  });
});
