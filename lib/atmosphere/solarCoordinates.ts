/**
 * The Sun's declination and the equation of time by the equations of the
 * NOAA Solar Calculator (NOAA Global Monitoring Laboratory; after Meeus,
 * "Astronomical Algorithms", 1991, ch. 25, low-accuracy method — constants
 * from memory, checked against astronomy-engine in the tests):
 *   T = (JD − 2451545)/36525;  L0 = 280.46646 + 36000.76983 T + 0.0003032 T²;
 *   M = 357.52911 + 35999.05029 T − 0.0001537 T²;  e = 0.016708634 − 0.000042037 T − 1.267e-7 T²;
 *   C = (1.914602 − 0.004817 T − 1.4e-5 T²) sin M + (0.019993 − 0.000101 T) sin 2M + 0.000289 sin 3M;
 *   λ = L0 + C − 0.00569 − 0.00478 sin Ω,  Ω = 125.04 − 1934.136 T;
 *   ε = 23°26′21.448″ − 46.815″ T − 0.00059″ T² + 0.001813″ T³ + 0.00256° cos Ω;
 *   δ = asin(sin ε sin λ);  y = tan²(ε/2);
 *   E = 4·(y sin 2L0 − 2e sin M + 4ey sin M cos 2L0 − ½y² sin 4L0 − 1.25e² sin 2M) (radians → minutes).
 * Units: degrees, minutes; time as day of year and hour of Universal Time.
 */
import { InputError } from "../errors";
import { isLeapYear } from "./dayOfYear";

const DEFAULTS = {
  /** year when none is given (the project's default date is 2026-03-20) */
  year: 2026,
};

const RAD = Math.PI / 180;

export interface SolarCoordinates {
  /** solar declination, degrees */
  declination_deg: number;
  /** equation of time (apparent − mean solar time), minutes */
  equationOfTime_min: number;
}

/** Throws InputError unless the day of year exists in the year. */
export function checkDayOfYear(dayOfYear: number, year: number): void {
  const days = isLeapYear(year) ? 366 : 365;
  if (!Number.isInteger(year)) throw new InputError("year", `solar geometry: year ${year} is not an integer`);
  if (!Number.isFinite(dayOfYear) || dayOfYear < 1 || dayOfYear >= days + 1) {
    throw new InputError("dayOfYear", `solar geometry: day of year ${dayOfYear} is outside 1–${days} for ${year}`);
  }
}

/** Declination and equation of time at a day of year, hour of UT (may run outside 0–24) and year. */
export function solarCoordinates(dayOfYear: number, ut_h = 12, year = DEFAULTS.year): SolarCoordinates {
  checkDayOfYear(dayOfYear, year);
  if (!Number.isFinite(ut_h)) throw new InputError("localSolarTime_h", `solar geometry: time ${ut_h} h is not finite`);
  const jd = Date.UTC(year, 0, 1) / 86400000 + 2440587.5 + (dayOfYear - 1) + ut_h / 24;
  const T = (jd - 2451545) / 36525;
  const L0 = (280.46646 + T * (36000.76983 + T * 0.0003032)) % 360;
  const M = 357.52911 + T * (35999.05029 - 0.0001537 * T);
  const e = 0.016708634 - T * (0.000042037 + 1.267e-7 * T);
  const Mr = M * RAD;
  const C =
    Math.sin(Mr) * (1.914602 - T * (0.004817 + 1.4e-5 * T)) +
    Math.sin(2 * Mr) * (0.019993 - 0.000101 * T) +
    Math.sin(3 * Mr) * 0.000289;
  const omega = (125.04 - 1934.136 * T) * RAD;
  const lambda = (L0 + C - 0.00569 - 0.00478 * Math.sin(omega)) * RAD;
  const eps0 = 23 + (26 + (21.448 - T * (46.815 + T * (0.00059 - T * 0.001813))) / 60) / 60;
  const eps = (eps0 + 0.00256 * Math.cos(omega)) * RAD;
  const declination_deg = Math.asin(Math.sin(eps) * Math.sin(lambda)) / RAD;
  const y = Math.tan(eps / 2) ** 2;
  const L0r = L0 * RAD;
  const E =
    y * Math.sin(2 * L0r) -
    2 * e * Math.sin(Mr) +
    4 * e * y * Math.sin(Mr) * Math.cos(2 * L0r) -
    0.5 * y * y * Math.sin(4 * L0r) -
    1.25 * e * e * Math.sin(2 * Mr);
  return { declination_deg, equationOfTime_min: (4 * E) / RAD };
}
