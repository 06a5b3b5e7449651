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
import { chooseReplaced } from "./chooseReplaced";
import { luFactor, luSolve } from "./denseLu";
import { jacobianLog, jacobianLogSparse, productionLoss, reactionRates } from "./massAction";
import { SparseLu } from "./sparseLu";
import { entryOf, type SparseSystemMatrix } from "./sparseSystemMatrix";

export const NEWTON_DEFAULTS = {
  /** max |r_i| for convergence */
  tolerance: 1e-10,
  maxNewtonIterations: 60,
  maxPtcSteps: 200,
  /** first pseudo-time step, s */
  tau0_s: 1,
  /** above this pseudo-time step (s) the iteration is treated as Newton's method */
  tauNewton_s: 1e10,
  /** largest change of ln x in one Newton step */
  maxLogStep: 50,
  /** largest rise of ln x of one species in one pseudo-time step (falls are exact implicit-Euler decay) */
  maxPtcLogStep: 5,
  /** a pseudo-time step that multiplies ‖r‖₂ by more than this is retried with Δτ/4 */
  maxPtcGrowth: 3,
  /** Newton steps accepted with a line-search factor below crawlLambda, crawlSteps in a row, send the iteration back to pseudo-time stepping */
  crawlLambda: 1 / 32,
  crawlSteps: 4,
  /** from this many unknowns on, the step's matrix is sparse (SparseLu); below it dense (denseLu), which is faster there */
  sparseFromUnknowns: 30,
  /** bounds of ln x: 1e-250 … 1e30 cm⁻³ */
  uMin: Math.log(1e-250),
  uMax: Math.log(1e30),
};

export interface NewtonLogSettings {
  tolerance: number;
  maxNewtonIterations: number;
  maxPtcSteps: number;
  /** convergence also needs the last Newton step max |δ ln x| below this */
  stepTolerance: number;
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

/** ln of the factor by which a species falls when the linear step would make it ≤ 0 */
const OVERSHOOT = Math.log(1e3);

/** The sparse form of the step's matrix: structure, values (row form and column form) and LU factors. */
export interface SparseStep {
  m: SparseSystemMatrix;
  lu: SparseLu;
  /** row-form values */
  rowValues: Float64Array;
  /** the same values in the compressed columns the LU takes */
  colValues: Float64Array;
}

/**
 * Work buffers for one system size; reused across calls of the same solve.
 * With a sparse structure the step's matrix is sparse (no n×n buffer).
 */
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
  readonly sparse: SparseStep | undefined;
  constructor(n: number, nReactions: number, sparse?: SparseSystemMatrix) {
    this.x = new Float64Array(n);
    this.rates = new Float64Array(nReactions);
    this.P = new Float64Array(n);
    this.L = new Float64Array(n);
    this.F = new Float64Array(n);
    this.r = new Float64Array(n);
    this.scale = new Float64Array(n);
    this.A = new Float64Array(sparse ? 0 : n * n);
    this.sparse = sparse && {
      m: sparse,
      lu: new SparseLu(sparse.pattern, sparse.order),
      rowValues: new Float64Array(sparse.nnz),
      colValues: new Float64Array(sparse.nnz),
    };
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
  if (ws.sparse) return sparseStep(sys, tau, ws, ws.sparse);
  const n = sys.n;
  const { A, x, scale, r, du, isConstraintRow } = ws;
  jacobianLog(sys, ws.rates, A, x);
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
    // equilibrate the row so that the singularity test is relative to each row
    let big = 0;
    for (let l = 0; l < n; l++) big = Math.max(big, Math.abs(A[row + l]));
    const e = big > 0 ? 1 / big : 1;
    for (let l = 0; l < n; l++) A[row + l] *= e;
    du[i] = r[i] * e;
  }
  const bad = luFactor(A, n, ws.pivot, 1e-22);
  if (bad >= 0) return bad;
  luSolve(A, n, ws.pivot, du);
  for (let i = 0; i < n; i++) if (!Number.isFinite(du[i])) return i;
  return -1;
}

