/**
 * Solar zenith angle for a latitude, day of year and local solar time:
 * cos θ = sin φ sin δ + cos φ cos δ cos h, with the declination, equation of
 * time and hour angle of the NOAA Solar Calculator (solarCoordinates.ts).
 * Geometric angle: no refraction. Units: degrees (0–180).
 */
import { InputError } from "../errors";
import { hourAngle_deg } from "./hourAngle";
import { solarDeclination } from "./solarDeclination";
import type { SolarPositionInput } from "./types";

const RAD = Math.PI / 180;

/** Throws InputError unless the latitude is a finite number in −90–90°. */
export function checkLatitude(latitude_deg: number): void {
  if (!Number.isFinite(latitude_deg) || latitude_deg < -90 || latitude_deg > 90) {
    throw new InputError("latitude_deg", `solar geometry: latitude ${latitude_deg}° is outside −90–90°`);
  }
}

/** Solar zenith angle, degrees (geometric, 0–180). */
export function solarZenithAngle(input: SolarPositionInput): number {
  checkLatitude(input.latitude_deg);
  const ut_h = input.localSolarTime_h - (input.longitude_deg ?? 0) / 15;
  const decl = solarDeclination(input.dayOfYear, ut_h, input.year) * RAD;
  const ha =
    hourAngle_deg(input.dayOfYear, input.localSolarTime_h, {
      apparentTime: input.apparentTime,
      longitude_deg: input.longitude_deg,
      year: input.year,
    }) * RAD;
  const lat = input.latitude_deg * RAD;
  const c = Math.sin(lat) * Math.sin(decl) + Math.cos(lat) * Math.cos(decl) * Math.cos(ha);
  return Math.acos(Math.max(-1, Math.min(1, c))) / RAD;
}
