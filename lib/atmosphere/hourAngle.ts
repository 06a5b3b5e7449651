/**
 * Solar hour angle from local solar time (NOAA Solar Calculator): true
 * solar time = mean solar time + equation of time; hour angle = true solar
 * time (min)/4 − 180°. Units: degrees, negative before noon.
 */
import { InputError } from "../errors";
import { equationOfTime_min } from "./equationOfTime";

export interface HourAngleOptions {
  /** the time is apparent (true) solar time, so the equation of time is not applied; default false */
  apparentTime?: boolean;
  /** longitude, degrees east, to find Universal Time for the Sun's coordinates; default 0 */
  longitude_deg?: number;
  /** calendar year; default 2026 */
  year?: number;
}

/** Hour angle, degrees, for a day of year and a local solar time (h, 0–24; mean solar time unless apparentTime). */
export function hourAngle_deg(dayOfYear: number, localSolarTime_h: number, options: HourAngleOptions = {}): number {
  if (!Number.isFinite(localSolarTime_h) || localSolarTime_h < 0 || localSolarTime_h > 24) {
    throw new InputError(
      "localSolarTime_h",
      `solar geometry: local solar time ${localSolarTime_h} h is outside 0–24 h`,
    );
  }
  if (options.apparentTime) return localSolarTime_h * 15 - 180;
  const ut_h = localSolarTime_h - (options.longitude_deg ?? 0) / 15;
  const trueSolarTime_min = localSolarTime_h * 60 + equationOfTime_min(dayOfYear, ut_h, options.year);
  return trueSolarTime_min / 4 - 180;
}