/** `step` on the sparse structure: the same matrix, row scaling and equilibration, factorised by SparseLu. */
function sparseStep(sys: ChemSystem, tau: number, ws: NewtonWorkspace, sp: SparseStep): number {
  const n = sys.n;
  const { x, scale, r, du, isConstraintRow } = ws;
  const { m, lu, rowValues: v, colValues } = sp;
  const { rowStart, diagonal, cscPosition } = m;
  jacobianLogSparse(sys, m, ws.rates, v, x);
  for (const c of sys.constraints) {
    const row = c.replaced;
    v.fill(0, rowStart[row], rowStart[row + 1]);
    for (let q = 0; q < c.members.length; q++) v[entryOf(m, row, c.members[q])] += c.weights[q] * x[c.members[q]];
  }
  const invTau = Number.isFinite(tau) ? 1 / tau : 0;
  for (let i = 0; i < n; i++) {
    const s = scale[i];
    const e0 = rowStart[i];
    const e1 = rowStart[i + 1];
    for (let e = e0; e < e1; e++) v[e] = -v[e] * s;
    if (invTau !== 0 && !isConstraintRow[i]) v[diagonal[i]] += x[i] * invTau * s;
    let big = 0;
    for (let e = e0; e < e1; e++) big = Math.max(big, Math.abs(v[e]));
    const f = big > 0 ? 1 / big : 1;
    for (let e = e0; e < e1; e++) {
      v[e] *= f;
      colValues[cscPosition[e]] = v[e];
    }
    du[i] = r[i] * f;
  }
  const bad = lu.factorise(colValues, 1e-22);
  if (bad >= 0) return m.order[bad];
  lu.solve(du);
  for (let i = 0; i < n; i++) if (!Number.isFinite(du[i])) return i;
  return -1;
}

/**
 * The linear system is solved for δ = δx/x (relative change). Applying it as
 * u + ln(1 + δ) is the Newton (or implicit-Euler) update of x itself, exact
 * for a species with first-order loss and a fixed source, where u + δ would
 * only move ln x by ≈ −1 per iteration for a species far above its balance;
 * where x + δx would be ≤ 0 the species is divided by e^OVERSHOOT instead.
 * Both agree with u + δ to second order, so quadratic convergence is kept.
 */
