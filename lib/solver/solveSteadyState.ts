/**
 * Instantaneous photochemical steady state: the number densities of all
 * solved species with d[X]/dt = 0, each given pool total replacing the
 * balance equation of its dominant member.
 *
 * Method: structural checks (no source / never lost / undetermined total),
 * a cold start (Jacobi quasi-steady-state sweeps, then pseudo-transient
 * continuation) or a warm start, and Newton's method on ln x with the
 * analytic Jacobian and a backtracking line search (see newtonLog.ts).
 * Numerical failure is a status, never an exception; malformed input throws
 * InputError.
 *
 * Units: molecules cm⁻³, molecules cm⁻³ s⁻¹, s.
 */
import { InputError } from "../errors";
import { hasId, idRecord, ownValue } from "../idRecord";
import type { CompiledMechanism } from "../mechanism/types";
import { assembleSteadyState } from "./assembleSteadyState";
import { buildSystem, type ChemSystem } from "./buildSystem";
import { chemistryOde } from "./chemistryOde";
import { chooseReplaced } from "./chooseReplaced";
import { applyWarmStart, coldGuess, toLog } from "./initialGuess";
import { effectiveConstants, reactionRates } from "./massAction";
import { evaluateResidual, NEWTON_DEFAULTS, type NewtonLogResult, NewtonWorkspace, newtonLog } from "./newtonLog";
import { rateConstants } from "./rateConstants";
import { integrateOde } from "./rosenbrock";
import { sparseSystemMatrix } from "./sparseSystemMatrix";
import { structuralChecks } from "./structuralChecks";
import type { SolveConditions, SolveStatus, SteadyState, SteadyStateOptions } from "./types";

export const STEADY_STATE_DEFAULTS = {
  /** max |(P − L)/(P + L)| at convergence */
  residualTolerance: 1e-10,
  /** and max |δ ln x| of the last Newton step (≈ relative error of the number densities) */
  stepTolerance: 1e-9,
  /** Newton iterations after the cold start (the hardest built-in cases, 10–16 km at SZA 85° with O3 solved, need up to about 300) */
  maxIterations: 300,
  /** pseudo-transient continuation steps */
  maxColdStartSteps: 200,
  /** length of the fallback integration when the pseudo-transient cold start fails, s */
  fallbackIntegration_s: 1e6,
  /** a species below this (cm⁻³) with loss ≫ production is reported as vanishing */
  vanishing_cm3: 1e-20,
};

function checkOptions(mech: CompiledMechanism, o: SteadyStateOptions): void {
  for (const key of ["residualTolerance", "stepTolerance"] as const) {
    const v = o[key];
    if (v !== undefined && !(v > 0 && v < 1)) throw new InputError(`options.${key}`, `must be in (0, 1), got ${v}`);
  }
  for (const key of ["maxIterations", "maxColdStartSteps"] as const) {
    const v = o[key];
    if (v !== undefined && !(Number.isInteger(v) && v >= 1))
      throw new InputError(`options.${key}`, `must be an integer ≥ 1, got ${v}`);
  }
  if (o.initialState !== undefined) {
    if (!Array.isArray(o.initialState) || o.initialState.length !== mech.species.length) {
      throw new InputError(
        "options.initialState",
        `must list a number density for each of the ${mech.species.length} species (by mechanism index), got ${Array.isArray(o.initialState) ? o.initialState.length : typeof o.initialState}`,
      );
    }
  }
  if (o.initial_cm3 !== undefined) {
    for (const [id, v] of Object.entries(o.initial_cm3)) {
      if (typeof v !== "number" || Number.isNaN(v) || v < 0)
        throw new InputError(`options.initial_cm3.${id}`, `must be a number ≥ 0, got ${v}`);
    }
  }
}

const names = (sys: ChemSystem, unknowns: number[]): string =>
  unknowns.map((i) => sys.mech.species[sys.unknownSpecies[i]].id).join(", ");

