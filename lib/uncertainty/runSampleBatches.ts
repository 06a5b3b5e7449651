/**
 * Schedules the samples of a planned Monte Carlo over an executor (the
 * engine pool, the job back end's queue workers, or this thread): a small
 * probe batch first, which measures the cost of a sample, then batches sized
 * to take about `batchTarget_ms` each, with one batch more in flight than
 * the executor has workers, so that no task runs long whatever the level
 * costs (a sample at 10 km costs ~40× one at 40 km).
 *
 * Every sample draws its factors from (seed, index) alone
 * (sampleMultipliers), and summariseSamples orders the batches by their
 * first index, so the result does not depend on how the samples were cut
 * into batches or where they ran.
 */
import type { MonteCarloPlan } from "./monteCarlo";
import type { SampleBatch } from "./runSampleBatch";
import type { SampleBatchResult } from "./types";

export const SAMPLE_SCHEDULE_DEFAULTS = {
  /** samples in the first batch, which measures the cost of a sample; default 4 */
  probeBatch: 4,
  /** later batches are sized to take about this long, ms; default 1500 */
  batchTarget_ms: 1500,
  /** most samples in one batch; default 50 */
  maxBatch: 50,
};

/** Where sample batches run. */
export interface SampleExecutor {
  /** how many batches can run at once */
  workers: number;
  run(batch: SampleBatch): Promise<SampleBatchResult>;
}

export interface SampleScheduleOptions extends Partial<typeof SAMPLE_SCHEDULE_DEFAULTS> {
  /** checked before each batch; a cancelled run rejects with the signal's reason */
  signal?: AbortSignal;
  /** called after each batch with its number of samples */
  onBatch?: (count: number) => void;
}

/** Runs every sample of the plan; the results in completion order (finishMonteCarlo sorts them). */
export async function runSampleBatches(
  plan: MonteCarloPlan,
  executor: SampleExecutor,
  options: SampleScheduleOptions = {},
): Promise<SampleBatchResult[]> {
  const { probeBatch, batchTarget_ms, maxBatch } = { ...SAMPLE_SCHEDULE_DEFAULTS, ...definedOnly(options) };
  const { samples } = plan;
  const template = plan.batches[0];
  let cursor = 0;
  let spent_ms = 0;
  let measured = 0;
  const results: SampleBatchResult[] = [];
  const runOne = async () => {
    if (options.signal?.aborted) throw options.signal.reason;
    const size =
      measured === 0 ? probeBatch : Math.max(1, Math.min(maxBatch, Math.floor(batchTarget_ms / (spent_ms / measured))));
    const batch = { ...template, start: cursor, count: Math.min(size, samples - cursor) };
    cursor += batch.count;
    const b0 = performance.now();
    results.push(await executor.run(batch));
    spent_ms += performance.now() - b0;
    measured += batch.count;
    options.onBatch?.(batch.count);
  };
  // the probe batch alone, then one lane more than the executor has workers
  await runOne();
  await Promise.all(
    Array.from({ length: executor.workers + 1 }, async () => {
      while (cursor < samples) await runOne();
    }),
  );
  return results;
}

function definedOnly<T extends object>(o: T): Partial<T> {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as Partial<T>;
}
