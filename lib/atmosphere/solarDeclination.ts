/**
 * Solar declination by the NOAA Fourier series in the fractional year γ
 * (NOAA GML "General Solar Position Calculations", after Spencer 1971):
 * δ = 0.006918 − 0.399912 cos γ + 0.070257 sin γ − 0.006758 cos 2γ
 *     + 0.000907 sin 2γ − 0.002697 cos 3γ + 0.00148 sin 3γ  (radians).
 * Units: degrees.
 */
import { fractionalYear_rad } from "./fractionalYear";

/** Solar declination, degrees, for a day of year (1–366) and hour of the day (default 12). */
export function solarDeclination(dayOfYear: number, hour_h = 12): number {
  const g = fractionalYear_rad(dayOfYear, hour_h);
  const d =
    0.006918 -
    0.399912 * Math.cos(g) +
    0.070257 * Math.sin(g) -
    0.006758 * Math.cos(2 * g) +
    0.000907 * Math.sin(2 * g) -
    0.002697 * Math.cos(3 * g) +
    0.00148 * Math.sin(3 * g);
  return (d * 180) / Math.PI;
}
