/**
 * Chemical activation through a bound adduct, in the form of the NASA/JPL
 * evaluation (Publication 19-5, Section 2, e.g. OH + CO → H + CO2 via HOCO):
 *
 *   k_f([M], T) = k0(T) / (1 + k0(T)[M]/k∞(T)) · Fc^(1/(1 + [log10(k0(T)[M]/k∞(T))]²)),
 *   k0(T) = k0(300)(T/300)^−n,  k∞(T) = k∞(300)(T/300)^−m,  Fc = 0.6.
 *
 * Units: k0 in cm³ molecule⁻¹ s⁻¹, k∞ in s⁻¹, [M] in cm⁻³, T in K; the result
 * is a bimolecular coefficient in cm³ molecule⁻¹ s⁻¹.
 */
import { DEFAULTS, falloff } from "./termolecular";

export interface ChemicalActivationParams {
  /** cm³ molecule⁻¹ s⁻¹ at 300 K */
  k0_300: number;
  n: number;
  /** s⁻¹ at 300 K */
  kinf_300: number;
  m: number;
  /** default 0.6 */
  Fc?: number;
}

/** Bimolecular rate coefficient of the activated channel, cm³ molecule⁻¹ s⁻¹. */
export function chemicalActivation(p: ChemicalActivationParams, T_K: number, M_cm3: number): number {
  const t = T_K / DEFAULTS.T_ref_K;
  const k0 = p.k0_300 * t ** -p.n;
  const kinf = p.kinf_300 * t ** -p.m;
  if (M_cm3 <= 0) return k0;
  // k0/(1 + k0[M]/k∞)·F = falloff(k0[M], k∞)/[M]
  return falloff(k0 * M_cm3, kinf, p.Fc ?? DEFAULTS.Fc) / M_cm3;
}
