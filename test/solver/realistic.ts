/**
 * Realistic solve conditions for the convergence tests: U.S. Standard
 * Atmosphere 1976 temperature and [M], the project's default climatology for
 * held species and pool totals, and photolysis frequencies from the project's
 * photolysis module (default overhead ozone column) — all from lib/.
 */
import { climatologyAt, standardAtmosphere } from "../../lib/atmosphere";
import type { CompiledMechanism } from "../../lib/mechanism/types";
import { photolysisFrequencies } from "../../lib/photolysis";
import type { SolveConditions } from "../../lib/solver/types";

export function realisticConditions(
  mech: CompiledMechanism,
  z_km: number,
  zenith_deg: number,
  ozone: "held" | "solved",
): SolveConditions {
  const std = standardAtmosphere(z_km);
  const M = std.M_cm3;
  const clim = climatologyAt(z_km) as Record<string, number>;
  const held_cm3: Record<string, number> = {};
  for (const s of mech.species) if (s.role === "held" && clim[s.id] !== undefined) held_cm3[s.id] = clim[s.id] * M;
  if (ozone === "held") held_cm3.O3 = clim.O3 * M;
  const poolTotals_cm3: Record<string, number> = {};
  for (const p of mech.pools) {
    const v = clim[p.id] ?? (p.total && "mixingRatio" in p.total ? p.total.mixingRatio : undefined);
    if (v !== undefined) poolTotals_cm3[p.id] = v * M;
  }
  return {
    T_K: std.T_K,
    M_cm3: M,
    J_s: photolysisFrequencies({ altitude_km: z_km, zenith_deg, T_K: std.T_K }),
    held_cm3,
    poolTotals_cm3,
  };
}
