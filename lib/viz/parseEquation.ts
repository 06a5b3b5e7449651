/**
 * Reads an equation as the mechanism route prints it ("2 ClO + M -> Cl2O2 +
 * M", "O3 + hv -> O(1D) + O2") into species terms for display, with the
 * mechanism module's own parser; the third body M becomes a flag, as hv does.
 */
import { parseEquation as parseMechanismEquation } from "../mechanism/parseEquation";
import type { ParsedEquation } from "./types";

const THIRD_BODY = "M";

export function parseEquation(equation: string): ParsedEquation {
  const r = parseMechanismEquation(equation);
  if (!r.ok) throw new RangeError(`parseEquation: ${r.message}`);
  const { reactants, products, photolysis } = r.equation;
  const has = (terms: typeof reactants) => terms.some((t) => t.species === THIRD_BODY);
  const without = (terms: typeof reactants) => terms.filter((t) => t.species !== THIRD_BODY);
  return {
    reactants: without(reactants),
    products: without(products),
    photolysis,
    thirdBody: has(reactants) || has(products),
  };
}
