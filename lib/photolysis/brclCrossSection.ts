/**
 * BrCl absorption cross section as two log-normal bands of the same form as
 * the Cl2 expression (cl2CrossSection.ts), without temperature dependence:
 *   σ = 3.8e-19·exp(−85·ln²(375/λ)) + 2.0e-20·exp(−80·ln²(460/λ)).
 * Approximate, from memory: the main band peaks near 375 nm at ~3.8e-19 cm²
 * with ~65 nm half width, and a weak shoulder lies near 460 nm.
 * Units: nm → cm².
 */

/** BrCl cross section, cm², at a wavelength (nm). */
export function brclCrossSection_cm2(lambda_nm: number): number {
  const l1 = Math.log(375 / lambda_nm);
  const l2 = Math.log(460 / lambda_nm);
  return 3.8e-19 * Math.exp(-85 * l1 * l1) + 2.0e-20 * Math.exp(-80 * l2 * l2);
}
