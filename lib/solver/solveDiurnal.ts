/**
 * The periodic 24-hour (diurnal) steady state: rate constants follow the sun
 * through the day (sampled from the caller's conditions and interpolated
 * linearly in time), and the state at local midnight y₀ is sought such that
 * one day of chemistry maps it onto itself, Φ(y₀) = y₀, with each pool total
 * replacing the periodicity condition of its dominant member.
 *
 * Method: shooting (Newton's method on the periodicity condition; Keller,
 * "Numerical Solution of Two Point Boundary Value Problems", SIAM 1976). One
 * day is integrated with ROS3 (rosenbrock.ts) and the monodromy matrix
 * ∂Φ/∂y₀ is carried along with the tangent-linear ROS3 steps; the Newton
 * update solves (∂Φ/∂y₀ − I) δ = −(Φ(y₀) − y₀). The first day is a plain
 * spin-up from the instantaneous steady state at 24-hour-mean rate constants;
 * a step that raises the day-to-day change is followed by a plain day.
 * Polar night and polar day need nothing special: the rate constants are
 * whatever the conditions give at each hour.
 *
 * Units: molecules cm⁻³, s; local solar time in h.
 */
import { InputError } from "../errors";
import type { CompiledMechanism } from "../mechanism/types";
import { assembleSteadyState } from "./assembleSteadyState";
import { buildSystem, type ChemSystem } from "./buildSystem";
import { chemistryOde } from "./chemistryOde";
import { chooseReplaced } from "./chooseReplaced";
import { luFactor, luSolve } from "./denseLu";
import { reactionRates } from "./massAction";
import { rateConstants } from "./rateConstants";
import { integrateOde, propagateTangent } from "./rosenbrock";
import { solveSteadyState } from "./solveSteadyState";
import type { DiurnalOptions, DiurnalSteadyState, SolveConditions, SolveStatus, SteadyStateOptions } from "./types";

export const DIURNAL_DEFAULTS = {
  samplesPerDay: 96,
  periodicTolerance: 1e-3,
  maxDays: 40,
  rtol: 1e-4,
  atol: 1,
  reportAt_h: 12,
  /** number density below which a species' day-to-day change is measured absolutely, cm⁻³ */
  periodicFloor_cm3: 1,
};

const DAY_s = 86_400;

export interface DiurnalInput {
  /** conditions at a local solar time (h, 0 ≤ t < 24); held amounts and pool totals are taken from t = 0 */
  conditionsAt: (localSolarTime_h: number) => SolveConditions;
  /** local solar time of the reported instantaneous state, h; default 12 */
  reportAt_h?: number;
}

interface DayResult {
  ok: boolean;
  message: string;
  y24: Float64Array;
  meanX: Float64Array;
  meanRates: Float64Array;
  yReport: Float64Array;
  S?: Float64Array;
  steps: number;
}

/** Sets the dominant member of each pool so that Σ w y = total exactly (else rescales the pool). */
function projectPools(sys: ChemSystem, y: Float64Array): void {
  for (const c of sys.constraints) {
    let others = 0;
    let wRep = 0;
    for (let q = 0; q < c.members.length; q++) {
      if (c.members[q] === c.replaced) wRep = c.weights[q];
      else others += c.weights[q] * y[c.members[q]];
    }
    const v = (c.total - others) / wRep;
    if (v > 0 && Number.isFinite(v)) y[c.replaced] = v;
    else {
      const s = others + wRep * y[c.replaced];
      if (s > 0) for (let q = 0; q < c.members.length; q++) y[c.members[q]] *= c.total / s;
    }
  }
}

