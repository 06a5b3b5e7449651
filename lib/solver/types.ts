/**
 * Types of the steady-state engine. Number densities in molecules cm⁻³,
 * rates in molecules cm⁻³ s⁻¹, lifetimes in s.
 */

/** Everything a solve needs besides the compiled mechanism. */
export interface SolveConditions {
  /** K */
  T_K: number;
  /** air number density [M], molecules cm⁻³ */
  M_cm3: number;
  /** photolysis frequencies by channel name, s⁻¹; a missing channel is 0 */
  J_s: Readonly<Record<string, number>>;
  /**
   * Number densities of held species (cm⁻³). Must give every species whose role
   * is "held" (else its default amount is used); may also name a solved species
   * (e.g. O3) to hold it for this solve.
   */
  held_cm3: Readonly<Record<string, number>>;
  /** Totals of the mechanism's pools by pool id (cm⁻³ of the pool's atoms, weighted). */
  poolTotals_cm3: Readonly<Record<string, number>>;
}

export type SolveStatus =
  | "converged"
  /** a solved species produced but never lost, or undetermined (e.g. a radical with J = 0 and no source) */
  | "no-steady-state"
  | "diverged"
  | "max-iterations"
  | "invalid-input";

export interface SpeciesState {
  id: string;
  role: "solved" | "held";
  /** molecules cm⁻³ */
  numberDensity_cm3: number;
  /** mol/mol of air */
  mixingRatio: number;
  /** chemical production, molecules cm⁻³ s⁻¹ */
  production_cm3s: number;
  /** chemical loss, molecules cm⁻³ s⁻¹ */
  loss_cm3s: number;
  /** [X]/loss, s; null when loss is 0 */
  lifetime_s: number | null;
}

export interface ReactionState {
  id: string;
  equation: string;
  /** effective rate coefficient (units depend on order; photolysis in s⁻¹) */
  k: number;
  /** molecules cm⁻³ s⁻¹ */
  rate_cm3s: number;
}

export interface PoolSource {
  pool: string;
  /** net chemical source of the pool from held species, molecules cm⁻³ s⁻¹ (what transport must balance) */
  externalSource_cm3s: number;
  /** the species whose balance equation the pool total replaced */
  replacedEquation: string;
  /** requested total, cm⁻³ */
  total_cm3: number;
}

export interface SteadyState {
  status: SolveStatus;
  /** names the species involved when not converged */
  message: string;
  iterations: number;
  /** max-norm of the scaled residual at the end */
  residualNorm: number;
  T_K: number;
  M_cm3: number;
  /** aligned with CompiledMechanism.species, the third body M omitted */
  species: SpeciesState[];
  /** aligned with CompiledMechanism.reactions */
  reactions: ReactionState[];
  pools: PoolSource[];
  /** number density of every species by mechanism index (M included as [M]), cm⁻³ */
  numberDensity_cm3: number[];
  /** rate of every reaction by mechanism index, molecules cm⁻³ s⁻¹ */
  rate_cm3s: number[];
}
