/**
 * Types of the profile domain: an atmospheric profile on altitude levels, a
 * sweep of steady-state analyses over those levels, and the comparison of two
 * sweeps. Plain JSON throughout. Altitudes in km, T in K, p in hPa, amounts as
 * mixing ratios (mol/mol) or number densities (molecules cm⁻³) as named,
 * rates in molecules cm⁻³ s⁻¹.
 */
import type { AnalysisMode, AnalysisOptions, AnalysisRequest, ConditionInput } from "../engine/types";
import type { SolveStatus } from "../solver/types";

/** One level of a profile, in the units the engine takes. */
export interface ProfileLevel {
  /** geometric altitude, km */
  altitude_km: number;
  /** K; absent: the U.S. Standard Atmosphere 1976 */
  T_K?: number;
  /** hPa; absent: the U.S. Standard Atmosphere 1976 */
  p_hPa?: number;
  /** held-species amounts, mol/mol, by species id */
  held?: Record<string, number>;
  /** pool totals, mol of the pool's atoms per mol of air, by pool id */
  poolTotals?: Record<string, number>;
}

/** A column of an uploaded profile, as its header named it. */
export interface ProfileColumn {
  /** the header cell as written, e.g. "p (hPa)" */
  header: string;
  quantity: "altitude" | "T" | "p" | "held" | "poolTotal";
  /** species or pool id for "held" and "poolTotal" */
  id?: string;
  /** unit as written, normalised, e.g. "hPa", "ppbv" */
  unit: string;
}

export type ProfileSourceKind = "standard" | "demo" | "upload";

/** A profile: levels in increasing altitude. */
export interface Profile {
  /** "standard", a demo id, or "upload" */
  id: string;
  title: string;
  source: ProfileSourceKind;
  /** true for invented demonstration data; the views label it */
  demo: boolean;
  /** provenance or notes (from `# note:` lines of a CSV) */
  note: string;
  /** strictly increasing altitudes */
  levels: ProfileLevel[];
  /** the columns of an uploaded CSV, in file order (kept for the round trip) */
  columns?: ProfileColumn[];
}

/** Where the profile of a sweep comes from. */
export type ProfileSpec =
  | { kind: "standard" }
  | { kind: "demo"; id: string }
  | { kind: "csv"; csv: string; name?: string };

/** The altitude grid of a sweep. */
export interface SweepGrid {
  /** lowest level, km; default 10 (or the profile's lowest level) */
  from_km?: number;
  /** highest level, km; default 60 (or the profile's highest level) */
  to_km?: number;
  /** spacing, km; default 1 */
  step_km?: number;
}

/** The parts of a condition that are the same at every level of a sweep. */
export type SweepCondition = Omit<ConditionInput, "altitude_km" | "T_K" | "p_hPa">;

export interface SweepOptions extends AnalysisOptions {
  /**
   * "parallel": one warm-started chain per pool worker (segments worked from
   * both ends); "sequential": one chain from the top down; "auto" (default):
   * parallel for the 24-hour mode, sequential for the instantaneous one (on
   * the 2-core machine the instantaneous sweep took the same wall time either
   * way and twice the CPU in parallel; see bench/cases/profiles.ts).
   */
  parallel?: "auto" | "parallel" | "sequential";
  /** with O3 solved: most passes of (solve every level → recompute the overhead O3 column); default 3 */
  maxColumnPasses?: number;
  /** with O3 solved: stop when no level's overhead column changed by more than this fraction; default 0.01 */
  columnTolerance?: number;
}

/** POST /api/profiles: a sweep. */
export interface SweepRequest {
  mechanismId: string;
  profile: ProfileSpec;
  grid?: SweepGrid;
  /** latitude, date, time, mode, ozone, held/pool overrides for every level (they win over the profile's columns) */
  condition?: SweepCondition;
  options?: SweepOptions;
}

/** How the overhead O3 column of each level was obtained. */
export type ColumnSource = "climatology" | "profile" | "solved";

export type LevelStatus = SolveStatus | "error";

/** The odd-oxygen budget of a level, reduced to what profiles show. */
export interface LevelBudget {
  /** molecules cm⁻³ s⁻¹ */
  production_cm3s: number;
  /** molecules cm⁻³ s⁻¹ */
  loss_cm3s: number;
  /** loss by family, molecules cm⁻³ s⁻¹, and its fraction (0–1; the fractions sum to 1) */
  byFamily: { family: string; oxLoss_cm3s: number; fraction: number }[];
  /** loss in pathways below the threshold, molecules cm⁻³ s⁻¹ */
  unassignedLoss_cm3s: number;
}

/** A cycle at one level, reduced. */
export interface LevelCycle {
  id: string;
  /** the steps as equations with multiplicities, sorted ("2×(ClO + O -> Cl + O2) ; …"): matches a cycle across mechanisms whose reaction ids differ */
  stepsKey: string;
  family: string;
  netEquation: string;
  /** molecules cm⁻³ s⁻¹ */
  rate_cm3s: number;
  /** molecules cm⁻³ s⁻¹ */
  oxLoss_cm3s: number;
  /** fraction of the level's Ox loss, 0–1 */
  share: number;
  rateLimitingStep: string;
  chainLength: number | null;
}

