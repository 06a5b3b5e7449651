/**
 * The full Monte Carlo profile: 1,000 samples at every level of the 51-level
 * 10–60 km profile (51,000 samples, each a warm-started steady state and a
 * cycle analysis), as a profile request with uncertaintySamples 1000 runs it:
 * one engine job per level, in a pool of one worker thread against a pool of
 * two. Each case runs once (no separate warm-up): one run takes minutes.
 * Run alone with `npm run bench montecarlo`. Samples per second =
 * 51,000 / median s. The per-level cost is reported beside it, because the
 * cycle analysis at 10–15 km costs many times more than above 20 km.
 */

import type { AnalysisRequest } from "../../lib/engine/types";
import { EnginePool } from "../../lib/runtime/pool";
import { bundleEngineWorker } from "../bundleWorker";
import type { BenchCase } from "../types";

const SRC = { id: "reference", title: "Reference stratosphere" };
const SAMPLES = 1000;
const levels = Array.from({ length: 51 }, (_x, i) => 10 + i);
const pools: EnginePool[] = [];

const request = (z: number): AnalysisRequest => ({
  mechanismId: "reference",
  condition: { altitude_km: z },
  options: { uncertaintySamples: SAMPLES, uncertaintySeed: z },
});

function profileCase(pool: EnginePool, label: string): BenchCase {
  return {
    name: `51-level profile × ${SAMPLES} samples, ${label}`,
    iterations: 1,
    warmup: false,
    note: `${51 * SAMPLES} samples; samples/s = ${51 * SAMPLES} / median s`,
    run: async () => {
      const perLevel: string[] = [];
      let failed = 0;
      let succeeded = 0;
      await Promise.all(
        levels.map(async (z) => {
          const t0 = performance.now();
          const res = (await pool.run({ kind: "analysis", mechanism: SRC, request: request(z) }, 3_600_000)) as {
            result: { uncertainty?: { monteCarlo?: { failed: number; succeeded: number } } };
          };
          const mc = res.result.uncertainty?.monteCarlo;
          if (!mc) throw new Error(`level ${z} km: no Monte Carlo result`);
          failed += mc.failed;
          succeeded += mc.succeeded;
          perLevel.push(`${z}:${((performance.now() - t0) / 1000).toFixed(1)}`);
        }),
      );
      console.log(
        `  ${label}: level:s (queue wait included) ${perLevel.join(" ")}; samples converged ${succeeded}, failed ${failed}`,
      );
    },
  };
}

export async function setup(): Promise<BenchCase[]> {
  const script = await bundleEngineWorker("montecarlo-worker");
  const one = new EnginePool({ size: 1, timeout_ms: 3_600_000, script });
  const two = new EnginePool({ size: 2, timeout_ms: 3_600_000, script });
  pools.push(one, two);
  return [profileCase(one, "pool of 1 worker"), profileCase(two, "pool of 2 workers")];
}

export const cases: BenchCase[] = [];

export async function teardown(): Promise<void> {
  await Promise.all(pools.map((p) => p.close()));
}
