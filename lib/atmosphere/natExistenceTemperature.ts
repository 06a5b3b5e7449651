/**
 * Existence temperature of nitric acid trihydrate (NAT): the temperature at
 * which NAT is in equilibrium with the ambient HNO3 and H2O, from the fit of
 * Hanson and Mauersberger (1988, Geophys. Res. Lett. 15, 855; constants from
 * memory):
 *
 *   log10 p(HNO3) = m(T) log10 p(H2O) + b(T),
 *   m = −2.7836 − 0.00088 T,  b = 38.9855 − 11397/T + 0.009179 T,  p in Torr.
 *
 * The equilibrium p(HNO3) rises steeply with T, so T_NAT is found by
 * bisection on 150–260 K. Below T_NAT NAT can exist (it needs some
 * supersaturation to form, which is not modelled).
 *
 * Units: partial pressures in hPa, temperature in K.
 */

/** Torr per hPa */
const TORR_PER_hPa = 760 / 1013.25;

export const NAT_DEFAULTS = {
  /** K: bracket of the bisection */
  minT_K: 150,
  maxT_K: 260,
  /** K: bisection tolerance */
  tolerance_K: 1e-6,
};

/** HNO3 partial pressure over NAT at T and the water partial pressure, hPa. */
export function natHno3Pressure_hPa(T_K: number, pH2O_hPa: number): number {
  const m = -2.7836 - 0.00088 * T_K;
  const b = 38.9855 - 11397 / T_K + 0.009179 * T_K;
  return 10 ** (m * Math.log10(pH2O_hPa * TORR_PER_hPa) + b) / TORR_PER_hPa;
}

/** T_NAT at the ambient partial pressures of HNO3 and H2O (hPa), K. */
export function natExistenceTemperature_K(pHNO3_hPa: number, pH2O_hPa: number): number {
  if (!(pHNO3_hPa > 0 && pH2O_hPa > 0)) {
    throw new RangeError(
      `natExistenceTemperature_K: partial pressures must be > 0, got HNO3 ${pHNO3_hPa} hPa, H2O ${pH2O_hPa} hPa`,
    );
  }
  let lo = NAT_DEFAULTS.minT_K;
  let hi = NAT_DEFAULTS.maxT_K;
  // p_NAT(T) − p(HNO3) goes from negative (cold) to positive (warm)
  if (natHno3Pressure_hPa(lo, pH2O_hPa) >= pHNO3_hPa) return lo;
  if (natHno3Pressure_hPa(hi, pH2O_hPa) <= pHNO3_hPa) return hi;
  while (hi - lo > NAT_DEFAULTS.tolerance_K) {
    const mid = 0.5 * (lo + hi);
    if (natHno3Pressure_hPa(mid, pH2O_hPa) < pHNO3_hPa) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}
