/**
 * Steady state of mass-action kinetics by Newton's method on u = ln x, with
 * pool totals replacing chosen balance rows, globalised two ways:
 * - pseudo-transient continuation (Kelley & Keyes, SIAM J. Numer. Anal. 35,
 *   508–523, 1998): linearly implicit Euler steps in physical pseudo-time,
 *   (diag(x)/Δτ − ∂F/∂u) δu = F, with Δτ grown by switched evolution
 *   relaxation (SER) so that the iteration becomes Newton's method;
 * - a backtracking (Armijo) line search on ½‖r‖² in the Newton phase
 *   (Dennis & Schnabel, "Numerical Methods for Unconstrained Optimization
 *   and Nonlinear Equations", 1983, §6.3).
 * Rows are scaled by 1/(P_i + L_i) (balances) and 1/total (pools), so the
 * residual r is dimensionless and |r_i| ≤ 1 for a balance row.
 *
 * Units: x in molecules cm⁻³, Δτ in s.
 */
import type { ChemSystem } from "./buildSystem";
import { luFactor, luSolve } from "./denseLu";
import { jacobianLog, productionLoss, reactionRates } from "./massAction";

export const NEWTON_DEFAULTS = {
  /** max |r_i| for convergence */
  tolerance: 1e-10,
  maxNewtonIterations: 60,
  maxPtcSteps: 200,
  /** first pseudo-time step, s */
  tau0_s: 1,
  /** above this pseudo-time step (s) the iteration is treated as Newton's method */
  tauNewton_s: 1e10,
  /** largest change of ln x in one step */
  maxLogStep: 3,
  /** bounds of ln x: 1e-250 … 1e30 cm⁻³ */
  uMin: Math.log(1e-250),
  uMax: Math.log(1e30),
};

export interface NewtonLogSettings {
  tolerance: number;
  maxNewtonIterations: number;
  maxPtcSteps: number;
  /** start in the Newton phase (warm start) */
  startWithNewton: boolean;
}

export interface NewtonLogResult {
  converged: boolean;
  /** unknown index of the row where the factorisation broke down, or −1 */
  singularRow: number;
  nonFinite: boolean;
  newtonIterations: number;
  ptcSteps: number;
  /** max |r_i| */
  residualNorm: number;
}

/** Work buffers for one system size; reused across calls of the same solve. */
export class NewtonWorkspace {
  readonly x: Float64Array;
  readonly rates: Float64Array;
  readonly P: Float64Array;
  readonly L: Float64Array;
  readonly F: Float64Array;
  readonly r: Float64Array;
  readonly scale: Float64Array;
  readonly A: Float64Array;
  readonly pivot: Int32Array;
  readonly du: Float64Array;
  readonly uTrial: Float64Array;
  readonly isConstraintRow: Uint8Array;
  constructor(n: number, nReactions: number) {
    this.x = new Float64Array(n);
    this.rates = new Float64Array(nReactions);
    this.P = new Float64Array(n);
    this.L = new Float64Array(n);
    this.F = new Float64Array(n);
    this.r = new Float64Array(n);
    this.scale = new Float64Array(n);
    this.A = new Float64Array(n * n);
    this.pivot = new Int32Array(n);
    this.du = new Float64Array(n);
    this.uTrial = new Float64Array(n);
    this.isConstraintRow = new Uint8Array(n);
  }
}

/**
 * Evaluates x = exp(u), the rates, P, L, the residual F and its scaled form r
 * into the workspace. Returns max |r_i| (NaN when something is not finite).
 */
export function evaluateResidual(sys: ChemSystem, kEff: Float64Array, u: Float64Array, ws: NewtonWorkspace): number {
  const n = sys.n;
  const { x, rates, P, L, F, r, scale } = ws;
  for (let i = 0; i < n; i++) x[i] = Math.exp(u[i]);
  reactionRates(sys, kEff, x, rates);
  productionLoss(sys, rates, P, L);
  for (let i = 0; i < n; i++) {
    F[i] = P[i] - L[i];
    scale[i] = 1 / (P[i] + L[i] + 1e-300);
  }
  for (const c of sys.constraints) {
    let s = 0;
    for (let q = 0; q < c.members.length; q++) s += c.weights[q] * x[c.members[q]];
    F[c.replaced] = s - c.total;
    scale[c.replaced] = 1 / c.total;
  }
  let m = 0;
  for (let i = 0; i < n; i++) {
    const v = F[i] * scale[i];
    r[i] = v;
    const a = Math.abs(v);
    if (!(a <= m)) m = a; // NaN propagates
  }
  return m;
}

function halfSquare(r: Float64Array): number {
  let s = 0;
  for (let i = 0; i < r.length; i++) s += r[i] * r[i];
  return 0.5 * s;
}

/**
 * Builds (diag(x)/τ − ∂F/∂u) row-scaled, factorises it and solves for δu into ws.du.
 * τ = Infinity gives the Newton step. Returns −1 or the singular unknown index.
 */
