/**
 * Equation of time (apparent minus mean solar time) by the NOAA Solar
 * Calculator equations (solarCoordinates.ts). Units: minutes.
 */
import { solarCoordinates } from "./solarCoordinates";

/** Equation of time, minutes, for a day of year (1–366), hour of UT (default 12) and year (default 2026). */
export function equationOfTime_min(dayOfYear: number, ut_h = 12, year?: number): number {
  return solarCoordinates(dayOfYear, ut_h, year).equationOfTime_min;
}
