/**
 * O2 Schumann–Runge bands, 175.4–206.2 nm, in 17 intervals of 500 cm⁻¹
 * (57000 → 48500 cm⁻¹, the interval grid of the WMO 1985 assessment).
 *
 * Method: an opacity distribution function per interval (Fang, Wofsy &
 * Dalgarno, Planet. Space Sci. 22, 413, 1974 — citation from memory), taken
 * here as log-uniform between a window cross section σ_min and a line-peak
 * cross section σ_max. Then, for slant O2 column N,
 *   transmission  T(N) = [E1(σ_min N) − E1(σ_max N)] / ln(σ_max/σ_min),
 *   O2 absorption ⟨σ e^(−σN)⟩ = [e^(−σ_min N) − e^(−σ_max N)] / (N ln(σ_max/σ_min)),
 * both exact for the assumed distribution. The bounds below are
 * approximate, from memory of the band structure (line peaks 1e-18 cm² near
 * 175 nm falling to ~5e-22 near 205 nm; windows from ~1e-21 cm² down to the
 * Herzberg continuum, ~8e-24 cm²); they are not fitted to line-by-line
 * calculations, and their temperature dependence is omitted. J(O2) from the
 * bands is uncertain by a factor of 2–3.
 * Units: nm, cm².
 */

/** Nodes (nm, σ_min cm²), log-linear between nodes. */
export const SRB_SIGMA_MIN: ReadonlyArray<readonly [number, number]> = [
  [175, 1.0e-21],
  [180, 3.0e-22],
  [185, 1.0e-22],
  [190, 5.0e-23],
  [195, 2.5e-23],
  [200, 1.2e-23],
  [207, 8.0e-24],
];

/** Nodes (nm, σ_max cm²), log-linear between nodes. */
export const SRB_SIGMA_MAX: ReadonlyArray<readonly [number, number]> = [
  [175, 1.0e-18],
  [180, 3.0e-19],
  [185, 1.0e-19],
  [190, 3.0e-20],
  [195, 1.0e-20],
  [200, 3.0e-21],
  [207, 5.0e-22],
];

/** First and last wavenumber of the interval grid, cm⁻¹, and the interval width. */
export const SRB_GRID = { first_cm: 57000, last_cm: 48500, step_cm: 500 } as const;
