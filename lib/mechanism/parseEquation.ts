/**
 * Reads a chemical equation in ordinary notation: "ClO + O -> Cl + O2",
 * "O2 + hv -> 2 O", "O + O2 + M -> O3 + M", "0.5 Cl2 + ...". Terms are joined
 * by "+", sides by "->" (or "→"); a leading number is a stoichiometric
 * coefficient; "hv" marks photolysis. Repeated species on one side are
 * merged in the terms ("ClO + ClO" is 2 ClO); the text keeps them as written. Species names are checked by the caller.
 */

export interface EquationTerm {
  species: string;
  coef: number;
}

export interface ParsedEquation {
  reactants: EquationTerm[];
  products: EquationTerm[];
  /** "hv" on the left */
  photolysis: boolean;
  /** normalised text, e.g. "ClO + O -> Cl + O2" */
  text: string;
}

export type EquationResult = { ok: true; equation: ParsedEquation } | { ok: false; message: string };

const COEF = /^([0-9]+(?:\.[0-9]+)?|\.[0-9]+)\s*(.*)$/;

function readSide(side: string, which: string): { terms: EquationTerm[]; hv: number; written: string[] } | string {
  const raw = side.split("+").map((t) => t.trim());
  if (raw.length === 1 && raw[0] === "") return `the ${which} side is empty`;
  const terms: EquationTerm[] = [];
  const written: string[] = [];
  let hv = 0;
  for (const t of raw) {
    if (t === "") return `an empty term on the ${which} side (two "+" in a row?)`;
    let coef = 1;
    let name = t;
    const m = COEF.exec(t);
    if (m) {
      coef = Number(m[1]);
      name = m[2].trim();
      if (!(coef > 0)) return `the coefficient of "${t}" must be positive`;
      if (name === "") return `"${t}" has a coefficient but no species`;
    }
    if (/\s/.test(name)) return `"${t}" is not one species (a missing "+"?)`;
    written.push(coef === 1 ? name : `${coef} ${name}`);
    if (name === "hv") {
      if (coef !== 1) return `"hv" takes no coefficient`;
      hv++;
      continue;
    }
    const same = terms.find((x) => x.species === name);
    if (same) same.coef += coef;
    else terms.push({ species: name, coef });
  }
  return { terms, hv, written };
}

export function parseEquation(equation: string): EquationResult {
  if (typeof equation !== "string") return { ok: false, message: "expected a string" };
  // \u2192 is the arrow →, escaped so that the bundles stay ASCII (scripts/cli-bundle.mjs)
  const sides = equation.split(/->|\u2192/);
  if (sides.length !== 2) {
    return {
      ok: false,
      message:
        sides.length < 2
          ? `no arrow "->" between reactants and products in "${equation}"`
          : `more than one arrow in "${equation}"; write each direction as its own reaction`,
    };
  }
  const left = readSide(sides[0], "left");
  if (typeof left === "string") return { ok: false, message: left };
  const right = readSide(sides[1], "right");
  if (typeof right === "string") return { ok: false, message: right };
  if (right.hv > 0) return { ok: false, message: `"hv" can only be a reactant` };
  if (left.hv > 1) return { ok: false, message: `"hv" is written more than once` };
  if (left.terms.length === 0) return { ok: false, message: "no reactant besides hv" };
  if (right.terms.length === 0) return { ok: false, message: "the right side has no species" };
  const text = `${left.written.join(" + ")} -> ${right.written.join(" + ")}`;
  return { ok: true, equation: { reactants: left.terms, products: right.terms, photolysis: left.hv === 1, text } };
}
