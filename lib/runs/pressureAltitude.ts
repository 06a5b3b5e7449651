/**
 * Pressure altitude: the geometric altitude at which the U.S. Standard
 * Atmosphere 1976 has a given pressure (bisection on its monotonic p(z)).
 * Units: hPa in, km out (0–86 km).
 */
import { standardAtmosphere } from "../atmosphere";
import { InputError } from "../errors";

const TOP_km = 86;
const ITERATIONS = 50;

export function pressureAltitude_km(p_hPa: number): number {
  if (!(p_hPa > 0 && Number.isFinite(p_hPa))) throw new InputError("p_hPa", `pressure must be > 0 hPa, got ${p_hPa}`);
  if (p_hPa >= standardAtmosphere(0).p_hPa) return 0;
  if (p_hPa <= standardAtmosphere(TOP_km).p_hPa) return TOP_km;
  let lo = 0;
  let hi = TOP_km;
  for (let i = 0; i < ITERATIONS; i++) {
    const mid = 0.5 * (lo + hi);
    if (standardAtmosphere(mid).p_hPa > p_hPa) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}
