/**
 * Overhead O3 columns for the levels of a sweep, molecules cm⁻²: from the O3
 * of a profile (held O3) or from the O3 the sweep solved at the levels above
 * (solved O3). Between levels the density is taken as exponential
 * (lib/atmosphere columnsAboveLevels); above the highest level the default
 * climatology's column is added (lib/atmosphere ozoneColumnAbove_cm2).
 */
import { climatologyMixingRatio, columnsAboveLevels, ozoneColumnAbove_cm2 } from "../atmosphere";
import type { Profile, SweepLevel } from "./types";
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

/**
 * Columns above each level from the solved O3 of the levels (increasing
 * altitude). A failed level takes its previous density, else the
 * climatology's O3 at that level's [M].
 */
export function solvedOzoneColumns(
  levels: readonly SweepLevel[],
  previous_cm3?: readonly number[],
): { column_cm2: number[]; density_cm3: number[] } {
  const density_cm3 = levels.map((l, i) => {
    const o3 = l.status === "converged" ? l.species.find((s) => s.id === "O3")?.numberDensity_cm3 : undefined;
    if (o3 !== undefined && Number.isFinite(o3) && o3 >= 0) return o3;
    if (previous_cm3?.[i] !== undefined) return previous_cm3[i];
    const M = l.condition?.M_cm3 ?? airDensityOf_cm3(1013.25 * Math.exp(-l.altitude_km / 7), 220);
    return climatologyMixingRatio("O3", l.altitude_km) * M;
  });
  const z = levels.map((l) => l.altitude_km);
  const column_cm2 = columnsAboveLevels(z, density_cm3, { columnAboveTop_cm2: ozoneColumnAbove_cm2(z[z.length - 1]) });
  return { column_cm2, density_cm3 };
}
