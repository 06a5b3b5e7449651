/**
 * The default profile: the U.S. Standard Atmosphere 1976 for T and p, and
 * the project's default climatology for every held species and pool total
 * (left to the engine, which fills them in at each level). Levels every
 * 1 km, 0–86 km, for display and export; a sweep over it asks the engine for
 * exactly the defaults at each altitude.
 */
import { standardAtmosphere } from "../atmosphere";
import type { Profile } from "./types";

export const STANDARD_PROFILE_ID = "standard";

export function standardProfile(): Profile {
  return {
    id: STANDARD_PROFILE_ID,
    title: "U.S. Standard Atmosphere 1976 with the default climatology",
    source: "standard",
    demo: false,
    note: "T and p from the U.S. Standard Atmosphere 1976; held species and pool totals from the default mid-latitude climatology.",
    levels: Array.from({ length: 87 }, (_, z) => {
      const s = standardAtmosphere(z);
      return { altitude_km: z, T_K: s.T_K, p_hPa: s.p_hPa };
    }),
  };
}
