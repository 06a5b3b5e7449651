/**
 * Reads the values of a list of outputs (see defineOutputs) from one steady
 * state and its cycle report. A cycle that is absent from the report (its
 * pathway fell below the significance threshold) has rate 0 and an undefined
 * chain length (null); a family absent from the budget has share 0.
 *
 * Units: as in `OutputDef.unit`.
 */
import type { CycleReport } from "../analysis/types";
import type { SteadyState } from "../solver/types";
import type { OutputDef } from "./types";

export function evaluateOutputs(
  outputs: readonly OutputDef[],
  state: Pick<SteadyState, "species">,
  report: Pick<CycleReport, "budget" | "cycles">,
): (number | null)[] {
  const byFamily = new Map(report.budget.byFamily.map((f) => [f.family, f.fraction]));
  const cycles = new Map(report.cycles.map((c) => [c.id, c]));
  const density = new Map(state.species.map((s) => [s.id, s.numberDensity_cm3]));
  return outputs.map((o) => {
    switch (o.kind) {
      case "ox-loss":
        return report.budget.loss_cm3s;
      case "family-share":
        return byFamily.get(o.family ?? "") ?? 0;
      case "cycle-rate":
        return cycles.get(o.cycleId ?? "")?.rate_cm3s ?? 0;
      case "chain-length":
        return cycles.get(o.cycleId ?? "")?.chainLength ?? null;
      case "number-density":
        return density.get(o.species ?? "") ?? null;
      default:
        return null;
    }
  });
}
