/**
 * A batch of Monte Carlo samples run one after another in one thread: each
 * sample draws its rate-constant factors (sampleMultipliers), solves the
 * steady state warm-started from the central solution, analyses its cycles
 * with the central options and reads the outputs. A sample whose solve does
 * not converge, or that throws, is a recorded failure, never dropped.
 * This is the unit of work the engine pool runs (job kind "uncertainty-samples").
 *
 * Units: as in `OutputDef.unit`.
 */
import { analyseCycles } from "../analysis/analyseCycles";
import type { CycleOptions } from "../analysis/types";
import { InputError } from "../errors";
import type { CompiledMechanism } from "../mechanism/types";
import { solveSteadyState } from "../solver";
import type { SolveConditions } from "../solver/types";
import { evaluateOutputs } from "./evaluateOutputs";
import { logFactors, type SampleOptions, sampleMultipliers } from "./sampleMultipliers";
import type { OutputDef, SampleBatchResult } from "./types";

/** Plain JSON: what crosses the worker boundary. */
export interface SampleBatch {
  conditions: SolveConditions;
  /** central steady state by mechanism index, cm⁻³ (the warm start of every sample) */
  centralState: number[];
  outputs: OutputDef[];
  cycleOptions: CycleOptions;
  seed: number;
  /** first sample index (0-based) */
  start: number;
  count: number;
  sampling?: SampleOptions;
}

export function runSampleBatch(mech: CompiledMechanism, batch: SampleBatch): SampleBatchResult {
  if (!(Number.isInteger(batch.start) && batch.start >= 0))
    throw new InputError("batch.start", `invalid start: ${batch.start} (give an integer ≥ 0)`);
  if (!(Number.isInteger(batch.count) && batch.count >= 0))
    throw new InputError("batch.count", `invalid count: ${batch.count} (give an integer ≥ 0)`);
  if (!(Number.isInteger(batch.seed) && batch.seed >= 0 && batch.seed <= 0xffffffff))
    throw new InputError("batch.seed", `invalid seed: ${batch.seed} (give an integer 0–4294967295)`);
  const sigma = logFactors(mech, batch.conditions.T_K, batch.sampling);
  const out: SampleBatchResult = { start: batch.start, values: [], failures: [] };
  for (let i = batch.start; i < batch.start + batch.count; i++) {
    try {
      const rateMultipliers = sampleMultipliers(sigma, batch.seed, i, mech);
      const state = solveSteadyState(mech, batch.conditions, { initialState: batch.centralState, rateMultipliers });
      if (state.status !== "converged") {
        out.values.push(null);
        out.failures.push({ index: i, status: state.status, message: state.message });
        continue;
      }
      const report = analyseCycles(mech, state, batch.cycleOptions);
      out.values.push(evaluateOutputs(batch.outputs, state, report));
    } catch (e) {
      out.values.push(null);
      out.failures.push({ index: i, status: "error", message: e instanceof Error ? e.message : String(e) });
    }
  }
  return out;
}
