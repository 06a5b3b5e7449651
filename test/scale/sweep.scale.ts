// A profile sweep over the BullMQ back end with real worker processes
// (`npm run worker`), against the embedded pool's sweep of the same request:
// equal results, a worker killed mid-sweep, a web instance restarted
// mid-job, cancellation, and the server-sent events the browser reads.
import { execFileSync } from "node:child_process";
import { type Job, Queue } from "bullmq";
import { afterAll, afterEach, beforeAll, describe, expect, it } from "vitest";
import { BullmqJobBackend } from "@/lib/jobs/bullmqBackend";
import { type BullmqConfig, bullmqConfigFromEnv, connect, JOBS_QUEUE, TASKS_QUEUE } from "@/lib/jobs/bullmqConfig";
import { EmbeddedJobBackend } from "@/lib/jobs/embeddedBackend";
import { isFinal, type JobBackend, type JobStatus } from "@/lib/jobs/types";
import type { SweepRequest, SweepResult } from "@/lib/profiles/types";
import { POOL_DEFAULTS } from "@/lib/runtime/pool";
import { JOB_HANDLERS } from "@/lib/service/jobs";
import { getProfileRecord, validateSweep } from "@/lib/service/profiles";
import { expectClose } from "../helpers/close";
import { redisUrl, startWorker, type WorkerProcess } from "./services";

// 26 levels of the reference mechanism, O3 held (one pass): one task per level. One warm-started
// chain ("sequential") makes the result independent of timing; with several chains ("parallel") the
// chains of a segment meet where their speed puts them, so the level where they meet can be
// warm-started from either side and differ in its last digits between any two runs (on either back end).
const REQUEST = {
  mechanismId: "reference",
  profile: { kind: "standard" },
  grid: { from_km: 10, to_km: 60, step_km: 2 },
  options: { parallel: "sequential" },
};
const PARALLEL_REQUEST = { ...REQUEST, options: { parallel: "parallel" } };
const LEVELS = 26;
// 11 levels of 24-hour solutions, one chain: about a second per task (an instantaneous level now takes
// milliseconds), so that a test can act while a sweep is still running whatever the machine's speed
const SLOW_REQUEST = { ...REQUEST, grid: { from_km: 20, to_km: 60, step_km: 4 }, condition: { mode: "diurnal" } };
const SLOW_LEVELS = 11;

let prefixCount = 0;
/** A configuration with its own Redis key prefix, so that tests do not see each other's queues. */
function freshConfig(): BullmqConfig {
  return {
    ...bullmqConfigFromEnv({ REDIS_URL: redisUrl() } as unknown as NodeJS.ProcessEnv),
    prefix: `ozt${process.pid}x${++prefixCount}`,
    lock_ms: 2000,
    backoff_ms: 200,
    parallel: POOL_DEFAULTS.size,
  };
}

const workerEnv = (c: BullmqConfig): Record<string, string> => ({
  REDIS_URL: c.url,
  OZONE_QUEUE_PREFIX: c.prefix,
  OZONE_QUEUE_LOCK_MS: String(c.lock_ms),
  OZONE_QUEUE_PARALLEL: String(c.parallel),
  OZONE_WORKER_TASKS: "1",
});

const workers: WorkerProcess[] = [];
const closers: (() => Promise<void>)[] = [];
afterEach(async () => {
  for (const c of closers.splice(0).reverse()) await c().catch(() => {});
  await Promise.all(workers.splice(0).map((w) => w.stop()));
});

async function startWorkers(c: BullmqConfig, n: number): Promise<WorkerProcess[]> {
  const started = await Promise.all(Array.from({ length: n }, () => startWorker(workerEnv(c))));
  workers.push(...started);
  return started;
}

function backendFor(c: BullmqConfig): BullmqJobBackend {
  const b = new BullmqJobBackend(c, { kinds: Object.keys(JOB_HANDLERS), poll_ms: 250 });
  closers.push(() => b.close());
  return b;
}

