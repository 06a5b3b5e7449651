/**
 * Overhead O3 columns for the levels of a sweep from the O3 of a profile
 * (held O3), molecules cm⁻² (solved O3: see runSweep). Between levels the density is taken as exponential
 * (lib/atmosphere columnsAboveLevels); above the highest level the default
 * climatology's column is added (lib/atmosphere ozoneColumnAbove_cm2).
 */
import { columnsAboveLevels, ozoneColumnAbove_cm2 } from "../atmosphere";
import type { Profile } from "./types";
import { airDensityOf_cm3 } from "./units";

/** Columns above each altitude from the profile's own O3 levels; null when the profile has no O3 at some level. */
export function profileOzoneColumns(profile: Profile, altitudes_km: readonly number[]): number[] | null {
  const L = profile.levels;
  if (!L.every((l) => l.held?.O3 !== undefined && l.T_K !== undefined && l.p_hPa !== undefined)) return null;
  const z = L.map((l) => l.altitude_km);
  const n = L.map((l) => (l.held?.O3 as number) * airDensityOf_cm3(l.p_hPa as number, l.T_K as number));
  const col = columnsAboveLevels(z, n, { columnAboveTop_cm2: ozoneColumnAbove_cm2(z[z.length - 1]) });
  return altitudes_km.map((a) => {
    let i = 0;
    while (i < z.length - 2 && z[i + 1] < a) i++;
    if (z.length === 1) return col[0];
    const f = Math.min(1, Math.max(0, (a - z[i]) / (z[i + 1] - z[i])));
    return Math.exp(Math.log(col[i]) * (1 - f) + Math.log(col[i + 1]) * f);
  });
}
