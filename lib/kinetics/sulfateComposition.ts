/**
 * Composition of liquid binary sulfuric acid aerosol in equilibrium with the
 * water vapour around it, after Shi et al. (2001, J. Geophys. Res. 106,
 * 24259, Appendix), the form the NASA/JPL evaluation 19-5 (Section 5)
 * recommends for the γ of ClONO2 and HOCl on sulfate (coefficients from
 * memory, not checked against the paper):
 *
 *   ln p°(H2O)/mbar = 18.452406985 − 3505.1578807/T − 330918.55082/T² + 12725068.262/T³
 *   a_w = p(H2O)/p°,  m = y1 + (T − 190)(y2 − y1)/70,  yᵢ = aᵢ a_w^bᵢ + cᵢ a_w + dᵢ
 *   wt = 9800 m / (98 m + 1000)
 *   η = A T^−1.43 exp(448/(T − T0)) (Williams and Long 1995, as used by Shi et al.)
 *   a_H = exp(60.51 − 0.095 wt + 0.0077 wt² − 1.61e-5 wt³ − (1.76 + 2.52e-4 wt²) √T + (−805.89 + 253.05 wt^0.076)/√T)
 *   H*(HCl) = (0.094 − 0.61 x + 1.2 x²) exp(−8.68 + (8515 − 10718 x^0.7)/T)
 *
 * The density is our own quadratic fit to room-temperature tables of
 * H2SO4/H2O (CRC Handbook, from memory; within 0.2 % at 10–80 wt %), with the
 * low-temperature rise of a few per cent neglected.
 *
 * Units: T in K, p in atm unless named; returns the fields of `SulfateComposition`.
 */

/** Coefficients (a, b, c, d) of y1 and y2 for the three ranges of water activity (Shi et al. 2001; from memory). */
const MOLALITY_FIT = {
  dry: [
    [12.37208932, -0.16125516114, -30.490657554, -2.1133114241],
    [13.455394705, -0.1921312255, -34.285174607, -1.7620073078],
  ],
  middle: [
    [11.820654354, -0.20786404244, -4.807306373, -5.1727540348],
    [12.891938068, -0.23233847708, -6.4261237757, -4.9005471319],
  ],
  wet: [
    [-180.06541028, -0.38601102592, -93.317846778, 273.88132245],
    [-176.95814097, -0.36257048154, -90.469744201, 267.45509988],
  ],
} as const;

export interface SulfateComposition {
  /** water activity, 0–1 */
  waterActivity: number;
  /** H2SO4 weight per cent */
  wt_percent: number;
  /** H2SO4 mole fraction */
  moleFraction: number;
  /** solution density, g cm⁻³ */
  density_gcm3: number;
  /** H2SO4 molarity, mol L⁻¹ */
  molarity_M: number;
  /** viscosity, cP */
  viscosity_cP: number;
  /** acid activity a_H (dimensionless, Shi et al. scale) */
  acidActivity: number;
  /** effective Henry's law coefficient of HCl, M atm⁻¹ */
  henryHCl_Matm: number;
}

/** Vapour pressure of (supercooled) liquid water, mbar. */
export function waterVapourPressure_mbar(T_K: number): number {
  return Math.exp(18.452406985 - 3505.1578807 / T_K - 330918.55082 / T_K ** 2 + 12725068.262 / T_K ** 3);
}

/** H2SO4 molality (mol kg⁻¹) of the solution at water activity a_w. */
export function sulfateMolality(T_K: number, waterActivity: number): number {
  const fit = waterActivity < 0.05 ? MOLALITY_FIT.dry : waterActivity <= 0.85 ? MOLALITY_FIT.middle : MOLALITY_FIT.wet;
  const [y1, y2] = fit.map(([a, b, c, d]) => a * waterActivity ** b + c * waterActivity + d);
  // the fit is made for 185–260 K; beyond it the end values are kept
  const t = Math.min(Math.max(T_K, 185), 260);
  return Math.max(y1 + ((t - 190) * (y2 - y1)) / 70, 0.01);
}

/** The solution's composition at T and the water partial pressure p(H2O) (atm). */
export function sulfateComposition(T_K: number, pH2O_atm: number): SulfateComposition {
  const pH2O_mbar = pH2O_atm * 1013.25;
  // below 1e-4 the fit leaves its range; dilute solutions beyond a_w = 1 do not exist
  const waterActivity = Math.min(Math.max(pH2O_mbar / waterVapourPressure_mbar(T_K), 1e-4), 1);
  const m = sulfateMolality(T_K, waterActivity);
  const wt = (9800 * m) / (98 * m + 1000);
  const moleFraction = wt / (wt + ((100 - wt) * 98) / 18);
  const density_gcm3 = 1.00459 + 5.8756e-3 * wt + 3.9464e-5 * wt * wt;
  const molarity_M = (density_gcm3 * wt) / 9.8;
  const A = 169.5 + 5.18 * wt - 0.0825 * wt ** 2 + 3.27e-3 * wt ** 3;
  const T0 = 144.11 + 0.166 * wt - 0.015 * wt ** 2 + 2.18e-4 * wt ** 3;
  const viscosity_cP = A * T_K ** -1.43 * Math.exp(448 / (T_K - T0));
  const sqrtT = Math.sqrt(T_K);
  const acidActivity = Math.exp(
    60.51 -
      0.095 * wt +
      0.0077 * wt ** 2 -
      1.61e-5 * wt ** 3 -
      (1.76 + 2.52e-4 * wt ** 2) * sqrtT +
      (-805.89 + 253.05 * wt ** 0.076) / sqrtT,
  );
  const henryHCl_Matm =
    (0.094 - 0.61 * moleFraction + 1.2 * moleFraction ** 2) *
    Math.exp(-8.68 + (8515 - 10718 * moleFraction ** 0.7) / T_K);
  return {
    waterActivity,
    wt_percent: wt,
    moleFraction,
    density_gcm3,
    molarity_M,
    viscosity_cP,
    acidActivity,
    henryHCl_Matm,
  };
}
