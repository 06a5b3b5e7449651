/**
 * Number formatting for the panels: scientific notation with a real
 * superscript exponent ("3.2 × 10⁶") and a true minus sign ("−4.6"), for
 * reading. Exports (CSV, JSON) keep plain ASCII ("-4.6e-12") and do not use
 * these functions.
 */

/** U+2212 MINUS SIGN: the typographic minus, not the hyphen-minus. */
export const MINUS = "\u2212";

/** A leading hyphen-minus written as the minus sign. */
const withMinus = (s: string): string => (s.startsWith("-") ? MINUS + s.slice(1) : s);

const SUPERSCRIPT: Record<string, string> = {
  "-": "⁻",
  "0": "⁰",
  "1": "¹",
  "2": "²",
  "3": "³",
  "4": "⁴",
  "5": "⁵",
  "6": "⁶",
  "7": "⁷",
  "8": "⁸",
  "9": "⁹",
};

export const superscript = (s: string): string =>
  s
    .split("")
    .map((c) => SUPERSCRIPT[c] ?? c)
    .join("");

/** "3.2 × 10⁶"; numbers between 0.01 and 10000 are written plainly; null/NaN → "—". */
export function formatNumber(v: number | null | undefined, digits = 3): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return "—";
  if (v === 0) return "0";
  const a = Math.abs(v);
  if (a >= 0.01 && a < 1e4) return withMinus(Number(v.toPrecision(digits)).toString());
  const e = Math.floor(Math.log10(a));
  let m = Number((v / 10 ** e).toPrecision(digits));
  let exp = e;
  if (Math.abs(m) >= 10) {
    m /= 10;
    exp += 1;
  }
  return `${withMinus(String(m))} × 10${superscript(String(exp))}`;
}

/** "10⁶" for a power of ten. */
export const formatDecade = (exp: number): string => `10${superscript(String(exp))}`;

/** Percentage with one decimal below 10 %, "<0.1 %" for tiny shares. */
export function formatPercent(fraction: number): string {
  if (!Number.isFinite(fraction)) return "—";
  const p = fraction * 100;
  if (p > 0 && p < 0.1) return "<0.1 %";
  return `${withMinus(Math.abs(p) < 10 ? p.toFixed(1) : p.toFixed(0))} %`;
}

/** Mixing ratio with a unit chosen for legibility: ppmv, ppbv or pptv. */
export function formatMixingRatio(x: number | null | undefined): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return "—";
  if (x >= 1e-2) return `${formatNumber(x)} mol/mol`;
  if (x >= 1e-7) return `${formatNumber(x * 1e6)} ppmv`;
  if (x >= 1e-10) return `${formatNumber(x * 1e9)} ppbv`;
  return `${formatNumber(x * 1e12)} pptv`;
}

/** Lifetime in the largest sensible unit. */
export function formatLifetime(s: number | null | undefined): string {
  if (s === null || s === undefined || !Number.isFinite(s)) return "—";
  if (s < 120) return `${formatNumber(s)} s`;
  if (s < 7200) return `${formatNumber(s / 60)} min`;
  if (s < 2 * 86400) return `${formatNumber(s / 3600)} h`;
  if (s < 730 * 86400) return `${formatNumber(s / 86400)} d`;
  return `${formatNumber(s / (365.25 * 86400))} yr`;
}
