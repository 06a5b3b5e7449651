/**
 * Sparse stoichiometric matrix of a mechanism: S[i][j] = (coefficient of
 * species i among the products of reaction j) − (among its reactants). The
 * third body M cancels and is left out; hv is not a species. Stored both by
 * reaction (columns) and by species (rows); cost O(number of terms).
 */
import type { CompiledMechanism, SparseStoichiometry, Term } from "./types";

export function stoichiometryMatrix(mech: Pick<CompiledMechanism, "species" | "reactions">): SparseStoichiometry {
  const nSpecies = mech.species.length;
  const rows: SparseStoichiometry["rows"] = Array.from({ length: nSpecies }, () => []);
  const columns: Term[][] = mech.reactions.map((r, j) => {
    const net = new Map<number, number>();
    for (const t of r.reactants) net.set(t.species, (net.get(t.species) ?? 0) - t.coef);
    for (const t of r.products) net.set(t.species, (net.get(t.species) ?? 0) + t.coef);
    const col: Term[] = [];
    for (const [species, coef] of net) if (Math.abs(coef) > 1e-12) col.push({ species, coef });
    col.sort((a, b) => a.species - b.species);
    for (const t of col) rows[t.species].push({ reaction: j, coef: t.coef });
    return col;
  });
  return { nSpecies, nReactions: mech.reactions.length, columns, rows };
}
