/**
 * Types of the cycle analysis. Rates in molecules cm⁻³ s⁻¹.
 */

/** A pathway (Lehmann 2004): reactions with integer multiplicities and a rate. */
export interface Pathway {
  /** reaction index → multiplicity (positive integers) */
  steps: { reaction: number; multiplicity: number }[];
  /** how many times per cm³ per s the whole sequence runs */
  rate_cm3s: number;
  /** net effect: species index → coefficient (non-zero only) */
  net: { species: number; coef: number }[];
}

export interface CycleStep {
  reactionId: string;
  equation: string;
  multiplicity: number;
  /** molecules cm⁻³ s⁻¹ (the reaction's total rate) */
  rate_cm3s: number;
}

export interface CatalyticCycle {
  /** stable id from the sorted step list */
  id: string;
  /** e.g. "O + O3 -> 2 O2" */
  netEquation: string;
  steps: CycleStep[];
  /** pathway rate, molecules cm⁻³ s⁻¹ */
  rate_cm3s: number;
  /** odd oxygen destroyed per turnover */
  oxPerTurnover: number;
  /** rate × oxPerTurnover, molecules cm⁻³ s⁻¹ */
  oxLoss_cm3s: number;
  /** "Ox", "HOx", "NOx", "ClOx", "BrOx", or coupled e.g. "ClOx-BrOx" */
  family: string;
  /** catalyst species ids (regenerated) */
  catalysts: string[];
  /** share of total Ox loss, 0–1 */
  share: number;
  /** fraction of the catalyst's passes through the first step that complete this cycle, 0–1 */
  efficiency: number;
  /** id of the slowest step */
  rateLimitingStep: string;
  /** turnovers before the carrier family goes to reservoirs; null when undefined */
  chainLength: number | null;
  /**
   * the operational form of the same ratio: the rate of the rate-limiting step (per multiplicity) divided by the
   * carrier family's loss to reservoirs, as chain lengths are often quoted; ≥ chainLength, null when undefined
   */
  chainLengthRateLimiting: number | null;
  /** id of the step whose rate is least devoted to this cycle (the step `efficiency` refers to) */
  entryStep: string;
  /** carrier family whose loss to reservoirs sets `chainLength` (for coupled cycles the one lost fastest relative to the cycle); null for pure oxygen */
  chainCarrier: string | null;
  /** net effect as species id → coefficient (negative = consumed) */
  net: Record<string, number>;
}

export interface FamilyShare {
  family: string;
  /** molecules cm⁻³ s⁻¹ */
  oxLoss_cm3s: number;
  /** 0–1; all families sum to 1 */
  fraction: number;
}

export interface OxBudget {
  /** species ids counted as odd oxygen */
  definition: string[];
  /** molecules cm⁻³ s⁻¹ */
  production_cm3s: number;
  /** molecules cm⁻³ s⁻¹ */
  loss_cm3s: number;
  byFamily: FamilyShare[];
  /** loss from the rate-limiting-step formula, molecules cm⁻³ s⁻¹ */
  directLoss_cm3s: number;
  /** loss in pathways below f_min, molecules cm⁻³ s⁻¹ */
  unassignedLoss_cm3s: number;
  /** production in pathways below f_min, molecules cm⁻³ s⁻¹ */
  unassignedProduction_cm3s: number;
  /** odd-oxygen weights used, species id → weight */
  weights: Record<string, number>;
  /** production − loss = Σ_j r_j ΔOx_j: the chemical tendency of Ox that a held O3 hides ("storage"), molecules cm⁻³ s⁻¹ */
  netChange_cm3s: number;
  /** the terms of the direct formula, largest first */
  directTerms: DirectTerm[];
  /** (loss − directLoss)/directLoss; null where directLoss ≤ 0 while the pathways find a loss (no check possible) */
  directMismatch: number | null;
}

/** One term of the direct Ox-loss formula: weight × rate of one reaction. */
export interface DirectTerm {
  reactionId: string;
  equation: string;
  /** Ox destroyed per reaction event (negative = counted against the loss) */
  weight: number;
  /** weight × rate, molecules cm⁻³ s⁻¹ */
  loss_cm3s: number;
}

/** The loss of a carrier family to reservoirs and sinks (Lary 1997 chain termination). */
export interface CarrierFamilyRate {
  family: string;
  /** members and their weights, e.g. { Cl: 1, ClO: 1, Cl2O2: 2 } (only species in the mechanism) */
  members: Record<string, number>;
  /** Σ_j r_j·max(0, −Δw_j), molecules cm⁻³ s⁻¹ */
  lossToReservoirs_cm3s: number;
  /** Σ_j r_j·max(0, Δw_j), molecules cm⁻³ s⁻¹ (equal to the loss in steady state) */
  productionFromReservoirs_cm3s: number;
}

