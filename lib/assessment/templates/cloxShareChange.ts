/**
 * The change in the ClOx cycles' share of the odd-oxygen loss when total
 * inorganic chlorine (Cly) doubles, all else held: two analyses, the second
 * with the Cly total of the first times two. Answer in percentage points
 * (share × 100, difference); absolute tolerance, 2 points by default.
 */
import type { AnalysisResult, ConditionInput } from "../../engine/types";
import { formatSignificant } from "../significant";
import type { QuestionTemplate } from "../types";
import { converged, oddOxygenText } from "./cycleText";

export const DEFAULTS = {
  /** the pool doubled */
  pool: "Cly",
  /** the family whose share is asked */
  family: "ClOx",
};

/** Cly of the variant as a mixing ratio of Cl atoms (mol/mol): as drawn, else as the analysis resolved it. */
export function clyMixingRatio(condition: ConditionInput, base: AnalysisResult): number | undefined {
  const drawn = condition.poolTotals?.[DEFAULTS.pool];
  if (drawn !== undefined) return drawn;
  const n = base.condition.poolTotals_cm3[DEFAULTS.pool];
  return n === undefined ? undefined : n / base.condition.M_cm3;
}

function share(r: AnalysisResult): number {
  return r.cycles.budget.byFamily.find((f) => f.family === DEFAULTS.family)?.fraction ?? 0;
}

export const cloxShareChange: QuestionTemplate = {
  kind: "clox-share-change",
  title: "Change in the ClOx share when chlorine doubles",
  summary:
    "By how many percentage points the ClOx share of odd-oxygen loss changes when total chlorine (Cly) is doubled.",
  unit: "percentage points",
  defaultTolerance: { kind: "absolute", abs: 2 },
  needs: { pool: DEFAULTS.pool },
  extraCondition(condition, base) {
    const cly = clyMixingRatio(condition, base) ?? 0;
    return { ...condition, poolTotals: { ...condition.poolTotals, [DEFAULTS.pool]: 2 * cly } };
  },
  build({ condition, base, extra }) {
    const bad = converged(base) ?? (extra ? converged(extra) : "the doubled-chlorine analysis is missing");
    if (bad) return { ok: false, problem: bad };
    const cly = clyMixingRatio(condition, base);
    if (!cly) return { ok: false, problem: "this mechanism has no Cly total at these conditions" };
    const change = (share(extra as AnalysisResult) - share(base)) * 100;
    const ppbv = (x: number) => formatSignificant(x * 1e9, 3);
    return {
      ok: true,
      text: `At these conditions total inorganic chlorine (Cly) is ${ppbv(cly)} ppbv. Suppose Cly is doubled to ${ppbv(2 * cly)} ppbv, with everything else unchanged. By how much does the share of the odd-oxygen (${oddOxygenText(base)}) loss carried by the ClOx cycles change? Answer in percentage points; a decrease is negative.`,
      value: change,
      accepted: [],
    };
  },
};
