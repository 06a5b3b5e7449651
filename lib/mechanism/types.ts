/**
 * Types of the mechanism domain: the document as written and the compiled
 * mechanism that the solver and the analysis read.
 *
 * Units: number densities in molecules cm⁻³; bimolecular rate constants in
 * cm³ molecule⁻¹ s⁻¹; termolecular low-pressure limits in cm⁶ molecule⁻² s⁻¹;
 * photolysis frequencies in s⁻¹; temperatures in K.
 */
import type { Diagnostic } from "../errors";
import type { LiquidAerosolProcess, RateLaw, SurfaceKind, Uncertainty } from "../kinetics/types";

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
  /**
   * For a surface reaction (uptake, liquid-aerosol): the species index of the gas taken up. The rate is first
   * order in it alone; a second reactant (the partner, e.g. HCl) is consumed but enters through γ.
   */
  firstOrderIn?: number;
  /**
   * For an equilibrium-reverse rate, the index of its forward reaction: a
   * change of the forward rate constant carries over to this one at fixed K,
   * and `uncertainty` is then the uncertainty of K.
   */
  forwardReaction?: number;
  uncertainty?: Uncertainty;
  /** Citation, e.g. "JPL 19-5, Table 1-1 (from memory)". */
  source?: string;
  note?: string;
  /** Reason given for a knowingly unbalanced reaction (lumped products); absent when balanced. */
  unbalanced?: string;
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
  /**
   * True when no reaction changes the sum (an exact invariant, in the left null
   * space of the solved-species stoichiometry); false for an element balance
   * that reactions with held species feed or drain.
   */
  exact: boolean;
  /** Reactions (indices) that change the sum: they exchange atoms with held species. */
  externalReactions: number[];
}

/** A conserved pool whose total the user holds (e.g. Cly). */
export interface ConservedPool extends ConservationRelation {
  /** Default total from the document, if any. */
  total?: Amount;
  /** Reactions that move atoms of this pool in or out from held species (e.g. CFCl3 photolysis). */
  externalReactions: number[];
  /** Note from the document, e.g. "approximate, mid-latitude 2020s". */
  note?: string;
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

/** Size limits of a mechanism document; beyond them loading stops with an error. */
export interface MechanismLimits {
  /** default 5,000 */
  maxSpecies: number;
  /** default 20,000 */
  maxReactions: number;
  /** UTF-8 bytes of the document text; default 4,194,304 (4 MiB) */
  maxTextBytes: number;
  /** deepest nesting of lists and mappings, levels; default 64 */
  maxDepth: number;
}

/** What `loadMechanism` returns. */
export interface LoadedMechanism {
  mechanism: CompiledMechanism;
  /** Canonical JSON of the parsed document (keys sorted, no whitespace), for content hashing. */
  canonical: string;
  /** Soft problems (also in `mechanism.warnings`). */
  warnings: Diagnostic[];
  /** The document text as given. */
  text: string;
}

/** A built-in mechanism as listed for users. */
export interface BuiltinMechanismInfo {
  id: string;
  title: string;
  description: string;
}

/** Sparse stoichiometric matrix: rows are species, columns reactions, entries net coefficients (M excluded). */
export interface SparseStoichiometry {
  nSpecies: number;
  nReactions: number;
  /** Per reaction, the nonzero net coefficients (products − reactants), sorted by species index. */
  columns: Term[][];
  /** Per species, the reactions that change it and the net coefficient. */
  rows: { reaction: number; coef: number }[][];
}

/*
 * The document as written (YAML or JSON), after its shape has been checked.
 * Field names are those of docs/mechanism-format.md.
 */

/** A rate law as written in a document; symbols of the JPL evaluation. */
export type RateEntry =
  | { law: "arrhenius"; A: number; "E/R"?: number; b?: number }
  | { law: "termolecular"; k0: number; n?: number; kinf?: number; m?: number; Fc?: number }
  | { law: "chemical-activation"; k0: number; n?: number; kinf: number; m?: number; Fc?: number }
  | { law: "lindemann"; low: { A: number; "E/R"?: number }; high: { A: number; "E/R"?: number } }
  | { law: "equilibrium-reverse"; forward: string | RateEntry; K: { A: number; B: number } }
  | { law: "photolysis"; channel?: string; factor?: number; J?: number }
  | { law: "uptake"; gamma: number; surface?: SurfaceKind }
  | { law: "liquid-aerosol"; process: LiquidAerosolProcess; radius_um?: number };

export interface SpeciesEntry {
  id: string;
  role: SpeciesRole;
  label?: string;
  group?: string;
  /** explicit composition for a name that is not a formula (lumped species) */
  atoms?: Record<string, number>;
  mixingRatio?: number;
  /** cm⁻³ */
  numberDensity_cm3?: number;
  note?: string;
}

export interface TotalEntry {
  id: string;
  element: string;
  label?: string;
  mixingRatio?: number;
  /** cm⁻³ */
  numberDensity_cm3?: number;
  note?: string;
}

export interface ReactionEntry {
  id: string;
  equation: string;
  rate: RateEntry;
  uncertainty?: Uncertainty;
  source?: string;
  note?: string;
  unbalanced?: string;
}

export interface MechanismDocument {
  title: string;
  version: string;
  description: string;
  species: SpeciesEntry[];
  totals: TotalEntry[];
  reactions: ReactionEntry[];
}
