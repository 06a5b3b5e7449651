/**
 * Chart series of Monte Carlo ranges: for the budget chart, one band per
 * family (median, 5 % and 95 % share); for a profile, one band per family
 * against altitude. Pure data for the chart components; a level or family
 * without a range gives nulls (the chart leaves a gap).
 *
 * Units: shares 0–1, altitude km.
 */
import type { MonteCarloResult } from "./types";

export interface ShareBand {
  family: string;
  central: number | null;
  median: number | null;
  p05: number | null;
  p95: number | null;
}

export interface ProfileBand {
  family: string;
  points: { altitude_km: number; median: number | null; p05: number | null; p95: number | null }[];
}

/** The family-share bands of one Monte Carlo result, in the order of its outputs. */
export function shareBands(mc: MonteCarloResult): ShareBand[] {
  return mc.outputs.flatMap((o, i) => {
    if (o.kind !== "family-share" || !o.family) return [];
    const s = mc.summaries[i];
    return [{ family: o.family, central: s.central, median: s.median, p05: s.p05, p95: s.p95 }];
  });
}

/** Family-share bands against altitude from per-level Monte Carlo results (null = failed level). */
export function profileShareBands(
  levels: { altitude_km: number; monteCarlo: MonteCarloResult | null }[],
): ProfileBand[] {
  const families: string[] = [];
  for (const l of levels)
    for (const b of l.monteCarlo ? shareBands(l.monteCarlo) : [])
      if (!families.includes(b.family)) families.push(b.family);
  return families.map((family) => ({
    family,
    points: levels.map((l) => {
      const b = l.monteCarlo ? shareBands(l.monteCarlo).find((x) => x.family === family) : undefined;
      return { altitude_km: l.altitude_km, median: b?.median ?? null, p05: b?.p05 ?? null, p95: b?.p95 ?? null };
    }),
  }));
}
