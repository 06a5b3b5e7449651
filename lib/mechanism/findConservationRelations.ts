/**
 * Conservation relations of the solved species, found automatically:
 *  1. the balance of every element carried by a solved species, Σ nᴱᵢ [Xᵢ],
 *     exact when no reaction exchanges that element with held species,
 *     otherwise listed with the reactions that do (its external reactions);
 *  2. the exact invariants of the left null space of the solved-species
 *     stoichiometric matrix (`leftNullSpace`) that are not combinations of
 *     exact element balances (e.g. a lumped family with no formula).
 */
import { externalReactions } from "./externalReactions";
import { leftNullSpace } from "./leftNullSpace";
import { weightedSum } from "./poolExpression";
import { stoichiometryMatrix } from "./stoichiometryMatrix";
import type { CompiledMechanism, ConservationRelation, SparseStoichiometry, Term } from "./types";

export const DEFAULTS = {
  /** at most this many invariants beyond element balances are listed */
  maxExtraInvariants: 50,
};

export interface ConservationSearch {
  relations: ConservationRelation[];
  /** false when the null-space search hit its size budget (element balances are still complete) */
  complete: boolean;
  /** invariants found but not listed (beyond `maxExtraInvariants`) */
  unlisted: number;
}

/** Weights of the element balance of `element` over the species with role "solved". */
export function elementWeights(mech: Pick<CompiledMechanism, "species">, element: string): Term[] {
  const w: Term[] = [];
  mech.species.forEach((s, i) => {
    const n = s.atoms[element];
    if (s.role === "solved" && n) w.push({ species: i, coef: n });
  });
  return w;
}

/** Rescales to a smallest magnitude of 1 and rounds near-integers; a leading negative sign is flipped. */
function tidy(w: Map<number, number>): Term[] {
  let min = Number.POSITIVE_INFINITY;
  for (const v of w.values()) if (v !== 0) min = Math.min(min, Math.abs(v));
  const terms: Term[] = [];
  for (const [species, v] of w) {
    const x = v / min;
    const r = Math.round(x);
    terms.push({ species, coef: Math.abs(x - r) < 1e-9 ? r : x });
  }
  terms.sort((a, b) => a.species - b.species);
  if (terms.length && terms.every((t) => t.coef <= 0)) for (const t of terms) t.coef = -t.coef;
  return terms;
}

export function searchConservation(
  mech: Pick<CompiledMechanism, "species" | "reactions">,
  stoich: SparseStoichiometry = stoichiometryMatrix(mech),
): ConservationSearch {
  const solved: number[] = [];
  mech.species.forEach((s, i) => {
    if (s.role === "solved") solved.push(i);
  });
  const elements: string[] = [];
  for (const i of solved)
    for (const el of Object.keys(mech.species[i].atoms)) if (!elements.includes(el)) elements.push(el);

  const relations: ConservationRelation[] = [];
  const n = mech.species.length;
  /** orthonormal basis (dense) of the exact relations accepted so far */
  const ortho: Float64Array[] = [];
  const accept = (w: readonly Term[]): boolean => {
    const v = new Float64Array(n);
    for (const t of w) v[t.species] = t.coef;
    let norm0 = 0;
    for (const t of w) norm0 += t.coef * t.coef;
    for (const q of ortho) {
      let d = 0;
      for (const t of w) d += q[t.species] * t.coef;
      if (d !== 0) for (let i = 0; i < n; i++) v[i] -= d * q[i];
    }
    let norm = 0;
    for (let i = 0; i < n; i++) norm += v[i] * v[i];
    if (norm <= 1e-16 * norm0) return false;
    const s = 1 / Math.sqrt(norm);
    for (let i = 0; i < n; i++) v[i] *= s;
    ortho.push(v);
    return true;
  };

  for (const el of elements) {
    const weights = elementWeights(mech, el);
    const ext = externalReactions(stoich, weights);
    const exact = ext.length === 0;
    if (exact) accept(weights);
    relations.push({
      id: el,
      label: `${el} atoms`,
      element: el,
      weights,
      expression: weightedSum(weights, mech.species),
      exact,
      externalReactions: ext,
    });
  }

  const { basis, complete } = leftNullSpace(stoich, solved);
  let extras = 0;
  let unlisted = 0;
  for (const b of basis) {
    const w = tidy(b);
    if (extras >= DEFAULTS.maxExtraInvariants) {
      unlisted++;
      continue;
    }
    if (!accept(w)) continue;
    extras++;
    relations.push({
      id: `invariant-${extras}`,
      label: `invariant ${extras}`,
      weights: w,
      expression: weightedSum(w, mech.species),
      exact: true,
      externalReactions: [],
    });
  }
  return { relations, complete, unlisted };
}

/** Every conservation relation of the solved species (see the file header). */
export function findConservationRelations(
  mech: Pick<CompiledMechanism, "species" | "reactions">,
): ConservationRelation[] {
  return searchConservation(mech).relations;
}
