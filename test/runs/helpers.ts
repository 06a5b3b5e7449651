import type { ConditionInput } from "../../lib/engine/types";
import { loadBuiltinMechanism } from "../../lib/mechanism";
import { periodicStart, RUN_DEFAULTS, type RunOptions, type RunPlan } from "../../lib/runs";

export const reference = () => loadBuiltinMechanism("reference").mechanism;

/** A plan at a fixed place started from its 24-hour periodic solution. */
export function periodicPlan(
  mechId: string,
  condition: ConditionInput,
  days: number,
  options: RunOptions = {},
  ozone: "held" | "solved" = "held",
): RunPlan {
  const mech = loadBuiltinMechanism(mechId).mechanism;
  const base = { condition, days, options: { ...RUN_DEFAULTS, ...options } };
  return { ...base, initial_cm3: periodicStart(mech, base, {}, ozone).state_cm3 };
}
