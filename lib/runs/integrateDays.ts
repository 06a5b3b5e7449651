/**
 * Days of a run: the mechanism integrated with the ROS3 Rosenbrock method
 * (lib/solver, Sandu et al., Atmos. Environ. 31, 3459–3472, 1997) from a
 * state, with rate constants sampled every 15 min from the run's conditions
 * and interpolated linearly in time (as the 24-hour solution does). Held
 * species keep their mixing ratios; when [M] changes along a trajectory
 * every number density follows it (dx/dt gains x·d ln[M]/dt, so mixing
 * ratios are kept by compression). Pool totals are not imposed: the
 * chemistry carries them. Hourly states and rates are recorded; each day's
 * rates are integrated (Simpson's rule over each accepted step, the state linear within it) for the
 * day's budget (dayBudget.ts). A failed integration returns what was done,
 * its status and the time of the failure. Units: cm⁻³, s (times in the
 * result in h since the run's start).
 */
import { InputError } from "../errors";
import type { CompiledMechanism } from "../mechanism/types";
import { buildSystem } from "../solver/buildSystem";
import { chemistryOde } from "../solver/chemistryOde";
import { reactionRates } from "../solver/massAction";
import { rateConstants } from "../solver/rateConstants";
import { integrateOde, type OdeSystem } from "../solver/rosenbrock";
import { dayBudget } from "./dayBudget";
import { runConditions } from "./runConditions";
import type { JCache, RunDay, RunHours, RunPlan, RunSegment } from "./types";

export const INTEGRATE_DAYS_DEFAULTS = {
  /** condition samples per day (rate constants interpolated between them) */
  nodesPerDay: 96,
  /** Rosenbrock tolerances: relative, and absolute in cm⁻³ (as the 24-hour solution) */
  rtol: 1e-4,
  atol: 1,
};

const DAY_s = 86_400;
const HOUR_s = 3_600;

export interface DaySpan {
  /** 0-based index of the first day */
  firstDay: number;
  dayCount: number;
  /** the state at the start of `firstDay` by mechanism index, cm⁻³ */
  state_cm3: readonly number[];
  /** photolysis frequencies computed before (filled in and returned) */
  jCache?: JCache;
  /** called after each day (e.g. progress); return false to stop */
  onDay?: (day: RunDay) => boolean | undefined;
}

/** Adds x·g(t), g = d ln[M]/dt, to the chemistry (compression along a trajectory). */
function withCompression(ode: OdeSystem, g: (t: number) => number): OdeSystem {
  return {
    n: ode.n,
    autonomous: false,
    rhs(t, y, dydt) {
      ode.rhs(t, y, dydt);
      const gt = g(t);
      if (gt !== 0) for (let i = 0; i < ode.n; i++) dydt[i] += gt * y[i];
    },
    jacobian(t, y, jac) {
      ode.jacobian(t, y, jac);
      const gt = g(t);
      if (gt !== 0) for (let i = 0; i < ode.n; i++) jac[i * ode.n + i] += gt;
    },
  };
}

export const emptyHours = (): RunHours => ({
  t_h: [],
  T_K: [],
  M_cm3: [],
  zenith_deg: [],
  numberDensity_cm3: [],
  rate_cm3s: [],
});

