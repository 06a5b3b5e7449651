/**
 * The condition vocabulary of one analysis: a condition as a user states it
 * (`ConditionInput`), the same with every default filled in and the derived
 * quantities (`ResolvedCondition`), and the defaults themselves
 * (`CONDITION_DEFAULTS`), in one place for the engine, the routes' schema and
 * OpenAPI document, the explorer's URL and the assessment builder.
 * Units: km, K, hPa, cm⁻³, degrees, h, s⁻¹, µm² cm⁻³, Dobson units.
 */
import { CLOUD_DEFAULTS, type CloudState, type CloudType } from "./polarCloud";

/** Defaults of the optional fields of a `ConditionInput`. */
export const CONDITION_DEFAULTS = {
  /** degrees north */
  latitude_deg: 45,
  /** YYYY-MM-DD */
  date: "2026-03-20",
  /** h, local mean solar time */
  localSolarTime_h: 12,
  mode: "instantaneous",
  ozone: "held",
  /** factor on every computed J */
  jScale: 1,
  /** Lambertian albedo of the ground for the scattered light, 0–1 */
  albedo: 0.3,
  /** aerosol optical depth of the column at 550 nm */
  aerosolOpticalDepth: 0,
  cloud: CLOUD_DEFAULTS.type,
} as const satisfies Partial<ConditionInput>;

export type AnalysisMode = "instantaneous" | "diurnal";

/** A condition as a user states it. Every field but the altitude has a default. */
export interface ConditionInput {
  /** geometric altitude, km (0–86) */
  altitude_km: number;
  /** temperature, K (150–350); default: U.S. Standard Atmosphere 1976 */
  T_K?: number;
  /** pressure, hPa (> 0); default: U.S. Standard Atmosphere 1976 */
  p_hPa?: number;
  /** latitude, degrees north (−90–90); default CONDITION_DEFAULTS */
  latitude_deg?: number;
  /** date "YYYY-MM-DD"; default CONDITION_DEFAULTS */
  date?: string;
  /** local solar time, h (0–24); default CONDITION_DEFAULTS */
  localSolarTime_h?: number;
  /** solar zenith angle, degrees (0–180); when given it overrides latitude/date/time for the sun */
  zenith_deg?: number;
  /** default CONDITION_DEFAULTS */
  mode?: AnalysisMode;
  /** held-species overrides, mixing ratio (mol/mol) by species id */
  held?: Record<string, number>;
  /** pool-total overrides, mixing ratio of the pool's atoms by pool id (e.g. Cly: 3.3e-9) */
  poolTotals?: Record<string, number>;
  /** photolysis overrides, s⁻¹ by channel */
  J?: Record<string, number>;
  /** factor on every computed J; default CONDITION_DEFAULTS */
  jScale?: number;
  /** hold O3 at the climatology ("held") or solve for it ("solved"); default CONDITION_DEFAULTS */
  ozone?: "held" | "solved";
  /** ozone column above the level, Dobson units (0–2000); default from the climatology. Sets the light, not the local O3. */
  o3ColumnAbove_DU?: number;
  /** aerosol surface area density for the mechanism's uptake reactions, µm² cm⁻³ (0–10000); default: background sulfate at the altitude */
  aerosolSurface_um2cm3?: number;
  /** polar stratospheric cloud: "none", "NAT", "ice", or "auto" (from T, the frost point and T_NAT); default CONDITION_DEFAULTS */
  cloud?: CloudType;
  /** surface area density of the cloud present, µm² cm⁻³ (NAT 0–100, ice 0–10000); default NAT 1, ice 200 */
  cloudSurface_um2cm3?: number;
  /** Lambertian albedo of the ground (and any cloud deck below) for the scattered light, 0–1; default CONDITION_DEFAULTS */
  albedo?: number;
  /** aerosol optical depth of the column at 550 nm for the light (0–10), spread like the background sulfate profile; default CONDITION_DEFAULTS */
  aerosolOpticalDepth?: number;
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
