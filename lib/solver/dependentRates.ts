/**
 * Reactions whose uptake probability γ depends on the amounts of gases
 * (lib/kinetics `amountDependence`: the partner of a surface reaction, the
 * HCl and water of a sulfate solution). Their rate is
 * r_j = kEff_j · γ_j(a) · [gas], with kEff_j the collision frequency; the
 * solver evaluates γ at every iterate and adds ∂r/∂x through γ to the
 * Jacobian, by central differences in ln a (relative step 1e-5, error ~1e-10;
 * common practice). docs/heterogeneous.md says why γ is not frozen.
 *
 * Units: number densities in molecules cm⁻³.
 */
import { amountDependence, newSurfaceCache } from "../kinetics";
import type { CompiledMechanism } from "../mechanism/types";
import type { SolveConditions } from "./types";

/** Relative step of the differences in ln a. */
const LOG_STEP = 1e-5;

export interface DependentRate {
  /** reaction index */
  reaction: number;
  /** species indices γ reads */
  species: Int32Array;
  /** γ from the amounts of `species`, cm⁻³ */
  gamma: (amounts_cm3: Float64Array) => number;
  /** work buffer: the amounts of `species` */
  amounts: Float64Array;
}

/** The amount-dependent reactions of a mechanism at one condition. */
export function dependentRates(mech: CompiledMechanism, cond: SolveConditions): DependentRate[] {
  const env = { T_K: cond.T_K, M_cm3: cond.M_cm3, J_s: {} };
  const out: DependentRate[] = [];
  // the sulfate reactions read the same amounts: one γ evaluation serves all three
  const cache = newSurfaceCache();
  for (const r of mech.reactions) {
    if (r.firstOrderIn === undefined) continue;
    const dep = amountDependence(r.rate, env, mech.species[r.firstOrderIn].id, cache);
    if (!dep) continue;
    const species = Int32Array.from(dep.species.map((id) => mech.speciesIndex[id]));
    out.push({ reaction: r.index, species, gamma: dep.gamma, amounts: new Float64Array(species.length) });
  }
  return out;
}

/** Fills d.amounts from the unknowns x and the fixed amounts. */
export function gatherAmounts(
  d: DependentRate,
  x: ArrayLike<number>,
  unknownOf: Int32Array,
  fixed: Float64Array,
): Float64Array {
  for (let q = 0; q < d.species.length; q++) {
    const s = d.species[q];
    const u = unknownOf[s];
    d.amounts[q] = u >= 0 ? Math.max(x[u], 0) : fixed[s];
  }
  return d.amounts;
}

/** ∂ln γ/∂ln a_q at d.amounts (0 where a_q or γ is 0); leaves d.amounts unchanged. */
export function logDerivative(d: DependentRate, q: number): number {
  const a = d.amounts[q];
  if (!(a > 0)) return 0;
  d.amounts[q] = a * Math.exp(LOG_STEP);
  const up = d.gamma(d.amounts);
  d.amounts[q] = a * Math.exp(-LOG_STEP);
  const down = d.gamma(d.amounts);
  d.amounts[q] = a;
  if (!(up > 0 && down > 0)) return 0;
  return (Math.log(up) - Math.log(down)) / (2 * LOG_STEP);
}

/** ∂γ/∂a_q at d.amounts, for the linear Jacobian (forward difference at a_q = 0). */
export function linearDerivative(d: DependentRate, q: number): number {
  const a = d.amounts[q];
  const h = a > 0 ? a * LOG_STEP : 1e-6;
  const base = d.gamma(d.amounts);
  d.amounts[q] = a + h;
  const up = d.gamma(d.amounts);
  if (a > 0) {
    d.amounts[q] = a - h;
    const down = d.gamma(d.amounts);
    d.amounts[q] = a;
    return (up - down) / (2 * h);
  }
  d.amounts[q] = a;
  return (up - base) / h;
}
