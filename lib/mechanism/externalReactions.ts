/**
 * The reactions that change a weighted sum over species: for an element
 * balance of the solved species, exactly those that exchange its atoms with
 * held species (e.g. CFCl3 + hv feeds Cly; N + NO → N2 + O drains NOy). The
 * engine reports their net rate as the pool's external source.
 */
import type { SparseStoichiometry, Term } from "./types";

/** Indices of reactions j with Σᵢ wᵢ S[i][j] ≠ 0 (relative tolerance 1e-9). */
export function externalReactions(stoich: SparseStoichiometry, weights: readonly Term[]): number[] {
  const w = new Map<number, number>();
  for (const t of weights) w.set(t.species, t.coef);
  const out: number[] = [];
  stoich.columns.forEach((col, j) => {
    let sum = 0;
    let scale = 0;
    for (const t of col) {
      const wi = w.get(t.species);
      if (wi === undefined) continue;
      sum += wi * t.coef;
      scale += Math.abs(wi * t.coef);
    }
    if (Math.abs(sum) > 1e-9 * Math.max(scale, 1)) out.push(j);
  });
  return out;
}
