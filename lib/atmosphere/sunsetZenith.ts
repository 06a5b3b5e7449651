/**
 * Zenith angle of geometric sunset seen from an altitude: the ray from the
 * sun grazes the ground (or a screening height) when
 * sin χ = (R + h_s)/(R + z), so χ_set = 90° + arccos((R + h_s)/(R + z)).
 * Spherical Earth, no refraction (common practice). Units: km, degrees.
 */
import { InputError } from "../errors";
import { EARTH_RADIUS_km } from "./constants";

/** Zenith angle (degrees) beyond which the sun is geometrically set for an observer at z_km. */
export function sunsetZenith_deg(z_km: number, screeningHeight_km = 0): number {
  if (!Number.isFinite(z_km) || z_km < 0) {
    throw new InputError("z_km", `sunsetZenith_deg: altitude ${z_km} km must be a finite number ≥ 0`);
  }
  if (screeningHeight_km >= z_km) return 90;
  return 90 + Math.acos((EARTH_RADIUS_km + screeningHeight_km) / (EARTH_RADIUS_km + z_km)) / (Math.PI / 180);
}
