// A Monte Carlo profile job (an uncertainty job over a stored sweep) on the BullMQ back end with two
// real worker processes (`npm run worker`), against the embedded pool's job of the same input: the
// central solves and the sample batches are tasks on the queue, and the result is the same to the bit.
import { execFileSync } from "node:child_process";
import { type Job, Queue } from "bullmq";
import { afterAll, afterEach, describe, expect, it } from "vitest";
import { BullmqJobBackend } from "@/lib/jobs/bullmqBackend";
import { type BullmqConfig, bullmqConfigFromEnv, connect, TASKS_QUEUE } from "@/lib/jobs/bullmqConfig";
import { EmbeddedJobBackend } from "@/lib/jobs/embeddedBackend";
import { isFinal, type JobBackend, type JobStatus } from "@/lib/jobs/types";
import { POOL_DEFAULTS } from "@/lib/runtime/pool";
import { JOB_HANDLERS } from "@/lib/service/jobs";
import { validateSweep } from "@/lib/service/profiles";
import { getUncertaintyProfile, validateUncertaintyJob } from "@/lib/service/uncertainty";
import { redisUrl, startWorker, type WorkerProcess } from "./services";

// 3 levels of the oxygen–chlorine mechanism, one 40-sample Monte Carlo each: with the probe batch
// and the batches sized from it, several tasks per level, a few levels in flight at once
const SWEEP = {
  mechanismId: "oxygen-chlorine",
  profile: { kind: "standard" },
  grid: { from_km: 30, to_km: 40, step_km: 5 },
  options: { parallel: "sequential" },
};
const SAMPLES = 40;
const SEED = 17;

const workers: WorkerProcess[] = [];
const closers: (() => Promise<void>)[] = [];
afterEach(async () => {
  for (const c of closers.splice(0).reverse()) await c().catch(() => {});
  await Promise.all(workers.splice(0).map((w) => w.stop()));
});
afterAll(async () => {
  const { getStore } = await import("@/lib/store");
  await getStore().close();
});

function untilFinal(b: JobBackend, id: string, timeout_ms = 180_000): Promise<JobStatus> {
  return new Promise((resolve, reject) => {
    let last: JobStatus | undefined;
    const timer = setTimeout(() => {
      stop();
      reject(new Error(`job ${id} not final after ${timeout_ms / 1000} s; last: ${JSON.stringify(last)}`));
    }, timeout_ms);
    const stop = b.watch(id, (s) => {
      last = s;
      if (isFinal(s.state)) {
        clearTimeout(timer);
        queueMicrotask(() => stop());
        resolve(s);
      }
    });
  });
}

/** The stored body without wall-clock times, which differ between any two runs. */
async function bodyOf(s: JobStatus) {
  expect(s.state).toBe("done");
  expect(s.resultKind).toBe("uncertainty-profile");
  const { body } = await getUncertaintyProfile(s.resultId as string);
  return JSON.parse(JSON.stringify(body, (k, v) => (k === "elapsed_ms" ? undefined : v)));
}

describe("a Monte Carlo profile job on the BullMQ back end", () => {
  it("gives over two worker processes exactly the embedded pool's result for the same seed, its samples computed as queue tasks", async () => {
    // always from the current source: a bundle left from older code would test that code
    execFileSync(process.execPath, ["scripts/engine-bundle.mjs"], { stdio: "inherit" });
    const embedded = new EmbeddedJobBackend(JOB_HANDLERS);
    closers.push(() => embedded.close());
    const sweep = await untilFinal(embedded, (await embedded.submit("profile-sweep", await validateSweep(SWEEP))).id);
    expect(sweep.state).toBe("done");
    const input = await validateUncertaintyJob({ profileId: sweep.resultId, samples: SAMPLES, seed: SEED });
    const local = await bodyOf(await untilFinal(embedded, (await embedded.submit("uncertainty", input)).id));
    expect(local.levels.map((l: { status: string }) => l.status)).toEqual(["ok", "ok", "ok"]);
    expect(local.levels.every((l: { monteCarlo: { samples: number } }) => l.monteCarlo.samples === SAMPLES)).toBe(true);

    const c: BullmqConfig = {
      ...bullmqConfigFromEnv({ REDIS_URL: redisUrl() } as unknown as NodeJS.ProcessEnv),
      prefix: `ozu${process.pid}`,
      lock_ms: 2000,
      backoff_ms: 200,
      parallel: POOL_DEFAULTS.size,
    };
    const env = {
      REDIS_URL: c.url,
      OZONE_QUEUE_PREFIX: c.prefix,
      OZONE_QUEUE_LOCK_MS: String(c.lock_ms),
      OZONE_QUEUE_PARALLEL: String(c.parallel),
      OZONE_WORKER_TASKS: "1",
    };
    const [a, b] = await Promise.all([startWorker(env), startWorker(env)]);
    workers.push(a, b);
    const backend = new BullmqJobBackend(c, { kinds: Object.keys(JOB_HANDLERS), poll_ms: 250 });
    closers.push(() => backend.close());
    const tasks = new Queue(TASKS_QUEUE, { connection: connect(c), prefix: c.prefix });
    closers.push(() => tasks.close());
    const last = await untilFinal(backend, (await backend.submit("uncertainty", input)).id);
    expect(await bodyOf(last)).toEqual(local);
    expect(last.done).toBe(3 * (SAMPLES + 1));
    // the central solves and the sample batches ran as tasks, on both workers
    const done = (await tasks.getCompleted(0, -1)) as Job[];
    const kinds = done.map((t) => (t.data as { task: { kind: string } }).task.kind);
    expect(kinds.filter((k) => k === "analysis").length).toBe(3);
    const sampled = done
      .filter((t) => (t.data as { task: { kind: string } }).task.kind === "uncertainty-samples")
      .reduce((n, t) => n + (t.data as { task: { batch: { count: number } } }).task.batch.count, 0);
    expect(sampled).toBe(3 * SAMPLES);
    expect(new Set(done.map((t) => t.processedBy))).toEqual(new Set([a.name, b.name]));
  });
});
