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
}
