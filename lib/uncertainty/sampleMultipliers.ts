/**
 * The rate-constant factors of one Monte Carlo sample: for each reaction with
 * a published uncertainty, ln k is drawn from N(ln k₀, (ln f(T))²), f(T) =
 * f(298)·exp|g(1/T − 1/298)| (NASA/JPL Publication 19-5, Section 1, as
 * recalled: k₀·f and k₀/f bound one standard deviation, i.e. f is the 1σ
 * factor of a log-normal k). Photolysis reactions get the caller's factor
 * (default 1: J not varied). Reactions without an uncertainty keep factor 1.
 * A reverse rate from an equilibrium constant follows its forward reaction.
 *
 * Units: dimensionless factors by reaction index.
 */
import { InputError } from "../errors";
import { uncertaintyFactor } from "../kinetics";
import type { CompiledMechanism } from "../mechanism/types";
import { normalDraws } from "./normalDraws";

export const SAMPLE_DEFAULTS = {
  /** 1σ factor on photolysis frequencies; 1 = not varied */
  photolysisFactor: 1,
  /** scale on every ln f; 1 = as published */
  factorScale: 1,
};

export interface SampleOptions {
  /** 1σ factor on every photolysis frequency; default 1 (not varied) */
  photolysisFactor?: number;
  /** multiplies every ln f (0 collapses every draw to the central k); default 1 */
  factorScale?: number;
}

/** ln f(T) of every reaction (0 = not varied), by reaction index. */
export function logFactors(mech: CompiledMechanism, T_K: number, options: SampleOptions = {}): Float64Array {
  const pf = options.photolysisFactor ?? SAMPLE_DEFAULTS.photolysisFactor;
  const scale = options.factorScale ?? SAMPLE_DEFAULTS.factorScale;
  if (!(pf >= 1 && Number.isFinite(pf)))
    throw new InputError(
      "options.photolysisFactor",
      `invalid photolysisFactor: ${pf} (give a factor ≥ 1, 1 = not varied)`,
    );
  if (!(scale >= 0 && Number.isFinite(scale)))
    throw new InputError("options.factorScale", `invalid factorScale: ${scale} (give a number ≥ 0)`);
  if (!(T_K > 0)) throw new InputError("T_K", `invalid temperature: ${T_K} K`);
  return Float64Array.from(mech.reactions, (r, j) => {
    let f = 1;
    if (r.uncertainty) {
      if (!(r.uncertainty.f298 >= 1))
        throw new InputError(
          `reactions[${j}].uncertainty.f298`,
          `uncertainty factor of ${r.id} must be ≥ 1, got ${r.uncertainty.f298}`,
        );
      f = uncertaintyFactor(r.uncertainty, T_K);
    } else if (r.photolysis) f = pf;
    return scale * Math.log(f);
  });
}

/**
 * Factors exp(σ_j z_j) of sample `index`, given σ_j = ln f_j(T) from
 * `logFactors`. With the mechanism given, a reverse rate computed from an
 * equilibrium constant (k_rev = k_fwd/K) also takes its forward reaction's
 * factor, its own σ being that of K (JPL Table 3 gives f and g for K), so
 * that a drawn k_fwd does not change the equilibrium.
 */
export function sampleMultipliers(
  sigma: Float64Array,
  seed: number,
  index: number,
  mech?: CompiledMechanism,
): Float64Array {
  const z = normalDraws(seed, index, sigma.length);
  const m = Float64Array.from(sigma, (s, j) => (s === 0 ? 1 : Math.exp(s * z[j])));
  if (mech) for (const r of mech.reactions) if (r.forwardReaction !== undefined) m[r.index] *= m[r.forwardReaction];
  return m;
}
