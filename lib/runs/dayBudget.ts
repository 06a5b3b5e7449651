/**
 * The odd-oxygen budget of one day of a run, from the day's integrated
 * reaction rates: pathway analysis after Lehmann (2004, J. Atmos. Chem. 47,
 * 45–78) in its form for a time interval, where each species' change over
 * the interval is storage (accumulated) or release (drawn down) and the
 * imbalance at a branching point is kept as a storage or release pathway
 * (lib/analysis `findPathways`). The analysis runs on the day-mean rates and
 * number densities (lifetimes); the amounts it returns are multiplied by the
 * day's length. The budget is checked against the Ox change of the
 * integrated state less what compression along a trajectory changed
 * (`closure`). Units: cm⁻³ per day.
 */
import { analyseCycles } from "../analysis/analyseCycles";
import { oxWeights } from "../analysis/oxWeights";
import type { CompiledMechanism } from "../mechanism/types";
import type { RunDay, RunOptions } from "./types";

export const DAY_BUDGET_DEFAULTS = {
  /** catalytic cycles kept per day */
  topCycles: 12,
  /** a day whose budget closes worse than this gets a warning */
  closureWarning: 0.01,
};

export interface DayBudgetInput {
  day: number;
  /** length of the interval, s */
  duration_s: number;
  /** states at the day's start and end by mechanism index, cm⁻³ */
  start_cm3: ArrayLike<number>;
  end_cm3: ArrayLike<number>;
  /** [M] at the start and end, cm⁻³ */
  startM_cm3: number;
  endM_cm3: number;
  /** day-mean number densities and reaction rates by mechanism index */
  meanState_cm3: number[];
  meanRates_cm3s: number[];
  /** ∫ x·d ln[M]/dt dt over the day by mechanism index, cm⁻³: the change by compression, not chemistry (0 at a fixed place) */
  compression_cm3?: ArrayLike<number>;
  /** species held for the run (not branching points) */
  heldSpecies: string[];
  options: Required<Pick<RunOptions, "fminRelative" | "oxDefinition">>;
}

/** Σ weight × amount of every pool of the mechanism, cm⁻³. */
export function poolTotalsOf(mech: CompiledMechanism, state: ArrayLike<number>): Record<string, number> {
  const out: Record<string, number> = {};
  for (const pool of mech.pools) {
    let s = 0;
    for (const w of pool.weights) s += w.coef * state[w.species];
    out[pool.id] = s;
  }
  return out;
}

export function dayBudget(mech: CompiledMechanism, input: DayBudgetInput): RunDay {
  const dt = input.duration_s;
  const o3 = mech.speciesIndex.O3;
  const report = analyseCycles(
    mech,
    { numberDensity_cm3: input.meanState_cm3, rate_cm3s: input.meanRates_cm3s },
    {
      fminRelative: input.options.fminRelative,
      oxDefinition: input.options.oxDefinition,
      heldSpecies: input.heldSpecies,
    },
  );
  const { weights } = oxWeights(mech, input.options.oxDefinition);
  let oxChange = 0;
  for (let s = 0; s < weights.length; s++)
    if (weights[s])
      oxChange += weights[s] * (input.end_cm3[s] - input.start_cm3[s] - (input.compression_cm3?.[s] ?? 0));
  const production = report.budget.production_cm3s * dt;
  const loss = report.budget.loss_cm3s * dt;
  const closure = loss > 0 ? Math.abs(oxChange - (production - loss)) / loss : 0;
  const o3Start = o3 === undefined ? 0 : input.start_cm3[o3];
  const o3End = o3 === undefined ? 0 : input.end_cm3[o3];
  const warnings = report.warnings.map((w) => `day ${input.day}: ${w}`);
  if (closure > DAY_BUDGET_DEFAULTS.closureWarning)
    warnings.push(`day ${input.day}: the Ox budget closes to ${(100 * closure).toFixed(2)} % only`);
  return {
    day: input.day,
    o3Start_cm3: o3Start,
    o3End_cm3: o3End,
    o3Change_ppbv: 1e9 * (o3End / input.endM_cm3 - o3Start / input.startM_cm3),
    o3Change_percent:
      o3Start > 0 ? (100 * (o3End / input.endM_cm3 - o3Start / input.startM_cm3)) / (o3Start / input.startM_cm3) : 0,
    oxProduction_cm3: production,
    oxLoss_cm3: loss,
    oxChange_cm3: oxChange,
    closure,
    byFamily: report.budget.byFamily.map((f) => ({ family: f.family, oxLoss_cm3: f.oxLoss_cm3s * dt })),
    cycles: report.cycles.slice(0, DAY_BUDGET_DEFAULTS.topCycles).map((c) => ({
      id: c.id,
      netEquation: c.netEquation,
      family: c.family,
      oxLoss_cm3: c.oxLoss_cm3s * dt,
    })),
    meanState_cm3: input.meanState_cm3,
    meanRates_cm3s: input.meanRates_cm3s,
    poolTotals_cm3: poolTotalsOf(mech, input.end_cm3),
    warnings,
  };
}
