/**
 * One analysis: resolve the condition, solve the photochemical steady state
 * (instantaneous, or the periodic 24-hour solution), and analyse the
 * catalytic cycles and the odd-oxygen budget.
 */
import { analyseCycles } from "../analysis";
import type { CycleReport } from "../analysis/types";
import { solarZenithAngle } from "../atmosphere";
import type { CompiledMechanism } from "../mechanism/types";
import { solveDiurnal, solveSteadyState } from "../solver";
import type { SteadyState } from "../solver/types";
import { analysisUncertainty } from "../uncertainty/analysisUncertainty";
import { CONDITION_DEFAULTS, jAt, resolveCondition, solveConditionsOf, yearOf } from "./resolve-condition";
import type { AnalysisOptions, AnalysisRequest, AnalysisResult } from "./types";
import { ENGINE_VERSION } from "./version";

export const ANALYSIS_DEFAULTS: Required<AnalysisOptions> = {
  fminRelative: 1e-4,
  oxDefinition: "standard",
  uncertaintySamples: 0,
  uncertaintySeed: 1,
  sensitivity: false,
};

function emptyReport(warning: string, oxDefinition: CycleReport["oxDefinition"]): CycleReport {
  return {
    otherLossPathways: [],
    branchingPoints: [],
    carrierFamilies: [],
    nullCycleRate_cm3s: 0,
    oxDefinition,
    heldTendencies: [],
    cycles: [],
    budget: {
      definition: [],
      production_cm3s: 0,
      loss_cm3s: 0,
      byFamily: [],
      directLoss_cm3s: 0,
      unassignedLoss_cm3s: 0,
      unassignedProduction_cm3s: 0,
      weights: {},
      netChange_cm3s: 0,
      directTerms: [],
      directMismatch: 0,
    },
    perReaction: [],
    pathwayCount: 0,
    fmin_cm3s: 0,
    warnings: [warning],
  };
}

export interface RunOptions {
  /** warm start: number densities by mechanism index from a neighbouring solve */
  initialState?: number[];
}

export function runAnalysis(
  mech: CompiledMechanism,
  mechanismRef: { id: string; title: string },
  request: AnalysisRequest,
  run: RunOptions = {},
): AnalysisResult {
  const t0 = performance.now();
  const options = { ...ANALYSIS_DEFAULTS, ...request.options };
  const condition = resolveCondition(mech, request.condition);
  let steadyState: SteadyState;
  if (condition.mode === "diurnal") {
    const diurnal = solveDiurnal(mech, {
      conditionsAt: (t_h: number) =>
        solveConditionsOf(
          condition,
          jAt(
            mech,
            condition,
            request.condition,
            solarZenithAngle({
              latitude_deg: condition.latitude_deg,
              dayOfYear: condition.dayOfYear,
              localSolarTime_h: t_h,
              year: yearOf(condition.date),
            }),
          ),
        ),
      reportAt_h: condition.localSolarTime_h ?? CONDITION_DEFAULTS.localSolarTime_h,
    });
    steadyState = diurnal.average;
  } else {
    steadyState = solveSteadyState(mech, solveConditionsOf(condition), { initialState: run.initialState });
  }
  const heldSpecies = Object.keys(condition.held_cm3);
  const cycleOptions = { fminRelative: options.fminRelative, oxDefinition: options.oxDefinition, heldSpecies };
  // Pathways of a state that is not a steady state would not close any budget: report none.
  const cycles =
    steadyState.status === "converged"
      ? analyseCycles(mech, steadyState, cycleOptions)
      : emptyReport(
          `no cycle analysis: the steady state did not converge (${steadyState.message})`,
          options.oxDefinition,
        );
  // sensitivities and Monte Carlo ranges (lib/uncertainty), only when asked for
  const uncertaintyOf = () => {
    const uncertainty = analysisUncertainty(
      mech,
      condition.mode,
      solveConditionsOf(condition),
      steadyState,
      cycles,
      cycleOptions,
      { sensitivity: options.sensitivity, samples: options.uncertaintySamples, seed: options.uncertaintySeed },
    );
    return uncertainty ? { uncertainty } : {};
  };
  return {
    engineVersion: ENGINE_VERSION,
    mechanism: mechanismRef,
    condition,
    options,
    steadyState,
    cycles,
    elapsed_ms: performance.now() - t0,
    ...uncertaintyOf(),
  };
}
