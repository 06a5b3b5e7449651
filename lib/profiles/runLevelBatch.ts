/**
 * A batch of neighbouring levels run one after another in one thread, each
 * warm-started from the last level that converged (or from its own given
 * state). This is the unit of work a sweep sends to an engine worker.
 */
import type { AnalysisRequest } from "../engine/types";
import type { CompiledMechanism } from "../mechanism/types";
import { analyseLevel } from "./analyseLevel";
import { failedLevel, summariseLevel } from "./summariseLevel";
import type { SweepLevel } from "./types";

export interface LevelTask {
  request: AnalysisRequest;
  /** overhead O3 column, molecules cm⁻²; default the climatology's */
  o3ColumnAbove_cm2?: number;
  /** this level's own warm start (e.g. its state from the previous column pass), cm⁻³ by mechanism index */
  initialState?: number[];
  /** [M] of `initialState`, cm⁻³ */
  initialM_cm3?: number;
}

export interface LevelBatch {
  tasks: LevelTask[];
  /** state to start the first task from (the neighbour's), cm⁻³ by mechanism index; default cold */
  initialState?: number[] | null;
  /** [M] of `initialState`, cm⁻³ */
  initialM_cm3?: number | null;
  /** warm-start each task from the one before; default true */
  chain?: boolean;
}

export interface LevelBatchResult {
  levels: SweepLevel[];
  /** the warm-start state each level left (null when it failed), cm⁻³ by mechanism index */
  states: (number[] | null)[];
  /** [M] of each level, cm⁻³ (null when it failed before resolving) */
  M_cm3: (number | null)[];
}

export function runLevelBatch(
  mech: CompiledMechanism,
  mechanismRef: { id: string; title: string },
  batch: LevelBatch,
): LevelBatchResult {
  const chain = batch.chain ?? true;
  let state = batch.initialState ?? null;
  let stateM = batch.initialM_cm3 ?? null;
  const out: LevelBatchResult = { levels: [], states: [], M_cm3: [] };
  for (const task of batch.tasks) {
    const initialState = task.initialState ?? (chain ? state : null) ?? undefined;
    const initialM_cm3 = task.initialState ? task.initialM_cm3 : (stateM ?? undefined);
    try {
      const run = analyseLevel(mech, mechanismRef, task.request, {
        initialState,
        initialM_cm3,
        o3ColumnAbove_cm2: task.o3ColumnAbove_cm2,
      });
      out.levels.push(summariseLevel(task.request, run.result, initialState !== undefined));
      out.states.push(run.nextState);
      out.M_cm3.push(run.result.condition.M_cm3);
      if (run.nextState) {
        state = run.nextState;
        stateM = run.result.condition.M_cm3;
      }
    } catch (e) {
      out.levels.push(failedLevel(task.request, e));
      out.states.push(null);
      out.M_cm3.push(null);
    }
  }
  return out;
}
