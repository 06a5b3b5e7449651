/**
 * Types of kinetic sensitivity and uncertainty analysis. Rates in molecules
 * cm⁻³ s⁻¹, number densities in molecules cm⁻³, shares 0–1, chain lengths
 * dimensionless; sensitivity coefficients are dimensionless (∂ln y/∂ln k).
 */

/** What an output measures. */
export type OutputKind = "ox-loss" | "family-share" | "cycle-rate" | "chain-length" | "number-density";

/** One key output of an analysis whose sensitivity and spread are reported. */
export interface OutputDef {
  /** stable key, e.g. "oxLoss", "share:NOx", "cycle:<id>:rate", "cycle:<id>:chainLength", "density:ClO" */
  key: string;
  kind: OutputKind;
  /** for people, e.g. "NOx share of Ox loss" */
  label: string;
  /** "cm⁻³ s⁻¹", "cm⁻³", "1" */
  unit: string;
  /** family name (family-share) */
  family?: string;
  /** cycle id (cycle-rate, chain-length) */
  cycleId?: string;
  /** species id (number-density) */
  species?: string;
}

/** A parameter whose logarithm is perturbed: one reaction's rate constant, or one photolysis channel (every reaction using it). */
export interface SensitivityParameter {
  /** reaction id, or "J:<channel>" */
  id: string;
  kind: "reaction" | "photolysis-channel";
  /** reaction equation, or the reactions using the channel */
  label: string;
  /** reaction indices whose k scales with this parameter */
  reactions: number[];
}

export type SensitivityStatus =
  /** every coefficient computed */
  | "ok"
  /** the central steady state did not converge: nothing computed */
  | "not-converged"
  /** the Jacobian at the steady state is singular (e.g. an undetermined species) */
  | "singular"
  /** diurnal (24-hour) mode: the instantaneous steady-state Jacobian does not apply */
  | "unsupported";

export interface SensitivityReport {
  status: SensitivityStatus;
  message: string;
  outputs: OutputDef[];
  parameters: SensitivityParameter[];
  /** central value of each output (aligned with `outputs`); null when undefined */
  central: (number | null)[];
  /**
   * S[i][p] = ∂ln(output_i)/∂ln(k_p), aligned with `outputs` × `parameters`;
   * null where the output is 0 or undefined, or where the cycle structure
   * changed under the perturbation (see `warnings`).
   */
  coefficients: (number | null)[][];
  /** how the cycle-structure outputs were differentiated */
  cycleMethod: "analysis-derivative-forward" | "analysis-derivative-central" | "none";
  warnings: string[];
  /** wall time, ms */
  elapsed_ms: number;
}

/** One row of a ranked sensitivity table. */
export interface RankedSensitivity {
  parameter: string;
  label: string;
  /** ∂ln y/∂ln k */
  coefficient: number;
  /** rank 1 = largest |coefficient| */
  rank: number;
}

/** Median and 5–95 % range of one output over the Monte Carlo samples. */
export interface OutputSummary {
  key: string;
  /** value at the central (unperturbed) solution; null when undefined */
  central: number | null;
  /** null when no sample gave a value */
  median: number | null;
  p05: number | null;
  p95: number | null;
  /** samples that gave a value (converged and the output defined) */
  count: number;
  /** converged samples in which the output was undefined (a cycle absent or its chain length undefined) */
  missing: number;
}

/** A sample that did not give a steady state. */
export interface SampleFailure {
  /** 0-based sample index */
  index: number;
  status: string;
  message: string;
}

export interface MonteCarloResult {
  /** samples requested */
  samples: number;
  seed: number;
  /** samples whose steady state converged */
  succeeded: number;
  /** samples that failed (status ≠ converged, or an exception) */
  failed: number;
  /** the first failures (at most 20) */
  failures: SampleFailure[];
  outputs: OutputDef[];
  /** aligned with `outputs` */
  summaries: OutputSummary[];
  /** reaction ids drawn with their uncertainty factor, and the 1σ factor f(T) used */
  varied: { id: string; factor: number }[];
  /** reactions with no uncertainty given (held at their central k) */
  notVaried: string[];
  /** percentile definition used */
  percentileMethod: string;
  warnings: string[];
  /** wall time of the sampling, ms */
  elapsed_ms: number;
}

/** What an analysis stores when sensitivities or Monte Carlo are asked for. */
export interface UncertaintyResult {
  sensitivity?: SensitivityReport;
  monteCarlo?: MonteCarloResult;
  /** why something asked for was not computed (e.g. the 24-hour mode) */
  warnings: string[];
}

/** Options of the Monte Carlo draw. */
export interface MonteCarloOptions {
  /** samples; default 100 */
  samples?: number;
  /** unsigned 32-bit seed; default 1 */
  seed?: number;
  /** 1σ factor applied to every photolysis frequency (JPL gives none in f(298)/g form); default 1 (not varied) */
  photolysisFactor?: number;
  /** multiply every uncertainty factor's ln by this (1 = as published, 0 = all collapse to the central k); default 1 */
  factorScale?: number;
}

/** The raw result of one batch of samples (what a worker returns). */
export interface SampleBatchResult {
  /** first sample index of the batch */
  start: number;
  /** per sample: output values aligned with the output list, or null when the sample failed */
  values: ((number | null)[] | null)[];
  failures: SampleFailure[];
}
