/**
 * HNO3 absorption cross section, 190–350 nm, with its temperature
 * dependence, as the NASA/JPL evaluation recommends it after Burkholder,
 * Talukdar, Ravishankara and Solomon (1993, J. Geophys. Res. 98, 22937):
 *   σ(λ, T) = σ(λ, 298 K)·exp[B(λ)·(T − 298)],
 * σ(298 K) on a 2 nm grid and B every 10 nm, both written down from memory
 * of the evaluation's table (not checked against it). The weak tail above
 * 300 nm, where the overhead ozone lets light through, sets J(HNO3) in the
 * lower stratosphere; cooling from 298 to 220 K lowers it there by about 20 %.
 * Log-linear between the σ nodes, linear between the B nodes, zero outside
 * 190–350 nm. Units: nm, K → cm².
 */

/** σ(298 K) in 1e-20 cm² from 190 nm in 2 nm steps. */
// biome-ignore format: a table reads better in rows
const SIGMA_298_E20 = [
  1360, 1225, 1095, 940, 770, 588, 447, 328, 231, 156,
  104, 67.5, 43.9, 29.2, 20.0, 14.9, 11.8, 9.61, 8.02, 6.82,
  5.75, 4.87, 4.14, 3.36, 2.93, 2.58, 2.34, 2.16, 2.06, 2.0,
  1.97, 1.96, 1.95, 1.95, 1.93, 1.91, 1.87, 1.83, 1.77, 1.7,
  1.62, 1.53, 1.44, 1.33, 1.23, 1.12, 1.01, 0.909, 0.807, 0.709,
  0.615, 0.532, 0.453, 0.381, 0.316, 0.263, 0.208, 0.167, 0.133, 0.105,
  0.0814, 0.0628, 0.0468, 0.0362, 0.0271, 0.0197, 0.0154, 0.0112, 0.00835, 0.00618,
  0.00471, 0.00353, 0.00275, 0.00211, 0.00158, 0.00114, 0.000855, 0.000643, 0.000467, 0.000342,
  0.000254,
];

/** B in 1e-3 K⁻¹ from 190 nm in 10 nm steps. */
const B_E3 = [0, 1.66, 1.69, 1.68, 1.56, 1.39, 1.34, 1.39, 1.48, 1.63, 1.81, 2.03, 2.29, 2.59, 2.95, 3.34, 3.64];

export const HNO3_SOURCE =
  "NASA/JPL evaluation after Burkholder et al. 1993 (J. Geophys. Res. 98, 22937): σ(298 K) and its temperature coefficients B(λ), from memory";

/** HNO3 cross section, cm², at a wavelength (nm) and temperature (K, clamped to 190–320 K). */
export function hno3CrossSection_cm2(lambda_nm: number, T_K: number): number {
  if (!(lambda_nm >= 190 && lambda_nm <= 350)) return 0;
  const x = (lambda_nm - 190) / 2;
  const i = Math.min(Math.floor(x), SIGMA_298_E20.length - 2);
  const f = x - i;
  const sigma = Math.exp(Math.log(SIGMA_298_E20[i]) * (1 - f) + Math.log(SIGMA_298_E20[i + 1]) * f) * 1e-20;
  const y = (lambda_nm - 190) / 10;
  const j = Math.min(Math.floor(y), B_E3.length - 2);
  const B = (B_E3[j] + (y - j) * (B_E3[j + 1] - B_E3[j])) * 1e-3;
  const T = Math.min(320, Math.max(190, T_K));
  return sigma * Math.exp(B * (T - 298));
}
