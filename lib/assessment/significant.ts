/** Rounding and printing to significant figures, for sheets and the key. */

/** x rounded to `digits` significant figures (0 stays 0). */
export function roundToSignificant(x: number, digits: number): number {
  if (x === 0 || !Number.isFinite(x)) return x;
  return Number(x.toPrecision(digits));
}

/**
 * x with `digits` significant figures as plain text: "0.0345", "12.0", "3.45e-7"
 * (exponent form outside 1e-3 … 1e5, as a spreadsheet reads it back).
 */
export function formatSignificant(x: number, digits = 3): string {
  if (!Number.isFinite(x)) return String(x);
  if (x === 0) return "0";
  const a = Math.abs(x);
  if (a >= 1e-3 && a < 1e5) {
    const s = x.toPrecision(digits);
    return s.includes("e") ? String(Number(s)) : s;
  }
  const [m, e] = x.toExponential(digits - 1).split("e");
  return `${m}e${Number(e)}`;
}
