/**
 * O3 absorption cross section σ(λ, T): the 295 K table of
 * tables/crossSections.ts times (σ218/σ295)^((295 − T)/77), i.e. log-linear in
 * T through the 218 K and 295 K values (Huggins bands; ratio 1 elsewhere).
 * T is clamped to 190–310 K. Source: approximate, from memory (see the tables).
 * Units: nm, K → cm².
 */

import { interpolateNodes } from "./interpolateNodes";
import { CROSS_SECTIONS, O3_RATIO_218_295 } from "./tables/crossSections";

const DEFAULTS = { Tmin_K: 190, Tmax_K: 310 };

/** O3 cross section, cm², at a wavelength (nm) and temperature (K). */
export function o3CrossSection_cm2(lambda_nm: number, T_K: number): number {
  const s295 = interpolateNodes(CROSS_SECTIONS.O3.points, lambda_nm);
  const ratio = interpolateNodes(O3_RATIO_218_295, lambda_nm, { mode: "linear" }) || 1;
  const T = Math.min(DEFAULTS.Tmax_K, Math.max(DEFAULTS.Tmin_K, T_K));
  return s295 * ratio ** ((295 - T) / 77);
}
