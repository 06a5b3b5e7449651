/**
 * Reading what a student wrote: numbers in the ways people type them
 * ("3.2e-7", "3.2E-7", "3.2×10^-7", "3.2 x 10-7", "3.2*10^(-7)", "−12 %", "1,234")
 * and names compared without case, spaces or arrow style.
 */

const SUPERSCRIPT_DIGITS: Record<string, string> = {
  "⁰": "0",
  "¹": "1",
  "²": "2",
  "³": "3",
  "⁴": "4",
  "⁵": "5",
  "⁶": "6",
  "⁷": "7",
  "⁸": "8",
  "⁹": "9",
  "⁻": "-",
  "⁺": "+",
};

const PLAIN = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/;

/** The number a student wrote, or null when it is not one. */
export function parseNumberAnswer(raw: string): number | null {
  let s = raw
    .trim()
    .replace(/[−–]/g, "-")
    .replace(/[⁰¹²³⁴⁵⁶⁷⁸⁹⁻⁺]+/g, (m) => `^${[...m].map((c) => SUPERSCRIPT_DIGITS[c]).join("")}`)
    .replace(/\s+/g, "")
    .toLowerCase();
  s = s.replace(/(%|percentagepoints?|pp|turnovers?)$/, "");
  // thousands separators only in the form 1,234 or 12,345,678
  if (/^[+-]?\d{1,3}(,\d{3})+(\.\d*)?$/.test(s)) s = s.replace(/,/g, "");
  const times = s.match(/^([+-]?(?:\d+\.?\d*|\.\d+))(?:×|x|\*|·)10\^?\(?([+-]?\d+)\)?$/);
  if (times) s = `${times[1]}e${times[2]}`;
  const pow = s.match(/^10\^\(?([+-]?\d+)\)?$/);
  if (pow) s = `1e${pow[1]}`;
  if (!PLAIN.test(s)) return null;
  const v = Number(s);
  return Number.isFinite(v) ? v : null;
}

/** A name for comparison: no case, no spaces, one arrow style, one dash, no surrounding brackets of a letter. */
export function normaliseName(raw: string): string {
  return raw
    .trim()
    .toLowerCase()
    .replace(/[→⟶]|=>|-->|=/g, "->")
    .replace(/[‐‑–—]/g, "-")
    .replace(/\s+/g, "")
    .replace(/^\(([a-z])\)\.?$/, "$1")
    .replace(/^([a-z])[.)]$/, "$1");
}
