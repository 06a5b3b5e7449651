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
  /** aerosol (liquid sulfate) surface area density for uptake reactions, cm² cm⁻³; default 0 (none) */
  aerosolSurface_cm2cm3?: number;
  /** NAT particle surface area density, cm² cm⁻³; default 0 (none) */
  natSurface_cm2cm3?: number;
  /** ice particle surface area density, cm² cm⁻³; default 0 (none) */
  iceSurface_cm2cm3?: number;
}

export type SolveStatus =
  | "converged"
  /** a solved species produced but never lost, or undetermined (e.g. a radical with J = 0 and no source) */
  | "no-steady-state"
  | "diverged"
  | "max-iterations"
  | "invalid-input"
  /** not a steady state: one instant of a time integration (a run's hour), the species changing at their net rates */
  | "instant";

export interface SpeciesState {
  id: string;
  /** index in CompiledMechanism.species (added by the solver) */
  index?: number;
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
  /** soft problems (ignored condition entries, species named in a failure); added by the solver */
  warnings?: string[];
  /** pseudo-transient continuation steps of the cold start (0 when a warm start converged directly); added by the solver */
  coldStartSteps?: number;
}

/** Options of `solveSteadyState`. */
export interface SteadyStateOptions {
  /** warm start: number densities by species id, cm⁻³ (solved species not named start cold); default none */
  initial_cm3?: Readonly<Record<string, number>>;
  /** warm start: number densities by mechanism index (e.g. a previous SteadyState.numberDensity_cm3), cm⁻³; default none */
  initialState?: readonly number[];
  /** convergence: max-norm of the scaled residual (P − L)/(P + L), dimensionless; default 1e-10 */
  residualTolerance?: number;
  /** convergence also needs the last Newton step max |δ ln x| (≈ relative error of the number densities) below this; default 1e-9 */
  stepTolerance?: number;
  /** maximum Newton iterations after the cold start; default 60 */
  maxIterations?: number;
  /** maximum pseudo-transient continuation steps of the cold start; default 200 */
  maxColdStartSteps?: number;
  /** effective rate constants by reaction index, overriding the kinetics evaluation (units as returned by effectiveRateConstant); default none */
  rateConstants?: ArrayLike<number>;
  /** factors on the rate constants by reaction index (sensitivity studies); default all 1 */
  rateMultipliers?: ArrayLike<number>;
  /** from this many unknowns on, the Newton step uses the sparse LU (below it the dense one); default 30 */
  sparseFromUnknowns?: number;
}

/** Options of the Rosenbrock integrator. */
export interface IntegrateOptions {
  /** relative tolerance of the local error, dimensionless; default 1e-4 */
  rtol?: number;
  /** absolute tolerance of the local error, in the units of y (cm⁻³ for chemistry); default 1e-2 */
  atol?: number;
  /** first trial step, s; default 1e-6 of the interval */
  initialStep_s?: number;
  /** largest step, s; default the whole interval */
  maxStep_s?: number;
  /** maximum accepted + rejected steps; default 100000 */
  maxSteps?: number;
  /** times (s) the integrator must step onto exactly (discontinuities, outputs); default none */
  breakpoints_s?: readonly number[];
}

/** Result of a Rosenbrock integration. */
export interface IntegrationResult {
  status: "ok" | "max-steps" | "step-too-small" | "non-finite";
  message: string;
  /** final time, s */
  t_s: number;
  /** final state (cm⁻³ for chemistry, by solved index in `integrateOde`, by mechanism index in `integrate`) */
  y: number[];
  acceptedSteps: number;
  rejectedSteps: number;
  /** right-hand-side evaluations */
  functionEvaluations: number;
  /** Jacobian evaluations (one per step attempt) */
  jacobianEvaluations: number;
}

/** The periodic 24-hour solution of `solveDiurnal`. */
export interface DiurnalSteadyState {
  status: SolveStatus;
  message: string;
  /**
   * 24-hour means: numberDensity_cm3, rate_cm3s, production, loss and pool
   * sources are means over the day; k is the mean rate constant; lifetime is
   * mean [X] / mean loss.
   */
  average: SteadyState;
  /** the instantaneous state of the periodic solution at `reportAt_h` */
  atReportTime: SteadyState;
  /** local solar time of `atReportTime`, h */
  reportAt_h: number;
  /** days integrated in total (including the spin-up) */
  daysIntegrated: number;
  /** Rosenbrock steps taken over all days (accepted + rejected) */
  integratorSteps: number;
  /** max over species of |y(24 h) − y(0 h)| / (|y(0 h)| + atol) after the last day */
  periodicityError: number;
}

/** Options of `solveDiurnal`. */
export interface DiurnalOptions {
  /** condition samples per day; rate constants are interpolated linearly between them; default 96 (every 15 min) */
  samplesPerDay?: number;
  /** convergence: day-to-day change and Newton correction, relative, below this; default 1e-3 */
  periodicTolerance?: number;
  /** maximum days integrated; default 40 */
  maxDays?: number;
  /** Rosenbrock relative tolerance; default 1e-4 */
  rtol?: number;
  /** Rosenbrock absolute tolerance, cm⁻³; default 1 */
  atol?: number;
  /** warm start by mechanism index, cm⁻³ (the state at local midnight); default the instantaneous steady state at 24-h mean rate constants */
  initialState?: readonly number[];
}
