/**
 * Surface chemistry benchmarks on the reference mechanism: the cost of the
 * amount-dependent γ (Shi et al. 2001 on sulfate, the partner limit on NAT
 * and ice) in a steady state, and the cold-start steady state of the
 * invented vortex parcel (lib/engine/demoConditions.ts). Conditions are
 * resolved in setup and not timed.
 *
 * - "γ evaluation": one call of sulfateGammas (three γ at one state).
 * - "steady state 30 km, γ evaluated": the cold start at 30 km, noon, 45° N.
 * - "steady state 30 km, γ frozen": the same with each amount-dependent law
 *   replaced by a constant-γ uptake at its value in the solution, so the
 *   difference of the two is what computing γ costs.
 * - "vortex parcel, cold start": the instantaneous steady state of the demo.
 */
import { POLAR_VORTEX_DEMO } from "../../lib/engine/demoConditions";
import { resolveCondition, solveConditionsOf } from "../../lib/engine/resolveCondition";
import { sulfateGammas } from "../../lib/kinetics";
import { loadBuiltinMechanism } from "../../lib/mechanism";
import type { CompiledMechanism } from "../../lib/mechanism/types";
import { solveSteadyState } from "../../lib/solver";
import { buildSystem } from "../../lib/solver/buildSystem";
import type { BenchCase } from "../types";

/** The mechanism with every amount-dependent γ frozen at its value in `state` (cm⁻³ by species index). */
function frozen(mech: CompiledMechanism, cond: Parameters<typeof buildSystem>[1], state: number[]): CompiledMechanism {
  const sys = buildSystem(mech, cond);
  const gamma = new Map<number, number>();
  for (const d of sys.dependent) {
    d.species.forEach((s, q) => {
      d.amounts[q] = state[s];
    });
    gamma.set(d.reaction, d.gamma(d.amounts));
  }
  return {
    ...mech,
    reactions: mech.reactions.map((r) => {
      const g = gamma.get(r.index);
      if (g === undefined || (r.rate.law !== "uptake" && r.rate.law !== "liquid-aerosol")) return r;
      const surface = r.rate.law === "uptake" ? r.rate.surface : undefined;
      return { ...r, rate: { law: "uptake", gamma: g, molarMass_gmol: r.rate.molarMass_gmol, surface } };
    }),
  };
}

export async function setup(): Promise<BenchCase[]> {
  const mech = loadBuiltinMechanism("reference").mechanism;
  const at30 = solveConditionsOf(resolveCondition(mech, { altitude_km: 30 }));
  const solved30 = solveSteadyState(mech, at30);
  const fixed30 = frozen(mech, at30, solved30.numberDensity_cm3);
  const vortex = solveConditionsOf(resolveCondition(mech, POLAR_VORTEX_DEMO.condition));
  const p = 50 / 1013.25;
  const gammaInput = { T_K: 192, pH2O_atm: 5e-6 * p, pHCl_atm: 1.5e-9 * p, pClONO2_atm: 1e-9 * p };
  // warm the compiled code of all three solves alike, so that the first case timed is not the one that pays for it
  for (let i = 0; i < 30; i++) {
    solveSteadyState(mech, at30);
    solveSteadyState(fixed30, at30);
    solveSteadyState(mech, vortex);
  }
  return [
    {
      name: "steady state 30 km, γ evaluated",
      run: () => solveSteadyState(mech, at30),
      note: `${solved30.iterations} iterations, ${solved30.status}`,
    },
    { name: "steady state 30 km, γ frozen", run: () => solveSteadyState(fixed30, at30) },
    {
      name: "vortex parcel (invented), cold start",
      run: () => {
        const s = solveSteadyState(mech, vortex);
        if (s.status !== "converged") throw new Error(`vortex parcel: ${s.status}`);
        return s;
      },
    },
    { name: "γ evaluation (sulfateGammas, 192 K)", run: () => sulfateGammas(gammaInput) },
  ];
}