export function solveSteadyState(
  mech: CompiledMechanism,
  cond: SolveConditions,
  options: SteadyStateOptions = {},
): SteadyState {
  checkOptions(mech, options);
  const sys = buildSystem(mech, cond);
  const k = rateConstants(mech, cond, options);
  const tolerance = options.residualTolerance ?? STEADY_STATE_DEFAULTS.residualTolerance;
  const n = sys.n;
  const kEff = effectiveConstants(sys, k, new Float64Array(sys.nReactions));
  const ws = new NewtonWorkspace(
    n,
    sys.nReactions,
    n >= (options.sparseFromUnknowns ?? NEWTON_DEFAULTS.sparseFromUnknowns) ? sparseSystemMatrix(sys) : undefined,
  );
  const x = new Float64Array(n);
  const warnings = [...sys.warnings];
  if (options.initial_cm3) {
    for (const id of Object.keys(options.initial_cm3)) {
      if (!hasId(mech.speciesIndex, id)) warnings.push(`initial_cm3.${id} ignored: not a species of this mechanism`);
    }
  }

  const report = (status: SolveStatus, message: string, iterations: number, residualNorm: number, cold: number) => {
    const numberDensity = Float64Array.from(sys.fixed);
    for (let i = 0; i < n; i++) numberDensity[sys.unknownSpecies[i]] = x[i];
    reactionRates(sys, kEff, x, ws.rates);
    return assembleSteadyState({
      sys,
      T_K: cond.T_K,
      M_cm3: cond.M_cm3,
      k,
      numberDensity,
      rates: ws.rates,
      status,
      message,
      iterations,
      residualNorm,
      coldStartSteps: cold,
      warnings,
    });
  };

  if (n === 0) return report("converged", "every species is held: nothing to solve", 0, 0, 0);

  const structure = structuralChecks(sys, kEff);
  // Members of a pool without a total that nothing makes: the total is what is missing.
  for (const p of sys.unconstrainedPools) {
    const pool = mech.pools[p];
    const missing = pool.weights.filter((t) => structure.noSource.includes(sys.unknownOf[t.species]));
    if (missing.length === 0) continue;
    coldGuess(sys, kEff, cond.M_cm3, structure.reachable, ws, x);
    return report(
      "no-steady-state",
      `no steady state: ${missing.map((t) => mech.species[t.species].id).join(", ")} ${missing.length > 1 ? "are" : "is"} set only by the total of ${pool.id} (${pool.expression}), which the conditions do not give: give conditions.poolTotals_cm3.${pool.id}`,
      0,
      1,
      0,
    );
  }
  if (structure.noSource.length > 0) {
    // Solve the rest with the source-less species at 0, and say so.
    const ids = structure.noSource.map((i) => mech.species[sys.unknownSpecies[i]].id);
    const held_cm3 = idRecord(cond.held_cm3);
    for (const id of ids) held_cm3[id] = 0;
    const rest = solveSteadyState(
      mech,
      { ...cond, held_cm3 },
      { ...options, rateConstants: k, rateMultipliers: undefined },
    );
    for (const s of rest.species) if (ids.includes(s.id)) s.role = "solved";
    const message =
      `no steady state for ${ids.join(", ")}: no chemical source under these conditions (every reaction that makes ` +
      `${ids.length > 1 ? "them" : "it"} has k = 0 or needs a species that is absent, e.g. photolysis at night). ` +
      `They are reported as 0; the other species: ${rest.status}${rest.status === "converged" ? "" : ` (${rest.message})`}. ` +
      "Use the 24-hour mode for night-time chemistry.";
    return { ...rest, status: "no-steady-state", message, warnings: [...warnings, ...(rest.warnings ?? [])] };
  }

  coldGuess(sys, kEff, cond.M_cm3, structure.reachable, ws, x);
  if (structure.neverLost.length > 0) {
    const ids = names(sys, structure.neverLost);
    return report(
      "no-steady-state",
      `no steady state: ${ids} ${structure.neverLost.length > 1 ? "are" : "is"} produced but never lost, so ${structure.neverLost.length > 1 ? "they accumulate" : "it accumulates"} without bound`,
      0,
      1,
      0,
    );
  }
  if (structure.conserved.length > 0) {
    const c = structure.conserved[0];
    return report(
      "no-steady-state",
      `no unique steady state: ${c.id} (${c.expression}) is conserved by the chemistry among the solved species, so its total is undetermined; ` +
        (c.isPool
          ? `give conditions.poolTotals_cm3.${c.id}`
          : `hold one of its members or give the total of a pool that contains it`),
      0,
      1,
      0,
    );
  }

  let warm = false;
  if (options.initialState || options.initial_cm3) {
    const byIndex = options.initialState;
    const byId = options.initial_cm3;
    const used = applyWarmStart(sys, (s) => ownValue(byId, mech.species[s].id) ?? byIndex?.[s], x);
    warm = used > 0;
  }

  const u = new Float64Array(n);
  const settings = {
    tolerance,
    stepTolerance: options.stepTolerance ?? STEADY_STATE_DEFAULTS.stepTolerance,
    maxNewtonIterations: options.maxIterations ?? STEADY_STATE_DEFAULTS.maxIterations,
    maxPtcSteps: options.maxColdStartSteps ?? STEADY_STATE_DEFAULTS.maxColdStartSteps,
    startWithNewton: warm,
  };
  const lossFrequency = (): Float64Array => {
    toLog(x, u);
    evaluateResidual(sys, kEff, u, ws);
    const f = new Float64Array(n);
    for (let i = 0; i < n; i++) f[i] = ws.L[i] / Math.max(x[i], 1e-300);
    return f;
  };
  const attempt = (): NewtonLogResult => {
    chooseReplaced(sys, x, lossFrequency());
    toLog(x, u);
    let res = newtonLog(sys, kEff, u, settings, ws);
    let iterations = res.newtonIterations + res.ptcSteps;
    let cold = res.ptcSteps;
    // The dominant reservoir is judged on the converged state; re-solve if it changed.
    for (let round = 0; round < 3 && res.converged; round++) {
      for (let i = 0; i < n; i++) x[i] = Math.exp(u[i]);
      if (!chooseReplaced(sys, x)) break;
      res = newtonLog(sys, kEff, u, { ...settings, startWithNewton: true }, ws);
      iterations += res.newtonIterations + res.ptcSteps;
      cold += res.ptcSteps;
    }
    for (let i = 0; i < n; i++) x[i] = Math.exp(u[i]);
    return { ...res, newtonIterations: iterations - cold, ptcSteps: cold };
  };

  let res = attempt();
  let totalIterations = res.newtonIterations + res.ptcSteps;
  let totalCold = res.ptcSteps;
  if (!res.converged && warm) {
    warnings.push("warm start did not converge; restarted cold");
    coldGuess(sys, kEff, cond.M_cm3, structure.reachable, ws, x);
    settings.startWithNewton = false;
    res = attempt();
    totalIterations += res.newtonIterations + res.ptcSteps;
    totalCold += res.ptcSteps;
  }
  if (!res.converged) {
    // Last resort: follow the real chemistry for a while from the cold guess
    // (ROS3, pools conserved by the integration), then iterate from there.
    coldGuess(sys, kEff, cond.M_cm3, structure.reachable, ws, x);
    const ode = chemistryOde(sys, (_t, out) => out.set(kEff), true);
    const run = integrateOde(
      ode,
      x,
      0,
      STEADY_STATE_DEFAULTS.fallbackIntegration_s,
      { rtol: 1e-3, atol: 1, maxSteps: 5000 },
      { nonNegative: true },
    );
    if (run.y.every(Number.isFinite)) {
      for (let i = 0; i < n; i++) x[i] = Math.max(run.y[i], 1e-30);
      warnings.push(
        `the pseudo-transient cold start failed; restarted after ${run.acceptedSteps} integration steps (${STEADY_STATE_DEFAULTS.fallbackIntegration_s} s)`,
      );
      settings.startWithNewton = false;
      res = attempt();
      totalIterations += res.newtonIterations + res.ptcSteps + run.acceptedSteps;
      totalCold += res.ptcSteps + run.acceptedSteps;
    }
  }
  if (res.converged) {
    return report("converged", "converged", totalIterations, res.residualNorm, totalCold);
  }
  return failure(sys, x, ws, res, cond.M_cm3, (status, message) =>
    report(status, message, totalIterations, res.residualNorm, totalCold),
  );
}

