/**
 * Builds the SteadyState report from number densities and rates: per-species
 * production, loss and lifetime from the net stoichiometry of each reaction,
 * per-reaction k and rate (k of an amount-dependent surface reaction is its
 * first-order constant γ(a) v̄ A / 4 at the state), and the net chemical source of each constrained
 * pool Σ w_i (P_i − L_i). Every number is forced finite (non-finite → 0) so
 * that a failed solve still yields a well-formed report.
 *
 * Units: molecules cm⁻³, molecules cm⁻³ s⁻¹, s.
 */
import type { ChemSystem } from "./buildSystem";
import type { PoolSource, SolveStatus, SpeciesState, SteadyState } from "./types";

const finite = (v: number): number => (Number.isFinite(v) ? v : 0);

export interface AssembleInput {
  sys: ChemSystem;
  T_K: number;
  M_cm3: number;
  /** rate constant per reaction (as reported) */
  k: ArrayLike<number>;
  /** number density by species index, cm⁻³ */
  numberDensity: ArrayLike<number>;
  /** rate per reaction, cm⁻³ s⁻¹ */
  rates: ArrayLike<number>;
  status: SolveStatus;
  message: string;
  iterations: number;
  residualNorm: number;
  coldStartSteps: number;
  warnings: string[];
}

export function assembleSteadyState(inp: AssembleInput): SteadyState {
  const { sys, M_cm3 } = inp;
  const mech = sys.mech;
  const ns = mech.species.length;
  const nr = mech.reactions.length;
  const P = new Float64Array(ns);
  const L = new Float64Array(ns);
  const rate_cm3s = new Array<number>(nr);
  for (let j = 0; j < nr; j++) {
    const r = finite(inp.rates[j]);
    rate_cm3s[j] = r;
    for (let q = sys.aStart[j]; q < sys.aStart[j + 1]; q++) {
      const nu = sys.aNu[q];
      if (nu > 0) P[sys.aSpecies[q]] += nu * r;
      else L[sys.aSpecies[q]] -= nu * r;
    }
  }
  const numberDensity_cm3 = new Array<number>(ns);
  const species: SpeciesState[] = [];
  for (let s = 0; s < ns; s++) {
    const sp = mech.species[s];
    const x = finite(inp.numberDensity[s]);
    numberDensity_cm3[s] = x;
    if (sp.role === "third-body") continue;
    const lifetime = L[s] > 0 ? x / L[s] : null;
    species.push({
      id: sp.id,
      index: s,
      role: sys.unknownOf[s] >= 0 ? "solved" : "held",
      numberDensity_cm3: x,
      mixingRatio: finite(x / M_cm3),
      production_cm3s: P[s],
      loss_cm3s: L[s],
      lifetime_s: lifetime !== null && Number.isFinite(lifetime) ? lifetime : null,
    });
  }
  const pools: PoolSource[] = sys.constraints.map((c) => {
    let source = 0;
    for (let q = 0; q < c.members.length; q++) {
      const s = sys.unknownSpecies[c.members[q]];
      source += c.weights[q] * (P[s] - L[s]);
    }
    return {
      pool: c.poolId,
      externalSource_cm3s: finite(source),
      replacedEquation: c.replaced >= 0 ? mech.species[sys.unknownSpecies[c.replaced]].id : "",
      total_cm3: c.requestedTotal,
    };
  });
  const gammaAt = new Map<number, number>();
  for (const d of sys.dependent) {
    d.species.forEach((sp, q) => {
      d.amounts[q] = inp.numberDensity[sp];
    });
    gammaAt.set(d.reaction, d.gamma(d.amounts));
  }
  return {
    status: inp.status,
    message: inp.message,
    iterations: inp.iterations,
    residualNorm: finite(inp.residualNorm),
    T_K: inp.T_K,
    M_cm3,
    species,
    reactions: mech.reactions.map((r, j) => ({
      id: r.id,
      equation: r.equation,
      k: finite(inp.k[j] * (gammaAt.get(j) ?? 1)),
      rate_cm3s: rate_cm3s[j],
    })),
    pools,
    numberDensity_cm3,
    rate_cm3s,
    warnings: inp.warnings,
    coldStartSteps: inp.coldStartSteps,
  };
}
