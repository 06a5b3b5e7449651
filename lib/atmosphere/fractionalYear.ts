/**
 * Fractional year γ of the NOAA solar-position equations (NOAA Global
 * Monitoring Laboratory, "General Solar Position Calculations"):
 * γ = 2π/days·(dayOfYear − 1 + (hour − 12)/24), radians.
 */
import { InputError } from "../errors";

/** Fractional year, radians, for a day of year (1–366) and hour of the day (0–24). */
export function fractionalYear_rad(dayOfYear: number, hour_h = 12, daysInYear = 365): number {
  if (!Number.isFinite(dayOfYear) || dayOfYear < 1 || dayOfYear > 366) {
    throw new InputError("dayOfYear", `solar geometry: day of year ${dayOfYear} is outside 1–366`);
  }
  if (!Number.isFinite(hour_h) || hour_h < 0 || hour_h > 24) {
    throw new InputError("localSolarTime_h", `solar geometry: local solar time ${hour_h} h is outside 0–24 h`);
  }
  return ((2 * Math.PI) / daysInYear) * (dayOfYear - 1 + (hour_h - 12) / 24);
}
