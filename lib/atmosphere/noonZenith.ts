/**
 * Solar zenith angle at apparent (true) solar noon: |φ − δ|, with the
 * declination of the NOAA Solar Calculator at 12 h UT (solarCoordinates.ts).
 * Units: degrees.
 */

import { solarDeclination } from "./solarDeclination";
import { checkLatitude } from "./solarZenithAngle";

/** Noon zenith angle, degrees, for a latitude (°N) and day of year. */
export function noonZenith(input: { latitude_deg: number; dayOfYear: number; year?: number }): number {
  checkLatitude(input.latitude_deg);
  return Math.abs(input.latitude_deg - solarDeclination(input.dayOfYear, 12, input.year));
}
