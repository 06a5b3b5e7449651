/**
 * Stiff ODE integration with the three-stage, L-stable, third-order
 * Rosenbrock method ROS3 with an embedded second-order error estimate, as
 * benchmarked for atmospheric chemistry by Sandu, Verwer, Blom, Spee,
 * Carmichael & Potra, "Benchmarking stiff ODE solvers for atmospheric
 * chemistry problems II: Rosenbrock solvers", Atmos. Environ. 31, 3459–3472
 * (1997). Implemented in the form without Jacobian–vector products
 * (Hairer & Wanner, "Solving Ordinary Differential Equations II", 2nd ed.,
 * §IV.7, eq. 7.25):
 *   (I/(hγ) − J) k_i = f(t + α_i h, y + Σ_j a_ij k_j) + Σ_j (c_ij/h) k_j + γ_i h ∂f/∂t,
 *   y₁ = y + Σ m_i k_i,   error = Σ e_i k_i,
 * with step-size control h_new = h·min(6, max(0.2, 0.9·err^(−1/3))) on the
 * RMS norm of the error scaled by atol + rtol·|y| (Hairer & Wanner §IV.8).
 * A dense LU of the n×n iteration matrix is used: the 24-hour mode, its main
 * user, is limited to 150 solved species (lib/engine/engineLimits.ts).
 */
import { luFactor, luSolve, luSolveMatrix } from "./denseLu";
import type { IntegrateOptions, IntegrationResult } from "./types";

export const ROSENBROCK_DEFAULTS = {
  rtol: 1e-4,
  atol: 1e-2,
  maxSteps: 100_000,
  /** smallest step relative to |t| before giving up */
  minStepRelative: 1e-14,
};

/** ROS3 coefficients (Sandu et al. 1997, Table 3, transformed as in Hairer & Wanner eq. 7.25). */
const GAMMA = 0.435866521508459;
const A21 = 1.0;
// a31 = 1, a32 = 0 and α3 = α2: stage 3 evaluates f at the stage-2 argument.
const C21 = -1.0156171083877703;
const C31 = 4.07599564525377;
const C32 = 9.20767942983308;
const M1 = 1.0;
const M2 = 6.1697947043828245;
const M3 = -0.42772256543218573;
const E1 = 0.5;
const E2 = -2.907955871680547;
const E3 = 0.2235406989781157;
const ALPHA2 = 0.435866521508459;
const GAMMA1 = 0.435866521508459;
const GAMMA2 = 0.24291996454816805;
const GAMMA3 = 2.185138002766406;

/** y' = f(t, y) with its Jacobian ∂f/∂y. */
export interface OdeSystem {
  n: number;
  rhs(t: number, y: Float64Array, dydt: Float64Array): void;
  /** ∂f/∂y, row-major n×n, overwritten */
  jacobian(t: number, y: Float64Array, jac: Float64Array): void;
  /** true when f does not depend on t explicitly (skips the ∂f/∂t evaluation); default false */
  autonomous?: boolean;
}

export interface IntegrateOdeHooks {
  /** after every accepted step, with the new time, state and step */
  onStep?: (t: number, y: Float64Array, h: number) => void;
  /** clip negative components to 0 after each accepted step (chemistry; common practice); default false */
  nonNegative?: boolean;
  /** take fixed steps of this size without error control (for order-of-accuracy checks); default none */
  fixedStep?: number;
  /**
   * after every accepted step, before `onStep`: the step h, the Jacobian J at
   * the step's start and the LU factors (with pivots) of I/(hγ) − J, so that a
   * caller can carry the tangent-linear (variational) solution with the same
   * step (see `propagateTangent`)
   */
  onLinearStep?: (h: number, J: Float64Array, lu: Float64Array, pivot: Int32Array) => void;
}

/**
 * One ROS3 step of the linear system S' = J S (J frozen over the step) applied
 * in place to the n×n row-major matrix S, reusing the step's LU factors: the
 * tangent-linear map of the step for the monodromy matrix of a periodic orbit.
 * `work` must hold 4·n·n numbers.
 */
