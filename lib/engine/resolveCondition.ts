/**
 * A condition for one mechanism: the atmosphere and sunlight at the place and
 * time (lib/photolysis `conditionAt`: U.S. Standard Atmosphere 1976, NOAA
 * solar position, default climatology, every J, each with its source), cut
 * down to the species, pools and photolysis channels this mechanism has.
 *
 * Precedence for a held species: the user's override, then the climatology,
 * then the mechanism's default amount. For a pool total: override, then the
 * climatology, then the mechanism's default total. O3 is held at the
 * climatology unless the condition asks to solve it.
 */

import {
  airColumnAbove_cm2,
  type CloudState,
  CONDITION_DEFAULTS,
  type ConditionInput,
  DOBSON_UNIT_cm2,
  O2_FRACTION,
  polarCloud,
  type ResolvedCondition,
  standardAtmosphere,
} from "../atmosphere";
import { InputError } from "../errors";
import { idRecord, ownValue } from "../idRecord";
import type { Amount, CompiledMechanism } from "../mechanism/types";
import { conditionAt, photolysisFrequencies } from "../photolysis";
import type { SolveConditions } from "../solver/types";

function amountToNumberDensity(a: Amount, M_cm3: number): number {
  return "mixingRatio" in a ? a.mixingRatio * M_cm3 : a.numberDensity_cm3;
}

export function resolveCondition(mech: CompiledMechanism, input: ConditionInput): ResolvedCondition {
  checkIds(mech, input);
  const base = conditionAt(input);
  const { M_cm3 } = base;
  const sources = idRecord(base.sources);

  const held_cm3 = idRecord<number>();
  for (const sp of mech.species) {
    if (sp.role !== "held" && !(sp.id === "O3" && base.ozone === "held")) continue;
    const fromBase = ownValue(base.held_cm3, sp.id);
    if (fromBase !== undefined) held_cm3[sp.id] = fromBase;
    else if (sp.defaultAmount) {
      held_cm3[sp.id] = amountToNumberDensity(sp.defaultAmount, M_cm3);
      sources[sp.id] = "mechanism default amount";
    } else throw new InputError(`condition.held.${sp.id}`, `no amount for held species ${sp.id}: give a mixing ratio`);
  }

  const poolTotals_cm3 = idRecord<number>();
  for (const pool of mech.pools) {
    const fromBase = ownValue(base.poolTotals_cm3, pool.id);
    if (fromBase !== undefined) poolTotals_cm3[pool.id] = fromBase;
    else if (pool.total) {
      poolTotals_cm3[pool.id] = amountToNumberDensity(pool.total, M_cm3);
      sources[pool.id] = "mechanism default total";
    }
  }

  let J_s = restrictJ(mech, base.J_s);
  let o3ColumnAbove_DU = base.o3ColumnAbove_DU;
  if (input.o3ColumnAbove_DU !== undefined) {
    o3ColumnAbove_DU = input.o3ColumnAbove_DU;
    J_s = jAt(mech, { ...base, o3ColumnAbove_DU }, input, base.zenith_deg);
    sources.o3Column = "given";
  }

  const keep = new Set([...Object.keys(held_cm3), ...Object.keys(poolTotals_cm3), "T_K", "p_hPa", "zenith_deg"]);
  for (const k of ["o3Column", "J"]) keep.add(k);
  // the aerosol and clouds matter only to a mechanism with surface reactions
  if (mech.reactions.some((r) => r.firstOrderIn !== undefined)) {
    keep.add("aerosol");
    keep.add("cloud");
  }
  const cloud = cloudOf(input, base.T_K, base.p_hPa, M_cm3, held_cm3, poolTotals_cm3);
  sources.cloud = cloudSource(cloud, input);
  return {
    ...base,
    cloud,
    o3ColumnAbove_DU,
    J_s,
    held_cm3,
    poolTotals_cm3,
    sources: idRecord(Object.entries(sources).filter(([k]) => keep.has(k))),
  };
}

/** The cloud of the condition: H2O from the held amount, HNO3 as the whole NOy (or the held HNO3). */
function cloudOf(
  input: ConditionInput,
  T_K: number,
  p_hPa: number,
  M_cm3: number,
  held_cm3: Record<string, number>,
  poolTotals_cm3: Record<string, number>,
): CloudState {
  const hno3 = poolTotals_cm3.NOy ?? held_cm3.HNO3 ?? 0;
  try {
    return polarCloud({
      type: input.cloud ?? CONDITION_DEFAULTS.cloud,
      T_K,
      pH2O_hPa: ((held_cm3.H2O ?? 0) / M_cm3) * p_hPa,
      pHNO3_hPa: (hno3 / M_cm3) * p_hPa,
      surface_um2cm3: input.cloudSurface_um2cm3,
    });
  } catch (e) {
    throw new InputError("condition.cloudSurface_um2cm3", e instanceof Error ? e.message : String(e));
  }
}

