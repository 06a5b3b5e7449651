/**
 * One hour of a stored run as an analysis result, for the explorer: the
 * condition in force then, the number densities and rates of that instant
 * (status "instant": not a steady state), and the cycles from the pathway
 * analysis of those rates, in which each species' net change at that moment
 * is storage or release (Lehmann 2004, J. Atmos. Chem. 47, 45–78).
 */
import { analyseCycles } from "../analysis/analyseCycles";
import type { AnalysisResult } from "../engine/types";
import { InputError } from "../errors";
import type { CompiledMechanism } from "../mechanism/types";
import { assembleSteadyState } from "../solver/assembleSteadyState";
import { buildSystem } from "../solver/buildSystem";
import { rateConstants } from "../solver/rateConstants";
import { planRun } from "./planRun";
import { runConditions } from "./runConditions";
import type { RunRequest, RunResult } from "./types";

export function hourSnapshot(
  mech: CompiledMechanism,
  request: RunRequest,
  run: RunResult,
  hour: number,
): AnalysisResult {
  const h = run.hours.t_h.indexOf(hour);
  if (!Number.isInteger(hour) || h < 0)
    throw new InputError("hour", `the run has hours 0–${run.hours.t_h.length - 1}, not ${hour}`);
  const { plan } = planRun(mech, request);
  const conditions = runConditions(mech, { ...plan, initial_cm3: [] }, {});
  const condition = conditions.resolvedAt(hour);
  const cond = conditions.at(hour).cond;
  const sys = buildSystem(mech, cond);
  const state = run.hours.numberDensity_cm3[h];
  const rates = run.hours.rate_cm3s[h];
  const message = `hour ${hour} (day ${Math.floor(hour / 24) + 1}, ${hour % 24} h local time) of a run: the species change at their net rates; cycles from the pathways of these rates, changes kept as storage and release`;
  const steadyState = assembleSteadyState({
    sys,
    T_K: cond.T_K,
    M_cm3: cond.M_cm3,
    k: rateConstants(mech, cond),
    numberDensity: state,
    rates,
    status: "instant",
    message,
    iterations: 0,
    residualNorm: 0,
    coldStartSteps: 0,
    warnings: [],
  });
  const heldSpecies = mech.species.filter((_sp, s) => sys.unknownOf[s] < 0).map((sp) => sp.id);
  const cycles = analyseCycles(
    mech,
    { numberDensity_cm3: state, rate_cm3s: rates },
    {
      fminRelative: run.options.fminRelative,
      oxDefinition: run.options.oxDefinition,
      heldSpecies,
    },
  );
  return {
    engineVersion: run.engineVersion,
    mechanism: run.mechanism,
    condition: { ...condition, mode: "instantaneous" },
    options: { fminRelative: run.options.fminRelative, oxDefinition: run.options.oxDefinition },
    steadyState,
    cycles,
    warnings: [message],
    elapsed_ms: 0,
  };
}
