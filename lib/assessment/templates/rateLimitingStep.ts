/**
 * The rate-limiting step of a named catalytic cycle at the variant's
 * conditions. Answer: the reaction id the cycle analysis reports as the
 * slowest step (exact); the student may write its letter or its equation.
 */
import type { QuestionTemplate } from "../types";
import {
  converged,
  familyText,
  findCycle,
  lettered,
  printedEquation,
  stepsInMechanismOrder,
  stepText,
} from "./cycleText";

export const rateLimitingStep: QuestionTemplate = {
  kind: "rate-limiting-step",
  title: "Rate-limiting step of a cycle",
  summary: "Which step of a chosen catalytic cycle limits its rate at the variant's conditions.",
  unit: "",
  defaultTolerance: { kind: "exact" },
  needs: { cycle: true },
  build({ question, base }) {
    const bad = converged(base);
    if (bad) return { ok: false, problem: bad };
    const cycle = findCycle(base, question.cycleId);
    if (!cycle) return { ok: false, problem: `the cycle ${question.cycleId} is not among the significant cycles` };
    const steps = stepsInMechanismOrder(base, cycle);
    if (steps.length < 2) return { ok: false, problem: `the cycle ${cycle.id} has a single step` };
    const choices = lettered(steps.map((s) => ({ value: s.reactionId, text: stepText(s) })));
    const answer = choices.find((c) => c.value === cycle.rateLimitingStep);
    if (!answer)
      return { ok: false, problem: `the rate-limiting step ${cycle.rateLimitingStep} is not a step of the cycle` };
    return {
      ok: true,
      text: `The ${familyText(cycle.family)} cycle below, with net reaction ${printedEquation(cycle.netEquation)}, runs at these conditions. Which of its steps limits the rate of the whole cycle? Write the letter of the step.`,
      choices,
      value: answer.value,
      accepted: [answer.letter, answer.text, steps.find((s) => s.reactionId === answer.value)?.equation ?? answer.text],
    };
  },
};
