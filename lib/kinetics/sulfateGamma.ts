/**
 * Reaction probabilities of ClONO2 and HOCl on liquid sulfuric acid aerosol
 * (and, as a first approximation, supercooled ternary solution) after Shi et
 * al. (2001, J. Geophys. Res. 106, 24259), as recommended by the NASA/JPL
 * evaluation 19-5, Section 5 (every coefficient from memory, not checked
 * against the table):
 *
 *   ClONO2: H = 1.6e-6 exp(4710/T − 0.306 M), D = 5e-8 T/η, c̄ = 1474 √T,
 *     k_hydr = (1.95e10 e^(−2800/T) + 1.22e12 e^(−6200/T) a_H) a_w,
 *     k_HCl = 7.9e11 a_H D [HCl]_aq,  [HCl]_aq = H*(HCl) p(HCl),
 *     Γ_b(H2O) = 4 H R T √(D k_hydr)/c̄,  l = √(D/(k_hydr + k_HCl)),  f = coth(r/l) − l/r,
 *     Γ_rxn = f Γ_b(H2O) √(1 + k_HCl/k_hydr),  Γ_b(HCl) = Γ_rxn k_HCl/(k_HCl + k_hydr),
 *     Γ_s = 66.12 e^(−1374/T) [HCl]_aq,
 *     F = 1/(1 + 0.612 (Γ_s + Γ_b(HCl)) p(ClONO2)/p(HCl))   (HCl depletion at the surface),
 *     γ = 1/(1 + 1/(F Γ_s + Γ_rxn)),  γ(+HCl) = γ (F Γ_s + F Γ_b(HCl))/(F Γ_s + Γ_rxn),
 *     γ(+H2O) = γ − γ(+HCl);
 *   HOCl + HCl: H = 1.91e-6 exp(5862.4/T − (0.0776 + 59.18/T) M), D = 6.4e-8 T/η,
 *     c̄ = 2009 √T, k = 1.25e9 a_H D [HCl]_aq, l = √(D/k), f = coth(r/l) − l/r,
 *     Γ_rxn = 4 H R T √(D k)/c̄,  γ = 1/(1 + 1/(f Γ_rxn F)).
 *
 * The HCl dependence makes the ClONO2 + HCl probability vanish linearly as
 * HCl → 0 (so the rate, first order in ClONO2, is limited by the HCl that
 * arrives); the solver differentiates it (docs/heterogeneous.md).
 *
 * Units: T in K, partial pressures in atm, r in cm; H in M atm⁻¹, D in cm² s⁻¹,
 * c̄ in cm s⁻¹, k in s⁻¹, R = 0.082 L atm mol⁻¹ K⁻¹.
 */
import { type SulfateComposition, sulfateComposition } from "./sulfateComposition";

export const SULFATE_GAMMA_DEFAULTS = {
  /** particle radius of the reacto-diffusive length test, cm (0.1 µm, background sulfate; common practice) */
  radius_cm: 1e-5,
};

/** L atm mol⁻¹ K⁻¹ */
const R_LATM = 0.082057;

export interface SulfateGammaInput {
  /** K */
  T_K: number;
  /** water vapour partial pressure, atm */
  pH2O_atm: number;
  /** HCl partial pressure, atm */
  pHCl_atm: number;
  /** ClONO2 partial pressure, atm (sets the surface HCl depletion) */
  pClONO2_atm: number;
  /** particle radius, cm; default 1e-5 */
  radius_cm?: number;
}

export interface SulfateGammas {
  /** ClONO2 + H2O → HOCl + HNO3 */
  ClONO2_H2O: number;
  /** ClONO2 + HCl → Cl2 + HNO3 */
  ClONO2_HCl: number;
  /** HOCl + HCl → Cl2 + H2O */
  HOCl_HCl: number;
}

/** coth(q) − 1/q, the reacto-diffusive correction for a sphere of radius r (q = r/l), stable for small q. */
function sphereFactor(q: number): number {
  if (q < 1e-3) return q / 3;
  if (q > 20) return 1 - 1 / q;
  return 1 / Math.tanh(q) - 1 / q;
}

/**
 * The three γ at one state; all in [0, 1]. `composition` may pass the
 * solution's composition at this T and p(H2O) when already known.
 */
export function sulfateGammas(input: SulfateGammaInput, composition?: SulfateComposition): SulfateGammas {
  const { T_K: T, pH2O_atm, pHCl_atm, pClONO2_atm } = input;
  const r = input.radius_cm ?? SULFATE_GAMMA_DEFAULTS.radius_cm;
  const c = composition ?? sulfateComposition(T, pH2O_atm);
  const sqrtT = Math.sqrt(T);
  const hclAq = c.henryHCl_Matm * Math.max(pHCl_atm, 0);

  // ClONO2
  const H = 1.6e-6 * Math.exp(4710 / T - 0.306 * c.molarity_M);
  const D = (5e-8 * T) / c.viscosity_cP;
  const cBar = 1474 * sqrtT;
  const kHydr = (1.95e10 * Math.exp(-2800 / T) + 1.22e12 * Math.exp(-6200 / T) * c.acidActivity) * c.waterActivity;
  const kHCl = 7.9e11 * c.acidActivity * D * hclAq;
  const gammaBH2O = (4 * H * R_LATM * T * Math.sqrt(D * kHydr)) / cBar;
  const l = Math.sqrt(D / (kHydr + kHCl));
  const gammaRxn = sphereFactor(r / l) * gammaBH2O * Math.sqrt(1 + kHCl / kHydr);
  const gammaBHCl = (gammaRxn * kHCl) / (kHCl + kHydr);
  const gammaS = 66.12 * Math.exp(-1374 / T) * hclAq;
  const depletion = pHCl_atm > 0 ? 1 / (1 + (0.612 * (gammaS + gammaBHCl) * Math.max(pClONO2_atm, 0)) / pHCl_atm) : 0;
  const surface = depletion * gammaS;
  const gammaTotal = 1 / (1 + 1 / (surface + gammaRxn));
  const ClONO2_HCl =
    surface + gammaRxn > 0 ? (gammaTotal * (surface + depletion * gammaBHCl)) / (surface + gammaRxn) : 0;
  const ClONO2_H2O = Math.max(gammaTotal - ClONO2_HCl, 0);

  // HOCl + HCl
  const Hh = 1.91e-6 * Math.exp(5862.4 / T - (0.0776 + 59.18 / T) * c.molarity_M);
  const Dh = (6.4e-8 * T) / c.viscosity_cP;
  const kh = 1.25e9 * c.acidActivity * Dh * hclAq;
  let HOCl_HCl = 0;
  if (kh > 0) {
    const lh = Math.sqrt(Dh / kh);
    const rxn = (4 * Hh * R_LATM * T * Math.sqrt(Dh * kh)) / (2009 * sqrtT);
    const g = sphereFactor(r / lh) * rxn * depletion;
    HOCl_HCl = g > 0 ? 1 / (1 + 1 / g) : 0;
  }
  return { ClONO2_H2O, ClONO2_HCl, HOCl_HCl };
}
