/**
 * Reads the two sides of an equation as the mechanism route prints it
 * ("2 ClO + M -> Cl2O2 + M", "O3 + hv -> O(1D) + O2") into species terms.
 * M and hv are flags, not species. Only for display: the mechanism module
 * owns the real parser.
 */
import type { EquationTerm, ParsedEquation } from "./types";

const ARROW = /\s*(?:<=>|->|=>|→|=)\s*/;
const TERM = /^(\d+(?:\.\d+)?)?\s*(.+)$/;

function side(text: string, equation: string): { terms: EquationTerm[]; hv: boolean; m: boolean } {
  const terms = new Map<string, number>();
  let hv = false;
  let m = false;
  for (const raw of text.split(/\s+\+\s+/)) {
    const t = raw.trim();
    if (!t) continue;
    const match = TERM.exec(t);
    if (!match) throw new RangeError(`parseEquation: cannot read term "${t}" in ${equation}`);
    const coef = match[1] ? Number(match[1]) : 1;
    const sp = match[2].trim();
    if (sp === "hv" || sp === "hν") hv = true;
    else if (sp === "M") m = true;
    else terms.set(sp, (terms.get(sp) ?? 0) + coef);
  }
  return { terms: [...terms].map(([species, coef]) => ({ species, coef })), hv, m };
}

export function parseEquation(equation: string): ParsedEquation {
  const parts = equation.split(ARROW);
  if (parts.length !== 2) throw new RangeError(`parseEquation: expected one arrow in: ${equation}`);
  const left = side(parts[0], equation);
  const right = side(parts[1], equation);
  return {
    reactants: left.terms,
    products: right.terms,
    photolysis: left.hv,
    thirdBody: left.m || right.m,
  };
}
