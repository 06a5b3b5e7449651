/**
 * Length of the day from the sunrise hour angle (NOAA GML "General Solar
 * Position Calculations"): cos h₀ = cos θ₀/(cos φ cos δ) − tan φ tan δ, with
 * θ₀ = 90.833° by default (refraction and the sun's radius, NOAA's choice) or
 * 90° for the geometric day. Polar day gives 24 h, polar night 0 h. Units: h.
 */
import { InputError } from "../errors";
import { solarDeclination } from "./solarDeclination";
import { checkLatitude } from "./solarZenithAngle";

const DEFAULTS = {
  /** zenith angle of the sun's centre at sunrise and sunset, degrees */
  sunriseZenith_deg: 90.833,
};

const RAD = Math.PI / 180;

export interface DaylightInput {
  /** latitude, degrees north (−90–90) */
  latitude_deg: number;
  /** day of year, 1–366 */
  dayOfYear: number;
  /** calendar year; default 2026 */
  year?: number;
  /** zenith angle that counts as sunrise/sunset, degrees; default 90.833 */
  sunriseZenith_deg?: number;
}

/** Hours between sunrise and sunset. */
export function daylightHours(input: DaylightInput): number {
  checkLatitude(input.latitude_deg);
  const z0 = input.sunriseZenith_deg ?? DEFAULTS.sunriseZenith_deg;
  if (!Number.isFinite(z0) || z0 <= 0 || z0 >= 180) {
    throw new InputError("sunriseZenith_deg", `daylightHours: sunrise zenith ${z0}° is outside 0–180°`);
  }
  const lat = input.latitude_deg * RAD;
  const decl = solarDeclination(input.dayOfYear, 12, input.year) * RAD;
  const denom = Math.cos(lat) * Math.cos(decl);
  if (Math.abs(denom) < 1e-12) {
    // at a pole: the sun circles at elevation δ
    const elevation = Math.sign(input.latitude_deg) * decl;
    return 90 - elevation / RAD < z0 ? 24 : 0;
  }
  const c = Math.cos(z0 * RAD) / denom - Math.tan(lat) * Math.tan(decl);
  if (c <= -1) return 24;
  if (c >= 1) return 0;
  return (2 * Math.acos(c)) / RAD / 15;
}
