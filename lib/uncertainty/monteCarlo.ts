/**
 * Monte Carlo over the evaluated rate-constant uncertainties at one
 * condition, in the calling thread: plan the samples (planMonteCarlo),
 * run them in batches (runSampleBatch) and summarise (summariseSamples).
 * The engine pool runs the same batches in parallel (lib/service/uncertainty).
 */
import type { CycleOptions, CycleReport } from "../analysis/types";
import { InputError } from "../errors";
import type { CompiledMechanism } from "../mechanism/types";
import type { SolveConditions, SteadyState } from "../solver/types";
import { defineOutputs, type OutputOptions } from "./defineOutputs";
import { evaluateOutputs } from "./evaluateOutputs";
import { runSampleBatch, type SampleBatch } from "./runSampleBatch";
import { logFactors } from "./sampleMultipliers";
import { summariseSamples } from "./summariseSamples";
import type { MonteCarloOptions, MonteCarloResult, OutputDef, SampleBatchResult } from "./types";

export const MONTE_CARLO_DEFAULTS = {
  /** samples */
  samples: 100,
  /** unsigned 32-bit seed */
  seed: 1,
  /** most samples in one request */
  maxSamples: 100_000,
  /** samples per batch (one unit of work for a worker) */
  batchSize: 50,
};

/** Everything a Monte Carlo run needs, ready to be split into batches. */
export interface MonteCarloPlan {
  samples: number;
  seed: number;
  outputs: OutputDef[];
  central: (number | null)[];
  varied: { id: string; factor: number }[];
  notVaried: string[];
  /** batches of at most `batchSize` samples, in order */
  batches: SampleBatch[];
  warnings: string[];
}

export function planMonteCarlo(
  mech: CompiledMechanism,
  conditions: SolveConditions,
  state: SteadyState,
  report: CycleReport,
  cycleOptions: CycleOptions,
  options: MonteCarloOptions & OutputOptions & { batchSize?: number } = {},
): MonteCarloPlan {
  const samples = options.samples ?? MONTE_CARLO_DEFAULTS.samples;
  const seed = options.seed ?? MONTE_CARLO_DEFAULTS.seed;
  const batchSize = options.batchSize ?? MONTE_CARLO_DEFAULTS.batchSize;
  if (!(Number.isInteger(samples) && samples >= 1 && samples <= MONTE_CARLO_DEFAULTS.maxSamples))
    throw new InputError(
      "options.uncertaintySamples",
      `invalid sample count: ${samples} (give an integer 1–${MONTE_CARLO_DEFAULTS.maxSamples})`,
    );
  if (!(Number.isInteger(seed) && seed >= 0 && seed <= 0xffffffff))
    throw new InputError("options.uncertaintySeed", `invalid seed: ${seed} (give an integer 0–4294967295)`);
  if (!(Number.isInteger(batchSize) && batchSize >= 1))
    throw new InputError("options.batchSize", `invalid batchSize: ${batchSize} (give an integer ≥ 1)`);
  if (state.status !== "converged")
    throw new InputError(
      "condition",
      `no Monte Carlo: the central steady state did not converge (${state.message})`,
      "not-converged",
    );
  const sampling = { photolysisFactor: options.photolysisFactor, factorScale: options.factorScale };
  const sigma = logFactors(mech, conditions.T_K, sampling);
  const outputs = defineOutputs(mech, state, report, options);
  const varied: { id: string; factor: number }[] = [];
  const notVaried: string[] = [];
  mech.reactions.forEach((r, j) => {
    if (sigma[j] > 0) varied.push({ id: r.id, factor: Math.exp(sigma[j]) });
    else notVaried.push(r.id);
  });
  const batches: SampleBatch[] = [];
  for (let start = 0; start < samples; start += batchSize)
    batches.push({
      conditions,
      centralState: state.numberDensity_cm3,
      outputs,
      cycleOptions,
      seed,
      start,
      count: Math.min(batchSize, samples - start),
      sampling,
    });
  const warnings: string[] = [];
  if (varied.length === 0)
    warnings.push("no reaction has an uncertainty factor > 1: every sample equals the central solution");
  return {
    samples,
    seed,
    outputs,
    central: evaluateOutputs(outputs, state, report),
    varied,
    notVaried,
    batches,
    warnings,
  };
}

export function finishMonteCarlo(
  plan: MonteCarloPlan,
  results: SampleBatchResult[],
  elapsed_ms: number,
): MonteCarloResult {
  return summariseSamples({ ...plan, batches: results, elapsed_ms });
}

/** Plans, runs every batch here and summarises. */
export function monteCarlo(
  mech: CompiledMechanism,
  conditions: SolveConditions,
  state: SteadyState,
  report: CycleReport,
  cycleOptions: CycleOptions,
  options: MonteCarloOptions & OutputOptions = {},
): MonteCarloResult {
  const t0 = performance.now();
  const plan = planMonteCarlo(mech, conditions, state, report, cycleOptions, options);
  const results = plan.batches.map((b) => runSampleBatch(mech, b));
  return finishMonteCarlo(plan, results, performance.now() - t0);
}
