/**
 * Atom composition of a chemical formula as written in equations: element
 * symbols with counts (Cl, Br, CH3O2, Cl2O2, C10H16), parenthesised groups
 * with a count ((CH3)2CO), and a trailing excited-state tag in parentheses
 * that starts with a digit or a Greek letter (O(1D), N(2D), O2(1Δ)), which
 * adds no atoms. Element symbols are checked against the periodic table.
 */
import { EngineError } from "../errors";

const ELEMENTS = new Set(
  (
    "H He Li Be B C N O F Ne Na Mg Al Si P S Cl Ar K Ca Sc Ti V Cr Mn Fe Co Ni Cu Zn Ga Ge As Se Br Kr " +
    "Rb Sr Y Zr Nb Mo Tc Ru Rh Pd Ag Cd In Sn Sb Te I Xe Cs Ba La Ce Pr Nd Pm Sm Eu Gd Tb Dy Ho Er Tm Yb Lu " +
    "Hf Ta W Re Os Ir Pt Au Hg Tl Pb Bi Po At Rn Fr Ra Ac Th Pa U Np Pu D"
  ).split(" "),
);

/** An excited-state tag: "(1D)", "(2D)", "(1Δ)", "(b1Σ)", "(v=1)". */
const STATE_TAG = /\((?:[0-9]|[a-z]?[0-9]?[\u0370-\u03ff]|v=)[^()]*\)$/u;

/** Element → count for `formula`; throws EngineError "formula" naming the problem. */
export function parseFormula(formula: string): Record<string, number> {
  const fail = (why: string): never => {
    throw new EngineError("formula", `cannot read the formula "${formula}": ${why}`);
  };
  if (typeof formula !== "string" || formula.trim() === "") fail("it is empty");
  let body = formula.trim();
  const tag = STATE_TAG.exec(body);
  if (tag) body = body.slice(0, tag.index);
  if (body === "") fail("only an excited-state tag is given");

  let pos = 0;
  const readCount = (): number => {
    const m = /^[0-9]+/.exec(body.slice(pos));
    if (!m) return 1;
    pos += m[0].length;
    const n = Number(m[0]);
    if (n === 0) fail(`a count of 0 at position ${pos}`);
    return n;
  };
  const readGroup = (closing: boolean): Record<string, number> => {
    const atoms: Record<string, number> = {};
    const add = (el: string, n: number) => {
      atoms[el] = (atoms[el] ?? 0) + n;
    };
    while (pos < body.length) {
      const c = body[pos];
      if (c === "(") {
        pos++;
        const inner = readGroup(true);
        const n = readCount();
        for (const [el, k] of Object.entries(inner)) add(el, k * n);
      } else if (c === ")") {
        if (!closing) fail(`an unmatched ")" at position ${pos + 1}`);
        pos++;
        return atoms;
      } else if (c >= "A" && c <= "Z") {
        let sym = c;
        pos++;
        if (pos < body.length && body[pos] >= "a" && body[pos] <= "z") {
          const two = sym + body[pos];
          if (ELEMENTS.has(two)) {
            sym = two;
            pos++;
          }
        }
        if (!ELEMENTS.has(sym)) fail(`"${sym}" is not an element symbol`);
        add(sym, readCount());
      } else {
        fail(`unexpected "${c}" at position ${pos + 1} (elements start with a capital letter)`);
      }
    }
    if (closing) fail('a "(" is not closed');
    return atoms;
  };
  const atoms = readGroup(false);
  if (Object.keys(atoms).length === 0) fail("no element found");
  return atoms;
}
