/**
 * The odd-oxygen budget alone: production, loss by family (with the
 * unassigned share of deleted pathways, summing to 1) and the direct-formula
 * check. A thin view of `analyseCycles`; see there for the method.
 */
import type { CompiledMechanism } from "../mechanism/types";
import type { SteadyState } from "../solver/types";
import { analyseCycles } from "./analyseCycles";
import type { CycleOptions, OxBudget } from "./types";

export function oxBudget(
  mech: CompiledMechanism,
  state: Pick<SteadyState, "numberDensity_cm3" | "rate_cm3s">,
  options: CycleOptions = {},
): OxBudget {
  return analyseCycles(mech, state, options).budget;
}
