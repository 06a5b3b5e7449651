/**
 * What the engine can do within the job time limit (OZONE_JOB_TIMEOUT_MS,
 * default 30 s) on the documented machine (2 shared cores), measured with
 * bench/cases/largeMechanism.ts and recorded in DEVELOPERS.md:
 * - instantaneous steady state and cycle analysis: every document within the
 *   loader's limits (5,000 species, 20,000 reactions); 4,900 solved species
 *   take about 1 s to solve and 3 s to analyse (the pathway search keeps to
 *   its work budget, lib/analysis/findPathways.ts `maxJoins`);
 * - the 24-hour mode: its periodic solve carries the dense n×n monodromy
 *   matrix through every integration step (O(n³) a step): 100 solved species
 *   took 5 s, 200 took 26 s; the limit is 150.
 * A request beyond a limit is refused at once with code "beyond-limit" (HTTP
 * 422) instead of running into the time limit.
 */
import { EngineError } from "../errors";
import type { CompiledMechanism } from "../mechanism/types";

export const ENGINE_LIMITS = {
  /** most solved species of a 24-hour (diurnal) analysis */
  diurnalMaxSolvedSpecies: 150,
};

/** Solved species of the mechanism (O3 counted, whether held or solved in a request). */
function solvedCount(mech: CompiledMechanism): number {
  return mech.species.filter((s) => s.role === "solved").length;
}

/** Throws EngineError "beyond-limit" when the requested mode cannot finish within the job time limit. */
export function checkEngineLimits(mech: CompiledMechanism, mode: "instantaneous" | "diurnal"): void {
  const n = solvedCount(mech);
  if (mode === "diurnal" && n > ENGINE_LIMITS.diurnalMaxSolvedSpecies) {
    throw new EngineError(
      "beyond-limit",
      `the 24-hour mode is limited to ${ENGINE_LIMITS.diurnalMaxSolvedSpecies} solved species (its cost grows as the cube of their number, and more would not finish within the time limit); mechanism "${mech.title}" has ${n}: use the instantaneous mode`,
      { path: "condition.mode" },
    );
  }
}

/** Warnings for an uploaded mechanism about the modes it cannot be analysed in. */
export function engineLimitWarnings(mech: CompiledMechanism): string[] {
  const n = solvedCount(mech);
  return n > ENGINE_LIMITS.diurnalMaxSolvedSpecies
    ? [
        `${n} solved species: beyond the ${ENGINE_LIMITS.diurnalMaxSolvedSpecies} of the 24-hour mode, so only instantaneous analyses are available`,
      ]
    : [];
}
