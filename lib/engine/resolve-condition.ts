/**
 * From a condition as a user states it to everything a solve needs: T, p and
 * [M] from the U.S. Standard Atmosphere 1976 unless overridden, the solar
 * zenith angle from latitude, date and local solar time (unless given), the
 * overhead ozone column and every photolysis frequency, and the held amounts
 * and pool totals from the default climatology unless overridden.
 *
 * Precedence for a held species: the user's override, then the climatology,
 * then the mechanism's default amount. For a pool total: override, then the
 * climatology, then the mechanism's default total.
 */
import {
  climatologyAt,
  DOBSON_UNIT_cm2,
  dayOfYear,
  ozoneColumnAbove_cm2,
  solarZenithAngle,
  standardAtmosphere,
} from "../atmosphere";
import { InputError } from "../errors";
import type { Amount, CompiledMechanism } from "../mechanism/types";
import { photolysisFrequencies } from "../photolysis";
import type { SolveConditions } from "../solver/types";
import type { ConditionInput, ResolvedCondition } from "./types";

/** Boltzmann constant, J K⁻¹ (SI 2019, exact). */
const K_B = 1.380649e-23;

export const CONDITION_DEFAULTS = {
  latitude_deg: 45,
  date: "2026-03-20",
  localSolarTime_h: 12,
  mode: "instantaneous",
  ozone: "held",
  jScale: 1,
} as const;

function amountToNumberDensity(a: Amount, M_cm3: number): number {
  return "mixingRatio" in a ? a.mixingRatio * M_cm3 : a.numberDensity_cm3;
}

/** The calendar year of a "YYYY-MM-DD" date (the solar position formulas use it). */
export function yearOf(date: string): number {
  return Number(date.slice(0, 4));
}

/** Resolves everything but the photolysis frequencies at one altitude and sun angle. */
export function resolveCondition(mech: CompiledMechanism, input: ConditionInput): ResolvedCondition {
  const z = input.altitude_km;
  const std = standardAtmosphere(z);
  const T_K = input.T_K ?? std.T_K;
  const p_hPa = input.p_hPa ?? std.p_hPa;
  const M_cm3 = (p_hPa * 100) / (K_B * T_K) / 1e6;
  const latitude_deg = input.latitude_deg ?? CONDITION_DEFAULTS.latitude_deg;
  const date = input.date ?? CONDITION_DEFAULTS.date;
  const doy = dayOfYear(date);
  const localSolarTime_h = input.localSolarTime_h ?? CONDITION_DEFAULTS.localSolarTime_h;
  const mode = input.mode ?? CONDITION_DEFAULTS.mode;
  const ozone = input.ozone ?? CONDITION_DEFAULTS.ozone;
  const zenith_deg =
    input.zenith_deg ?? solarZenithAngle({ latitude_deg, dayOfYear: doy, localSolarTime_h, year: yearOf(date) });

  const clim: Readonly<Record<string, number>> = climatologyAt(z);
  const held_cm3: Record<string, number> = {};
  for (const sp of mech.species) {
    if (sp.role !== "held" && !(sp.id === "O3" && ozone === "held")) continue;
    const override = input.held?.[sp.id];
    if (override !== undefined) held_cm3[sp.id] = override * M_cm3;
    else if (clim[sp.id] !== undefined) held_cm3[sp.id] = clim[sp.id] * M_cm3;
    else if (sp.defaultAmount) held_cm3[sp.id] = amountToNumberDensity(sp.defaultAmount, M_cm3);
    else throw new InputError(`condition.held.${sp.id}`, `no amount for held species ${sp.id}: give a mixing ratio`);
  }
  for (const id of Object.keys(input.held ?? {})) {
    if (!(id in mech.speciesIndex)) throw new InputError(`condition.held.${id}`, `unknown species ${id}`);
    if (held_cm3[id] === undefined)
      throw new InputError(`condition.held.${id}`, `${id} is solved in this mechanism and cannot be given an amount`);
  }

  const poolTotals_cm3: Record<string, number> = {};
  for (const pool of mech.pools) {
    const override = input.poolTotals?.[pool.id];
    if (override !== undefined) poolTotals_cm3[pool.id] = override * M_cm3;
    else if (clim[pool.id] !== undefined) poolTotals_cm3[pool.id] = clim[pool.id] * M_cm3;
    else if (pool.total) poolTotals_cm3[pool.id] = amountToNumberDensity(pool.total, M_cm3);
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

  const o3Column = ozoneColumnAbove_cm2(z);
  const resolved: ResolvedCondition = {
    altitude_km: z,
    T_K,
    p_hPa,
    M_cm3,
    latitude_deg,
    date,
    dayOfYear: doy,
    localSolarTime_h,
    zenith_deg,
    mode,
    ozone,
    o3ColumnAbove_DU: o3Column / DOBSON_UNIT_cm2,
    J_s: {},
    held_cm3,
    poolTotals_cm3,
  };
  resolved.J_s = jAt(mech, resolved, input, zenith_deg);
  return resolved;
}

/** Photolysis frequencies at a given zenith angle, with the user's scale and fixed values applied. */
export function jAt(
  mech: CompiledMechanism,
  c: Pick<ResolvedCondition, "altitude_km" | "T_K" | "M_cm3" | "o3ColumnAbove_DU">,
  input: Pick<ConditionInput, "J" | "jScale">,
  zenith_deg: number,
): Record<string, number> {
  const all = photolysisFrequencies(
    {
      altitude_km: c.altitude_km,
      zenith_deg,
      T_K: c.T_K,
      M_cm3: c.M_cm3,
      o3ColumnAbove_cm2: c.o3ColumnAbove_DU * DOBSON_UNIT_cm2,
    },
    { jScale: input.jScale ?? CONDITION_DEFAULTS.jScale },
  );
  const J: Record<string, number> = {};
  for (const ch of mech.photolysisChannels) J[ch] = input.J?.[ch] ?? all[ch] ?? 0;
  return J;
}

export function solveConditionsOf(c: ResolvedCondition, J_s: Record<string, number> = c.J_s): SolveConditions {
  return { T_K: c.T_K, M_cm3: c.M_cm3, J_s, held_cm3: c.held_cm3, poolTotals_cm3: c.poolTotals_cm3 };
}