export function propagateTangent(
  n: number,
  h: number,
  J: Float64Array,
  lu: Float64Array,
  pivot: Int32Array,
  S: Float64Array,
  work: Float64Array,
): void {
  const nn = n * n;
  const K1 = work.subarray(0, nn);
  const K2 = work.subarray(nn, 2 * nn);
  const K3 = work.subarray(2 * nn, 3 * nn);
  const T = work.subarray(3 * nn, 4 * nn);
  const mul = (src: Float64Array, dst: Float64Array) => {
    dst.fill(0);
    for (let i = 0; i < n; i++) {
      const ri = i * n;
      for (let l = 0; l < n; l++) {
        const a = J[ri + l];
        if (a === 0) continue;
        const rl = l * n;
        for (let c = 0; c < n; c++) dst[ri + c] += a * src[rl + c];
      }
    }
  };
  const solveColumns = (M: Float64Array) => luSolveMatrix(lu, n, pivot, M, n);
  mul(S, K1);
  solveColumns(K1);
  for (let q = 0; q < nn; q++) T[q] = S[q] + A21 * K1[q];
  mul(T, K2);
  for (let q = 0; q < nn; q++) {
    const f1 = K2[q];
    K2[q] = f1 + (C21 / h) * K1[q];
    K3[q] = f1; // stage 3 reuses f at the stage-2 argument
  }
  solveColumns(K2);
  for (let q = 0; q < nn; q++) K3[q] += (C31 * K1[q] + C32 * K2[q]) / h;
  solveColumns(K3);
  for (let q = 0; q < nn; q++) S[q] += M1 * K1[q] + M2 * K2[q] + M3 * K3[q];
}

/**
 * First trial step from the scaled sizes of y and f (Hairer, Nørsett & Wanner,
 * "Solving ODEs I", §II.4, the first part of their starting-step algorithm):
 * h₀ = 0.01·‖y‖/‖f‖, capped by the interval.
 */
function initialStep(sys: OdeSystem, y: Float64Array, t0: number, span: number, rtol: number, atol: number): number {
  const f = new Float64Array(sys.n);
  sys.rhs(t0, y, f);
  let d0 = 0;
  let d1 = 0;
  for (let i = 0; i < sys.n; i++) {
    const sc = atol + rtol * Math.abs(y[i]);
    d0 += (y[i] / sc) ** 2;
    d1 += (f[i] / sc) ** 2;
  }
  d0 = Math.sqrt(d0 / Math.max(1, sys.n));
  d1 = Math.sqrt(d1 / Math.max(1, sys.n));
  const h0 = d0 < 1e-5 || d1 < 1e-5 ? 1e-6 * span : (0.01 * d0) / d1;
  return Math.min(span, Number.isFinite(h0) && h0 > 0 ? h0 : 1e-6 * span);
}

