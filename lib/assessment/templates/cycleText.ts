/**
 * Shared wording for the cycle questions: find a cycle by its stable id, list
 * its steps in the mechanism's reaction order (never by rate, which would
 * give the rate-limiting step away), and letter the choices.
 */
import { familyRank } from "../../analysis/familyOf";
import type { CatalyticCycle } from "../../analysis/types";
import type { AnalysisResult } from "../../engine/types";
import type { Choice } from "../types";

export const LETTERS = "abcdefghijklmnopqrstuvwxyz";

export function findCycle(result: AnalysisResult, cycleId: string | undefined): CatalyticCycle | undefined {
  return result.cycles.cycles.find((c) => c.id === cycleId);
}

/** The cycle's steps in the order of the mechanism's reaction list. */
export function stepsInMechanismOrder(result: AnalysisResult, cycle: CatalyticCycle) {
  const order = new Map(result.steadyState.reactions.map((r, i) => [r.id, i]));
  return [...cycle.steps].sort(
    (a, b) =>
      (order.get(a.reactionId) ?? 1e9) - (order.get(b.reactionId) ?? 1e9) || a.reactionId.localeCompare(b.reactionId),
  );
}

/** An equation as printed for students: a real arrow instead of "->". */
export function printedEquation(equation: string): string {
  return equation.replace(/\s*->\s*/g, " → ");
}

export function stepText(s: { equation: string; multiplicity: number }): string {
  const eq = printedEquation(s.equation);
  return s.multiplicity > 1 ? `${s.multiplicity} × (${eq})` : eq;
}

/** "Cl + O3 -> ClO + O2; ClO + O -> Cl + O2 (net: O + O3 -> 2 O2)" */
export function cycleDescription(result: AnalysisResult, cycle: CatalyticCycle): string {
  return `${stepsInMechanismOrder(result, cycle).map(stepText).join("; ")} (net: ${printedEquation(cycle.netEquation)})`;
}

export function lettered(items: { value: string; text: string }[]): Choice[] {
  return items.map((it, i) => ({ letter: LETTERS[i], value: it.value, text: it.text }));
}

/** The budget's bucket for loss in pathways below the threshold: not a family a student can name. */
export const UNASSIGNED = "unassigned";

/** The families a student may name, in display order (coupled ones after, by name); the unassigned bucket left out. */
export function sortFamilies(families: Iterable<string>): string[] {
  return [...new Set(families)]
    .filter((f) => f !== UNASSIGNED)
    .sort((a, b) => familyRank(a) - familyRank(b) || a.localeCompare(b));
}

export function familyText(f: string): string {
  if (f === "Ox") return "Ox (oxygen only)";
  if (f.includes("-")) return `${f.replace(/-/g, "–")} (coupled)`;
  return f;
}

/** "O, O(1D), O3" from the budget's definition. */
export function oddOxygenText(result: AnalysisResult): string {
  const def = result.cycles.budget.definition;
  return def.length > 0 ? def.join(" + ") : "O + O(1D) + O3";
}

export function converged(result: AnalysisResult): string | null {
  const s = result.steadyState;
  return s.status === "converged" ? null : `the steady state did not converge (${s.status}: ${s.message})`;
}
