/**
 * Geometric ↔ geopotential altitude, U.S. Standard Atmosphere 1976:
 * H = r0·Z / (r0 + Z), r0 = 6356.766 km. Units: km (geometric), km' (geopotential).
 */
import { R0_GEOPOTENTIAL_km } from "./constants";

/** Geopotential altitude (km') of a geometric altitude (km). */
export function geometricToGeopotential_km(z_km: number): number {
  return (R0_GEOPOTENTIAL_km * z_km) / (R0_GEOPOTENTIAL_km + z_km);
}

/** Geometric altitude (km) of a geopotential altitude (km'). */
export function geopotentialToGeometric_km(h_km: number): number {
  return (R0_GEOPOTENTIAL_km * h_km) / (R0_GEOPOTENTIAL_km - h_km);
}
