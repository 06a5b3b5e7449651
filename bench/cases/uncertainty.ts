/**
 * Uncertainty benchmarks: sensitivities of every output to every rate
 * constant at one level (reference mechanism, 40 km), and 1,000 Monte Carlo
 * samples at that level and over the 51-level 10–60 km profile (20 samples
 * per level, 1,020 in all), each in this thread (one worker's work), in a
 * pool of one worker thread and in a pool of two (the service's batching).
 * Samples per second = samples / median time. The pool cases bundle the
 * engine worker (with the "uncertainty-samples" job kind) into .engine/bench.
 */
import { compileSource } from "../../lib/engine/mechanismSource";
import { solveConditionsOf } from "../../lib/engine/resolveCondition";
import { runAnalysis } from "../../lib/engine/runAnalysis";
import type { AnalysisRequest } from "../../lib/engine/types";
import { EnginePool } from "../../lib/runtime/pool";
import { monteCarlo, planMonteCarlo, runSampleBatch, sensitivities } from "../../lib/uncertainty";
import { bundleEngineWorker } from "../bundleWorker";
import type { BenchCase } from "../types";

const SRC = { id: "reference", title: "Reference stratosphere" };
const mech = compileSource(SRC);
const request = (z: number, options: AnalysisRequest["options"] = {}): AnalysisRequest => ({
  mechanismId: "reference",
  condition: { altitude_km: z },
  options,
});
const central = runAnalysis(mech, SRC, request(40));
const cond = solveConditionsOf(central.condition);
const cycleOptions = { heldSpecies: Object.keys(central.condition.held_cm3) };
const plan = planMonteCarlo(mech, cond, central.steadyState, central.cycles, cycleOptions, {
  samples: 1000,
  seed: 1,
  batchSize: 50,
});
const levels = Array.from({ length: 51 }, (_x, i) => 10 + i);
const PER_LEVEL = 20;

const pools: EnginePool[] = [];

function poolCases(pool: EnginePool, label: string): BenchCase[] {
  return [
    {
      name: `1,000 samples at 40 km, ${label}`,
      iterations: 3,
      note: "samples/s = 1000 / median s",
      run: () =>
        Promise.all(
          plan.batches.map((batch) => pool.run({ kind: "uncertainty-samples", mechanism: SRC, batch }, 600_000)),
        ),
    },
    {
      name: `51-level profile × ${PER_LEVEL} samples, ${label}`,
      iterations: 2,
      note: `${51 * PER_LEVEL} samples; one job per level`,
      run: () =>
        Promise.all(
          levels.map((z) =>
            pool.run(
              {
                kind: "analysis",
                mechanism: SRC,
                request: request(z, { uncertaintySamples: PER_LEVEL, uncertaintySeed: z }),
              },
              600_000,
            ),
          ),
        ),
    },
  ];
}

export async function setup(): Promise<BenchCase[]> {
  const script = await bundleEngineWorker("uncertainty-worker");
  const one = new EnginePool({ size: 1, timeout_ms: 600_000, script });
  const two = new EnginePool({ size: 2, timeout_ms: 600_000, script });
  pools.push(one, two);
  return [
    {
      name: "sensitivities at 40 km, state only (adjoint solves)",
      run: () =>
        sensitivities(mech, cond, central.steadyState, central.cycles, cycleOptions, { cycleDifference: "none" }),
    },
    {
      name: "sensitivities at 40 km, with cycle outputs (forward)",
      iterations: 5,
      note: `${mech.reactions.length} reactions: one cycle analysis each`,
      run: () => sensitivities(mech, cond, central.steadyState, central.cycles, cycleOptions),
    },
    {
      name: "1,000 samples at 40 km, this thread",
      iterations: 2,
      note: "samples/s = 1000 / median s",
      run: () => plan.batches.map((b) => runSampleBatch(mech, b)),
    },
    {
      name: `51-level profile × ${PER_LEVEL} samples, this thread`,
      iterations: 1,
      note: `${51 * PER_LEVEL} samples`,
      run: () =>
        levels.map((z) => {
          const c = runAnalysis(mech, SRC, request(z));
          return monteCarlo(
            mech,
            solveConditionsOf(c.condition),
            c.steadyState,
            c.cycles,
            {
              heldSpecies: Object.keys(c.condition.held_cm3),
            },
            { samples: PER_LEVEL, seed: z },
          );
        }),
    },
    ...poolCases(one, "pool of 1 worker"),
    ...poolCases(two, "pool of 2 workers"),
  ];
}

export const cases: BenchCase[] = [];

export async function teardown(): Promise<void> {
  await Promise.all(pools.map((p) => p.close()));
}