function tasksQueue(c: BullmqConfig): Queue {
  const q = new Queue(TASKS_QUEUE, { connection: connect(c), prefix: c.prefix });
  closers.push(() => q.close());
  return q;
}

/** Resolves with every status `watch` reports, once the job is final. */
function untilFinal(b: JobBackend, id: string, timeout_ms = 180_000): Promise<JobStatus[]> {
  return new Promise((resolve, reject) => {
    const seen: JobStatus[] = [];
    const timer = setTimeout(() => {
      stop();
      reject(new Error(`job ${id} not final after ${timeout_ms / 1000} s; last: ${JSON.stringify(seen.at(-1))}`));
    }, timeout_ms);
    const stop = b.watch(id, (s) => {
      seen.push(s);
      if (isFinal(s.state)) {
        clearTimeout(timer);
        queueMicrotask(() => stop());
        resolve(seen);
      }
    });
  });
}

async function poll<T>(what: string, f: () => Promise<T | null | undefined | false>, timeout_ms = 120_000) {
  const end = Date.now() + timeout_ms;
  while (Date.now() < end) {
    const v = await f();
    if (v) return v;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`timed out waiting for ${what}`);
}

/** The result without wall-clock times, which differ between any two runs. */
function withoutTimes(r: SweepResult) {
  return JSON.parse(
    JSON.stringify(r, (k, v) => (k === "elapsed_ms" || k === "wall_ms" || k === "compute_ms" ? undefined : v)),
  );
}

async function resultOf(s: JobStatus): Promise<SweepResult> {
  expect(s.state).toBe("done");
  expect(s.resultKind).toBe("profile");
  return (await getProfileRecord(s.resultId as string)).body.result;
}

let request: SweepRequest;
let embedded: SweepResult;
let parallelRequest: SweepRequest;
let embeddedParallel: SweepResult;

async function runEmbedded(r: SweepRequest): Promise<SweepResult> {
  const b = new EmbeddedJobBackend(JOB_HANDLERS);
  const first = await b.submit("profile-sweep", r);
  const statuses = await untilFinal(b, first.id);
  const result = await resultOf(statuses.at(-1) as JobStatus);
  await b.close();
  return result;
}

let slow: Promise<{ slowRequest: SweepRequest; slowEmbedded: SweepResult }> | null = null;
/** The slow sweep and its embedded-pool result, computed once for the tests that need a sweep held open. */
function slowBaseline() {
  slow ??= (async () => {
    const slowRequest = await validateSweep(SLOW_REQUEST);
    const slowEmbedded = await runEmbedded(slowRequest);
    expect(slowEmbedded.levels.length).toBe(SLOW_LEVELS);
    expect(slowEmbedded.levels.every((l) => l.status === "converged")).toBe(true);
    return { slowRequest, slowEmbedded };
  })();
  return slow;
}

beforeAll(async () => {
  // always from the current source: a bundle left from older code would test that code
  execFileSync(process.execPath, ["scripts/engine-bundle.mjs"], { stdio: "inherit" });
  request = await validateSweep(REQUEST);
  parallelRequest = await validateSweep(PARALLEL_REQUEST);
  embedded = await runEmbedded(request);
  embeddedParallel = await runEmbedded(parallelRequest);
  expect(embedded.levels.length).toBe(LEVELS);
  expect(embedded.levels.every((l) => l.status === "converged")).toBe(true);
});

afterAll(async () => {
  const { getStore } = await import("@/lib/store");
  await getStore().close();
});

