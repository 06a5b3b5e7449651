/**
 * Frost point: the temperature at which the ambient water vapour is in
 * equilibrium with ice, from the vapour pressure of ice of Marti and
 * Mauersberger (1993, Geophys. Res. Lett. 20, 363; constants from memory):
 *
 *   log10 p(Pa) = −2663.5/T + 12.537   (valid 170–250 K)
 *
 * so T_ice = 2663.5 / (12.537 − log10 p(H2O)/Pa).
 *
 * Units: pressure in hPa, temperature in K.
 */

/** Vapour pressure of ice at T, hPa. */
export function iceVapourPressure_hPa(T_K: number): number {
  return 10 ** (-2663.5 / T_K + 12.537) / 100;
}

/** The frost point at the water partial pressure (hPa), K. */
export function frostPoint_K(pH2O_hPa: number): number {
  if (!(pH2O_hPa > 0))
    throw new RangeError(`frostPoint_K: the water partial pressure must be > 0, got ${pH2O_hPa} hPa`);
  return 2663.5 / (12.537 - Math.log10(pH2O_hPa * 100));
}
