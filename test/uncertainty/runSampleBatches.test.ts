import { describe, expect, it } from "vitest";
import { solveConditionsOf } from "@/lib/engine/resolveCondition";
import { runAnalysis } from "@/lib/engine/runAnalysis";
import { loadBuiltinMechanism } from "@/lib/mechanism";
import {
  finishMonteCarlo,
  inLanes,
  monteCarlo,
  planMonteCarlo,
  runSampleBatch,
  runSampleBatches,
  type SampleBatch,
  type SampleExecutor,
} from "@/lib/uncertainty";

const mech = loadBuiltinMechanism("oxygen-chlorine").mechanism;
const central = runAnalysis(
  mech,
  { id: "oxygen-chlorine", title: mech.title },
  { mechanismId: "oxygen-chlorine", condition: { altitude_km: 40 } },
);
const cond = solveConditionsOf(central.condition);
const cycleOptions = { heldSpecies: Object.keys(central.condition.held_cm3) };
const SAMPLES = 30;
const SEED = 11;
const plan = () =>
  planMonteCarlo(mech, cond, central.steadyState, central.cycles, cycleOptions, {
    samples: SAMPLES,
    seed: SEED,
    batchSize: SAMPLES,
  });

/** Runs batches in this thread, each finishing after a pseudo-random number of event-loop turns. */
function jitteryExecutor(workers: number, seen: SampleBatch[]): SampleExecutor {
  let turn = 0;
  return {
    workers,
    run: async (batch) => {
      seen.push(batch);
      for (let k = (turn++ * 7) % 5; k > 0; k--) await new Promise((r) => setImmediate(r));
      return runSampleBatch(mech, batch);
    },
  };
}

describe("runSampleBatches", () => {
  it("gives exactly the one-thread Monte Carlo of the same seed, however the samples are cut and wherever they finish", async () => {
    const seen: SampleBatch[] = [];
    const p = plan();
    const results = await runSampleBatches(p, jitteryExecutor(3, seen), { probeBatch: 4, maxBatch: 5 });
    const viaBatches = finishMonteCarlo(p, results, 0);
    const inThread = monteCarlo(mech, cond, central.steadyState, central.cycles, cycleOptions, {
      samples: SAMPLES,
      seed: SEED,
    });
    expect({ ...viaBatches, elapsed_ms: 0 }).toEqual({ ...inThread, elapsed_ms: 0 });
    // the probe batch first, then batches of at most maxBatch, covering every index once
    expect(seen[0]).toMatchObject({ start: 0, count: 4 });
    expect(seen.every((b) => b.count >= 1 && b.count <= 5)).toBe(true);
    const indices = seen.flatMap((b) => Array.from({ length: b.count }, (_, i) => b.start + i)).sort((a, b) => a - b);
    expect(indices).toEqual(Array.from({ length: SAMPLES }, (_, i) => i));
  });

  it("keeps one batch more in flight than the executor has workers, after the probe batch alone", async () => {
    let inFlight = 0;
    let most = 0;
    let probeAlone = false;
    const executor: SampleExecutor = {
      workers: 2,
      run: async (batch) => {
        inFlight++;
        most = Math.max(most, inFlight);
        if (batch.start === 0) probeAlone = inFlight === 1;
        await new Promise((r) => setTimeout(r, 2));
        inFlight--;
        return runSampleBatch(mech, batch);
      },
    };
    await runSampleBatches(plan(), executor, { probeBatch: 2, maxBatch: 2 });
    expect(probeAlone).toBe(true);
    expect(most).toBe(3);
  });

  it("reports each batch's samples, adding up to the plan's", async () => {
    const counts: number[] = [];
    await runSampleBatches(plan(), jitteryExecutor(2, []), { onBatch: (n) => counts.push(n) });
    expect(counts.reduce((a, b) => a + b, 0)).toBe(SAMPLES);
  });

  it("throws the signal's reason when cancelled, and runs no batch after", async () => {
    const controller = new AbortController();
    const seen: SampleBatch[] = [];
    const executor = jitteryExecutor(1, seen);
    const run = runSampleBatches(plan(), executor, {
      signal: controller.signal,
      probeBatch: 1,
      maxBatch: 1,
      onBatch: () => controller.abort(new Error("cancelled by the test")),
    });
    await expect(run).rejects.toThrow("cancelled by the test");
    // the probe batch ran; the lanes stopped before taking another
    expect(seen.length).toBe(1);
  });
});

describe("inLanes", () => {
  it("keeps the items' order in its results and runs at most `lanes` at once", async () => {
    let inFlight = 0;
    let most = 0;
    const out = await inLanes([5, 1, 4, 2, 3], 2, new AbortController().signal, async (x) => {
      inFlight++;
      most = Math.max(most, inFlight);
      await new Promise((r) => setTimeout(r, x));
      inFlight--;
      return x * 10;
    });
    expect(out).toEqual([50, 10, 40, 20, 30]);
    expect(most).toBe(2);
  });

  it("throws the signal's reason before taking an item once cancelled", async () => {
    const controller = new AbortController();
    const done: number[] = [];
    const run = inLanes([1, 2, 3], 1, controller.signal, async (x) => {
      done.push(x);
      controller.abort(new Error("stop"));
      return x;
    });
    await expect(run).rejects.toThrow("stop");
    expect(done).toEqual([1]);
  });
});