export function integrateDays(mech: CompiledMechanism, plan: RunPlan, span: DaySpan): RunSegment {
  const { firstDay, dayCount } = span;
  if (!(Number.isInteger(firstDay) && firstDay >= 0 && Number.isInteger(dayCount) && dayCount >= 1))
    throw new InputError("span", `days ${firstDay}+${dayCount}: give whole numbers, the count ≥ 1`);
  if (span.state_cm3.length !== mech.species.length)
    throw new InputError("span.state_cm3", `must have ${mech.species.length} entries, got ${span.state_cm3.length}`);
  const jCache: JCache = span.jCache ?? {};
  const conditions = runConditions(mech, plan, jCache);
  const at0 = conditions.at(0).cond;
  const sys = buildSystem(mech, at0);
  const n = sys.n;
  const nr = sys.nReactions;
  const nS = mech.species.length;
  const M0 = at0.M_cm3;
  // order of each reaction in the held species (and M): their amounts scale with [M]
  const heldOrder = new Float64Array(nr);
  for (let j = 0; j < nr; j++)
    for (const t of mech.reactions[j].reactants) if (sys.unknownOf[t.species] < 0) heldOrder[j] += t.coef;

  const N = INTEGRATE_DAYS_DEFAULTS.nodesPerDay;
  const dtNode = DAY_s / N;
  const t0 = firstDay * DAY_s;
  const nodes = dayCount * N + 1;
  const kEffNodes = new Float64Array(nodes * nr);
  const MNodes = new Float64Array(nodes);
  const TNodes = new Float64Array(nodes);
  const zNodes = new Float64Array(nodes);
  const kTmp = new Float64Array(nr);
  for (let q = 0; q < nodes; q++) {
    const { cond, zenith_deg } = conditions.at((t0 + q * dtNode) / HOUR_s);
    rateConstants(mech, cond, {}, kTmp);
    const ratio = cond.M_cm3 / M0;
    for (let j = 0; j < nr; j++)
      kEffNodes[q * nr + j] = kTmp[j] * sys.heldFactor[j] * (heldOrder[j] === 0 ? 1 : ratio ** heldOrder[j]);
    MNodes[q] = cond.M_cm3;
    TNodes[q] = cond.T_K;
    zNodes[q] = zenith_deg;
  }
  const nodeOf = (t: number) => {
    const pos = (t - t0) / dtNode;
    const q = Math.min(nodes - 2, Math.max(0, Math.floor(pos)));
    return { q, f: Math.min(1, Math.max(0, pos - q)) };
  };
  const kEffAt = (t: number, out: Float64Array) => {
    const { q, f } = nodeOf(t);
    const a = q * nr;
    const b = a + nr;
    for (let j = 0; j < nr; j++) out[j] = (1 - f) * kEffNodes[a + j] + f * kEffNodes[b + j];
  };
  const MAt = (t: number) => {
    const { q, f } = nodeOf(t);
    return (1 - f) * MNodes[q] + f * MNodes[q + 1];
  };
  const compression = (t: number) => {
    const { q } = nodeOf(t);
    return Math.log(MNodes[q + 1] / MNodes[q]) / dtNode;
  };
  const ode = withCompression(chemistryOde(sys, kEffAt, false), compression);

  const fullState = (x: ArrayLike<number>, t: number): number[] => {
    const ratio = MAt(t) / M0;
    const full = new Array<number>(nS);
    for (let s = 0; s < nS; s++) full[s] = sys.fixed[s] * ratio;
    for (let i = 0; i < n; i++) full[sys.unknownSpecies[i]] = x[i];
    return full;
  };
  let y = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const v = span.state_cm3[sys.unknownSpecies[i]];
    if (!(Number.isFinite(v) && v >= 0))
      throw new InputError(`span.state_cm3.${mech.species[sys.unknownSpecies[i]].id}`, `must be ≥ 0, got ${v}`);
    y[i] = v;
  }

  const hours = emptyHours();
  const kE = new Float64Array(nr);
  const rates = new Float64Array(nr);
  const ratesMid = new Float64Array(nr);
  const yMid = new Float64Array(n);
  const record = (t: number, x: Float64Array) => {
    kEffAt(t, kE);
    reactionRates(sys, kE, x, rates);
    const { q, f } = nodeOf(t);
    hours.t_h.push(t / HOUR_s);
    hours.T_K.push((1 - f) * TNodes[q] + f * TNodes[q + 1]);
    hours.M_cm3.push(MAt(t));
    hours.zenith_deg.push((1 - f) * zNodes[q] + f * zNodes[q + 1]);
    hours.numberDensity_cm3.push(fullState(x, t));
    hours.rate_cm3s.push(Array.from(rates));
  };
  if (firstDay === 0) record(0, y);

  const breakpoints: number[] = [];
  const days: RunDay[] = [];
  const heldSpecies = mech.species.filter((_sp, s) => sys.unknownOf[s] < 0).map((sp) => sp.id);
  let steps = 0;
  for (let d = 0; d < dayCount; d++) {
    const ta = t0 + d * DAY_s;
    const tb = ta + DAY_s;
    breakpoints.length = 0;
    for (let q = 1; q < N; q++) breakpoints.push(ta + q * dtNode);
    const startFull = fullState(y, ta);
    const meanX = new Float64Array(n);
    const sumRates = new Float64Array(nr);
    const sumCompression = new Float64Array(n);
    const prevX = Float64Array.from(y);
    const prevRates = new Float64Array(nr);
    kEffAt(ta, kE);
    reactionRates(sys, kE, prevX, prevRates);
    let nextHour = ta + HOUR_s;
    const res = integrateOde(
      ode,
      y,
      ta,
      tb,
      {
        rtol: INTEGRATE_DAYS_DEFAULTS.rtol,
        atol: INTEGRATE_DAYS_DEFAULTS.atol,
        breakpoints_s: breakpoints,
        maxStep_s: dtNode,
        initialStep_s: 1,
      },
      {
        nonNegative: true,
        onStep: (t, x, h) => {
          // Simpson's rule over the step with the state linear between its ends (exact for a bimolecular
          // reaction whose reactants and rate constant change linearly over the step; the stiff radicals'
          // derivatives are too large to interpolate with)
          for (let i = 0; i < n; i++) yMid[i] = 0.5 * (prevX[i] + x[i]);
          const tm = t - 0.5 * h;
          kEffAt(tm, kE);
          reactionRates(sys, kE, yMid, ratesMid);
          kEffAt(t, kE);
          reactionRates(sys, kE, x, rates);
          const g = compression(tm);
          const w = h / 6;
          for (let i = 0; i < n; i++) {
            const s = prevX[i] + 4 * yMid[i] + x[i];
            meanX[i] += (w * s) / DAY_s;
            if (g !== 0) sumCompression[i] += w * g * s;
          }
          for (let j = 0; j < nr; j++) sumRates[j] += w * (prevRates[j] + 4 * ratesMid[j] + rates[j]);
          prevX.set(x);
          prevRates.set(rates);
          if (Math.abs(t - nextHour) < 1e-6) {
            record(t, x);
            nextHour += HOUR_s;
          }
        },
      },
    );
    steps += res.acceptedSteps + res.rejectedSteps;
    if (res.status !== "ok") {
      return {
        status: "failed",
        message: `day ${firstDay + d + 1}: the integration stopped (${res.status}): ${res.message}`,
        failedAt_h: res.t_s / HOUR_s,
        hours,
        days,
        final_cm3: fullState(Float64Array.from(res.y), res.t_s),
        jCache,
        steps,
      };
    }
    y = Float64Array.from(res.y);
    const endFull = fullState(y, tb);
    const meanFull = fullState(meanX, ta + DAY_s / 2);
    const day = dayBudget(mech, {
      day: firstDay + d + 1,
      duration_s: DAY_s,
      start_cm3: startFull,
      end_cm3: endFull,
      startM_cm3: MAt(ta),
      endM_cm3: MAt(tb),
      meanState_cm3: meanFull,
      meanRates_cm3s: Array.from(sumRates, (r) => r / DAY_s),
      compression_cm3: fullState(sumCompression, ta).map((v, sp) => (sys.unknownOf[sp] < 0 ? 0 : v)),
      heldSpecies,
      options: plan.options,
    });
    days.push(day);
    if (span.onDay?.(day) === false) break;
  }
  return {
    status: "ok",
    message: "ok",
    hours,
    days,
    final_cm3: fullState(y, t0 + days.length * DAY_s),
    jCache: conditions.cacheFrom((t0 + days.length * DAY_s) / HOUR_s),
    steps,
  };
}