/** One level of a sweep. A failed level keeps its status and reason; budget and cycles are then null/empty. */
export interface SweepLevel {
  altitude_km: number;
  status: LevelStatus;
  /** the reason when not converged; empty when converged */
  message: string;
  /** the single-level analysis request this level is equivalent to (open it in the explorer) */
  request: AnalysisRequest;
  /** K, hPa, cm⁻³, degrees, DU, µm² cm⁻³ as resolved; null when the condition could not be resolved */
  condition: {
    T_K: number;
    p_hPa: number;
    M_cm3: number;
    zenith_deg: number;
    o3ColumnAbove_DU: number;
    /** aerosol surface area density used by uptake reactions; absent in sweeps stored before engine 0.2.0 */
    aerosolSurface_um2cm3?: number;
    /** the polar cloud at this level (the request's cloud type decided per level); absent when none */
    cloud?: "NAT" | "ice";
    /** its surface area density, µm² cm⁻³ */
    cloudSurface_um2cm3?: number;
  } | null;
  budget: LevelBudget | null;
  cycles: LevelCycle[];
  /** number densities (cm⁻³) and mixing ratios (mol/mol) of every species */
  species: { id: string; role: "solved" | "held"; numberDensity_cm3: number; mixingRatio: number }[];
  iterations: number;
  residualNorm: number;
  /** whether the solve started from a neighbour's state */
  warmStarted: boolean;
  /** ms */
  elapsed_ms: number;
}

export interface SweepTiming {
  /** wall time of the whole sweep, ms */
  wall_ms: number;
  /** sum of the levels' own compute times, ms */
  compute_ms: number;
  /** warm-started chains run side by side */
  chains: number;
  /** passes over the levels (more than one when the overhead O3 column is iterated) */
  passes: number;
}

/** A finished sweep. Levels in increasing altitude. */
export interface SweepResult {
  engineVersion: string;
  mechanism: { id: string; title: string };
  profile: { id: string; title: string; source: ProfileSourceKind; demo: boolean; note: string };
  mode: AnalysisMode;
  ozone: "held" | "solved";
  columnSource: ColumnSource;
  levels: SweepLevel[];
  /** every family with Ox loss at some level, in display order */
  families: string[];
  timing: SweepTiming;
  /** soft problems: failed levels, column iteration not settled, … */
  warnings: string[];
}

/** One side of a comparison: a stored sweep by id, or a sweep to run. */
export type ComparisonSide = { sweepId: string } | SweepRequest;

/** POST /api/comparisons. */
export interface ComparisonRequest {
  a: ComparisonSide;
  b: ComparisonSide;
  /** labels of the two sides; default "A" and "B" */
  labels?: { a?: string; b?: string };
  /** cycles listed per altitude as explaining the difference; default 5 */
  topCycles?: number;
}

/** One side's numbers at one altitude. */
export interface ComparisonSideLevel {
  status: LevelStatus;
  message: string;
  /** molecules cm⁻³ s⁻¹; null when the level failed */
  loss_cm3s: number | null;
  /** by family: molecules cm⁻³ s⁻¹ */
  oxLoss_cm3s: Record<string, number>;
  /** by family: 0–1 */
  fraction: Record<string, number>;
}

/** A cycle's change between A and B at one altitude. */
export interface CycleChange {
  cycleId: string;
  family: string;
  netEquation: string;
  /** molecules cm⁻³ s⁻¹ */
  a_cm3s: number;
  /** molecules cm⁻³ s⁻¹ */
  b_cm3s: number;
  /** b − a, molecules cm⁻³ s⁻¹ */
  delta_cm3s: number;
  /** delta / (total loss difference); can exceed 1 or be negative when changes offset */
  shareOfDifference: number | null;
}

export interface ComparisonLevel {
  altitude_km: number;
  a: ComparisonSideLevel;
  b: ComparisonSideLevel;
  /** null when either side failed */
  difference: {
    /** B − A, molecules cm⁻³ s⁻¹ */
    loss_cm3s: number;
    /** (B − A)/A; null when A is 0 */
    relative: number | null;
    /** by family, B − A, molecules cm⁻³ s⁻¹ */
    oxLoss_cm3s: Record<string, number>;
    /** by family, fraction B − fraction A */
    fraction: Record<string, number>;
    /** the cycles whose change is largest in magnitude, largest first */
    explaining: CycleChange[];
    /** Σ delta of `explaining` / total difference; null when the total difference is 0 */
    explainedFraction: number | null;
  } | null;
}

export interface ComparisonResult {
  engineVersion: string;
  labels: { a: string; b: string };
  a: { sweepId: string; mechanism: { id: string; title: string }; profile: SweepResult["profile"]; mode: AnalysisMode };
  b: { sweepId: string; mechanism: { id: string; title: string }; profile: SweepResult["profile"]; mode: AnalysisMode };
  families: string[];
  levels: ComparisonLevel[];
  warnings: string[];
}
