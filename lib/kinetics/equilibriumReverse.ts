/**
 * Reverse rate from an equilibrium constant, in the form of the NASA/JPL
 * evaluation (Publication 19-5, Section 3): K(T) = A exp(B/T) in cm³ molecule⁻¹,
 * k_rev = k_fwd / K(T) (e.g. Cl2O2 + M → 2 ClO + M, N2O5 + M → NO2 + NO3 + M).
 *
 * Units: A in cm³ molecule⁻¹, B and T in K; k_fwd is the effective bimolecular
 * forward coefficient (cm³ molecule⁻¹ s⁻¹), so k_rev is in s⁻¹.
 */

/** K(T) = A exp(B/T), cm³ molecule⁻¹. */
export function equilibriumConstant(A_cm3: number, B_K: number, T_K: number): number {
  return A_cm3 * Math.exp(B_K / T_K);
}

/** k_rev = k_fwd / K(T). */
export function equilibriumReverse(kForward: number, A_cm3: number, B_K: number, T_K: number): number {
  return kForward / equilibriumConstant(A_cm3, B_K, T_K);
}
