/**
 * Equation of time (apparent minus mean solar time) by the NOAA series in the
 * fractional year γ (NOAA GML "General Solar Position Calculations"):
 * E = 229.18·(0.000075 + 0.001868 cos γ − 0.032077 sin γ − 0.014615 cos 2γ − 0.040849 sin 2γ).
 * Units: minutes.
 */
import { fractionalYear_rad } from "./fractionalYear";

/** Equation of time, minutes, for a day of year (1–366) and hour of the day (default 12). */
export function equationOfTime_min(dayOfYear: number, hour_h = 12): number {
  const g = fractionalYear_rad(dayOfYear, hour_h);
  return (
    229.18 *
    (0.000075 +
      0.001868 * Math.cos(g) -
      0.032077 * Math.sin(g) -
      0.014615 * Math.cos(2 * g) -
      0.040849 * Math.sin(2 * g))
  );
}
