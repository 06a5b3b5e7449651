/**
 * The steady-state ratio of the number densities of two species, [A]/[B], at
 * the variant's conditions. Relative tolerance, 5 % by default.
 */
import type { QuestionTemplate } from "../types";
import { converged } from "./cycleText";

export const speciesRatio: QuestionTemplate = {
  kind: "species-ratio",
  title: "Steady-state ratio of two species",
  summary: "The ratio of two species' number densities, [A]/[B], in the photochemical steady state.",
  unit: "dimensionless",
  defaultTolerance: { kind: "relative", rel: 0.05 },
  needs: { species: true },
  build({ question, base }) {
    const bad = converged(base);
    if (bad) return { ok: false, problem: bad };
    const a = base.steadyState.species.find((s) => s.id === question.speciesA);
    const b = base.steadyState.species.find((s) => s.id === question.speciesB);
    if (!a || !b)
      return { ok: false, problem: `species ${a ? question.speciesB : question.speciesA} is not in the steady state` };
    if (!(b.numberDensity_cm3 > 0)) return { ok: false, problem: `[${b.id}] is zero at these conditions` };
    const ratio = a.numberDensity_cm3 / b.numberDensity_cm3;
    if (!Number.isFinite(ratio)) return { ok: false, problem: `[${a.id}]/[${b.id}] is not finite` };
    return {
      ok: true,
      text: `In the photochemical steady state at these conditions, what is the ratio of the number density of ${a.id} to that of ${b.id}, [${a.id}]/[${b.id}]? The ratio is dimensionless.`,
      value: ratio,
      accepted: [],
    };
  },
};
