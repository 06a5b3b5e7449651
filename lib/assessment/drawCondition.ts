/**
 * A variant's condition: the base condition with every ranged field drawn
 * uniformly from its range by a seeded mulberry32 stream, in a fixed field
 * order, then rounded to the field's step, so that the same seed always gives
 * the same condition and the printed values are round numbers.
 */
import type { ConditionInput } from "../engine/types";
import { mulberry32 } from "../random";
import { roundToSignificant } from "./significant";
import type { ConditionRanges, Range } from "./types";

export const DEFAULTS = {
  /** rounding grain per field, in the field's unit */
  step: { altitude_km: 1, latitude_deg: 1, localSolarTime_h: 0.5, zenith_deg: 1, T_K: 1, jScale: 0.05 },
  /** significant figures a drawn pool total (mixing ratio) keeps */
  poolSignificantFigures: 2,
} as const;

type ScalarField = keyof typeof DEFAULTS.step;

/** Fixed draw order: adding a range for one field never changes the others' draws. */
export const SCALAR_FIELDS: readonly ScalarField[] = [
  "altitude_km",
  "latitude_deg",
  "localSolarTime_h",
  "zenith_deg",
  "T_K",
  "jScale",
];

function drawIn(r: Range, u: number, step: number): number {
  const x = r.min + u * (r.max - r.min);
  const rounded = Math.round(x / step) * step;
  // Rounding may step just outside the range; clamp to it, on the grain where possible.
  const clamped = Math.min(r.max, Math.max(r.min, rounded));
  return Number(clamped.toPrecision(12));
}

/** The condition of one variant. Every field draws one number, ranged or not, to keep the stream aligned. */
export function drawCondition(base: ConditionInput, ranges: ConditionRanges, seed: number): ConditionInput {
  const next = mulberry32(seed);
  const out: ConditionInput = { ...base };
  for (const f of SCALAR_FIELDS) {
    const u = next();
    const r = ranges[f];
    if (r) out[f] = drawIn(r, u, r.step ?? DEFAULTS.step[f]);
  }
  const pools = Object.keys(ranges.poolTotals ?? {}).sort();
  if (pools.length > 0) {
    const totals: Record<string, number> = { ...base.poolTotals };
    for (const id of pools) {
      const r = (ranges.poolTotals as Record<string, Range>)[id];
      const x = r.min + next() * (r.max - r.min);
      const v = r.step ? Math.round(x / r.step) * r.step : roundToSignificant(x, DEFAULTS.poolSignificantFigures);
      totals[id] = Number(Math.min(r.max, Math.max(r.min, v)).toPrecision(12));
    }
    out.poolTotals = totals;
  }
  return out;
}
