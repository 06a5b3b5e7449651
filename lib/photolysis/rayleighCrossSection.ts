/**
 * Rayleigh scattering cross section of air, Nicolet (Planet. Space Sci. 32,
 * 1467, 1984) — form and constants from memory:
 *   σ = 4.02e-28 / λ^(4 + x),  λ in µm,
 *   x = 0.389λ + 0.09426/λ − 0.3228 for 0.2 < λ < 0.55 µm, x = 0.04 above 0.55 µm
 * (the 0.2 µm value of x is used below 0.2 µm). Units: nm → cm².
 */

/** Rayleigh cross section of air, cm², at a wavelength (nm). */
export function rayleighCrossSection_cm2(lambda_nm: number): number {
  const l = lambda_nm / 1000;
  const lx = Math.max(l, 0.2);
  const x = l > 0.55 ? 0.04 : 0.389 * lx + 0.09426 / lx - 0.3228;
  return 4.02e-28 / l ** (4 + x);
}
