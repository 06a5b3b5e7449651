/**
 * Which family of catalytic cycles removes the most odd oxygen at the
 * variant's conditions. Answer: a family id from the budget (exact). A variant
 * where the two largest shares are within 5 % of each other is redrawn, as
 * the question would have no clear answer. The budget's "unassigned" bucket
 * (pathways below the threshold) is not a family and never an answer.
 */
import type { QuestionTemplate } from "../types";
import { converged, familyText, lettered, oddOxygenText, UNASSIGNED } from "./cycleText";

export const DEFAULTS = {
  /** second-largest share over the largest above which the question is too close to call */
  maxRunnerUpRatio: 0.95,
};

export const dominantFamily: QuestionTemplate = {
  kind: "dominant-family",
  title: "Dominant odd-oxygen loss family",
  summary: "Which family of cycles (Ox, HOx, NOx, ClOx, BrOx) removes the most odd oxygen at the variant's altitude.",
  unit: "",
  defaultTolerance: { kind: "exact" },
  needs: {},
  build({ base, families }) {
    const bad = converged(base);
    if (bad) return { ok: false, problem: bad };
    const shares = base.cycles.budget.byFamily
      .filter((f) => f.family !== UNASSIGNED)
      .sort((a, b) => b.fraction - a.fraction);
    if (shares.length === 0 || shares[0].fraction <= 0)
      return { ok: false, problem: "no odd-oxygen loss by any family" };
    if (shares.length > 1 && shares[1].fraction >= DEFAULTS.maxRunnerUpRatio * shares[0].fraction)
      return { ok: false, problem: `${shares[0].family} and ${shares[1].family} remove nearly the same share` };
    const top = shares[0].family;
    const choices = lettered(withFamily(families, top).map((f) => ({ value: f, text: familyText(f) })));
    const answer = choices.find((c) => c.value === top) as (typeof choices)[number];
    return {
      ok: true,
      text: `Which family of catalytic cycles removes the most odd oxygen (${oddOxygenText(base)}) at these conditions? Write the letter or the name of the family.`,
      choices,
      value: top,
      accepted: [answer.letter, answer.text],
    };
  },
};

function withFamily(families: string[], top: string): string[] {
  return families.includes(top) ? families : [...families, top];
}
