/**
 * Arrhenius rate law in the form of the NASA/JPL evaluation (Publication 19-5,
 * Table 1): k(T) = A exp(−(E/R)/T), with an optional (T/300)^b factor.
 *
 * Units: A in cm³ molecule⁻¹ s⁻¹ (bimolecular), cm⁶ molecule⁻² s⁻¹ (written
 * with + M) or s⁻¹ (unimolecular); E/R and T in K.
 */

/** k = A (T/300)^b exp(−(E/R)/T). */
export function arrhenius(A: number, EoverR_K: number, T_K: number, b = 0): number {
  const k = A * Math.exp(-EoverR_K / T_K);
  return b === 0 ? k : k * (T_K / 300) ** b;
}
