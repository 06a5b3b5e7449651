/**
 * N2O absorption cross section, 173–240 nm, by the polynomial fit of Selwyn,
 * Podolske & Johnston (Geophys. Res. Lett. 4, 427, 1977) as recommended by
 * the NASA/JPL evaluation (coefficients from memory):
 *   ln σ = Σ Aₙ λⁿ + (T − 300)·exp(Σ Bₙ λⁿ),  λ in nm, T in K (194–302 K).
 * Zero outside 173–240 nm. Units: nm, K → cm².
 */

const A = [68.21023, -4.071805, 4.301146e-2, -1.777846e-4, 2.520672e-7];
const B = [123.4014, -2.116255, 1.111572e-2, -1.881058e-5];

/** N2O cross section, cm², at a wavelength (nm) and temperature (K). */
export function n2oCrossSection_cm2(lambda_nm: number, T_K: number): number {
  if (lambda_nm < 173 || lambda_nm > 240) return 0;
  const l = lambda_nm;
  const a = A[0] + l * (A[1] + l * (A[2] + l * (A[3] + l * A[4])));
  const b = B[0] + l * (B[1] + l * (B[2] + l * B[3]));
  const T = Math.min(302, Math.max(194, T_K));
  return Math.exp(a + (T - 300) * Math.exp(b));
}
