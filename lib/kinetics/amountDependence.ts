/**
 * Rate laws whose uptake probability depends on the amounts of gases (the
 * HCl partner of a surface reaction, the water and HCl of a sulfate
 * solution). For them `rateConstant` returns the collision frequency
 * v̄ A / 4 (γ = 1) and the rate is that times γ(amounts) times [gas]; this
 * module gives the species γ reads and γ itself, so that the solver can
 * evaluate and differentiate it at every iterate.
 *
 * Units: number densities in cm⁻³, T in K, [M] in cm⁻³; partial pressures are
 * p = n/[M] · p_air with p_air = [M] k_B T.
 */
import { partnerLimitedGamma } from "./partnerLimitedGamma";
import { type SulfateComposition, sulfateComposition } from "./sulfateComposition";
import { type SulfateGammas, sulfateGammas } from "./sulfateGamma";
import type { KineticsEnv, RateLaw } from "./types";

/**
 * Work memory that the liquid-aerosol reactions of one system share: the
 * three processes read the same amounts, and the composition changes only
 * with p(H2O). Create one per solve (`newSurfaceCache`).
 */
export interface SurfaceCache {
  pH2O_atm: number;
  composition: SulfateComposition | null;
  /** the last few evaluations (the Jacobian's differences repeat for each of the three processes) */
  entries: { hcl: number; clono2: number; radius: number; gammas: SulfateGammas }[];
  next: number;
}

/** Evaluations kept: 2 differences × 2 amounts, plus the state itself. */
const CACHE_SIZE = 6;

export function newSurfaceCache(): SurfaceCache {
  return { pH2O_atm: Number.NaN, composition: null, entries: [], next: 0 };
}

/** J K⁻¹ (exact, SI 2019) */
const BOLTZMANN = 1.380649e-23;
/** Pa per atm */
const ATM_Pa = 101325;

export interface AmountDependence {
  /** species ids γ reads, in the order of `gamma`'s argument */
  species: readonly string[];
  /** γ (dimensionless, 0–1) from the number densities of `species`, cm⁻³ */
  gamma(amounts_cm3: ArrayLike<number>): number;
}

/** Partial pressure (atm) of a gas at number density n (cm⁻³) and temperature T. */
export function partialPressure_atm(n_cm3: number, T_K: number): number {
  return (n_cm3 * 1e6 * BOLTZMANN * T_K) / ATM_Pa;
}

/** The species ids a law's γ depends on (empty when γ is a constant). */
export function amountSpecies(law: RateLaw): readonly string[] {
  if (law.law === "uptake") return law.partner ? [law.partner.species] : [];
  if (law.law === "liquid-aerosol") return ["H2O", "HCl", "ClONO2"];
  return [];
}

/**
 * γ as a function of amounts, for a law whose γ depends on them; undefined
 * for every other law. `gas` is the id of the gas taken up.
 */
export function amountDependence(
  law: RateLaw,
  env: KineticsEnv,
  gas: string,
  cache: SurfaceCache = newSurfaceCache(),
): AmountDependence | undefined {
  if (law.law === "uptake" && law.partner) {
    const { gamma, molarMass_gmol, partner } = law;
    return {
      species: [gas, partner.species],
      gamma: (a) => partnerLimitedGamma(gamma, a[0], molarMass_gmol, a[1], partner.molarMass_gmol),
    };
  }
  if (law.law === "liquid-aerosol") {
    const T = env.T_K;
    const { process, radius_cm } = law;
    return {
      species: ["H2O", "HCl", "ClONO2"],
      gamma: (a) => {
        const pH2O_atm = partialPressure_atm(a[0], T);
        if (pH2O_atm !== cache.pH2O_atm || !cache.composition) {
          cache.pH2O_atm = pH2O_atm;
          cache.composition = sulfateComposition(T, pH2O_atm);
          cache.entries = [];
        }
        const r = radius_cm ?? 0;
        let g = cache.entries.find((e) => e.hcl === a[1] && e.clono2 === a[2] && e.radius === r)?.gammas;
        if (!g) {
          g = sulfateGammas(
            {
              T_K: T,
              pH2O_atm,
              pHCl_atm: partialPressure_atm(a[1], T),
              pClONO2_atm: partialPressure_atm(a[2], T),
              radius_cm,
            },
            cache.composition,
          );
          cache.entries[cache.next] = { hcl: a[1], clono2: a[2], radius: r, gammas: g };
          cache.next = (cache.next + 1) % CACHE_SIZE;
        }
        return process === "ClONO2+H2O" ? g.ClONO2_H2O : process === "ClONO2+HCl" ? g.ClONO2_HCl : g.HOCl_HCl;
      },
    };
  }
  return undefined;
}
