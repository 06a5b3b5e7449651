/**
 * One analysis: resolve the condition, solve the photochemical steady state
 * (instantaneous, or the periodic 24-hour solution), and analyse the
 * catalytic cycles and the odd-oxygen budget.
 */
import { analyseCycles } from "../analysis/analyseCycles";
import type { CycleReport } from "../analysis/types";
import { CONDITION_DEFAULTS, solarZenithAngle } from "../atmosphere";
import type { CompiledMechanism } from "../mechanism/types";
import { solveDiurnal, solveSteadyState } from "../solver";
import type { SteadyState } from "../solver/types";
import { analysisUncertainty } from "../uncertainty/analysisUncertainty";
import { checkEngineLimits } from "./engineLimits";
import { jAt, resolveCondition, solveConditionsOf, yearOf } from "./resolveCondition";
import type { AnalysisOptions, AnalysisRequest, AnalysisResult, DiurnalSummary } from "./types";
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
  /**
   * warm start by mechanism index, cm⁻³: a neighbouring level's steady state
   * (instantaneous) or its state at the report time (24-hour); default none
   */
  initialState?: readonly number[];
  /**
   * air number density of the level `initialState` comes from, cm⁻³: the state
   * is scaled by [M] here / [M] there, since mixing ratios vary less between
   * neighbouring levels than densities; default no scaling
   */
  initialM_cm3?: number;
}

/** An analysis, and the state a neighbouring level can warm-start from (null when the solve failed). */
export interface AnalysisRun {
  result: AnalysisResult;
  nextState: number[] | null;
}

export function runAnalysis(
  mech: CompiledMechanism,
  mechanismRef: { id: string; title: string },
  request: AnalysisRequest,
  run: RunOptions = {},
): AnalysisResult {
  return analyse(mech, mechanismRef, request, run).result;
}

/** The one composition of an analysis; profile levels use it too. */
export function analyse(
  mech: CompiledMechanism,
  mechanismRef: { id: string; title: string },
  request: AnalysisRequest,
  run: RunOptions = {},
): AnalysisRun {
  const t0 = performance.now();
  const options = { ...ANALYSIS_DEFAULTS, ...request.options };
  const condition = resolveCondition(mech, request.condition);
  checkEngineLimits(mech, condition.mode);
  const initialState =
    run.initialState && run.initialM_cm3 && run.initialM_cm3 > 0
      ? run.initialState.map((v) => v * (condition.M_cm3 / (run.initialM_cm3 as number)))
      : run.initialState?.slice();
  let steadyState: SteadyState;
  let nextState: number[] | null;
  let diurnalSummary: DiurnalSummary | undefined;
  if (condition.mode === "diurnal") {
    const diurnal = solveDiurnal(
      mech,
      {
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
      },
      { initialState },
    );
    steadyState = diurnal.average;
    nextState = diurnal.status === "converged" ? [...diurnal.atReportTime.numberDensity_cm3] : null;
    diurnalSummary = {
      reportAt_h: diurnal.reportAt_h,
      atLocalTime_cm3: [...diurnal.atReportTime.numberDensity_cm3],
      atLocalTimeRates_cm3s: [...diurnal.atReportTime.rate_cm3s],
      daysIntegrated: diurnal.daysIntegrated,
      periodicityError: diurnal.periodicityError,
    };
  } else {
    steadyState = solveSteadyState(mech, solveConditionsOf(condition), { initialState });
    nextState = steadyState.status === "converged" ? [...steadyState.numberDensity_cm3] : null;
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
  const result: AnalysisResult = {
    engineVersion: ENGINE_VERSION,
    mechanism: mechanismRef,
    condition,
    options,
    steadyState,
    cycles,
    ...(diurnalSummary ? { diurnal: diurnalSummary } : {}),
    ...(condition.mode === "diurnal" && request.condition.zenith_deg !== undefined
      ? {
          warnings: [
            "the zenith angle given is not used in the 24-hour mode: the sun follows the latitude and date through the day",
          ],
        }
      : {}),
    elapsed_ms: 0,
    ...uncertaintyOf(),
  };
  result.elapsed_ms = performance.now() - t0;
  return { result, nextState };
}
