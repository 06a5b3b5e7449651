/**
 * The units of work of a run as plain JSON, for an engine worker: the start
 * state, and a span of days from a state. A run's job sends one start task,
 * then one task per span, each from the end of the one before.
 */
import { InputError } from "../errors";
import type { CompiledMechanism } from "../mechanism/types";
import { integrateDays } from "./integrateDays";
import { runConditions } from "./runConditions";
import { periodicStart, type StartState } from "./startState";
import type { JCache, RunPlan, RunSegment } from "./types";

/** How the start state is made (a stored analysis arrives as its state). */
export type StartSpec =
  | { kind: "periodic"; ozone?: "held" | "solved" }
  | { kind: "amounts"; mixingRatios: Record<string, number>; ozone?: "held" | "solved" }
  /** a state by mechanism index at air density M_cm3, scaled to the first condition's [M] */
  | { kind: "state"; state_cm3: number[]; M_cm3: number };

export interface RunStartTask {
  plan: Omit<RunPlan, "initial_cm3">;
  start: StartSpec;
}

export interface RunDaysTask {
  plan: RunPlan;
  firstDay: number;
  dayCount: number;
  state_cm3: number[];
  jCache?: JCache;
}

export function runStartTask(mech: CompiledMechanism, task: RunStartTask): StartState {
  const s = task.start;
  if (s.kind === "periodic") return periodicStart(mech, task.plan, {}, s.ozone);
  if (s.kind === "amounts") return periodicStart(mech, task.plan, s.mixingRatios, s.ozone);
  if (s.state_cm3.length !== mech.species.length || !(s.M_cm3 > 0))
    throw new InputError(
      "start",
      `the stored state has ${s.state_cm3.length} species, the mechanism ${mech.species.length}`,
    );
  const first = runConditions(mech, { ...task.plan, initial_cm3: [] }, {}).first;
  const f = first.M_cm3 / s.M_cm3;
  return { state_cm3: s.state_cm3.map((v) => Math.max(0, v) * f), warnings: [] };
}

export function runDaysTask(mech: CompiledMechanism, task: RunDaysTask): RunSegment {
  return integrateDays(mech, task.plan, {
    firstDay: task.firstDay,
    dayCount: task.dayCount,
    state_cm3: task.state_cm3,
    jCache: task.jCache,
  });
}
