/**
 * The chemistry of a `ChemSystem` as an ODE for the Rosenbrock integrator:
 * dx/dt = Σ_j ν_ij r_j(x) over the unknowns, with the analytic Jacobian of
 * mass-action kinetics. Rate constants come from a callback of time so that
 * photolysis can follow the sun.
 *
 * Units: x in molecules cm⁻³, t in s.
 */
import type { ChemSystem } from "./buildSystem";
import { jacobianLinear, reactionRates } from "./massAction";
import type { OdeSystem } from "./rosenbrock";

/** `kEffAt(t, out)` writes the effective constants (k × held factors) at time t into out. */
export function chemistryOde(
  sys: ChemSystem,
  kEffAt: (t_s: number, out: Float64Array) => void,
  autonomous: boolean,
): OdeSystem {
  const kEff = new Float64Array(sys.nReactions);
  const rates = new Float64Array(sys.nReactions);
  let kTime = Number.NaN;
  const at = (t: number) => {
    if (t !== kTime) {
      kEffAt(t, kEff);
      kTime = t;
    }
  };
  return {
    n: sys.n,
    autonomous,
    rhs(t, y, dydt) {
      at(t);
      reactionRates(sys, kEff, y, rates);
      dydt.fill(0);
      const { sStart, sUnknown, sNu } = sys;
      for (let j = 0; j < sys.nReactions; j++) {
        const r = rates[j];
        if (r === 0) continue;
        for (let q = sStart[j]; q < sStart[j + 1]; q++) dydt[sUnknown[q]] += sNu[q] * r;
      }
    },
    jacobian(t, y, jac) {
      at(t);
      jacobianLinear(sys, kEff, y, jac);
    },
  };
}
