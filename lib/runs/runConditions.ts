/**
 * The conditions of a run at any time: the fixed place, or the trajectory
 * row in force (T and p interpolated linearly in time between rows, every
 * other field taken from the row before), the sun at the local solar time
 * t mod 24 h of the (advancing) calendar day by the NOAA solar-position
 * equations, and photolysis frequencies interpolated linearly in the zenith
 * angle between whole degrees, each degree computed once per condition row
 * (lib/photolysis is costly for a new zenith angle). The row's condition is
 * resolved by lib/engine's `resolveCondition`, so every condition field the
 * engine knows flows through unchanged. Units: h, s, K, hPa, cm⁻³, degrees.
 */
import { airNumberDensity_cm3, BOLTZMANN_J_K, dayOfYear, solarZenithAngle } from "../atmosphere";
import { jAt, resolveCondition, solveConditionsOf, yearOf } from "../engine/resolveCondition";
import type { ConditionInput, ResolvedCondition } from "../engine/types";
import { InputError } from "../errors";
import type { CompiledMechanism } from "../mechanism/types";
import type { SolveConditions } from "../solver/types";
import { pressureAltitude_km } from "./pressureAltitude";
import type { JCache, RunPlan, TrajectoryPoint } from "./types";

export const RUN_CONDITION_DEFAULTS = {
  /** spacing of the zenith-angle nodes of the photolysis frequencies, degrees */
  zenithStep_deg: 1,
  /** a run's ozone is solved unless the condition holds it */
  ozone: "solved" as const,
};

const DAY_ms = 86_400_000;

/** The conditions of a run at one time. */
export interface RunConditionAt {
  cond: SolveConditions;
  zenith_deg: number;
}

export interface RunConditions {
  /** the resolved condition at t = 0 */
  first: ResolvedCondition;
  at(t_h: number): RunConditionAt;
  /** the resolved condition in force at t_h with that time's T, p, [M], latitude, date, local time, sun and J */
  resolvedAt(t_h: number): ResolvedCondition;
  /** the photolysis frequencies still needed from t_h on (a trajectory's earlier rows dropped) */
  cacheFrom(t_h: number): JCache;
}

/** The calendar date `days` after "YYYY-MM-DD". */
export function dateAfter(date: string, days: number): string {
  const t = Date.parse(`${date}T00:00:00Z`) + days * DAY_ms;
  return new Date(t).toISOString().slice(0, 10);
}

/** The condition input of one trajectory row over the run's base condition. */
export function rowInput(base: ConditionInput, p: TrajectoryPoint): ConditionInput {
  return {
    ...base,
    ...(p.extra ?? {}),
    // to the metre: the altitude only sets the light and the climatology
    altitude_km: p.altitude_km ?? Math.round(1000 * pressureAltitude_km(p.p_hPa)) / 1000,
    T_K: p.T_K,
    p_hPa: p.p_hPa,
    latitude_deg: p.latitude_deg,
    ...(p.aerosolSurface_um2cm3 !== undefined ? { aerosolSurface_um2cm3: p.aerosolSurface_um2cm3 } : {}),
  } as ConditionInput;
}

