/**
 * Effective rate constants of every reaction at one condition, from the
 * kinetics domain (`effectiveRateConstant`: JPL 19-5 rate laws, [M] included
 * for third-body reactions), optionally overridden or scaled by the caller.
 *
 * Units: as returned by the kinetics (s⁻¹ first order, cm³ molecule⁻¹ s⁻¹ second order).
 */
import { InputError } from "../errors";
import { effectiveRateConstant } from "../kinetics";
import type { CompiledMechanism } from "../mechanism/types";
import type { SolveConditions } from "./types";

export interface RateConstantOptions {
  /** replaces the kinetics evaluation, by reaction index; default none */
  rateConstants?: ArrayLike<number>;
  /** factors by reaction index; default all 1 */
  rateMultipliers?: ArrayLike<number>;
}

/** Rate constants by reaction index; throws InputError when one is negative or not finite. */
export function rateConstants(
  mech: CompiledMechanism,
  cond: SolveConditions,
  options: RateConstantOptions = {},
  out: Float64Array = new Float64Array(mech.reactions.length),
): Float64Array {
  const nr = mech.reactions.length;
  const { rateConstants: given, rateMultipliers } = options;
  if (given && given.length !== nr) {
    throw new InputError("options.rateConstants", `has ${given.length} entries, the mechanism has ${nr} reactions`);
  }
  if (rateMultipliers && rateMultipliers.length !== nr) {
    throw new InputError(
      "options.rateMultipliers",
      `has ${rateMultipliers.length} entries, the mechanism has ${nr} reactions`,
    );
  }
  const env = {
    T_K: cond.T_K,
    M_cm3: cond.M_cm3,
    J_s: cond.J_s ?? {},
    aerosolSurface_cm2cm3: cond.aerosolSurface_cm2cm3,
    natSurface_cm2cm3: cond.natSurface_cm2cm3,
    iceSurface_cm2cm3: cond.iceSurface_cm2cm3,
  };
  for (let j = 0; j < nr; j++) {
    let k = given ? given[j] : effectiveRateConstant(mech.reactions[j], env);
    if (rateMultipliers) k *= rateMultipliers[j];
    if (!(Number.isFinite(k) && k >= 0)) {
      throw new InputError(
        `reactions[${j}]`,
        `rate constant of ${mech.reactions[j].id} (${mech.reactions[j].equation}) is ${k} at T = ${cond.T_K} K, [M] = ${cond.M_cm3} cm⁻³: must be finite and ≥ 0`,
      );
    }
    out[j] = k;
  }
  return out;
}
