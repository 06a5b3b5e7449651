/**
 * Checks a run request against its mechanism before anything is queued and
 * lays out what the integration needs: the trajectory parsed (it must cover
 * the run), the first condition resolved (bad overrides fail here, not
 * inside a job), the options with their defaults.
 */
import { resolveCondition } from "../engine/resolveCondition";
import { InputError } from "../errors";
import type { CompiledMechanism } from "../mechanism/types";
import { parseTrajectoryCsv } from "./parseTrajectoryCsv";
import { RUN_CONDITION_DEFAULTS, rowInput } from "./runConditions";
import type { RunOptions, RunPlan, RunRequest } from "./types";

export const RUN_DEFAULTS: Required<RunOptions> = {
  fminRelative: 1e-4,
  oxDefinition: "standard",
  sunFollowsDate: true,
};

export interface PlannedRun {
  /** the plan without its initial state (computed by the start task) */
  plan: Omit<RunPlan, "initial_cm3">;
  warnings: string[];
}

export function planRun(mech: CompiledMechanism, request: RunRequest): PlannedRun {
  const warnings: string[] = [];
  const options: Required<RunOptions> = { ...RUN_DEFAULTS, ...request.options };
  const condition = { ...request.condition };
  if (condition.localSolarTime_h !== undefined && condition.localSolarTime_h !== 0)
    warnings.push("a run starts at local midnight: the local solar time given is not used");
  if (condition.mode === "diurnal") warnings.push("a run follows the sun hour by hour: the mode given is not used");
  if (condition.zenith_deg !== undefined)
    warnings.push(`the zenith angle is held at ${condition.zenith_deg}° for the whole run (the sun does not move)`);
  let trajectory: RunPlan["trajectory"];
  if (request.trajectory) {
    const fileName = "trajectory.csv";
    const parsed = parseTrajectoryCsv(request.trajectory.csv, { fileName });
    trajectory = parsed.points;
    const last = trajectory[trajectory.length - 1];
    if (last.time_h < 24 * request.days)
      throw new InputError(
        "trajectory",
        `the trajectory ends at ${last.time_h} h, before the end of the run at ${24 * request.days} h (${request.days} days): add rows or shorten the run`,
      );
    if (parsed.extraColumns.length)
      warnings.push(`trajectory columns passed to the condition as given: ${parsed.extraColumns.join(", ")}`);
  }
  const first = trajectory ? rowInput(condition, trajectory[0]) : condition;
  try {
    resolveCondition(mech, { ...first, mode: "instantaneous", ozone: first.ozone ?? RUN_CONDITION_DEFAULTS.ozone });
  } catch (e) {
    if (e instanceof InputError && trajectory) throw new InputError("trajectory.csv, first row", e.message, e.code);
    throw e;
  }
  return { plan: { condition, trajectory, days: request.days, options }, warnings };
}