describe("a profile sweep on the BullMQ back end", () => {
  it("gives over two worker processes exactly the embedded pool's result, its tasks shared by both", async () => {
    const c = freshConfig();
    const [a, b] = await startWorkers(c, 2);
    const backend = backendFor(c);
    const job = await backend.submit("profile-sweep", request);
    expect(job.state).toBe("queued");
    const statuses = await untilFinal(backend, job.id);
    const last = statuses.at(-1) as JobStatus;
    expect(withoutTimes(await resultOf(last))).toEqual(withoutTimes(embedded));
    expect(last.done).toBe(LEVELS);
    expect(last.total).toBe(LEVELS);
    // progress arrived on the way, never going back
    const running = statuses.filter((s) => s.state === "running");
    expect(running.length).toBeGreaterThan(0);
    for (let i = 1; i < statuses.length; i++) expect(statuses[i].done).toBeGreaterThanOrEqual(statuses[i - 1].done);
    const tasks = (await tasksQueue(c).getCompleted(0, -1)) as Job[];
    expect(tasks.length).toBe(LEVELS);
    expect(new Set(tasks.map((t) => t.processedBy))).toEqual(new Set([a.name, b.name]));
  });

  it("runs a sweep's chains side by side on two workers and agrees with the embedded pool to solver tolerance", async () => {
    const c = freshConfig();
    await startWorkers(c, 2);
    const backend = backendFor(c);
    const job = await backend.submit("profile-sweep", parallelRequest);
    const q = tasksQueue(c);
    const last = (await untilFinal(backend, job.id)).at(-1) as JobStatus;
    const result = await resultOf(last);
    expect(result.levels.map((l) => l.altitude_km)).toEqual(embeddedParallel.levels.map((l) => l.altitude_km));
    result.levels.forEach((l, i) => {
      const e = embeddedParallel.levels[i];
      expect(l.status).toBe("converged");
      // solver tolerance 1e-10 on the residual (lib/solver); budgets agree far tighter than 1e-8
      expectClose(
        l.budget?.loss_cm3s as number,
        e.budget?.loss_cm3s as number,
        { rel: 1e-8 },
        `${l.altitude_km} km Ox loss`,
      );
      for (const [k, sp] of l.species.entries()) {
        const want = e.species[k].numberDensity_cm3;
        expectClose(sp.numberDensity_cm3, want, { rel: 1e-8, abs: 1e-8 }, `${l.altitude_km} km [${sp.id}]`);
      }
    });
    // the chains ran side by side: two tasks of different workers were being computed at the same time
    const tasks = (await q.getCompleted(0, -1)) as Job[];
    const overlapping = tasks.some((t) =>
      tasks.some(
        (u) =>
          u.processedBy !== t.processedBy &&
          (u.processedOn as number) < (t.finishedOn as number) &&
          (t.processedOn as number) < (u.finishedOn as number),
      ),
    );
    expect(overlapping).toBe(true);
  });

  it("loses no level when a worker is killed mid-sweep: its task is retried, the sweep completes, nothing counts twice", async () => {
    const { slowRequest, slowEmbedded } = await slowBaseline();
    const c = freshConfig();
    const [victim] = await startWorkers(c, 2);
    const backend = backendFor(c);
    const q = tasksQueue(c);
    const job = await backend.submit("profile-sweep", slowRequest);
    // kill the victim while it computes a task, after a few levels are done
    const taken = (await poll("a task running on the victim", async () => {
      const s = await backend.status(job.id);
      if (!s || s.done < 3) return null;
      const active = (await q.getActive(0, -1)) as Job[];
      return active.find((t) => t.processedBy === victim.name) ?? null;
    })) as Job;
    await victim.kill();
    const statuses = await untilFinal(backend, job.id);
    const last = statuses.at(-1) as JobStatus;
    const result = await resultOf(last);
    expect(withoutTimes(result)).toEqual(withoutTimes(slowEmbedded));
    expect(last.done).toBe(SLOW_LEVELS);
    expect(last.total).toBe(SLOW_LEVELS);
    expect(new Set(result.levels.map((l) => l.altitude_km)).size).toBe(SLOW_LEVELS);
    // the task the victim held ran again elsewhere; each task has one entry and one result
    const retried = (await q.getJob(taken.id as string)) as Job;
    expect(await retried.getState()).toBe("completed");
    expect(retried.attemptsStarted + retried.stalledCounter).toBeGreaterThanOrEqual(2);
    expect(retried.processedBy).not.toBe(victim.name);
    const tasks = (await q.getCompleted(0, -1)) as Job[];
    expect(tasks.length).toBe(SLOW_LEVELS);
    expect(new Set(tasks.map((t) => t.id)).size).toBe(SLOW_LEVELS);
  });

  it("survives the death of the worker that runs the job itself: another takes the job over and reuses the finished tasks", async () => {
    const { slowRequest, slowEmbedded } = await slowBaseline();
    const c = freshConfig();
    await startWorkers(c, 2);
    const backend = backendFor(c);
    const jobs = new Queue(JOBS_QUEUE, { connection: connect(c), prefix: c.prefix });
    closers.push(() => jobs.close());
    const q = tasksQueue(c);
    const job = await backend.submit("profile-sweep", slowRequest);
    const owner = (await poll("the job running with a few levels done", async () => {
      const [s, j] = await Promise.all([backend.status(job.id), jobs.getJob(job.id)]);
      return s && s.state === "running" && s.done >= 3 && j?.processedBy ? j.processedBy : null;
    })) as string;
    const doneBefore = (await q.getCompletedCount()) as number;
    const victim = workers.find((w) => w.name === owner) as WorkerProcess;
    await victim.kill();
    const statuses = await untilFinal(backend, job.id);
    const last = statuses.at(-1) as JobStatus;
    expect(withoutTimes(await resultOf(last))).toEqual(withoutTimes(slowEmbedded));
    const taken = (await jobs.getJob(job.id)) as Job;
    expect(taken.processedBy).not.toBe(owner);
    // the tasks finished before the takeover were not computed again: one entry per task, each run once
    const tasks = (await q.getCompleted(0, -1)) as Job[];
    expect(tasks.length).toBe(SLOW_LEVELS);
    expect(tasks.filter((t) => t.attemptsStarted === 1 && t.stalledCounter === 0).length).toBeGreaterThanOrEqual(
      doneBefore,
    );
    // the progress shown never fell back during the takeover
    for (let i = 1; i < statuses.length; i++) expect(statuses[i].done).toBeGreaterThanOrEqual(statuses[i - 1].done);
  });

  it("runs a comparison job (two sweeps and their difference) on the queue as the embedded back end does", async () => {
    const c = freshConfig();
    await startWorkers(c, 2);
    const input = {
      a: { ...REQUEST, grid: { from_km: 20, to_km: 40, step_km: 5 } },
      b: { ...REQUEST, mechanismId: "oxygen-chlorine", grid: { from_km: 20, to_km: 40, step_km: 5 } },
    };
    const { validateComparison, getComparisonRecord } = await import("@/lib/service/profiles");
    const request = await validateComparison(input);
    const queued = await backendFor(c).submit("comparison", request);
    const onQueue = (await untilFinal(backendFor(c), queued.id)).at(-1) as JobStatus;
    const local = new EmbeddedJobBackend(JOB_HANDLERS);
    const inProcess = (await untilFinal(local, (await local.submit("comparison", request)).id)).at(-1) as JobStatus;
    await local.close();
    expect(onQueue.state).toBe("done");
    expect(onQueue.resultKind).toBe("comparison");
    expect(onQueue.total).toBe(10);
    const [x, y] = await Promise.all([
      getComparisonRecord(onQueue.resultId as string),
      getComparisonRecord(inProcess.resultId as string),
    ]);
    // the stored sides have ids of their own in each run
    const sides = (r: typeof x.body.result) => ({ ...r, a: { ...r.a, sweepId: "" }, b: { ...r.b, sweepId: "" } });
    expect(sides(x.body.result)).toEqual(sides(y.body.result));
  });

  it("shows a restarted web instance the job's progress and result", async () => {
    const { slowRequest, slowEmbedded } = await slowBaseline();
    const c = freshConfig();
    await startWorkers(c, 2);
    const before = new BullmqJobBackend(c, { kinds: Object.keys(JOB_HANDLERS), poll_ms: 250 });
    const job = await before.submit("profile-sweep", slowRequest);
    const seen = (await poll("progress", async () => {
      const s = await before.status(job.id);
      return s && s.state === "running" && s.done >= 2 ? s : null;
    })) as JobStatus;
    await before.close(); // the web instance goes away mid-job
    const after = backendFor(c);
    const now = (await after.status(job.id)) as JobStatus;
    expect(now.id).toBe(job.id);
    expect(now.createdAt).toBe(job.createdAt);
    expect(now.done).toBeGreaterThanOrEqual(seen.done);
    expect(now.total).toBe(SLOW_LEVELS);
    const last = (await untilFinal(after, job.id)).at(-1) as JobStatus;
    expect(withoutTimes(await resultOf(last))).toEqual(withoutTimes(slowEmbedded));
  });

  it("cancels a job still in the queue: its status stays readable, and the worker that takes it later ends it unrun", async () => {
    const c = freshConfig();
    const backend = backendFor(c);
    const job = await backend.submit("profile-sweep", request); // no worker yet: it waits
    const cancelled = (await backend.cancel(job.id)) as JobStatus;
    expect(cancelled.state).toBe("cancelled");
    await startWorkers(c, 1);
    await new Promise((r) => setTimeout(r, 3000)); // time enough for the worker to take anything left
    expect((await backend.status(job.id))?.state).toBe("cancelled");
    const counts = await tasksQueue(c).getJobCounts("waiting", "active", "completed", "failed");
    expect(counts).toEqual({ waiting: 0, active: 0, completed: 0, failed: 0 });
    const jobs = new Queue(JOBS_QUEUE, { connection: connect(c), prefix: c.prefix });
    closers.push(() => jobs.close());
    expect(await jobs.getJobCounts("waiting", "active")).toEqual({ waiting: 0, active: 0 });
  });

  it("stops a running sweep at once when it is cancelled while its task waits, and computes nothing after", async () => {
    // The tasks queue is paused, so the sweep is held open at its first level whatever the machine's speed.
    const c = freshConfig();
    const tasks = tasksQueue(c);
    await tasks.pause();
    await startWorkers(c, 1);
    const backend = backendFor(c);
    const job = await backend.submit("profile-sweep", request);
    await poll("the job running, its first task queued", async () => {
      const s = await backend.status(job.id);
      return s?.state === "running" && (await tasks.getJobCounts("waiting")).waiting > 0;
    });
    const at = Date.now();
    expect((await backend.cancel(job.id))?.state).toBe("cancelled");
    const last = (await untilFinal(backend, job.id)).at(-1) as JobStatus;
    expect(last.state).toBe("cancelled");
    expect(last.resultId ?? null).toBeNull();
    // the job itself has ended (not merely been marked) before any task ran
    const jobs = new Queue(JOBS_QUEUE, { connection: connect(c), prefix: c.prefix });
    closers.push(() => jobs.close());
    await poll("the job's handler to end", async () => (await jobs.getJobCounts("active")).active === 0, 10_000);
    expect(Date.now() - at).toBeLessThan(10_000);
    await tasks.resume();
    await poll("the waiting task to be taken", async () => (await tasks.getJobCounts("waiting")).waiting === 0);
    await new Promise((r) => setTimeout(r, 1000));
    // the one task that was queued is skipped (null result), and no further level is queued
    const done = await tasks.getCompleted();
    expect(done.length).toBeLessThanOrEqual(1);
    for (const t of done) expect(t.returnvalue).toBeNull();
    expect((await backend.status(job.id))?.state).toBe("cancelled");
  });

  it("throws if asked for a job kind no worker handles, and knows no unknown job id", async () => {
    const backend = backendFor(freshConfig());
    await expect(backend.submit("no-such-kind", {})).rejects.toThrow(/no job handler for kind "no-such-kind"/);
    expect(await backend.status("AAAAAAAAAAAAAAAA")).toBeNull();
    expect(await backend.cancel("AAAAAAAAAAAAAAAA")).toBeNull();
  });
});
