/**
 * Mass-action kinetics over the unknowns of a `ChemSystem`: reaction rates
 * r_j = k_j Π_held [X]^ν · Π_unknown x_l^ν_lj, net tendencies
 * F_i = Σ_j (products − reactants)_ij r_j split into production and loss, and
 * the analytic Jacobian, in linear (∂F/∂x) or logarithmic (∂F/∂ln x) form.
 * For u = ln x the derivative of r_j is exact and division-free:
 * ∂r_j/∂u_l = ν_lj r_j (common practice; e.g. Sandu et al., Atmos. Environ. 31, 1997).
 * Reactions whose γ depends on amounts (dependentRates.ts) are multiplied by
 * γ(a), and their Jacobian gains r_j ∂ln γ/∂ln a through every amount read.
 *
 * Units: x in molecules cm⁻³, rates in molecules cm⁻³ s⁻¹.
 */
import type { ChemSystem } from "./buildSystem";
import { gatherAmounts, linearDerivative, logDerivative } from "./dependentRates";
import { entryOf, type SparseSystemMatrix } from "./sparseSystemMatrix";

/** kEff_j = k_j × Π over held reactants [X]^coef. */
export function effectiveConstants(sys: ChemSystem, k: ArrayLike<number>, out: Float64Array): Float64Array {
  for (let j = 0; j < sys.nReactions; j++) out[j] = k[j] * sys.heldFactor[j];
  return out;
}

/** Rates of every reaction at unknown amounts x (cm⁻³). */
export function reactionRates(sys: ChemSystem, kEff: Float64Array, x: Float64Array, rates: Float64Array): void {
  const { rStart, rUnknown, rCoef } = sys;
  for (let j = 0; j < sys.nReactions; j++) {
    let r = kEff[j];
    if (r !== 0) {
      for (let q = rStart[j]; q < rStart[j + 1]; q++) {
        const v = x[rUnknown[q]];
        const c = rCoef[q];
        r *= c === 1 ? v : c === 2 ? v * v : v ** c;
      }
    }
    rates[j] = r;
  }
  for (const d of sys.dependent) {
    if (rates[d.reaction] !== 0) rates[d.reaction] *= d.gamma(gatherAmounts(d, x, sys.unknownOf, sys.fixed));
  }
}

/** Production P and loss L of every unknown from the net stoichiometry, cm⁻³ s⁻¹. */
export function productionLoss(sys: ChemSystem, rates: Float64Array, P: Float64Array, L: Float64Array): void {
  P.fill(0);
  L.fill(0);
  const { sStart, sUnknown, sNu } = sys;
  for (let j = 0; j < sys.nReactions; j++) {
    const r = rates[j];
    if (r === 0) continue;
    for (let q = sStart[j]; q < sStart[j + 1]; q++) {
      const nu = sNu[q];
      if (nu > 0) P[sUnknown[q]] += nu * r;
      else L[sUnknown[q]] -= nu * r;
    }
  }
}

/**
 * dF/du with u = ln x, row-major n×n, from the rates (overwrites J). Amount-dependent reactions are
 * differentiated at x when given, else at the amounts of the `reactionRates` call that gave `rates`.
 */
export function jacobianLog(sys: ChemSystem, rates: Float64Array, J: Float64Array, x?: ArrayLike<number>): void {
  const n = sys.n;
  J.fill(0);
  const { rStart, rUnknown, rCoef, sStart, sUnknown, sNu } = sys;
  for (let j = 0; j < sys.nReactions; j++) {
    const r = rates[j];
    if (r === 0) continue;
    for (let q = rStart[j]; q < rStart[j + 1]; q++) {
      const l = rUnknown[q];
      const d = rCoef[q] * r;
      for (let s = sStart[j]; s < sStart[j + 1]; s++) J[sUnknown[s] * n + l] += sNu[s] * d;
    }
  }
  dependentLogTerms(sys, rates, x, (row, col, v) => {
    J[row * n + col] += v;
  });
}

/** dF/dx, row-major n×n, at unknown amounts x ≥ 0 (exact also where some x are 0). Overwrites J. */
export function jacobianLinear(sys: ChemSystem, kEff: Float64Array, x: Float64Array, J: Float64Array): void {
  const n = sys.n;
  J.fill(0);
  const { rStart, rUnknown, sStart, sUnknown, sNu } = sys;
  const gammaOf = gammasAt(sys, x);
  for (let j = 0; j < sys.nReactions; j++) {
    const kj = kEff[j] * (gammaOf.get(j) ?? 1);
    if (kj === 0) continue;
    const q0 = rStart[j];
    const q1 = rStart[j + 1];
    for (let q = q0; q < q1; q++) {
      const d = rateDerivative(sys, kj, x, q, q0, q1);
      if (d === 0) continue;
      const l = rUnknown[q];
      for (let s = sStart[j]; s < sStart[j + 1]; s++) J[sUnknown[s] * n + l] += sNu[s] * d;
    }
  }
  dependentLinearTerms(sys, kEff, x, (row, col, v) => {
    J[row * n + col] += v;
  });
}

