/**
 * Rate laws as data. Symbols follow the NASA/JPL evaluation (Publication 19-5):
 * A, E/R, k0, n, k∞, m, Fc, f(298), g.
 *
 * Every law evaluates to the effective rate coefficient such that the reaction
 * rate is k × Π[reactant]^coef (M and hv excluded): termolecular laws already
 * include [M]; an Arrhenius reaction written with "+ M" is multiplied by [M]
 * by the caller (see `effectiveRateConstant`).
 */

export type RateLaw =
  /** k = A (T/300)^b exp(−(E/R)/T); A in cm³ molecule⁻¹ s⁻¹ (bimolecular) or s⁻¹ (unimolecular). */
  | { law: "arrhenius"; A: number; EoverR_K: number; b?: number }
  /**
   * JPL termolecular: k0(T) = k0_300 (T/300)^−n, k∞(T) = k∞_300 (T/300)^−m,
   * k = k0[M]/(1 + k0[M]/k∞) · Fc^(1/(1 + log10(k0[M]/k∞)²)). Omit kinf_300 for the low-pressure limit k0[M].
   */
  | { law: "termolecular"; k0_300: number; n: number; kinf_300?: number; m?: number; Fc?: number }
  /**
   * JPL chemical activation (e.g. OH + CO → H + CO2 through HOCO):
   * k = k0(T)/(1 + k0(T)[M]/k∞(T)) · Fc^(1/(1 + log10(k0[M]/k∞)²)), k0 in cm³ molecule⁻¹ s⁻¹, k∞ in s⁻¹.
   */
  | { law: "chemical-activation"; k0_300: number; n: number; kinf_300: number; m: number; Fc?: number }
  /**
   * Lindemann form with Arrhenius limits (JPL 19-5 form of the pressure-dependent
   * part of OH + HNO3): k = k_low[M]/(1 + k_low[M]/k_high), k_low in cm⁶ molecule⁻² s⁻¹,
   * k_high in cm³ molecule⁻¹ s⁻¹, each A exp(−(E/R)/T). Includes [M].
   */
  | { law: "lindemann"; low: { A: number; EoverR_K: number }; high: { A: number; EoverR_K: number } }
  /** k = k_forward / K(T), K(T) = A exp(B/T) in cm³ molecule⁻¹ (JPL Table 3). */
  | { law: "equilibrium-reverse"; forward: RateLaw; Keq_A_cm3: number; Keq_B_K: number }
  /** J from the photolysis module for the named channel, times `factor` (default 1). */
  | { law: "photolysis"; channel: string; factor?: number }
  /** A fixed photolysis frequency J in s⁻¹. */
  | { law: "photolysis-fixed"; J_s: number }
  /**
   * Uptake on particle surfaces, k = γ v̄ A / 4 in s⁻¹ (uptake.ts): γ the uptake probability (0–1], the gas's
   * molar mass in g mol⁻¹ (for v̄), A the surface area density of `surface` (default sulfate). With a gas-phase
   * `partner` (e.g. HCl in ClONO2 + HCl) the rate stays first order in the gas taken up and γ is limited by the
   * partner's arrival at the surface (partnerLimitedGamma.ts).
   */
  | {
      law: "uptake";
      gamma: number;
      molarMass_gmol: number;
      surface?: SurfaceKind;
      partner?: { species: string; molarMass_gmol: number };
    }
  /**
   * Uptake on liquid sulfate / supercooled ternary solution with γ from the Shi et al. (2001) parameterisation
   * of JPL 19-5 (sulfateGamma.ts): γ depends on T, p(H2O), p(HCl) and p(ClONO2); k = γ v̄ A_sulfate / 4 in s⁻¹.
   */
  | { law: "liquid-aerosol"; process: LiquidAerosolProcess; molarMass_gmol: number; radius_cm?: number };

/** The particle surfaces a condition can carry. */
export type SurfaceKind = "sulfate" | "nat" | "ice";

/** The reactions on liquid aerosol that the Shi et al. (2001) parameterisation covers. */
export type LiquidAerosolProcess = "ClONO2+H2O" | "ClONO2+HCl" | "HOCl+HCl";

/** JPL uncertainty: f(T) = f(298) exp|g (1/T − 1/298)|. */
export interface Uncertainty {
  f298: number;
  /** K */
  g: number;
}

/** What a rate law needs from the conditions. */
export interface KineticsEnv {
  /** K */
  T_K: number;
  /** air number density, molecules cm⁻³ */
  M_cm3: number;
  /** photolysis frequencies by channel, s⁻¹; a missing channel is 0 */
  J_s: Readonly<Record<string, number>>;
  /** aerosol (liquid sulfate) surface area density, cm² cm⁻³; default 0 (no uptake) */
  aerosolSurface_cm2cm3?: number;
  /** nitric acid trihydrate (NAT) particle surface area density, cm² cm⁻³; default 0 */
  natSurface_cm2cm3?: number;
  /** ice particle surface area density, cm² cm⁻³; default 0 */
  iceSurface_cm2cm3?: number;
}