export interface ReactionOx {
  reactionId: string;
  /** Ox destroyed through the cycles this reaction takes part in, molecules cm⁻³ s⁻¹ */
  oxDestroyed_cm3s: number;
  /** the reaction's own net Ox change (positive = produced), molecules cm⁻³ s⁻¹ */
  netOxChange_cm3s: number;
}

export interface CycleReport {
  cycles: CatalyticCycle[];
  budget: OxBudget;
  perReaction: ReactionOx[];
  /** number of significant pathways kept */
  pathwayCount: number;
  /** threshold used, molecules cm⁻³ s⁻¹ */
  fmin_cm3s: number;
  warnings: string[];
  /** Ox-destroying pathways whose net effect involves more than Ox and O2 (initiation/termination chains, reservoir formation), largest first */
  otherLossPathways: CatalyticCycle[];
  /** branching-point species in the order they were processed */
  branchingPoints: string[];
  /** carrier families and their loss to reservoirs */
  carrierFamilies: CarrierFamilyRate[];
  /** total rate of the null cycles dropped, molecules cm⁻³ s⁻¹ */
  nullCycleRate_cm3s: number;
  /** odd-oxygen definition used */
  oxDefinition: OxDefinition;
  /** chemical tendency Σ_j r_j S_ij of each solved species held for this solve (e.g. O3), molecules cm⁻³ s⁻¹ */
  heldTendencies: { species: string; tendency_cm3s: number }[];
}

export type OxDefinition = "standard" | "extended";

/** Options of `analyseCycles`. */
export interface CycleOptions {
  /** pathway significance threshold f_min as a fraction of the gross Ox destruction Σ r_j·max(0, w_j) under the extended weights (docs/cycle-analysis.md); default 1e-4 */
  fminRelative?: number;
  /** "standard": O + O(1D) + O3; "extended": also NO2, 2 NO3, 3 N2O5, HNO3, HO2NO2, ClO, 2 OClO, 2 Cl2O2, 2 ClONO2, BrO, 2 BrONO2 (docs/cycle-analysis.md); default "standard" */
  oxDefinition?: OxDefinition;
  /** only species with chemical lifetime below this are branching points, s; default 1e7 (≈ 116 days) */
  lifetimeLimit_s?: number;
  /** species held for this solve (e.g. O3): never branching points, never catalysts; species whose role is "held" are always held */
  heldSpecies?: string[];
  /** at most this many pathways are kept after each branching point (slowest deleted, with a warning); default 50000 */
  maxPathways?: number;
}

/** Options of `findPathways`. */
export interface PathwayOptions {
  /** significance threshold f_min, molecules cm⁻³ s⁻¹; default 0 (keep every pathway) */
  fmin_cm3s?: number;
  /** species never used as branching points (species of interest, held species); default none */
  notBranching?: string[];
  /** only species with [X]/D(X) below this are branching points, s; default 1e7 */
  lifetimeLimit_s?: number;
  /** weighted sums (weights by species index) whose gross change in deleted pathways is recorded, e.g. { Ox: weights } */
  track?: Record<string, ArrayLike<number>>;
  /** at most this many pathways after each branching point; default 50000 */
  maxPathways?: number;
  /**
   * work budget: once this many producer–consumer joins are made, no further
   * branching points are processed (with a warning), so that the search ends
   * within the job time limit on a large network; default 1e6
   */
  maxJoins?: number;
}

/** Result of `findPathways`. */
export interface PathwaySet {
  /** significant pathways, fastest first */
  pathways: Pathway[];
  /** species ids in processing order */
  branchingPoints: string[];
  /** molecules cm⁻³ s⁻¹ */
  fmin_cm3s: number;
  deleted: {
    /** Σ over deleted pathways of rate × net effect, by species index, molecules cm⁻³ s⁻¹ */
    net_cm3s: number[];
    /** Σ over deleted pathways of rate × multiplicity, by reaction index: the reaction flux they carried, molecules cm⁻³ s⁻¹ */
    flux_cm3s: number[];
    /** gross positive and negative change of each tracked weighted sum in deleted pathways, molecules cm⁻³ s⁻¹ */
    tracked: Record<string, { produced_cm3s: number; destroyed_cm3s: number }>;
  };
  /** total rate of null cycles dropped, molecules cm⁻³ s⁻¹ */
  nullCycleRate_cm3s: number;
  /** imbalance P − D of each branching point when it was processed (> 0: storage, < 0: release), molecules cm⁻³ s⁻¹ */
  storage: { species: string; rate_cm3s: number }[];
  warnings: string[];
}