function trial(u: Float64Array, du: Float64Array, lambda: number, out: Float64Array, maxRise: number): void {
  const { uMin, uMax, maxLogStep } = NEWTON_DEFAULTS;
  for (let i = 0; i < u.length; i++) {
    const d = lambda * du[i];
    let s = d > -1 + 1e-15 ? Math.log1p(d) : -OVERSHOOT;
    if (s > maxRise) s = maxRise;
    else if (s < -maxLogStep) s = -maxLogStep;
    out[i] = Math.min(uMax, Math.max(uMin, u[i] + s));
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
  const rOld = new Float64Array(n);
  const scale0 = new Float64Array(n);
  const result = (converged: boolean, singularRow = -1, nonFinite = false): NewtonLogResult => ({
    converged,
    singularRow,
    nonFinite,
    newtonIterations,
    ptcSteps,
    residualNorm: norm,
  });
  if (!Number.isFinite(norm)) return result(false, -1, true);

  // Converged when the residual is small and the last Newton step (≈ the error
  // in ln x) is below stepTolerance: rows dominated by fast cycling (O ⇄ O3)
  // can have a tiny scaled residual while the slow balance is still off.
  let lastNewtonStep = Number.POSITIVE_INFINITY;
  let lastPtcTau = NEWTON_DEFAULTS.tau0_s;
  let crawling = 0;
  while (newtonIterations < settings.maxNewtonIterations && ptcSteps < settings.maxPtcSteps) {
    if (norm <= settings.tolerance) {
      if (lastNewtonStep <= settings.stepTolerance) return result(true);
      tau = Number.POSITIVE_INFINITY; // polish with Newton steps
    }
    const newton = !Number.isFinite(tau);
    const bad = step(sys, tau, ws);
    if (bad >= 0) {
      // A singular matrix is regularised by a (shorter) finite pseudo-time step.
      tau = newton ? 1e6 : tau / 10;
      evaluateResidual(sys, kEff, u, ws);
      if (++fallbacks > 8 || tau < 1e-9) return result(false, bad);
      continue;
    }
    if (newton) {
      newtonIterations++;
      const phi0 = halfSquare(ws.r);
      scale0.set(ws.scale);
      let lambda = 1;
      let accepted = false;
      let maxStep = 0;
      for (let i = 0; i < n; i++) maxStep = Math.max(maxStep, Math.abs(ws.du[i]));
      if (maxStep > 1e6) lambda = 1e6 / maxStep;
      if (maxStep <= settings.stepTolerance && norm <= settings.tolerance) {
        trial(u, ws.du, 1, u, NEWTON_DEFAULTS.maxLogStep);
        norm = evaluateResidual(sys, kEff, u, ws);
        return result(true);
      }
      while (lambda >= 1 / 256) {
        trial(u, ws.du, lambda, ws.uTrial, NEWTON_DEFAULTS.maxLogStep);
        const m = evaluateResidual(sys, kEff, ws.uTrial, ws);
        // merit with the row scaling frozen at the current iterate: the Newton
        // direction is a descent direction for it (it is not, in general, for
        // the re-scaled residual when P + L of a row changes along the step)
        let phi = 0;
        for (let i = 0; i < n; i++) phi += (ws.F[i] * scale0[i]) ** 2;
        if (Number.isFinite(m) && 0.5 * phi <= (1 - 1e-4 * lambda) * phi0) {
          u.set(ws.uTrial);
          norm = m;
          accepted = true;
          lastNewtonStep = lambda * maxStep;
          break;
        }
        lambda /= 2;
      }
      // A run of heavily damped steps means Newton's method is far from its
      // basin (a slow mode still relaxing): go back to pseudo-time stepping.
      crawling = accepted && lambda < NEWTON_DEFAULTS.crawlLambda ? crawling + 1 : 0;
      if (crawling >= NEWTON_DEFAULTS.crawlSteps && fallbacks < 5) {
        crawling = 0;
        fallbacks++;
        tau = lastPtcTau;
        continue;
      }
      if (!accepted) {
        norm = evaluateResidual(sys, kEff, u, ws);
        // Round-off floor: no descent possible while the residual is already small.
        if (norm <= settings.tolerance || (maxStep < 1e-11 && norm < 1e-7)) return result(true);
        if (++fallbacks > 5) break;
        tau = 1e3 * 10 ** fallbacks;
      }
    } else {
      ptcSteps++;
      rOld.set(ws.r);
      trial(u, ws.du, 1, ws.uTrial, NEWTON_DEFAULTS.maxPtcLogStep);
      const m = evaluateResidual(sys, kEff, ws.uTrial, ws);
      const grew = halfSquare(ws.r) > NEWTON_DEFAULTS.maxPtcGrowth ** 2 * halfSquare(rOld) && tau > 1e-6;
      if (!Number.isFinite(m) || grew) {
        tau /= grew ? 4 : 10;
        norm = evaluateResidual(sys, kEff, u, ws);
        if (tau < 1e-12) return result(false, -1, true);
        continue;
      }
      // switched evolution relaxation on the 2-norm of the scaled residual
      const phiOld = halfSquare(rOld);
      const ratio = Math.sqrt(phiOld / Math.max(halfSquare(ws.r), 1e-300));
      u.set(ws.uTrial);
      norm = m;
      // Keep each pool's replaced equation on its dominant member while the state moves.
      if (sys.constraints.length > 0 && chooseReplaced(sys, ws.x, undefined, 4)) {
        ws.isConstraintRow.fill(0);
        for (const c of sys.constraints) ws.isConstraintRow[c.replaced] = 1;
        norm = evaluateResidual(sys, kEff, u, ws);
        rOld.set(ws.r);
      }
      lastPtcTau = tau;
      tau *= ratio >= 0.9 ? Math.min(10, Math.max(2, ratio)) : ratio > 0.5 ? 1.2 : 0.5;
      if (tau >= NEWTON_DEFAULTS.tauNewton_s || (norm < 1e-4 && fallbacks === 0)) tau = Number.POSITIVE_INFINITY;
    }
  }
  if (norm <= settings.tolerance) return result(true);
  return result(false);
}
