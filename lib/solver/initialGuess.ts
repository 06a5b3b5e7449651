/**
 * Starting values for the steady-state iteration (the choice of the balance
 * equation each pool total replaces is in chooseReplaced.ts).
 *
 * Cold start: pool members share their pool's total equally, other species
 * start at 1e-12·[M]; a few damped Jacobi sweeps of the local balance
 * x_i ← P_i(x) / (L_i(x)/x_i) (the quasi-steady-state estimate of each species
 * given the others; common practice) bring radicals near their fast
 * equilibria, with the pools rescaled to their totals after each sweep.
 * Warm start: the given number densities (non-positive or missing entries cold).
 *
 * Units: molecules cm⁻³; u = ln x.
 */
import type { ChemSystem } from "./buildSystem";
import { productionLoss, reactionRates } from "./massAction";
import { NEWTON_DEFAULTS, type NewtonWorkspace } from "./newtonLog";

const DEFAULTS = {
  /** cold-start amount of a species outside every pool, fraction of [M] */
  coldFraction: 1e-12,
  /** Jacobi sweeps */
  sweeps: 4,
  /** damping of each sweep in ln x (1 = undamped) */
  damping: 0.7,
  /** bounds of a swept value, cm⁻³ */
  floor_cm3: 1e-20,
  /** upper bound, fraction of [M] */
  ceilingFraction: 3e-5,
  /** only species with a loss frequency above this (s⁻¹) get the quasi-steady estimate */
  fastLossFrequency_s: 1e-4,
};

/** Rescales the members of every pool so that Σ w x = total (sequentially over pools). */
export function rescalePools(sys: ChemSystem, x: Float64Array): void {
  for (const c of sys.constraints) {
    let s = 0;
    for (let q = 0; q < c.members.length; q++) s += c.weights[q] * x[c.members[q]];
    if (!(s > 0)) continue;
    const f = c.total / s;
    for (let q = 0; q < c.members.length; q++) x[c.members[q]] *= f;
  }
}

/** Cold-start guess in x (cm⁻³), written into `x`. `reachable[i] = 0` marks species without a source. */
export function coldGuess(
  sys: ChemSystem,
  kEff: Float64Array,
  M_cm3: number,
  reachable: Uint8Array,
  ws: NewtonWorkspace,
  x: Float64Array,
): void {
  const n = sys.n;
  x.fill(DEFAULTS.coldFraction * M_cm3);
  for (const c of sys.constraints) {
    let wsum = 0;
    for (let q = 0; q < c.members.length; q++) wsum += c.weights[q];
    for (let q = 0; q < c.members.length; q++) {
      const m = c.members[q];
      const v = c.total / wsum;
      x[m] = x[m] === DEFAULTS.coldFraction * M_cm3 ? v : Math.min(x[m], v);
    }
  }
  const ceiling = DEFAULTS.ceilingFraction * M_cm3;
  for (let sweep = 0; sweep < DEFAULTS.sweeps; sweep++) {
    reactionRates(sys, kEff, x, ws.rates);
    productionLoss(sys, ws.rates, ws.P, ws.L);
    for (let i = 0; i < n; i++) {
      if (!reachable[i]) {
        x[i] = DEFAULTS.floor_cm3;
        continue;
      }
      const P = ws.P[i];
      const lossFrequency = ws.L[i] / x[i];
      if (!(P > 0) || !(lossFrequency >= DEFAULTS.fastLossFrequency_s)) continue;
      let target = P / lossFrequency;
      target = Math.min(ceiling, Math.max(DEFAULTS.floor_cm3, target));
      x[i] = Math.exp((1 - DEFAULTS.damping) * Math.log(x[i]) + DEFAULTS.damping * Math.log(target));
    }
    rescalePools(sys, x);
  }
}

/** Warm-start guess: given values where positive and finite, else the cold guess already in `x`. */
export function applyWarmStart(
  sys: ChemSystem,
  given: (speciesIndex: number) => number | undefined,
  x: Float64Array,
): number {
  let used = 0;
  for (let i = 0; i < sys.n; i++) {
    const v = given(sys.unknownSpecies[i]);
    if (v !== undefined && Number.isFinite(v) && v > 0) {
      x[i] = v;
      used++;
    }
  }
  return used;
}

/** u = ln x within the solver's bounds. */
export function toLog(x: Float64Array, u: Float64Array): void {
  for (let i = 0; i < x.length; i++) {
    const v = Math.log(Math.max(x[i], 1e-300));
    u[i] = Math.min(NEWTON_DEFAULTS.uMax, Math.max(NEWTON_DEFAULTS.uMin, v));
  }
}
