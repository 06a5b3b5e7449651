/**
 * One analysis with its Monte Carlo ranges, spread over an executor (the
 * engine pool, or the job back end's queue workers): the central solve
 * (with the sensitivities when asked) as one task, then the samples in
 * batches (lib/uncertainty/runSampleBatches.ts). The same request and seed
 * give the same result on every executor.
 */
import {
  finishMonteCarlo,
  type MonteCarloResult,
  planMonteCarlo,
  runSampleBatches,
  type SampleBatch,
  type SampleBatchResult,
  type SampleScheduleOptions,
} from "../uncertainty";
import { compileSource, type MechanismSource } from "./mechanismSource";
import { solveConditionsOf } from "./resolveCondition";
import type { AnalysisRequest, AnalysisResult } from "./types";

/** Where the central solve and the sample batches run. */
export interface UncertaintyExecutor {
  /** how many tasks can run at once */
  workers: number;
  /** one analysis (its options' uncertaintySamples 0) */
  analysis(request: AnalysisRequest): Promise<AnalysisResult>;
  samples(batch: SampleBatch): Promise<SampleBatchResult>;
}

export interface AnalysisWithUncertaintyOptions extends Omit<SampleScheduleOptions, "onBatch"> {
  /** called after each unit of work: 1 for the central solve, then each batch's samples */
  onProgress?: (done: number, stage: "central steady state" | "Monte Carlo samples") => void;
}

export async function analysisWithUncertainty(
  src: MechanismSource,
  request: AnalysisRequest,
  executor: UncertaintyExecutor,
  options: AnalysisWithUncertaintyOptions = {},
): Promise<AnalysisResult> {
  const t0 = performance.now();
  const { onProgress, ...schedule } = options;
  const samples = request.options?.uncertaintySamples ?? 0;
  const result = await executor.analysis({ ...request, options: { ...request.options, uncertaintySamples: 0 } });
  onProgress?.(1, "central steady state");
  const out: AnalysisResult = { ...result, options: { ...result.options, ...request.options } };
  const warnings = [...(result.uncertainty?.warnings ?? [])];
  if (samples > 0 && result.condition.mode === "diurnal")
    warnings.push("Monte Carlo ranges need the instantaneous steady state; not computed in the 24-hour mode");
  else if (samples > 0 && result.steadyState.status !== "converged")
    warnings.push(`no Monte Carlo ranges: the central steady state did not converge (${result.steadyState.message})`);
  else if (samples > 0) {
    const plan = planMonteCarlo(
      compileSource(src),
      // every field the engine solved with (also the aerosol surface of uptake reactions)
      solveConditionsOf(result.condition),
      result.steadyState,
      result.cycles,
      {
        fminRelative: result.options.fminRelative,
        oxDefinition: result.options.oxDefinition,
        heldSpecies: Object.keys(result.condition.held_cm3),
      },
      { samples, seed: request.options?.uncertaintySeed, batchSize: samples },
    );
    const batches = await runSampleBatches(
      plan,
      { workers: executor.workers, run: (batch) => executor.samples(batch) },
      { ...schedule, onBatch: (n) => onProgress?.(n, "Monte Carlo samples") },
    );
    const monteCarlo: MonteCarloResult = finishMonteCarlo(plan, batches, performance.now() - t0);
    out.uncertainty = { ...result.uncertainty, monteCarlo, warnings };
  }
  if (!out.uncertainty && warnings.length > 0) out.uncertainty = { warnings };
  return out;
}
