/**
 * The request and result of one analysis: what the server route takes and
 * returns, and what the views read. Plain JSON throughout.
 */
import type { CycleReport } from "../analysis/types";
import type { ConditionInput, ResolvedCondition } from "../atmosphere/condition";
import type { SteadyState } from "../solver/types";
import type { UncertaintyResult } from "../uncertainty/types";

export type { AnalysisMode, ConditionInput, ResolvedCondition } from "../atmosphere/condition";

export interface AnalysisOptions {
  /** pathway significance threshold as a fraction of the gross Ox destruction (docs/cycle-analysis.md); default 1e-4 */
  fminRelative?: number;
  /** odd-oxygen family: "O+O(1D)+O3" (default) or "extended" (adds NO2, NO3, 2·N2O5, ClO, BrO, …) */
  oxDefinition?: "standard" | "extended";
  /** Monte Carlo samples over the rate-constant uncertainties (lib/uncertainty); default 0 (none) */
  uncertaintySamples?: number;
  /** seed of the Monte Carlo draws, unsigned 32-bit integer; default 1 */
  uncertaintySeed?: number;
  /** normalised sensitivity coefficients ∂ln(output)/∂ln k of the key outputs (lib/uncertainty); default false */
  sensitivity?: boolean;
}

export interface AnalysisRequest {
  mechanismId: string;
  condition: ConditionInput;
  options?: AnalysisOptions;
}

/** The 24-hour solution besides its means (which are `steadyState`). */
export interface DiurnalSummary {
  /** local solar time of `atLocalTime`, h */
  reportAt_h: number;
  /** the instantaneous state of the periodic solution at reportAt_h: number densities by mechanism index, cm⁻³ */
  atLocalTime_cm3: number[];
  /** reaction rates at reportAt_h by mechanism index, molecules cm⁻³ s⁻¹ */
  atLocalTimeRates_cm3s: number[];
  daysIntegrated: number;
  /** max relative day-to-day change of the last day */
  periodicityError: number;
}

export interface AnalysisResult {
  engineVersion: string;
  mechanism: { id: string; title: string };
  condition: ResolvedCondition;
  /** the options used: fminRelative and oxDefinition always filled in; the uncertainty options when given */
  options: Required<Pick<AnalysisOptions, "fminRelative" | "oxDefinition">> & AnalysisOptions;
  steadyState: SteadyState;
  cycles: CycleReport;
  /** present in the 24-hour mode */
  diurnal?: DiurnalSummary;
  /** inputs that were not used as given, for people */
  warnings?: string[];
  /** wall time of the computation, ms */
  elapsed_ms: number;
  /** sensitivities and Monte Carlo ranges, when the options ask for them (lib/uncertainty) */
  uncertainty?: UncertaintyResult;
}
