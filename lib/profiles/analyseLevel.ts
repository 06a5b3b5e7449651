/**
 * One level of a sweep: the same composition as lib/engine's runAnalysis
 * (resolve the condition, solve the steady state or the periodic 24-hour
 * solution, analyse the cycles), with two additions a sweep needs: an
 * overhead O3 column given from the levels above (the photolysis frequencies
 * are recomputed with it), and a warm start of the 24-hour solution from the
 * neighbour's state at local midnight. The sweep tests check that a level
 * equals runAnalysis at the same condition.
 */
import { analyseCycles } from "../analysis";
import { DOBSON_UNIT_cm2, solarZenithAngle } from "../atmosphere";
import { jAt, resolveCondition, solveConditionsOf } from "../engine/resolve-condition";
import { ANALYSIS_DEFAULTS } from "../engine/run-analysis";
import type { AnalysisRequest, AnalysisResult } from "../engine/types";
import { ENGINE_VERSION } from "../engine/version";
import type { CompiledMechanism } from "../mechanism/types";
import { solveDiurnal, solveSteadyState } from "../solver";
import type { SteadyState } from "../solver/types";

export interface LevelRunOptions {
  /** warm start by mechanism index, cm⁻³: the neighbour's steady state (instantaneous) or its midnight state (24-hour); default none */
  initialState?: readonly number[];
  /** air number density of the level `initialState` comes from, cm⁻³: the state is scaled by [M] here / [M] there, since mixing ratios vary less between neighbours than densities; default no scaling */
  initialM_cm3?: number;
  /** overhead O3 column, molecules cm⁻²; default: the climatology's (as runAnalysis) */
  o3ColumnAbove_cm2?: number;
}

export interface LevelRun {
  result: AnalysisResult;
  /** the state to warm-start a neighbour from (cm⁻³ by mechanism index); null when the solve failed */
  nextState: number[] | null;
}

export function analyseLevel(
  mech: CompiledMechanism,
  mechanismRef: { id: string; title: string },
  request: AnalysisRequest,
  run: LevelRunOptions = {},
): LevelRun {
  const t0 = performance.now();
  const options = { ...ANALYSIS_DEFAULTS, ...request.options };
  const condition = resolveCondition(mech, request.condition);
  if (run.o3ColumnAbove_cm2 !== undefined) {
    condition.o3ColumnAbove_DU = run.o3ColumnAbove_cm2 / DOBSON_UNIT_cm2;
    condition.J_s = jAt(mech, condition, request.condition, condition.zenith_deg);
  }
  const initialState =
    run.initialState && run.initialM_cm3 && run.initialM_cm3 > 0
      ? run.initialState.map((v) => v * (condition.M_cm3 / (run.initialM_cm3 as number)))
      : run.initialState;
  let steadyState: SteadyState;
  let nextState: number[] | null;
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
              }),
            ),
          ),
        // the 24-hour means do not depend on the report time; midnight is the warm start the next level needs
        reportAt_h: 0,
      },
      { initialState },
    );
    steadyState = diurnal.average;
    nextState = diurnal.status === "converged" ? [...diurnal.atReportTime.numberDensity_cm3] : null;
  } else {
    steadyState = solveSteadyState(mech, solveConditionsOf(condition), { initialState });
    nextState = steadyState.status === "converged" ? [...steadyState.numberDensity_cm3] : null;
  }
  const cycles = analyseCycles(mech, steadyState, {
    fminRelative: options.fminRelative,
    oxDefinition: options.oxDefinition,
    heldSpecies: Object.keys(condition.held_cm3),
  });
  return {
    result: {
      engineVersion: ENGINE_VERSION,
      mechanism: mechanismRef,
      condition,
      options,
      steadyState,
      cycles,
      elapsed_ms: performance.now() - t0,
    },
    nextState,
  };
}