/** Names the species behind a failed iteration. */
function failure(
  sys: ChemSystem,
  x: Float64Array,
  ws: NewtonWorkspace,
  res: NewtonLogResult,
  M_cm3: number,
  make: (status: SolveStatus, message: string) => SteadyState,
): SteadyState {
  const n = sys.n;
  const r = ws.r;
  if (res.singularRow >= 0) {
    const idle: number[] = [];
    for (let i = 0; i < n; i++) if (!ws.isConstraintRow[i] && ws.P[i] + ws.L[i] === 0) idle.push(i);
    if (idle.length > 0) {
      return make(
        "no-steady-state",
        `no steady state: ${names(sys, idle)} ${idle.length > 1 ? "are" : "is"} neither produced nor lost under these conditions, so ${idle.length > 1 ? "their amounts are" : "its amount is"} undetermined`,
      );
    }
    return make(
      "no-steady-state",
      `no steady state: the balance equations are singular at ${names(sys, [res.singularRow])} (a species or combination left undetermined by the chemistry)`,
    );
  }
  const vanishing: number[] = [];
  const runaway: number[] = [];
  for (let i = 0; i < n; i++) {
    if (x[i] < STEADY_STATE_DEFAULTS.vanishing_cm3 && r[i] < -0.5) vanishing.push(i);
    if (x[i] > 10 * M_cm3 || Math.log(x[i]) >= NEWTON_DEFAULTS.uMax - 1) runaway.push(i);
  }
  if (vanishing.length > 0) {
    return make(
      "no-steady-state",
      `no steady state: ${names(sys, vanishing)} fall${vanishing.length > 1 ? "" : "s"} towards 0 (loss without a sufficient source under these conditions, e.g. photolysis at night); use the 24-hour mode for night-time chemistry`,
    );
  }
  if (runaway.length > 0) {
    return make(
      "diverged",
      `diverged: ${names(sys, runaway)} grow${runaway.length > 1 ? "" : "s"} without bound (production exceeds every loss)`,
    );
  }
  const order = Array.from({ length: n }, (_, i) => i).sort((a, b) => Math.abs(r[b]) - Math.abs(r[a]));
  const worst = order.slice(0, Math.min(3, n)).filter((i) => Math.abs(r[i]) > 0);
  if (res.nonFinite) return make("diverged", `diverged: the iteration left the finite range near ${names(sys, worst)}`);
  return make(
    "max-iterations",
    `did not converge within the iteration limit; largest scaled residuals at ${names(sys, worst)} (max ${res.residualNorm.toExponential(2)})`,
  );
}
