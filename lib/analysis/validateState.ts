/**
 * Entry checks shared by the analysis functions: the state's arrays must be
 * aligned with the mechanism and hold finite, non-negative numbers. Small
 * negative rates (solver round-off) are accepted and treated as 0 with a
 * warning; anything else throws an InputError naming the entry.
 */
import { InputError } from "../errors";
import type { CompiledMechanism } from "../mechanism/types";
import type { SteadyState } from "../solver/types";

export function validateState(
  mech: CompiledMechanism,
  state: Pick<SteadyState, "numberDensity_cm3" | "rate_cm3s">,
): string[] {
  const warnings: string[] = [];
  if (!mech || !Array.isArray(mech.species) || !Array.isArray(mech.reactions))
    throw new InputError("mechanism", "not a compiled mechanism (species and reactions missing)");
  if (!state || !Array.isArray(state.rate_cm3s) || !Array.isArray(state.numberDensity_cm3))
    throw new InputError("state", "give numberDensity_cm3[] and rate_cm3s[] from a steady state");
  if (state.rate_cm3s.length !== mech.reactions.length)
    throw new InputError(
      "state.rate_cm3s",
      `has ${state.rate_cm3s.length} entries but mechanism "${mech.title}" has ${mech.reactions.length} reactions`,
    );
  if (state.numberDensity_cm3.length !== mech.species.length)
    throw new InputError(
      "state.numberDensity_cm3",
      `has ${state.numberDensity_cm3.length} entries but mechanism "${mech.title}" has ${mech.species.length} species`,
    );
  let maxRate = 0;
  state.rate_cm3s.forEach((r, j) => {
    if (!Number.isFinite(r))
      throw new InputError(`state.rate_cm3s[${j}]`, `rate of ${mech.reactions[j].id} is ${r}; give a finite rate`);
    maxRate = Math.max(maxRate, Math.abs(r));
  });
  state.rate_cm3s.forEach((r, j) => {
    if (r < -1e-8 * maxRate)
      throw new InputError(`state.rate_cm3s[${j}]`, `rate of ${mech.reactions[j].id} is negative (${r})`);
    if (r < 0)
      warnings.push(`rate of ${mech.reactions[j].id} is slightly negative (${r.toExponential(2)}); taken as 0`);
  });
  state.numberDensity_cm3.forEach((n, i) => {
    if (!Number.isFinite(n) || n < 0)
      throw new InputError(
        `state.numberDensity_cm3[${i}]`,
        `number density of ${mech.species[i].id} is ${n}; give a finite value ≥ 0`,
      );
  });
  return warnings;
}
