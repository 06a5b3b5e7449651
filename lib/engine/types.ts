/**
 * The request and result of one analysis: what the server route takes and
 * returns, and what the views read. Plain JSON throughout.
 */
import type { CycleReport } from "../analysis/types";
import type { CloudState, CloudType } from "../atmosphere/polarCloud";
import type { SteadyState } from "../solver/types";
import type { UncertaintyResult } from "../uncertainty/types";

export type AnalysisMode = "instantaneous" | "diurnal";

/** A condition as a user states it. Every field but the altitude has a default. */
export interface ConditionInput {
  /** geometric altitude, km (0–86) */
  altitude_km: number;
  /** temperature, K (150–350); default: U.S. Standard Atmosphere 1976 */
  T_K?: number;
  /** pressure, hPa (> 0); default: U.S. Standard Atmosphere 1976 */
  p_hPa?: number;
  /** latitude, degrees north (−90–90); default 45 */
  latitude_deg?: number;
  /** date "YYYY-MM-DD"; default "2026-03-20" */
  date?: string;
  /** local solar time, h (0–24); default 12 */
  localSolarTime_h?: number;
  /** solar zenith angle, degrees (0–180); when given it overrides latitude/date/time for the sun */
  zenith_deg?: number;
  /** default "instantaneous" */
  mode?: AnalysisMode;
  /** held-species overrides, mixing ratio (mol/mol) by species id */
  held?: Record<string, number>;
  /** pool-total overrides, mixing ratio of the pool's atoms by pool id (e.g. Cly: 3.3e-9) */
  poolTotals?: Record<string, number>;
  /** photolysis overrides, s⁻¹ by channel */
  J?: Record<string, number>;
  /** factor on every computed J; default 1 */
  jScale?: number;
  /** hold O3 at the climatology ("held", default) or solve for it ("solved") */
  ozone?: "held" | "solved";
  /** ozone column above the level, Dobson units (0–2000); default from the climatology. Sets the light, not the local O3. */
  o3ColumnAbove_DU?: number;
  /** aerosol surface area density for the mechanism's uptake reactions, µm² cm⁻³ (0–10000); default: background sulfate at the altitude */
  aerosolSurface_um2cm3?: number;
  /** polar stratospheric cloud: "none" (default), "NAT", "ice", or "auto" (from T, the frost point and T_NAT) */
  cloud?: CloudType;
  /** surface area density of the cloud present, µm² cm⁻³ (NAT 0–100, ice 0–10000); default NAT 1, ice 200 */
  cloudSurface_um2cm3?: number;
  /** Lambertian albedo of the ground (and any cloud deck below) for the scattered light, 0–1; default 0.3 */
  albedo?: number;
  /** aerosol optical depth of the column at 550 nm for the light (0–10), spread like the background sulfate profile; default 0 */
  aerosolOpticalDepth?: number;
}

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

/** The condition with every default filled in and the derived quantities. */
export interface ResolvedCondition {
  altitude_km: number;
  T_K: number;
  p_hPa: number;
  /** air number density, cm⁻³ */
  M_cm3: number;
  latitude_deg: number;
  date: string;
  dayOfYear: number;
  localSolarTime_h: number;
  /** degrees */
  zenith_deg: number;
  mode: AnalysisMode;
  ozone: "held" | "solved";
  /** overhead ozone column, Dobson units */
  o3ColumnAbove_DU: number;
  /** aerosol surface area density used by uptake reactions, µm² cm⁻³ */
  aerosolSurface_um2cm3: number;
  /** the polar stratospheric cloud used and the temperatures that decide it (absent in records from before clouds: none) */
  cloud?: CloudState;
  /** ground albedo used for the light, 0–1 (absent in records from before the two-stream light: 0.2, one reflection) */
  albedo?: number;
  /** column aerosol optical depth at 550 nm used for the light */
  aerosolOpticalDepth?: number;
  /** every photolysis frequency used, s⁻¹ */
  J_s: Record<string, number>;
  /** held amounts used, cm⁻³ */
  held_cm3: Record<string, number>;
  /** pool totals used, cm⁻³ */
  poolTotals_cm3: Record<string, number>;
  /** where each value came from ("U.S. Standard Atmosphere 1976", "given", "default climatology: …"), by quantity */
  sources?: Record<string, string>;
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
