/**
 * From a sweep request and its profile to one single-level analysis request
 * per altitude. Precedence at a level: the request-wide condition (held,
 * poolTotals) over the profile's columns over the climatology. Profile
 * columns the mechanism cannot use (a species it does not hold, a pool it
 * does not have) are left out with a warning, so one profile can be run
 * under several mechanisms; O3 from the profile is used only when O3 is held.
 */

import { CONDITION_DEFAULTS } from "../atmosphere/condition";
import type { AnalysisRequest } from "../engine/types";
import { InputError } from "../errors";
import { idRecord } from "../idRecord";
import { interpolateProfile } from "./interpolateProfile";
import { GRID_DEFAULTS, levelGrid } from "./levelGrid";
import { profileOzoneColumns } from "./ozoneColumns";
import type { LevelTask } from "./runLevelBatch";
import type { ColumnSource, Profile, SweepRequest } from "./types";

/** What planning needs to know of a mechanism (a CompiledMechanism fits). */
export interface MechanismShape {
  species: readonly { id: string; role: string }[];
  pools: readonly { id: string }[];
}

export interface SweepPlan {
  /** one task per altitude, increasing altitude */
  tasks: LevelTask[];
  altitudes_km: number[];
  mode: "instantaneous" | "diurnal";
  ozone: "held" | "solved";
  columnSource: ColumnSource;
  warnings: string[];
}

export function planSweep(request: SweepRequest, profile: Profile, mech: MechanismShape): SweepPlan {
  const lo = profile.levels[0]?.altitude_km ?? 0;
  const hi = profile.levels[profile.levels.length - 1]?.altitude_km ?? 86;
  const step_km = request.grid?.step_km ?? GRID_DEFAULTS.step_km;
  const grid = {
    from_km: request.grid?.from_km ?? Math.max(GRID_DEFAULTS.from_km, Math.ceil(lo - 1e-9)),
    to_km: request.grid?.to_km ?? Math.min(GRID_DEFAULTS.to_km, Math.floor(hi + 1e-9)),
    step_km,
  };
  if (grid.from_km < lo - 1e-9 || grid.to_km > hi + 1e-9) {
    throw new InputError(
      grid.from_km < lo - 1e-9 ? "grid.from_km" : "grid.to_km",
      `the grid ${grid.from_km}–${grid.to_km} km reaches outside the profile "${profile.title}" (${lo}–${hi} km)`,
    );
  }
  if (grid.from_km > grid.to_km) {
    if (request.grid?.from_km !== undefined || request.grid?.to_km !== undefined) {
      throw new InputError(
        "grid.to_km",
        `expected an altitude at or above from_km (${grid.from_km} km), got ${grid.to_km} km`,
      );
    }
    throw new InputError(
      "grid",
      `the profile "${profile.title}" (${lo}–${hi} km) has no level on the default grid 10–60 km; give grid.from_km and grid.to_km`,
    );
  }
  const altitudes_km = levelGrid(grid);
  const condition = request.condition ?? {};
  const ozone = condition.ozone ?? CONDITION_DEFAULTS.ozone;
  const mode = condition.mode ?? CONDITION_DEFAULTS.mode;
  const heldIds = new Set(mech.species.filter((s) => s.role === "held").map((s) => s.id));
  if (ozone === "held" && mech.species.some((s) => s.id === "O3")) heldIds.add("O3");
  const poolIds = new Set(mech.pools.map((p) => p.id));
  const dropped = new Map<string, string>();
  const useProfile = profile.source !== "standard";

  const tasks = altitudes_km.map((z): LevelTask => {
    const at = useProfile ? interpolateProfile(profile, z) : null;
    const held = idRecord<number>();
    for (const [id, x] of Object.entries(at?.held ?? {})) {
      if (heldIds.has(id)) held[id] = x;
      else dropped.set(id, id === "O3" ? "O3 is solved in this sweep" : `the mechanism does not hold ${id}`);
    }
    const poolTotals = idRecord<number>();
    for (const [id, x] of Object.entries(at?.poolTotals ?? {})) {
      if (poolIds.has(id)) poolTotals[id] = x;
      else dropped.set(id, `the mechanism has no pool ${id}`);
    }
    Object.assign(held, condition.held);
    Object.assign(poolTotals, condition.poolTotals);
    const req: AnalysisRequest = {
      mechanismId: request.mechanismId,
      condition: {
        ...condition,
        altitude_km: z,
        ...(at?.T_K !== undefined ? { T_K: at.T_K } : {}),
        ...(at?.p_hPa !== undefined ? { p_hPa: at.p_hPa } : {}),
        ...(Object.keys(held).length ? { held } : {}),
        ...(Object.keys(poolTotals).length ? { poolTotals } : {}),
      },
    };
    if (!Object.keys(held).length) delete req.condition.held;
    if (!Object.keys(poolTotals).length) delete req.condition.poolTotals;
    if (request.options) {
      const { fminRelative, oxDefinition } = request.options;
      const options = {
        ...(fminRelative !== undefined ? { fminRelative } : {}),
        ...(oxDefinition ? { oxDefinition } : {}),
      };
      if (Object.keys(options).length) req.options = options;
    }
    return { request: req };
  });

  const warnings = [...dropped].map(([id, why]) => `profile column ${id} not used: ${why}`);
  const profileO3 = ozone === "held" && useProfile && tasks.every((t) => t.request.condition.held?.O3 !== undefined);
  if (profileO3) {
    const columns = profileOzoneColumns(profile, altitudes_km);
    if (columns) for (const [i, t] of tasks.entries()) t.o3ColumnAbove_cm2 = columns[i];
  }
  return {
    tasks,
    altitudes_km,
    mode,
    ozone,
    columnSource: ozone === "solved" ? "solved" : profileO3 ? "profile" : "climatology",
    warnings,
  };
}