function step(sys: ChemSystem, tau: number, ws: NewtonWorkspace): number {
  const n = sys.n;
  const { A, x, scale, r, du, isConstraintRow } = ws;
  jacobianLog(sys, ws.rates, A);
  for (const c of sys.constraints) {
    const row = c.replaced * n;
    A.fill(0, row, row + n);
    for (let q = 0; q < c.members.length; q++) A[row + c.members[q]] += c.weights[q] * x[c.members[q]];
  }
  const invTau = Number.isFinite(tau) ? 1 / tau : 0;
  for (let i = 0; i < n; i++) {
    const s = scale[i];
    const row = i * n;
    for (let l = 0; l < n; l++) A[row + l] = -A[row + l] * s;
    if (invTau !== 0 && !isConstraintRow[i]) A[row + i] += x[i] * invTau * s;
    du[i] = r[i];
  }
  const bad = luFactor(A, n, ws.pivot);
  if (bad >= 0) return bad;
  luSolve(A, n, ws.pivot, du);
  let big = 0;
  for (let i = 0; i < n; i++) {
    const a = Math.abs(du[i]);
    if (!(a <= big)) big = a;
  }
  if (!Number.isFinite(big)) return 0;
  if (big > NEWTON_DEFAULTS.maxLogStep) {
    const f = NEWTON_DEFAULTS.maxLogStep / big;
    for (let i = 0; i < n; i++) du[i] *= f;
  }
  return -1;
}

function trial(u: Float64Array, du: Float64Array, lambda: number, out: Float64Array): void {
  const { uMin, uMax } = NEWTON_DEFAULTS;
  for (let i = 0; i < u.length; i++) {
    const v = u[i] + lambda * du[i];
    out[i] = Math.min(uMax, Math.max(uMin, v));
  }
}

/** Solves in place on u (ln cm⁻³); the workspace holds the final evaluation on return. */
export function newtonLog(
  sys: ChemSystem,
  kEff: Float64Array,
  u: Float64Array,
  settings: NewtonLogSettings,
  ws: NewtonWorkspace,
): NewtonLogResult {
  const n = sys.n;
  ws.isConstraintRow.fill(0);
  for (const c of sys.constraints) ws.isConstraintRow[c.replaced] = 1;
  let tau = settings.startWithNewton ? Number.POSITIVE_INFINITY : NEWTON_DEFAULTS.tau0_s;
  let newtonIterations = 0;
  let ptcSteps = 0;
  let fallbacks = 0;
  let norm = evaluateResidual(sys, kEff, u, ws);
  const result = (converged: boolean, singularRow = -1, nonFinite = false): NewtonLogResult => ({
    converged,
    singularRow,
    nonFinite,
    newtonIterations,
    ptcSteps,
    residualNorm: norm,
  });
  if (!Number.isFinite(norm)) return result(false, -1, true);

  while (newtonIterations < settings.maxNewtonIterations && ptcSteps < settings.maxPtcSteps) {
    if (norm <= settings.tolerance) return result(true);
    const newton = !Number.isFinite(tau);
    const bad = step(sys, tau, ws);
    if (bad >= 0) {
      if (newton) {
        // A singular Newton matrix can be regularised by a finite pseudo-time step.
        tau = 1e6;
        evaluateResidual(sys, kEff, u, ws);
        if (++fallbacks > 5) return result(false, bad);
        continue;
      }
      return result(false, bad);
    }
    if (newton) {
      newtonIterations++;
      const phi0 = halfSquare(ws.r);
      let lambda = 1;
      let accepted = false;
      let maxStep = 0;
      for (let i = 0; i < n; i++) maxStep = Math.max(maxStep, Math.abs(ws.du[i]));
      while (lambda >= 1 / 256) {
        trial(u, ws.du, lambda, ws.uTrial);
        const m = evaluateResidual(sys, kEff, ws.uTrial, ws);
        if (Number.isFinite(m) && halfSquare(ws.r) <= (1 - 1e-4 * lambda) * phi0) {
          u.set(ws.uTrial);
          norm = m;
          accepted = true;
          break;
        }
        lambda /= 2;
      }
      if (!accepted) {
        norm = evaluateResidual(sys, kEff, u, ws);
        // Round-off floor: the Newton step is negligible and the residual small.
        if (maxStep < 1e-11 && norm < 1e-7) return result(true);
        if (++fallbacks > 5) break;
        tau = 1e3 * 10 ** fallbacks;
      }
    } else {
      ptcSteps++;
      trial(u, ws.du, 1, ws.uTrial);
      const m = evaluateResidual(sys, kEff, ws.uTrial, ws);
      if (!Number.isFinite(m)) {
        tau /= 10;
        norm = evaluateResidual(sys, kEff, u, ws);
        if (tau < 1e-12) return result(false, -1, true);
        continue;
      }
      const ratio = norm / Math.max(m, 1e-300);
      u.set(ws.uTrial);
      norm = m;
      tau *= ratio >= 1 ? Math.min(10, Math.max(2, ratio)) : ratio > 0.3 ? 1.5 : 0.5;
      if (tau >= NEWTON_DEFAULTS.tauNewton_s || (norm < 1e-4 && fallbacks === 0)) tau = Number.POSITIVE_INFINITY;
    }
  }
  if (norm <= settings.tolerance) return result(true);
  return result(false);
}
