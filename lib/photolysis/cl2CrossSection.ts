/**
 * Cl2 absorption cross section by the two-band expression of Maric, Burrows,
 * Meller & Moortgat (J. Photochem. Photobiol. A 70, 205, 1993) recommended
 * by the NASA/JPL evaluation (constants from memory):
 *   σ = 1e-20·α^½·[27.3·exp(−99.0·α·ln²(329.5/λ)) + 0.932·exp(−91.5·α·ln²(406.5/λ))],
 *   α = tanh(402.7/T).
 * Units: nm, K → cm².
 */

/** Cl2 cross section, cm², at a wavelength (nm) and temperature (K). */
export function cl2CrossSection_cm2(lambda_nm: number, T_K: number): number {
  const alpha = Math.tanh(402.7 / T_K);
  const l1 = Math.log(329.5 / lambda_nm);
  const l2 = Math.log(406.5 / lambda_nm);
  return (
    1e-20 * Math.sqrt(alpha) * (27.3 * Math.exp(-99.0 * alpha * l1 * l1) + 0.932 * Math.exp(-91.5 * alpha * l2 * l2))
  );
}