/** Integrates from t0 to t1 (t1 > t0). Never throws for numerical failure: see `status`. */
export function integrateOde(
  sys: OdeSystem,
  y0: ArrayLike<number>,
  t0: number,
  t1: number,
  options: IntegrateOptions = {},
  hooks: IntegrateOdeHooks = {},
): IntegrationResult {
  const n = sys.n;
  const rtol = options.rtol ?? ROSENBROCK_DEFAULTS.rtol;
  const atol = options.atol ?? ROSENBROCK_DEFAULTS.atol;
  const maxSteps = options.maxSteps ?? ROSENBROCK_DEFAULTS.maxSteps;
  const span = t1 - t0;
  const hMax = options.maxStep_s ?? span;
  const breaks = (options.breakpoints_s ?? []).filter((b) => b > t0 && b < t1).sort((a, b) => a - b);
  breaks.push(t1);
  let nextBreak = 0;

  const y = Float64Array.from(y0);
  const ynew = new Float64Array(n);
  const ytmp = new Float64Array(n);
  const f0 = new Float64Array(n);
  const f1 = new Float64Array(n);
  const dfdt = new Float64Array(n);
  const k1 = new Float64Array(n);
  const k2 = new Float64Array(n);
  const k3 = new Float64Array(n);
  const J = new Float64Array(n * n);
  const A = new Float64Array(n * n);
  const pivot = new Int32Array(n);

  let t = t0;
  let h = hooks.fixedStep ?? Math.min(hMax, options.initialStep_s ?? initialStep(sys, y, t0, span, rtol, atol));
  let accepted = 0;
  let rejected = 0;
  let nf = 0;
  let nj = 0;
  const done = (status: IntegrationResult["status"], message: string): IntegrationResult => ({
    status,
    message,
    t_s: t,
    y: Array.from(y),
    acceptedSteps: accepted,
    rejectedSteps: rejected,
    functionEvaluations: nf,
    jacobianEvaluations: nj,
  });

  while (t < t1) {
    if (accepted + rejected >= maxSteps) return done("max-steps", `stopped after ${maxSteps} steps at t = ${t} s`);
    // land exactly on breakpoints
    while (breaks[nextBreak] <= t) nextBreak++;
    const target = breaks[nextBreak];
    let last = false;
    if (t + h >= target || target - (t + h) < 1e-10 * Math.abs(target)) {
      h = target - t;
      last = true;
    }
    sys.rhs(t, y, f0);
    sys.jacobian(t, y, J);
    nf++;
    nj++;
    if (!sys.autonomous) {
      const dt = Math.sqrt(Number.EPSILON) * Math.max(1e-5, Math.abs(t), Math.abs(h));
      sys.rhs(t + dt, y, dfdt);
      nf++;
      for (let i = 0; i < n; i++) dfdt[i] = (dfdt[i] - f0[i]) / dt;
    }
    let stepOk = false;
    while (!stepOk) {
      const d = 1 / (h * GAMMA);
      for (let i = 0; i < n * n; i++) A[i] = -J[i];
      for (let i = 0; i < n; i++) A[i * n + i] += d;
      if (luFactor(A, n, pivot, 1e-300) >= 0) {
        rejected++;
        h *= 0.25;
        if (hooks.fixedStep !== undefined || h < ROSENBROCK_DEFAULTS.minStepRelative * Math.abs(t) + 1e-300) {
          return done("step-too-small", `singular iteration matrix at t = ${t} s`);
        }
        last = false;
        continue;
      }
      const ft = !sys.autonomous;
      // stage 1
      for (let i = 0; i < n; i++) k1[i] = f0[i] + (ft ? GAMMA1 * h * dfdt[i] : 0);
      luSolve(A, n, pivot, k1);
      // stage 2
      for (let i = 0; i < n; i++) ytmp[i] = y[i] + A21 * k1[i];
      sys.rhs(t + ALPHA2 * h, ytmp, f1);
      nf++;
      for (let i = 0; i < n; i++) k2[i] = f1[i] + (C21 / h) * k1[i] + (ft ? GAMMA2 * h * dfdt[i] : 0);
      luSolve(A, n, pivot, k2);
      // stage 3 (same argument as stage 2 since a31 = a21, a32 = 0, α3 = α2: f reused)
      for (let i = 0; i < n; i++) k3[i] = f1[i] + (C31 * k1[i] + C32 * k2[i]) / h + (ft ? GAMMA3 * h * dfdt[i] : 0);
      luSolve(A, n, pivot, k3);
      let err = 0;
      for (let i = 0; i < n; i++) {
        ynew[i] = y[i] + M1 * k1[i] + M2 * k2[i] + M3 * k3[i];
        const e = E1 * k1[i] + E2 * k2[i] + E3 * k3[i];
        const sc = atol + rtol * Math.max(Math.abs(y[i]), Math.abs(ynew[i]));
        err += (e / sc) ** 2;
      }
      err = Math.sqrt(err / Math.max(1, n));
      if (!Number.isFinite(err)) {
        rejected++;
        h *= 0.1;
        last = false;
        if (hooks.fixedStep !== undefined || h < ROSENBROCK_DEFAULTS.minStepRelative * Math.abs(t) + 1e-300) {
          return done("non-finite", `the solution left the finite range at t = ${t} s`);
        }
        continue;
      }
      if (hooks.fixedStep !== undefined || err <= 1) {
        stepOk = true;
        t = last ? target : t + h;
        if (hooks.nonNegative) for (let i = 0; i < n; i++) y[i] = Math.max(ynew[i], 0);
        else y.set(ynew);
        accepted++;
        hooks.onLinearStep?.(h, J, A, pivot);
        hooks.onStep?.(t, y, h);
        if (hooks.fixedStep === undefined) {
          const fac = Math.min(6, Math.max(0.2, 0.9 * err ** (-1 / 3)));
          h = Math.min(hMax, h * fac);
        } else h = hooks.fixedStep;
      } else {
        rejected++;
        h *= Math.max(0.2, 0.9 * err ** (-1 / 3));
        last = false;
        if (h < ROSENBROCK_DEFAULTS.minStepRelative * Math.abs(t) + 1e-300) {
          return done("step-too-small", `step size fell below ${h} s at t = ${t} s`);
        }
      }
    }
  }
  return done("ok", "ok");
}
