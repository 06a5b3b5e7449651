/**
 * Pressure-dependent termolecular association in the form of the NASA/JPL
 * evaluation (Publication 19-5, Section 2):
 *
 *   k0(T) = k0(300) (T/300)^−n,  k∞(T) = k∞(300) (T/300)^−m,
 *   k = k0[M] / (1 + k0[M]/k∞) · Fc^(1/(1 + [log10(k0[M]/k∞)]²)),  Fc = 0.6.
 *
 * Without k∞ the low-pressure limit k0(T)[M] is returned. The result is the
 * effective bimolecular coefficient (cm³ molecule⁻¹ s⁻¹): [M] is included.
 * Units: k0 in cm⁶ molecule⁻² s⁻¹, k∞ in cm³ molecule⁻¹ s⁻¹, [M] in cm⁻³, T in K.
 */

export const DEFAULTS = {
  /** broadening factor used by JPL for every termolecular entry */
  Fc: 0.6,
  /** reference temperature of k0(300) and k∞(300), K */
  T_ref_K: 300,
} as const;

export interface TermolecularParams {
  /** cm⁶ molecule⁻² s⁻¹ at 300 K */
  k0_300: number;
  n: number;
  /** cm³ molecule⁻¹ s⁻¹ at 300 K; omit for the low-pressure limit */
  kinf_300?: number;
  /** default 0 */
  m?: number;
  /** default 0.6 */
  Fc?: number;
}

/** Effective bimolecular rate coefficient k([M], T), cm³ molecule⁻¹ s⁻¹. */
export function termolecular(p: TermolecularParams, T_K: number, M_cm3: number): number {
  const t = T_K / DEFAULTS.T_ref_K;
  const k0M = p.k0_300 * t ** -p.n * M_cm3;
  if (p.kinf_300 === undefined) return k0M;
  const kinf = p.kinf_300 * t ** -(p.m ?? 0);
  return falloff(k0M, kinf, p.Fc ?? DEFAULTS.Fc);
}

/**
 * The JPL falloff expression x/(1 + x/k∞) · Fc^(1/(1 + log10(x/k∞)²)) for a
 * low-pressure rate x = k0[M]. Shared with the chemical-activation law.
 */
export function falloff(k0M: number, kinf: number, Fc: number): number {
  if (k0M <= 0) return 0;
  const ratio = k0M / kinf;
  const lg = Math.log10(ratio);
  return (k0M / (1 + ratio)) * Fc ** (1 / (1 + lg * lg));
}
