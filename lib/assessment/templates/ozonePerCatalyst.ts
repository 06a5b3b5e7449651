/**
 * Ozone removed per catalyst atom before it is tied up: the chain length of a
 * named cycle times the odd oxygen it destroys per turnover (odd oxygen
 * counted as ozone, since O and O3 interconvert much faster than either is
 * lost). Relative tolerance, 10 % by default.
 */
import type { QuestionTemplate } from "../types";
import { converged, cycleDescription, familyText, findCycle, oddOxygenText } from "./cycleText";

export const ozonePerCatalyst: QuestionTemplate = {
  kind: "ozone-per-catalyst",
  title: "Ozone removed per catalyst atom",
  summary:
    "Odd oxygen one catalyst atom destroys through a chosen cycle before a reservoir ties it up (chain length × Ox per turnover).",
  unit: "molecules per catalyst atom",
  defaultTolerance: { kind: "relative", rel: 0.1 },
  needs: { cycle: true },
  build({ question, base }) {
    const bad = converged(base);
    if (bad) return { ok: false, problem: bad };
    const cycle = findCycle(base, question.cycleId);
    if (!cycle) return { ok: false, problem: `the cycle ${question.cycleId} is not among the significant cycles` };
    if (cycle.chainLength === null || !Number.isFinite(cycle.chainLength) || cycle.chainLength <= 0)
      return { ok: false, problem: `the cycle ${cycle.id} has no chain length here` };
    if (!(cycle.oxPerTurnover > 0)) return { ok: false, problem: `the cycle ${cycle.id} destroys no odd oxygen` };
    return {
      ok: true,
      text: `Consider the ${familyText(cycle.family)} cycle ${cycleDescription(base, cycle)}. How many ozone molecules does one catalyst atom remove through this cycle, on average, before it is tied up in a reservoir species? Count odd oxygen (${oddOxygenText(base)}) as ozone.`,
      value: cycle.chainLength * cycle.oxPerTurnover,
      accepted: [],
    };
  },
};
