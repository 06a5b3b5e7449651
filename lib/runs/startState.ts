/**
 * The state a run starts from: the 24-hour periodic solution at the first
 * condition (lib/solver `solveDiurnal`, with the run's own photolysis
 * interpolation so that a run at a fixed place continues it), its state at
 * local midnight; optionally with some species set to given mixing ratios.
 * Along a trajectory the periodic solution is that of the first row held
 * fixed. O3 is held at the condition's amount (the climatology unless
 * given) while the periodic solution is found, by default: O3 lives for
 * months in the lower stratosphere, where its photochemical equilibrium is
 * far from the air's actual amount. Units: cm⁻³ by mechanism index.
 */
import { InputError } from "../errors";
import type { CompiledMechanism } from "../mechanism/types";
import { solveDiurnal } from "../solver/solveDiurnal";
import { rowInput, runConditions } from "./runConditions";
import type { RunPlan } from "./types";

export const START_DEFAULTS = {
  /** O3 while the periodic start is found */
  ozone: "held" as "held" | "solved",
};

export interface StartState {
  state_cm3: number[];
  warnings: string[];
}

export function periodicStart(
  mech: CompiledMechanism,
  plan: Omit<RunPlan, "initial_cm3">,
  mixingRatios: Record<string, number> = {},
  ozone: "held" | "solved" = START_DEFAULTS.ozone,
): StartState {
  const firstPlace: RunPlan = {
    ...plan,
    initial_cm3: [],
    condition: { ...(plan.trajectory?.length ? rowInput(plan.condition, plan.trajectory[0]) : plan.condition), ozone },
    trajectory: undefined,
    options: { ...plan.options, sunFollowsDate: false },
  };
  const conditions = runConditions(mech, firstPlace, {});
  const periodic = solveDiurnal(mech, { conditionsAt: (t_h) => conditions.at(t_h).cond, reportAt_h: 0 });
  const warnings: string[] = [];
  if (periodic.status !== "converged")
    warnings.push(`the 24-hour solution the run starts from did not converge: ${periodic.message}`);
  const state = [...periodic.atReportTime.numberDensity_cm3];
  const M = conditions.first.M_cm3;
  for (const [id, x] of Object.entries(mixingRatios)) {
    const s = mech.speciesIndex[id];
    if (s === undefined) throw new InputError(`start.mixingRatios.${id}`, `unknown species ${id}`);
    if (mech.species[s].role !== "solved" && id !== "O3")
      throw new InputError(
        `start.mixingRatios.${id}`,
        `${id} is not solved in this mechanism: give held amounts in the condition`,
      );
    if (!(Number.isFinite(x) && x >= 0 && x <= 1))
      throw new InputError(`start.mixingRatios.${id}`, `mixing ratio ${x} must be a number in 0–1 (mol/mol)`);
    state[s] = x * M;
  }
  return { state_cm3: state, warnings };
}
