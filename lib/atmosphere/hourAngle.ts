/**
 * Solar hour angle from local solar time (NOAA GML "General Solar Position
 * Calculations"): true solar time = mean solar time + equation of time;
 * hour angle = true solar time (min)/4 − 180°. Units: degrees, negative before noon.
 */
import { equationOfTime_min } from "./equationOfTime";

/**
 * Hour angle, degrees, for a day of year and a local solar time (h). The time
 * is mean solar time (UTC + longitude/15°) unless `apparentTime` is true.
 */
export function hourAngle_deg(dayOfYear: number, localSolarTime_h: number, apparentTime = false): number {
  const eot = equationOfTime_min(dayOfYear, localSolarTime_h);
  const trueSolarTime_min = localSolarTime_h * 60 + (apparentTime ? 0 : eot);
  return trueSolarTime_min / 4 - 180;
}
