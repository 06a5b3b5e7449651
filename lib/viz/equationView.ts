/**
 * An equation as the mechanism route prints it ("2 ClO + M -> Cl2O2 + M",
 * "O3 + hv -> O(1D) + O2") as the views draw it: its species terms, read by
 * the mechanism module's parser (the one equation parser), with the third
 * body M taken out of the terms and kept as a flag, as hv is.
 */
import { parseEquation } from "../mechanism/parseEquation";
import type { EquationView } from "./types";

const THIRD_BODY = "M";

export function equationView(equation: string): EquationView {
  const r = parseEquation(equation);
  if (!r.ok) throw new RangeError(`equationView: ${r.message}`);
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
