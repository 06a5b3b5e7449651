/**
 * Types of the mechanism domain: the document as written and the compiled
 * mechanism that the solver and the analysis read.
 *
 * Units: number densities in molecules cm⁻³; bimolecular rate constants in
 * cm³ molecule⁻¹ s⁻¹; termolecular low-pressure limits in cm⁶ molecule⁻² s⁻¹;
 * photolysis frequencies in s⁻¹; temperatures in K.
 */
import type { Diagnostic } from "../errors";
import type { RateLaw, Uncertainty } from "../kinetics/types";

/** How a species enters a steady-state solve. */
export type SpeciesRole = "solved" | "held" | "third-body";

/** An amount of a species or a pool: a mixing ratio (mol/mol) or a number density (cm⁻³). */
export type Amount = { mixingRatio: number } | { numberDensity_cm3: number };

export interface Species {
  /** Formula as written in equations, e.g. "O(1D)", "ClONO2", "CH3O2". */
  id: string;
  /** Display label; defaults to the id. */
  label: string;
  role: SpeciesRole;
  /** Atom composition parsed from the formula, element → count (excited-state tags ignored). */
  atoms: Readonly<Record<string, number>>;
  /** Default amount for a held species when the conditions give none. */
  defaultAmount?: Amount;
  /** Optional grouping for display ("Ox", "HOx", "NOx", "ClOx", "BrOx", "reservoir", "source", …). */
  group?: string;
}

/** One side's entry of a reaction: species index into `CompiledMechanism.species` and its coefficient. */
export interface Term {
  species: number;
  coef: number;
}

export interface CompiledReaction {
  /** Index in `CompiledMechanism.reactions`. */
  index: number;
  /** Unique id from the document, e.g. "C1" or "ClO+O". */
  id: string;
  /** Equation as written, normalised spacing, e.g. "ClO + O -> Cl + O2". */
  equation: string;
  /** Reactants excluding M and hv (mass-action factors). */
  reactants: Term[];
  /** Products excluding M. */
  products: Term[];
  /** Third body M written in the equation. */
  thirdBody: boolean;
  /** hv written in the equation. */
  photolysis: boolean;
  rate: RateLaw;
  uncertainty?: Uncertainty;
  /** Citation, e.g. "JPL 19-5, Table 1-1 (from memory)". */
  source?: string;
  note?: string;
}

/**
 * A linear conservation relation over the solved species: Σ weight·[X] is
 * constant under the chemistry among solved species.
 */
export interface ConservationRelation {
  /** e.g. "Cly", or "Cl" for an element found automatically. */
  id: string;
  /** e.g. "Cl atoms". */
  label: string;
  /** Element the relation counts, when it is an element balance. */
  element?: string;
  /** Solved-species weights (species index → weight > 0). */
  weights: Term[];
  /** Human-readable sum, e.g. "Cl + ClO + HCl + ClONO2 + 2 Cl2O2". */
  expression: string;
}

/** A conserved pool whose total the user holds (e.g. Cly). */
export interface ConservedPool extends ConservationRelation {
  /** Default total from the document, if any. */
  total?: Amount;
  /** Reactions that move atoms of this pool in or out from held species (e.g. CFCl3 photolysis). */
  externalReactions: number[];
}

export interface CompiledMechanism {
  title: string;
  version: string;
  description: string;
  species: Species[];
  /** Species id → index. */
  speciesIndex: Readonly<Record<string, number>>;
  reactions: CompiledReaction[];
  /** Pools whose totals are held (from the document's totals). */
  pools: ConservedPool[];
  /** All conservation relations of the solved species found automatically. */
  conservation: ConservationRelation[];
  /** Photolysis channel names used, sorted. */
  photolysisChannels: string[];
  /** Soft problems found while loading. */
  warnings: Diagnostic[];
}
