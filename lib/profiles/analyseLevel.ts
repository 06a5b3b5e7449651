/**
 * One level of a sweep: lib/engine's `analyse` with the overhead O3 column of
 * the levels above (when O3 is solved) carried in the level's own condition,
 * so that the stored request and its explorer link reproduce the level.
 */
import { DOBSON_UNIT_cm2 } from "../atmosphere";
import { type AnalysisRun, analyse } from "../engine/runAnalysis";
import type { AnalysisRequest } from "../engine/types";
import type { CompiledMechanism } from "../mechanism/types";

export interface LevelRunOptions {
  /** warm start by mechanism index, cm⁻³: the neighbour's steady state (instantaneous) or its state at the report time (24-hour); default none */
  initialState?: readonly number[];
  /** air number density of the level `initialState` comes from, cm⁻³ (the state is scaled by the ratio of [M]); default no scaling */
  initialM_cm3?: number;
  /** overhead O3 column, molecules cm⁻²; default: the climatology's (as runAnalysis) */
  o3ColumnAbove_cm2?: number;
}

export type LevelRun = AnalysisRun;

export function analyseLevel(
  mech: CompiledMechanism,
  mechanismRef: { id: string; title: string },
  request: AnalysisRequest,
  run: LevelRunOptions = {},
): LevelRun {
  const levelRequest =
    run.o3ColumnAbove_cm2 === undefined
      ? request
      : { ...request, condition: { ...request.condition, o3ColumnAbove_DU: run.o3ColumnAbove_cm2 / DOBSON_UNIT_cm2 } };
  return analyse(mech, mechanismRef, levelRequest, { initialState: run.initialState, initialM_cm3: run.initialM_cm3 });
}