export function runConditions(mech: CompiledMechanism, plan: RunPlan, jCache: JCache): RunConditions {
  const base: ConditionInput = {
    ...plan.condition,
    mode: "instantaneous",
    ozone: plan.condition.ozone ?? RUN_CONDITION_DEFAULTS.ozone,
    localSolarTime_h: 0,
  };
  const traj = plan.trajectory;
  const inputs: ConditionInput[] = traj ? traj.map((p) => rowInput(base, p)) : [base];
  const resolved: (ResolvedCondition | undefined)[] = new Array(inputs.length);
  const rowAt = (i: number): ResolvedCondition => {
    let r = resolved[i];
    if (!r) {
      try {
        r = resolveCondition(mech, inputs[i]);
      } catch (e) {
        if (e instanceof InputError && traj) {
          throw new InputError(`trajectory row ${i + 1}`, e.message, e.code);
        }
        throw e;
      }
      resolved[i] = r;
    }
    return r;
  };
  const first = rowAt(0);
  const startDoy = dayOfYear(first.date);
  const year = yearOf(first.date);

  const jNode = (row: number, z: number): Record<string, number> => {
    const key = `${row}|${z}`;
    let J = jCache[key];
    if (!J) {
      J = jAt(mech, rowAt(row), inputs[row], Math.min(180, z));
      jCache[key] = J;
    }
    return J;
  };

  const rowIndex = (t_h: number): number => {
    if (!traj) return 0;
    let lo = 0;
    let hi = traj.length - 1;
    if (t_h >= traj[hi].time_h) return hi;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (traj[mid].time_h <= t_h) lo = mid;
      else hi = mid;
    }
    return lo;
  };

  const at = (t_h: number): RunConditionAt => {
    const i = rowIndex(t_h);
    const row = rowAt(i);
    let T_K = row.T_K;
    let p_hPa = row.p_hPa;
    let latitude_deg = row.latitude_deg;
    if (traj && i + 1 < traj.length) {
      const a = traj[i];
      const b = traj[i + 1];
      const f = Math.min(1, Math.max(0, (t_h - a.time_h) / (b.time_h - a.time_h)));
      T_K = a.T_K + f * (b.T_K - a.T_K);
      p_hPa = a.p_hPa + f * (b.p_hPa - a.p_hPa);
      latitude_deg = a.latitude_deg + f * (b.latitude_deg - a.latitude_deg);
    }
    const day = Math.floor(t_h / 24 + 1e-9);
    const date = plan.options.sunFollowsDate ? dateAfter(first.date, day) : first.date;
    const doy = plan.options.sunFollowsDate ? dayOfYear(date) : startDoy;
    const zenith_deg =
      base.zenith_deg ??
      solarZenithAngle({
        latitude_deg,
        dayOfYear: doy,
        localSolarTime_h: t_h - 24 * day,
        year: plan.options.sunFollowsDate ? yearOf(date) : year,
      });
    const step = RUN_CONDITION_DEFAULTS.zenithStep_deg;
    const z0 = Math.floor(zenith_deg / step) * step;
    const f = (zenith_deg - z0) / step;
    const J0 = jNode(i, z0);
    const J1 = f > 0 ? jNode(i, z0 + step) : J0;
    const J_s: Record<string, number> = {};
    for (const ch of Object.keys(J0)) J_s[ch] = J0[ch] + f * ((J1[ch] ?? 0) - J0[ch]);
    const cond: SolveConditions = {
      ...solveConditionsOf(row, J_s),
      T_K,
      M_cm3: airNumberDensity_cm3(p_hPa * 100, T_K),
    };
    return { cond, zenith_deg };
  };

  const resolvedAt = (t_h: number): ResolvedCondition => {
    const { cond, zenith_deg } = at(t_h);
    const row = rowAt(rowIndex(t_h));
    const day = Math.floor(t_h / 24 + 1e-9);
    const date = plan.options.sunFollowsDate ? dateAfter(first.date, day) : first.date;
    return {
      ...row,
      T_K: cond.T_K,
      M_cm3: cond.M_cm3,
      p_hPa: (cond.M_cm3 * 1e6 * BOLTZMANN_J_K * cond.T_K) / 100,
      date,
      dayOfYear: dayOfYear(date),
      localSolarTime_h: t_h - 24 * day,
      zenith_deg,
      J_s: { ...cond.J_s },
    };
  };

  const cacheFrom = (t_h: number): JCache => {
    const row = rowIndex(t_h);
    return Object.fromEntries(Object.entries(jCache).filter(([key]) => Number(key.split("|")[0]) >= row));
  };

  return { first, at, resolvedAt, cacheFrom };
}