/** ∂r_j/∂x of reaction j's q-th reactant term (terms q0..q1): k_j times Π x^c differentiated in that factor. */
function rateDerivative(sys: ChemSystem, kj: number, x: Float64Array, q: number, q0: number, q1: number): number {
  const { rUnknown, rCoef } = sys;
  const c = rCoef[q];
  const v = x[rUnknown[q]];
  let d = kj * (c === 1 ? 1 : c === 2 ? 2 * v : c * v ** (c - 1));
  for (let o = q0; o < q1; o++) {
    if (o === q) continue;
    const w = x[rUnknown[o]];
    const co = rCoef[o];
    d *= co === 1 ? w : co === 2 ? w * w : w ** co;
  }
  return d;
}

/**
 * dF/du (u = ln x) into the row-form values of the sparse structure `m` (overwrites vals); the same
 * terms as `jacobianLog`, amount-dependent reactions included (their entries are in the pattern:
 * sparseSystemMatrix.ts).
 */
export function jacobianLogSparse(
  sys: ChemSystem,
  m: SparseSystemMatrix,
  rates: Float64Array,
  vals: Float64Array,
  x?: ArrayLike<number>,
): void {
  vals.fill(0);
  const { rStart, rCoef, sStart, sNu } = sys;
  const { termStart, termPosition } = m;
  for (let j = 0; j < sys.nReactions; j++) {
    const r = rates[j];
    if (r === 0) continue;
    let t = termStart[j];
    for (let q = rStart[j]; q < rStart[j + 1]; q++) {
      const d = rCoef[q] * r;
      for (let s = sStart[j]; s < sStart[j + 1]; s++) vals[termPosition[t++]] += sNu[s] * d;
    }
  }
  dependentLogTerms(sys, rates, x, (row, col, v) => {
    vals[entryOf(m, row, col)] += v;
  });
}

/** dF/dx at x ≥ 0 into the row-form values of the sparse structure `m` (overwrites vals); the terms of `jacobianLinear`. */
export function jacobianLinearSparse(
  sys: ChemSystem,
  m: SparseSystemMatrix,
  kEff: Float64Array,
  x: Float64Array,
  vals: Float64Array,
): void {
  vals.fill(0);
  const { rStart, sStart, sNu } = sys;
  const { termStart, termPosition } = m;
  const gammaOf = gammasAt(sys, x);
  for (let j = 0; j < sys.nReactions; j++) {
    const kj = kEff[j] * (gammaOf.get(j) ?? 1);
    if (kj === 0) continue;
    const q0 = rStart[j];
    const q1 = rStart[j + 1];
    const ns = sStart[j + 1] - sStart[j];
    for (let q = q0; q < q1; q++) {
      const d = rateDerivative(sys, kj, x, q, q0, q1);
      if (d === 0) continue;
      const t0 = termStart[j] + (q - q0) * ns;
      for (let s = 0; s < ns; s++) vals[termPosition[t0 + s]] += sNu[sStart[j] + s] * d;
    }
  }
  dependentLinearTerms(sys, kEff, x, (row, col, v) => {
    vals[entryOf(m, row, col)] += v;
  });
}

type AddTerm = (row: number, col: number, value: number) => void;

/**
 * The ∂F/∂u terms of the amount-dependent reactions: r_j ∂ln γ/∂ln a for every amount γ reads, at x
 * when given, else at the amounts of the `reactionRates` call that gave `rates`.
 */
function dependentLogTerms(sys: ChemSystem, rates: Float64Array, x: ArrayLike<number> | undefined, add: AddTerm) {
  const { sStart, sUnknown, sNu } = sys;
  for (const d of sys.dependent) {
    const j = d.reaction;
    const r = rates[j];
    if (r === 0) continue;
    if (x) gatherAmounts(d, x, sys.unknownOf, sys.fixed);
    for (let q = 0; q < d.species.length; q++) {
      const l = sys.unknownOf[d.species[q]];
      if (l < 0) continue;
      const dr = r * logDerivative(d, q);
      if (dr !== 0) for (let s = sStart[j]; s < sStart[j + 1]; s++) add(sUnknown[s], l, sNu[s] * dr);
    }
  }
}

/** The ∂F/∂x terms of the amount-dependent reactions (mass-action part × ∂γ/∂a), at x. */
function dependentLinearTerms(sys: ChemSystem, kEff: Float64Array, x: Float64Array, add: AddTerm) {
  const { rStart, rUnknown, rCoef, sStart, sUnknown, sNu } = sys;
  for (const d of sys.dependent) {
    const j = d.reaction;
    let mass = kEff[j];
    if (mass === 0) continue;
    for (let q = rStart[j]; q < rStart[j + 1]; q++) mass *= x[rUnknown[q]] ** rCoef[q];
    if (mass === 0) continue;
    gatherAmounts(d, x, sys.unknownOf, sys.fixed);
    for (let q = 0; q < d.species.length; q++) {
      const l = sys.unknownOf[d.species[q]];
      if (l < 0) continue;
      // the same difference as the log form where a > 0, so that both forms agree to rounding
      const a = d.amounts[q];
      const dr = a > 0 ? (mass * d.gamma(d.amounts) * logDerivative(d, q)) / a : mass * linearDerivative(d, q);
      if (dr !== 0) for (let s = sStart[j]; s < sStart[j + 1]; s++) add(sUnknown[s], l, sNu[s] * dr);
    }
  }
}

/** γ of every amount-dependent reaction at x, by reaction index. */
function gammasAt(sys: ChemSystem, x: ArrayLike<number>): Map<number, number> {
  const out = new Map<number, number>();
  for (const d of sys.dependent) out.set(d.reaction, d.gamma(gatherAmounts(d, x, sys.unknownOf, sys.fixed)));
  return out;
}
