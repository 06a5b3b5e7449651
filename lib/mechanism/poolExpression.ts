/**
 * Human-readable forms of a linear combination of species, e.g.
 * "Cl + ClO + HCl + ClONO2 + 2 Cl2O2", and of a relation with its label,
 * "Cl atoms: Cl + ClO + …".
 */
import type { ConservationRelation, Species, Term } from "./types";

const num = (x: number): string => (Number.isInteger(x) ? String(x) : String(Number(x.toPrecision(6))));

/** "a X + b Y − c Z", in the order of `weights`. */
export function weightedSum(weights: readonly Term[], species: readonly Pick<Species, "id">[]): string {
  let s = "";
  for (const { species: i, coef } of weights) {
    const mag = Math.abs(coef);
    const term = mag === 1 ? species[i].id : `${num(mag)} ${species[i].id}`;
    if (s === "") s = coef < 0 ? `−${term}` : term;
    else s += coef < 0 ? ` − ${term}` : ` + ${term}`;
  }
  return s === "" ? "0" : s;
}

/** "Cl atoms: Cl + ClO + HCl + …". */
export function poolExpression(relation: Pick<ConservationRelation, "label" | "expression">): string {
  return `${relation.label}: ${relation.expression}`;
}
