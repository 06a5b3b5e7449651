/**
 * A profile's values at an altitude between its levels: T linear in
 * altitude, p and positive amounts linear in log (exponential between
 * levels, as hydrostatic pressure and most trace-gas profiles are; common
 * practice). An amount given at only one of the two levels is left out, so
 * the level falls back to the climatology for it. Null outside the profile.
 */

import { idRecord, ownValue } from "../idRecord";
import type { Profile, ProfileLevel } from "./types";

function logLinear(a: number, b: number, f: number): number {
  return a > 0 && b > 0 ? Math.exp(Math.log(a) * (1 - f) + Math.log(b) * f) : a + (b - a) * f;
}

function mixRecords(
  a: Record<string, number> | undefined,
  b: Record<string, number> | undefined,
  f: number,
): Record<string, number> | undefined {
  if (!a || !b) return f === 0 ? a : f === 1 ? b : undefined;
  const out = idRecord<number>();
  for (const id of Object.keys(a)) {
    const bv = ownValue(b, id);
    if (bv !== undefined) out[id] = logLinear(a[id], bv, f);
  }
  return Object.keys(out).length ? out : undefined;
}

export function interpolateProfile(profile: Profile, z_km: number): ProfileLevel | null {
  const L = profile.levels;
  const eps = 1e-9;
  if (L.length === 0 || z_km < L[0].altitude_km - eps || z_km > L[L.length - 1].altitude_km + eps) return null;
  let i = 0;
  while (i < L.length - 1 && L[i + 1].altitude_km < z_km - eps) i++;
  const lo = L[i];
  if (Math.abs(lo.altitude_km - z_km) <= eps || i === L.length - 1) return { ...lo, altitude_km: z_km };
  const hi = L[i + 1];
  if (Math.abs(hi.altitude_km - z_km) <= eps) return { ...hi, altitude_km: z_km };
  const f = (z_km - lo.altitude_km) / (hi.altitude_km - lo.altitude_km);
  const out: ProfileLevel = { altitude_km: z_km };
  if (lo.T_K !== undefined && hi.T_K !== undefined) out.T_K = lo.T_K + (hi.T_K - lo.T_K) * f;
  if (lo.p_hPa !== undefined && hi.p_hPa !== undefined) out.p_hPa = logLinear(lo.p_hPa, hi.p_hPa, f);
  const held = mixRecords(lo.held, hi.held, f);
  if (held) out.held = held;
  const pools = mixRecords(lo.poolTotals, hi.poolTotals, f);
  if (pools) out.poolTotals = pools;
  return out;
}
