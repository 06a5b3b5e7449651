/**
 * A profile from one of lib/atmosphere's invented demonstration atmospheres.
 * Mixing ratios named Cly, Bry or NOy are pool totals; the rest are held
 * species. The profile is flagged as demo data so every view labels it.
 */
import type { DemoProfile } from "../atmosphere/types";
import { KNOWN_POOLS } from "./parseColumnHeader";
import type { Profile, ProfileLevel } from "./types";

export function fromDemoProfile(d: DemoProfile): Profile {
  const levels: ProfileLevel[] = [...d.levels]
    .sort((a, b) => a.z_km - b.z_km)
    .map((l) => {
      const level: ProfileLevel = { altitude_km: l.z_km, T_K: l.T_K, p_hPa: l.p_hPa };
      for (const [id, x] of Object.entries(l.mixingRatios ?? {})) {
        const key = KNOWN_POOLS.includes(id) ? "poolTotals" : "held";
        level[key] = { ...level[key], [id]: x };
      }
      return level;
    });
  return { id: d.id, title: d.title, source: "demo", demo: true, note: d.provenance, levels };
}