export function solveDiurnal(
  mech: CompiledMechanism,
  input: DiurnalInput,
  options: DiurnalOptions = {},
): DiurnalSteadyState {
  if (!input || typeof input.conditionsAt !== "function") {
    throw new InputError("input.conditionsAt", "must be a function of local solar time (h) returning conditions");
  }
  const reportAt_h = input.reportAt_h ?? DIURNAL_DEFAULTS.reportAt_h;
  if (!(reportAt_h >= 0 && reportAt_h <= 24))
    throw new InputError("input.reportAt_h", `must be in [0, 24], got ${reportAt_h}`);
  const N = options.samplesPerDay ?? DIURNAL_DEFAULTS.samplesPerDay;
  if (!(Number.isInteger(N) && N >= 4 && N <= 10_000))
    throw new InputError("options.samplesPerDay", `must be an integer in [4, 10000], got ${N}`);
  const maxDays = options.maxDays ?? DIURNAL_DEFAULTS.maxDays;
  if (!(Number.isInteger(maxDays) && maxDays >= 1))
    throw new InputError("options.maxDays", `must be an integer ≥ 1, got ${maxDays}`);
  const tol = options.periodicTolerance ?? DIURNAL_DEFAULTS.periodicTolerance;
  if (!(tol > 0)) throw new InputError("options.periodicTolerance", `must be > 0, got ${tol}`);
  const rtol = options.rtol ?? DIURNAL_DEFAULTS.rtol;
  const atol = options.atol ?? DIURNAL_DEFAULTS.atol;

  const conds: SolveConditions[] = [];
  for (let i = 0; i < N; i++) conds.push(input.conditionsAt((24 * i) / N));
  const cond0 = conds[0];
  const sys = buildSystem(mech, cond0);
  const n = sys.n;
  const nr = sys.nReactions;
  const kNodes = new Float64Array(N * nr);
  const kEffNodes = new Float64Array(N * nr);
  const meanK = new Float64Array(nr);
  const kTmp = new Float64Array(nr);
  for (let i = 0; i < N; i++) {
    const c = conds[i];
    if (c.T_K !== cond0.T_K || c.M_cm3 !== cond0.M_cm3) buildSystem(mech, c); // validates the sample
    rateConstants(mech, c, {}, kTmp);
    for (let j = 0; j < nr; j++) {
      kNodes[i * nr + j] = kTmp[j];
      kEffNodes[i * nr + j] = kTmp[j] * sys.heldFactor[j];
      meanK[j] += kTmp[j] / N;
    }
  }
  const kAt = (nodes: Float64Array, t_s: number, out: Float64Array) => {
    const th = (((t_s / 3600) % 24) + 24) % 24;
    const pos = (th * N) / 24;
    const i0 = Math.min(N - 1, Math.floor(pos));
    const f = pos - i0;
    const i1 = (i0 + 1) % N;
    for (let j = 0; j < nr; j++) out[j] = (1 - f) * nodes[i0 * nr + j] + f * nodes[i1 * nr + j];
  };
  const kEffAt = (t: number, out: Float64Array) => kAt(kEffNodes, t, out);

  const warnings = [...sys.warnings];
  const fullState = (x: Float64Array): Float64Array => {
    const full = Float64Array.from(sys.fixed);
    for (let i = 0; i < n; i++) full[sys.unknownSpecies[i]] = x[i];
    return full;
  };

  // Start: given state, or the steady state at 24-hour-mean rate constants.
  let y0 = new Float64Array(n);
  if (options.initialState) {
    if (options.initialState.length !== mech.species.length) {
      throw new InputError(
        "options.initialState",
        `must have ${mech.species.length} entries, got ${options.initialState.length}`,
      );
    }
    for (let i = 0; i < n; i++) y0[i] = Math.max(0, options.initialState[sys.unknownSpecies[i]] || 0);
  } else {
    const ssOptions: SteadyStateOptions = { rateConstants: meanK };
    const ss = solveSteadyState(mech, cond0, ssOptions);
    for (let i = 0; i < n; i++) y0[i] = ss.numberDensity_cm3[sys.unknownSpecies[i]];
    if (ss.status !== "converged")
      warnings.push(`start from the 24-hour-mean steady state: ${ss.status} (${ss.message})`);
  }
  chooseReplaced(sys, y0);
  projectPools(sys, y0);
  const isReplaced = new Uint8Array(n);
  for (const c of sys.constraints) isReplaced[c.replaced] = 1;

  const breakpoints: number[] = [];
  for (let i = 1; i < N; i++) breakpoints.push((DAY_s * i) / N);
  const tReport = (reportAt_h % 24) * 3600;
  if (tReport > 0) breakpoints.push(tReport);
  const ode = chemistryOde(sys, kEffAt, false);
  const kE = new Float64Array(nr);
  const rates = new Float64Array(nr);

  const runDay = (start: Float64Array, tangent: boolean): DayResult => {
    const meanX = new Float64Array(n);
    const meanRates = new Float64Array(nr);
    const yReport = Float64Array.from(start);
    const prevX = Float64Array.from(start);
    const prevRates = new Float64Array(nr);
    kEffAt(0, kE);
    reactionRates(sys, kE, prevX, prevRates);
    const S = tangent ? new Float64Array(n * n) : undefined;
    const work = tangent ? new Float64Array(4 * n * n) : undefined;
    if (S) for (let i = 0; i < n; i++) S[i * n + i] = 1;
    const res = integrateOde(
      ode,
      start,
      0,
      DAY_s,
      { rtol, atol, breakpoints_s: breakpoints, maxStep_s: DAY_s / N, initialStep_s: 1 },
      {
        nonNegative: true,
        onLinearStep: S && work ? (h, J, lu, pivot) => propagateTangent(n, h, J, lu, pivot, S, work) : undefined,
        onStep: (t, y, h) => {
          kEffAt(t, kE);
          reactionRates(sys, kE, y, rates);
          for (let i = 0; i < n; i++) meanX[i] += (0.5 * h * (prevX[i] + y[i])) / DAY_s;
          for (let j = 0; j < nr; j++) meanRates[j] += (0.5 * h * (prevRates[j] + rates[j])) / DAY_s;
          prevX.set(y);
          prevRates.set(rates);
          if (tReport > 0 && Math.abs(t - tReport) < 1e-6) yReport.set(y);
        },
      },
    );
    return {
      ok: res.status === "ok",
      message: res.message,
      y24: Float64Array.from(res.y),
      meanX,
      meanRates,
      yReport,
      S,
      steps: res.acceptedSteps + res.rejectedSteps,
    };
  };

  const periodicity = (a: Float64Array, b: Float64Array): { err: number; worst: number } => {
    let err = 0;
    let worst = -1;
    for (let i = 0; i < n; i++) {
      if (isReplaced[i]) continue;
      const e = Math.abs(b[i] - a[i]) / (Math.max(Math.abs(a[i]), Math.abs(b[i])) + DIURNAL_DEFAULTS.periodicFloor_cm3);
      if (e > err) {
        err = e;
        worst = i;
      }
    }
    return { err, worst };
  };

  const B = new Float64Array(n * n);
  const pivot = new Int32Array(n);
  const delta = new Float64Array(n);
  let day = 0;
  let last: DayResult | undefined;
  let err = Number.POSITIVE_INFINITY;
  let prevErr = Number.POSITIVE_INFINITY;
  let worst = -1;
  let status: SolveStatus = "max-iterations";
  let message = "";
  let plainNext = true;
  let steps = 0;
  while (day < maxDays) {
    const useNewton = !plainNext && n > 0;
    const d = runDay(y0, useNewton);
    day++;
    last = d;
    steps += d.steps;
    if (!d.ok) {
      status = "diverged";
      message = `the integration of day ${day} failed: ${d.message}`;
      break;
    }
    // The pool totals replace the periodicity rows of the members dominant at midnight.
    if (chooseReplaced(sys, d.y24, undefined, 2)) {
      isReplaced.fill(0);
      for (const c of sys.constraints) isReplaced[c.replaced] = 1;
    }
    ({ err, worst } = periodicity(y0, d.y24));
    // Newton correction (∂Φ/∂y₀ − I) δ = y₀ − Φ(y₀), pool rows replaced by Σ w y₀ = total
    let next = Float64Array.from(d.y24);
    let distance = Number.POSITIVE_INFINITY;
    if (d.S) {
      for (let i = 0; i < n * n; i++) B[i] = d.S[i];
      for (let i = 0; i < n; i++) {
        B[i * n + i] -= 1;
        delta[i] = y0[i] - d.y24[i];
      }
      for (const c of sys.constraints) {
        const row = c.replaced * n;
        B.fill(0, row, row + n);
        let sum = -c.total;
        for (let q = 0; q < c.members.length; q++) {
          B[row + c.members[q]] += c.weights[q];
          sum += c.weights[q] * y0[c.members[q]];
        }
        delta[c.replaced] = -sum;
      }
      if (luFactor(B, n, pivot, 1e-13) < 0) {
        luSolve(B, n, pivot, delta);
        distance = 0;
        next = new Float64Array(n);
        for (let i = 0; i < n; i++) {
          const scale = Math.max(Math.abs(y0[i]), Math.abs(d.y24[i])) + DIURNAL_DEFAULTS.periodicFloor_cm3;
          if (Number.isFinite(delta[i])) distance = Math.max(distance, Math.abs(delta[i]) / scale);
          else distance = Number.POSITIVE_INFINITY;
          let v = Number.isFinite(delta[i]) ? y0[i] + delta[i] : d.y24[i];
          // at most a factor 10 per update, never negative
          if (y0[i] > DIURNAL_DEFAULTS.periodicFloor_cm3) v = Math.min(10 * y0[i], Math.max(0.1 * y0[i], v));
          next[i] = Math.max(0, v);
        }
      }
    }
    // Periodic when the day-to-day change is small and, where the monodromy is
    // known, so is the estimated distance to the periodic orbit (slow modes).
    // At least one day with the monodromy (a slow drift can hide under a small change).
    const settled = err <= tol && (n === 0 || (d.S !== undefined && (!Number.isFinite(distance) || distance <= tol)));
    if (settled) {
      status = "converged";
      message = `periodic to ${err.toExponential(2)} after ${day} day${day > 1 ? "s" : ""}`;
      break;
    }
    if (useNewton && err > 1.5 * prevErr) {
      plainNext = true; // the last Newton update made things worse: take a plain day
      next = Float64Array.from(d.y24);
    } else plainNext = false;
    prevErr = err;
    projectPools(sys, next);
    y0 = next;
  }
  if (status === "max-iterations") {
    const id = worst >= 0 ? mech.species[sys.unknownSpecies[worst]].id : "";
    message = `not periodic after ${day} days: the largest day-to-day change is ${err.toExponential(2)} (${id})`;
  }
  const d = last as DayResult;
  const meanFull = fullState(d.meanX);
  const average = assembleSteadyState({
    sys,
    T_K: cond0.T_K,
    M_cm3: cond0.M_cm3,
    k: meanK,
    numberDensity: meanFull,
    rates: d.meanRates,
    status,
    message,
    iterations: day,
    residualNorm: Number.isFinite(err) ? err : 0,
    coldStartSteps: 0,
    warnings,
  });
  // the last integrated day's own state (its start at 0 h): after a day that did not converge y0 is already the next guess
  const yR = d.yReport;
  const kR = new Float64Array(nr);
  kAt(kNodes, tReport, kR);
  kEffAt(tReport, kE);
  reactionRates(sys, kE, yR, rates);
  const atReportTime = assembleSteadyState({
    sys,
    T_K: cond0.T_K,
    M_cm3: cond0.M_cm3,
    k: kR,
    numberDensity: fullState(yR),
    rates,
    status,
    message,
    iterations: day,
    residualNorm: Number.isFinite(err) ? err : 0,
    coldStartSteps: 0,
    warnings,
  });
  return {
    status,
    message,
    average,
    atReportTime,
    reportAt_h,
    daysIntegrated: day,
    integratorSteps: steps,
    periodicityError: Number.isFinite(err) ? err : 0,
  };
}
