/**
 * Time integration of a mechanism at fixed conditions with the ROS3
 * Rosenbrock method (see rosenbrock.ts; Sandu et al., Atmos. Environ. 31,
 * 3459–3472, 1997). Held species stay at their amounts; pool totals are not
 * imposed (the chemistry conserves them up to the pools' external sources).
 *
 * Units: molecules cm⁻³, s.
 */
import { InputError } from "../errors";
import type { CompiledMechanism } from "../mechanism/types";
import { buildSystem } from "./buildSystem";
import { chemistryOde } from "./chemistryOde";
import { effectiveConstants } from "./massAction";
import { rateConstants } from "./rateConstants";
import { integrateOde } from "./rosenbrock";
import type { IntegrateOptions, IntegrationResult, SolveConditions } from "./types";

export const INTEGRATE_DEFAULTS = { rtol: 1e-4, atol: 1e-2 };

export interface IntegrateInput {
  /** length of the integration, s (> 0) */
  duration_s: number;
  /** initial number densities by mechanism index, cm⁻³ (e.g. a SteadyState.numberDensity_cm3); default 0 */
  initialState?: readonly number[];
  /** initial number densities by species id, cm⁻³, overriding initialState; default 0 */
  initial_cm3?: Readonly<Record<string, number>>;
}

/** Integrates the chemistry for `duration_s`; `y` of the result is by mechanism index (held species included). */
export function integrate(
  mech: CompiledMechanism,
  cond: SolveConditions,
  input: IntegrateInput,
  options: IntegrateOptions = {},
): IntegrationResult {
  if (!(input.duration_s > 0 && Number.isFinite(input.duration_s))) {
    throw new InputError("input.duration_s", `must be a finite number > 0, got ${input.duration_s}`);
  }
  if (input.initialState && input.initialState.length !== mech.species.length) {
    throw new InputError(
      "input.initialState",
      `must have ${mech.species.length} entries, got ${input.initialState.length}`,
    );
  }
  const sys = buildSystem(mech, cond);
  const k = rateConstants(mech, cond);
  const kEff = effectiveConstants(sys, k, new Float64Array(sys.nReactions));
  const y0 = new Float64Array(sys.n);
  for (let i = 0; i < sys.n; i++) {
    const s = sys.unknownSpecies[i];
    const v = input.initial_cm3?.[mech.species[s].id] ?? input.initialState?.[s] ?? 0;
    if (!(Number.isFinite(v) && v >= 0))
      throw new InputError(`input.initial.${mech.species[s].id}`, `must be ≥ 0, got ${v}`);
    y0[i] = v;
  }
  const ode = chemistryOde(sys, (_t, out) => out.set(kEff), true);
  const res = integrateOde(
    ode,
    y0,
    0,
    input.duration_s,
    { rtol: INTEGRATE_DEFAULTS.rtol, atol: INTEGRATE_DEFAULTS.atol, ...options },
    { nonNegative: true },
  );
  const y = Array.from(sys.fixed);
  for (let i = 0; i < sys.n; i++) y[sys.unknownSpecies[i]] = res.y[i];
  return { ...res, y };
}
