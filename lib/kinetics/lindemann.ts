/**
 * Lindemann falloff with Arrhenius limits, the form the NASA/JPL evaluation
 * (Publication 19-5) uses for the pressure-dependent part of OH + HNO3:
 *   k = k_low[M] / (1 + k_low[M]/k_high),  k_x = A_x exp(−(E/R)_x / T).
 * Units: k_low in cm⁶ molecule⁻² s⁻¹, k_high in cm³ molecule⁻¹ s⁻¹, [M] in
 * cm⁻³; the result (cm³ molecule⁻¹ s⁻¹) includes [M].
 */
import { arrhenius } from "./arrhenius";

export interface LindemannParams {
  low: { A: number; EoverR_K: number };
  high: { A: number; EoverR_K: number };
}

export function lindemann(p: LindemannParams, T_K: number, M_cm3: number): number {
  const lowM = arrhenius(p.low.A, p.low.EoverR_K, T_K) * M_cm3;
  if (lowM <= 0) return 0;
  return lowM / (1 + lowM / arrhenius(p.high.A, p.high.EoverR_K, T_K));
}
