/**
 * Normalised local sensitivities of a steady state, S_oj = ∂ln[X_o]/∂ln k_j,
 * by the implicit-function theorem on the steady-state equations G(u, ln k) = 0
 * (u = ln x, pool rows as in the solve): ∂u/∂ln k_j = −(∂G/∂u)⁻¹ ∂G/∂ln k_j with
 * ∂F_i/∂ln k_j = ν_ij r_j. Computed in adjoint form, one transposed solve per
 * output: (∂G/∂u)ᵀ λ_o = e_o, S_oj = −λ_oᵀ ∂G/∂ln k_j (e.g. Saltelli, Ratto,
 * Tarantola & Campolongo, Chem. Rev. 105, 2811–2828, 2005, §2 on local methods).
 * Rows are scaled by 1/(P + L) and equilibrated before the LU (as in the solve).
 *
 * Units: dimensionless.
 */
import { InputError } from "../errors";
import { hasId, ownValue } from "../idRecord";
import type { CompiledMechanism } from "../mechanism/types";
import { buildSystem } from "./buildSystem";
import { luFactor, luSolveTransposed } from "./denseLu";
import { effectiveConstants, jacobianLog } from "./massAction";
import { evaluateResidual, NewtonWorkspace } from "./newtonLog";
import { rateConstants } from "./rateConstants";
import type { SolveConditions, SteadyState, SteadyStateOptions } from "./types";

export interface SensitivityResult {
  status: "ok" | "not-converged" | "singular";
  message: string;
  /** output species ids, in the order asked */
  outputs: string[];
  /** reaction ids, by mechanism index */
  reactions: string[];
  /** coefficients[o][j] = ∂ln[outputs[o]]/∂ln k_j (0 for a held output) */
  coefficients: number[][];
}

export function steadyStateSensitivities(
  mech: CompiledMechanism,
  cond: SolveConditions,
  state: SteadyState,
  outputs: readonly string[],
  options: Pick<SteadyStateOptions, "rateConstants" | "rateMultipliers"> = {},
): SensitivityResult {
  for (const id of outputs)
    if (!hasId(mech.speciesIndex, id)) throw new InputError(`outputs.${id}`, `unknown species ${id}`);
  if (!state || state.numberDensity_cm3?.length !== mech.species.length) {
    throw new InputError("state", `must be a SteadyState of this mechanism (${mech.species.length} species)`);
  }
  const nr = mech.reactions.length;
  const zero = (): SensitivityResult["coefficients"] => outputs.map(() => new Array<number>(nr).fill(0));
  const base = { outputs: [...outputs], reactions: mech.reactions.map((r) => r.id) };
  if (state.status !== "converged") {
    return {
      ...base,
      status: "not-converged",
      message: `the state is not a converged steady state (${state.status})`,
      coefficients: zero(),
    };
  }
  const sys = buildSystem(mech, cond);
  const n = sys.n;
  for (const c of sys.constraints) {
    const p = state.pools.find((q) => q.pool === c.poolId);
    const s = p ? ownValue(mech.speciesIndex, p.replacedEquation) : undefined;
    c.replaced = s !== undefined ? sys.unknownOf[s] : -1;
    if (c.replaced < 0) throw new InputError("state.pools", `no replaced equation for pool ${c.poolId} in the state`);
  }
  const k = rateConstants(mech, cond, options);
  const kEff = effectiveConstants(sys, k, new Float64Array(nr));
  const ws = new NewtonWorkspace(n, nr);
  const u = Float64Array.from(sys.unknownSpecies, (s) => Math.log(Math.max(state.numberDensity_cm3[s], 1e-300)));
  evaluateResidual(sys, kEff, u, ws);
  const A = ws.A;
  jacobianLog(sys, ws.rates, A, ws.x);
  const isConstraint = new Uint8Array(n);
  for (const c of sys.constraints) {
    isConstraint[c.replaced] = 1;
    const row = c.replaced * n;
    A.fill(0, row, row + n);
    for (let q = 0; q < c.members.length; q++) A[row + c.members[q]] += c.weights[q] * ws.x[c.members[q]];
  }
  // row scaling d_i = equilibration · 1/(P + L) (or 1/total)
  const d = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const row = i * n;
    let big = 0;
    for (let l = 0; l < n; l++) big = Math.max(big, Math.abs(A[row + l] * ws.scale[i]));
    d[i] = big > 0 ? ws.scale[i] / big : ws.scale[i];
    for (let l = 0; l < n; l++) A[row + l] *= d[i];
  }
  const pivot = new Int32Array(n);
  const bad = luFactor(A, n, pivot, 1e-15);
  if (bad >= 0) {
    return {
      ...base,
      status: "singular",
      message: `the steady-state Jacobian is singular at ${mech.species[sys.unknownSpecies[bad]].id}`,
      coefficients: zero(),
    };
  }
  const coefficients = zero();
  const lambda = new Float64Array(n);
  outputs.forEach((id, o) => {
    const i = sys.unknownOf[ownValue(mech.speciesIndex, id) ?? -1] ?? -1;
    if (i < 0) return; // held: insensitive
    lambda.fill(0);
    lambda[i] = 1;
    luSolveTransposed(A, n, pivot, lambda);
    for (let j = 0; j < nr; j++) {
      const r = ws.rates[j];
      if (r === 0) continue;
      let s = 0;
      for (let q = sys.sStart[j]; q < sys.sStart[j + 1]; q++) {
        const row = sys.sUnknown[q];
        if (!isConstraint[row]) s += lambda[row] * d[row] * sys.sNu[q] * r;
      }
      coefficients[o][j] = -s;
    }
  });
  return { ...base, status: "ok", message: "ok", coefficients };
}
