/**
 * Types of a run: the chemistry of one air parcel integrated over days, at a
 * fixed place or along a sequence of conditions (a trajectory), with the
 * daily odd-oxygen budget split by family and cycle. Number densities in
 * molecules cm⁻³, rates in molecules cm⁻³ s⁻¹, daily amounts in molecules
 * cm⁻³ per day, times in h from the start of the run.
 */
import type { ConditionInput } from "../engine/types";

/** One row of a trajectory: the conditions at a time. */
export interface TrajectoryPoint {
  /** time since the start of the run, h (≥ 0, increasing) */
  time_h: number;
  /** K */
  T_K: number;
  /** hPa */
  p_hPa: number;
  /** degrees north */
  latitude_deg: number;
  /** geometric altitude for the light and the climatology, km; default the pressure altitude of the U.S. Standard Atmosphere 1976 */
  altitude_km?: number;
  /** aerosol surface area density for the uptake reactions, µm² cm⁻³; default the condition's */
  aerosolSurface_um2cm3?: number;
  /** further condition fields by name (passed to the condition as given, e.g. surface areas of other particle types) */
  extra?: Record<string, number | string>;
}

/** Where a run's chemistry starts. */
export type RunStart =
  /**
   * the 24-hour periodic solution at the first condition, its state at local midnight (default); O3 held at the
   * condition's amount (the climatology unless given) while it is found (default "held"), or solved with the rest
   */
  | { kind: "periodic"; ozone?: "held" | "solved" }
  /** a stored analysis: its state (at its local time in the 24-hour mode), scaled to the first condition's [M] */
  | { kind: "analysis"; analysisId: string }
  /** mixing ratios (mol/mol) by species id over the 24-hour periodic state at midnight */
  | { kind: "amounts"; mixingRatios: Record<string, number>; ozone?: "held" | "solved" };

export interface RunOptions {
  /** pathway significance threshold as a fraction of the gross Ox destruction; default 1e-4 */
  fminRelative?: number;
  /** odd-oxygen family, "standard" (O + O(1D) + O3, default) or "extended" */
  oxDefinition?: "standard" | "extended";
  /** the sun's declination follows the calendar day by day (false: every day is the start date); default true */
  sunFollowsDate?: boolean;
}

/** What a run is asked to do (plain JSON). */
export interface RunRequest {
  mechanismId: string;
  /** the place and start (date, local midnight); along a trajectory its altitude, T, p and latitude are the first row's */
  condition: ConditionInput;
  /** length, days (1–60) */
  days: number;
  /** default { kind: "periodic" } */
  start?: RunStart;
  /** a trajectory as CSV text (docs/runs.md); absent: a fixed place */
  trajectory?: { csv: string; name?: string };
  title?: string;
  options?: RunOptions;
}

/** Everything the integration needs, resolved: plain JSON, so that it crosses worker threads. */
export interface RunPlan {
  /** the condition of the fixed place, or the base of every trajectory row (held overrides, pool totals, date) */
  condition: ConditionInput;
  /** absent: a fixed place */
  trajectory?: TrajectoryPoint[];
  days: number;
  /** the state at t = 0 by mechanism index, cm⁻³ */
  initial_cm3: number[];
  options: Required<RunOptions>;
}

/** Photolysis frequencies already computed, by condition row and zenith node; carried from one segment to the next. */
export type JCache = Record<string, Record<string, number>>;

/** One day's odd-oxygen budget. Amounts in molecules cm⁻³ per day. */
export interface RunDay {
  /** 1-based */
  day: number;
  /** O3 at the day's start and end, cm⁻³ */
  o3Start_cm3: number;
  o3End_cm3: number;
  /** change of the O3 mixing ratio over the day, ppbv per day */
  o3Change_ppbv: number;
  /** change of the O3 mixing ratio relative to its start, % per day */
  o3Change_percent: number;
  /** Ox produced over the day by the pathways (and the deleted share), cm⁻³ per day */
  oxProduction_cm3: number;
  /** Ox destroyed over the day, cm⁻³ per day */
  oxLoss_cm3: number;
  /** Ox change by chemistry from the integrated state (what compression along a trajectory changed left out), cm⁻³ per day */
  oxChange_cm3: number;
  /** |Ox change − (production − loss)| / loss: how well the day's budget closes */
  closure: number;
  /** the day's Ox loss by family (the analysis' "unassigned" share included), cm⁻³ per day */
  byFamily: { family: string; oxLoss_cm3: number }[];
  /** the largest catalytic cycles of the day, cm⁻³ per day */
  cycles: { id: string; netEquation: string; family: string; oxLoss_cm3: number }[];
  /** the day-mean number densities by mechanism index, cm⁻³ (the lifetimes of the pathway analysis) */
  meanState_cm3: number[];
  /** the day's integrated rate of every reaction over its length, molecules cm⁻³ s⁻¹ (the rates the analysis splits) */
  meanRates_cm3s: number[];
  /** pool totals at the day's end, cm⁻³ (the chemistry changes them only through held sources) */
  poolTotals_cm3: Record<string, number>;
  warnings: string[];
}

/** The hourly series: row h is the state at t = h hours. */
export interface RunHours {
  /** h since the start */
  t_h: number[];
  /** K */
  T_K: number[];
  /** cm⁻³ */
  M_cm3: number[];
  /** degrees */
  zenith_deg: number[];
  /** per hour, number densities by mechanism index (M included), cm⁻³ */
  numberDensity_cm3: number[][];
  /** per hour, the rate of every reaction by mechanism index, molecules cm⁻³ s⁻¹ */
  rate_cm3s: number[][];
}

export type RunStatus = "ok" | "failed";

/** The integration of some days from a state: a segment of a run. */
export interface RunSegment {
  status: RunStatus;
  message: string;
  /** h since the run's start where the integration failed; absent when ok */
  failedAt_h?: number;
  /** the hours of these days (the segment's start hour excluded, unless it is the run's t = 0) */
  hours: RunHours;
  days: RunDay[];
  /** the state at the end, by mechanism index, cm⁻³ */
  final_cm3: number[];
  jCache: JCache;
  /** Rosenbrock steps, accepted and rejected */
  steps: number;
}

/** A finished (or failed) run. */
export interface RunResult {
  engineVersion: string;
  mechanism: { id: string; title: string };
  title: string;
  kind: "place" | "trajectory";
  days: number;
  status: RunStatus;
  message: string;
  failedAt_h?: number;
  /** species ids by mechanism index */
  species: string[];
  reactions: { id: string; equation: string }[];
  hours: RunHours;
  daily: RunDay[];
  /** pool totals at t = 0, cm⁻³ */
  initialPoolTotals_cm3: Record<string, number>;
  options: Required<RunOptions>;
  warnings: string[];
  elapsed_ms: number;
}
