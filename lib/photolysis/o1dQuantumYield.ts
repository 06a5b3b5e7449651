/**
 * Quantum yield of O(1D) from O3 photolysis, φ(λ, T): 0.90 below 306 nm;
 * 306–328 nm the recommended expression of Matsumi et al. (J. Geophys. Res.
 * 107(D3), 4024, 2002), adopted by the NASA/JPL evaluation:
 *   φ = q1/(q1+q2)·A1·exp(−((X1−λ)/ω1)⁴) + q2/(q1+q2)·A2·(T/300)²·exp(−((X2−λ)/ω2)²)
 *       + A3·(T/300)^1.5·exp(−((X3−λ)/ω3)²) + c,   q_i = exp(−ν_i/(k T)),
 * with X = 304.225, 314.957, 310.737 nm; ω = 5.576, 6.601, 2.187 nm;
 * A = 0.8036, 8.9061, 0.1192; ν2 = 825.518 cm⁻¹ (ν1 = 0); c = 0.0765
 * (constants from memory); 0.08 for 328–340 nm; 0 above 340 nm.
 * Units: nm, K → dimensionless.
 */

const K_cm_per_K = 0.695035; // Boltzmann constant in cm⁻¹ K⁻¹

/** O(1D) quantum yield of O3 photolysis at a wavelength (nm) and temperature (K). */
export function o1dQuantumYield(lambda_nm: number, T_K: number): number {
  if (lambda_nm < 306) return 0.9;
  if (lambda_nm > 340) return 0;
  if (lambda_nm > 328) return 0.08;
  const q2 = Math.exp(-825.518 / (K_cm_per_K * T_K));
  const w1 = 1 / (1 + q2);
  const w2 = q2 / (1 + q2);
  const t = T_K / 300;
  const phi =
    w1 * 0.8036 * Math.exp(-(((304.225 - lambda_nm) / 5.576) ** 4)) +
    w2 * 8.9061 * t * t * Math.exp(-(((314.957 - lambda_nm) / 6.601) ** 2)) +
    0.1192 * t ** 1.5 * Math.exp(-(((310.737 - lambda_nm) / 2.187) ** 2)) +
    0.0765;
  return Math.min(0.9, phi);
}
