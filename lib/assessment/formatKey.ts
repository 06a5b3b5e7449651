/** How a key entry and a tolerance read on the key, in CSV and on the page. */
import { formatSignificant } from "./significant";
import type { Choice, Tolerance } from "./types";

export const DEFAULTS = {
  /** significant figures of a numeric answer on the key */
  digits: 3,
};

export function formatAnswer(value: number | string, unit: string, choices?: Choice[]): string {
  if (typeof value === "string") {
    const c = choices?.find((x) => x.value === value);
    return c ? `(${c.letter}) ${c.text}` : value;
  }
  const v = formatSignificant(value, DEFAULTS.digits);
  return unit && unit !== "dimensionless" ? `${v} ${unit}` : v;
}

export function formatTolerance(t: Tolerance, unit: string): string {
  if (t.kind === "exact") return "exact";
  if (t.kind === "relative") return `± ${formatSignificant(t.rel * 100, 3)} %`;
  return `± ${formatSignificant(t.abs, 3)}${unit && unit !== "dimensionless" ? ` ${unit}` : ""}`;
}
