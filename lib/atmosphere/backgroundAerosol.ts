/**
 * Surface area density of the background (volcanically quiet) stratospheric
 * sulfate aerosol at mid-latitudes, against altitude: the default for uptake
 * reactions when a condition gives none.
 *
 * Values from memory of the SAGE II-era background in the SPARC Assessment
 * of Stratospheric Aerosol Properties (SPARC Report No. 4, 2006): about
 * 0.5–1 µm² cm⁻³ from the tropopause to 20 km, falling off above 25 km. A
 * rough shape, not a measured profile; give `aerosolSurface_um2cm3` for a
 * real case (after an eruption the values are 10–100 times larger).
 *
 * Units: altitude in km, surface area density in µm² cm⁻³ (1 µm² cm⁻³ = 1e-8 cm² cm⁻³).
 */

/** [altitude km, µm² cm⁻³], linear in between, 0 above the last node. */
export const BACKGROUND_SULFATE_SURFACE: readonly (readonly [number, number])[] = [
  [0, 0.8],
  [15, 0.8],
  [20, 0.7],
  [25, 0.4],
  [30, 0.12],
  [35, 0.03],
  [40, 0.005],
  [45, 0],
];

export const BACKGROUND_SULFATE_SOURCE =
  "background sulfate aerosol, mid-latitudes (SPARC 2006 aerosol assessment, from memory)";

export function backgroundSulfateSurface_um2cm3(altitude_km: number): number {
  const t = BACKGROUND_SULFATE_SURFACE;
  if (!(altitude_km > t[0][0])) return t[0][1];
  for (let i = 1; i < t.length; i++) {
    const [z1, a1] = t[i];
    if (altitude_km <= z1) {
      const [z0, a0] = t[i - 1];
      return a0 + ((a1 - a0) * (altitude_km - z0)) / (z1 - z0);
    }
  }
  return 0;
}
