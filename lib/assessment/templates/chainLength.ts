/**
 * The chain length of a named catalytic cycle: how many times it turns over,
 * on average, before its carrier is tied up in a reservoir, as the cycle
 * analysis reports it. Relative tolerance, 10 % by default.
 */
import type { QuestionTemplate } from "../types";
import { converged, cycleDescription, familyText, findCycle } from "./cycleText";

export const chainLength: QuestionTemplate = {
  kind: "chain-length",
  title: "Chain length of a cycle",
  summary: "How many turnovers a chosen cycle makes before its catalyst goes into a reservoir.",
  unit: "turnovers",
  defaultTolerance: { kind: "relative", rel: 0.1 },
  needs: { cycle: true },
  build({ question, base }) {
    const bad = converged(base);
    if (bad) return { ok: false, problem: bad };
    const cycle = findCycle(base, question.cycleId);
    if (!cycle) return { ok: false, problem: `the cycle ${question.cycleId} is not among the significant cycles` };
    if (cycle.chainLength === null || !Number.isFinite(cycle.chainLength) || cycle.chainLength <= 0)
      return { ok: false, problem: `the cycle ${cycle.id} has no chain length here` };
    return {
      ok: true,
      text: `Consider the ${familyText(cycle.family)} cycle ${cycleDescription(base, cycle)}. On average, how many times does it turn over before its catalyst is tied up in a reservoir species? Give the chain length in turnovers.`,
      value: cycle.chainLength,
      accepted: [],
    };
  },
};
