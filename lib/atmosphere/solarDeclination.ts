/**
 * Solar declination by the NOAA Solar Calculator equations (solarCoordinates.ts).
 * Units: degrees.
 */
import { solarCoordinates } from "./solarCoordinates";

/** Solar declination, degrees, for a day of year (1–366), hour of UT (default 12) and year (default 2026). */
export function solarDeclination(dayOfYear: number, ut_h = 12, year?: number): number {
  return solarCoordinates(dayOfYear, ut_h, year).declination_deg;
}