function cloudSource(c: CloudState, input: ConditionInput): string {
  const t = (v: number | null) => (v === null ? "n/a" : `${v.toFixed(1)} K`);
  const temps = `T_NAT ${t(c.T_NAT_K)} (Hanson and Mauersberger 1988, NOy as HNO3), frost point ${t(c.frostPoint_K)} (Marti and Mauersberger 1993)`;
  if (c.present === "none")
    return `no cloud (${c.type === "auto" ? "auto: warmer than T_NAT" : "none asked for"}); ${temps}`;
  const area = c.present === "NAT" ? c.natSurface_um2cm3 : c.iceSurface_um2cm3;
  const given = input.cloudSurface_um2cm3 !== undefined ? "given" : "default";
  return `${c.present} cloud (${c.type === "auto" ? "auto" : "given"}), ${area} µm² cm⁻³ (${given}); ${temps}`;
}

/**
 * The mechanism's photolysis frequencies at another zenith angle (the 24-hour
 * cycle) or under another overhead O3 column (a profile with O3 solved takes
 * it from the levels above), with the user's fixed values and scale applied.
 */
export function jAt(
  mech: CompiledMechanism,
  c: Pick<
    ResolvedCondition,
    "altitude_km" | "T_K" | "p_hPa" | "M_cm3" | "o3ColumnAbove_DU" | "albedo" | "aerosolOpticalDepth"
  >,
  input: Pick<ConditionInput, "J" | "jScale">,
  zenith_deg: number,
): Record<string, number> {
  // The O2 column follows the pressure at the level when that is overridden (as in conditionAt).
  const o2Above = O2_FRACTION * airColumnAbove_cm2(c.altitude_km) * (c.p_hPa / standardAtmosphere(c.altitude_km).p_hPa);
  const all = photolysisFrequencies(
    {
      altitude_km: c.altitude_km,
      zenith_deg,
      T_K: c.T_K,
      M_cm3: c.M_cm3,
      o3ColumnAbove_cm2: c.o3ColumnAbove_DU * DOBSON_UNIT_cm2,
      o2ColumnAbove_cm2: o2Above,
    },
    { jScale: input.jScale, fixed: input.J, albedo: c.albedo, aerosolOpticalDepth: c.aerosolOpticalDepth },
  );
  return restrictJ(mech, all);
}

function restrictJ(mech: CompiledMechanism, all: Record<string, number>): Record<string, number> {
  const J = idRecord<number>();
  for (const ch of mech.photolysisChannels) J[ch] = ownValue(all, ch) ?? 0;
  return J;
}

/** Overrides must name species, pools and channels this mechanism has. */
function checkIds(mech: CompiledMechanism, input: ConditionInput): void {
  const ozoneHeld = (input.ozone ?? CONDITION_DEFAULTS.ozone) === "held";
  for (const id of Object.keys(input.held ?? {})) {
    const sp = mech.species[ownValue(mech.speciesIndex, id) ?? -1];
    if (!sp) throw new InputError(`condition.held.${id}`, `unknown species ${id}`);
    if (sp.role !== "held" && !(id === "O3" && ozoneHeld))
      throw new InputError(`condition.held.${id}`, `${id} is solved in this mechanism and cannot be given an amount`);
  }
  for (const id of Object.keys(input.poolTotals ?? {})) {
    if (!mech.pools.some((p) => p.id === id))
      throw new InputError(
        `condition.poolTotals.${id}`,
        `unknown pool ${id}; this mechanism holds ${mech.pools.map((p) => p.id).join(", ") || "no pools"}`,
      );
  }
  for (const id of Object.keys(input.J ?? {})) {
    if (!mech.photolysisChannels.includes(id))
      throw new InputError(
        `condition.J.${id}`,
        `unknown photolysis channel ${id}; channels: ${mech.photolysisChannels.join(", ")}`,
      );
  }
}

/** The calendar year of a "YYYY-MM-DD" date (the solar position formulas use it). */
export function yearOf(date: string): number {
  return Number(date.slice(0, 4));
}

export function solveConditionsOf(c: ResolvedCondition, J_s: Record<string, number> = c.J_s): SolveConditions {
  return {
    T_K: c.T_K,
    M_cm3: c.M_cm3,
    J_s,
    held_cm3: c.held_cm3,
    poolTotals_cm3: c.poolTotals_cm3,
    // µm² cm⁻³ → cm² cm⁻³; a stored condition from before this field has none
    aerosolSurface_cm2cm3: (c.aerosolSurface_um2cm3 ?? 0) * 1e-8,
    natSurface_cm2cm3: (c.cloud?.natSurface_um2cm3 ?? 0) * 1e-8,
    iceSurface_cm2cm3: (c.cloud?.iceSurface_um2cm3 ?? 0) * 1e-8,
  };
}
