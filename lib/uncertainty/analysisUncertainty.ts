/**
 * The uncertainty part of one analysis, as the engine asks for it: the
 * sensitivity coefficients (`sensitivity: true`) and a Monte Carlo run in the
 * calling thread (`uncertaintySamples` > 0). Both need the instantaneous
 * steady state; in the 24-hour mode they are skipped with a warning. The
 * cycle analysis of every perturbed or sampled state uses the central options.
 */
import type { CycleOptions, CycleReport } from "../analysis/types";
import type { CompiledMechanism } from "../mechanism/types";
import type { SolveConditions, SteadyState } from "../solver/types";
import { monteCarlo } from "./monteCarlo";
import { sensitivities } from "./sensitivities";
import type { UncertaintyResult } from "./types";

export interface AnalysisUncertaintyOptions {
  /** compute sensitivity coefficients; default false */
  sensitivity?: boolean;
  /** Monte Carlo samples; default 0 (none) */
  samples?: number;
  /** Monte Carlo seed; default 1 */
  seed?: number;
}

/** undefined when nothing is asked for. */
export function analysisUncertainty(
  mech: CompiledMechanism,
  mode: "instantaneous" | "diurnal",
  conditions: SolveConditions,
  state: SteadyState,
  report: CycleReport,
  cycleOptions: CycleOptions,
  options: AnalysisUncertaintyOptions,
): UncertaintyResult | undefined {
  const samples = options.samples ?? 0;
  if (!options.sensitivity && samples === 0) return undefined;
  const result: UncertaintyResult = { warnings: [] };
  if (mode === "diurnal") {
    result.warnings.push(
      "sensitivities and Monte Carlo ranges need the instantaneous steady state; they are not computed in the 24-hour mode",
    );
    return result;
  }
  if (state.status !== "converged") {
    result.warnings.push(`no sensitivities or ranges: the steady state did not converge (${state.message})`);
    return result;
  }
  if (options.sensitivity) result.sensitivity = sensitivities(mech, conditions, state, report, cycleOptions);
  if (samples > 0)
    result.monteCarlo = monteCarlo(mech, conditions, state, report, cycleOptions, { samples, seed: options.seed });
  return result;
}
