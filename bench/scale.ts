/**
 * Scale-out benchmark: the embedded engine pool against the BullMQ task
 * queue with 1, 2 and 4 worker processes (`npm run worker`, one engine
 * thread each) on this machine.
 *
 * Workloads (BENCH_WORKLOAD), both over the 51-level profile of the
 * reference mechanism (U.S. Standard Atmosphere 1976, 10–60 km every 1 km,
 * instantaneous, O3 held):
 *
 * - "mc" (default): a Monte Carlo run of lib/uncertainty, 1,020 samples
 *   (20 per level, seed 1): per level the central analysis, then
 *   planMonteCarlo's sample batches ("uncertainty-samples" engine jobs:
 *   rate constants drawn from their stated uncertainties, steady state from
 *   the central state, cycle analysis, outputs), BENCH_BATCH samples per
 *   task (default 1: sample-sized tasks, the queue's worst case).
 * - "levels": a stand-in needing no lib/uncertainty: 1,000 level solves,
 *   sample k at level k mod 51 with every J scaled by a log-normal factor
 *   (σ = 0.2 in ln J, invented for the benchmark), warm-started from the
 *   level's nominal state; one "profile-levels" task per sample.
 *
 * Reported: wall time and samples per second (median of the repeats), and
 * the overhead per task of the queue against the pool: tasks sent one at a
 * time, alternately to the pool and to the queue (one worker), so that both
 * see the same load of the shared machine; the overhead is the median of
 * the paired differences of their round trips, for the sample tasks and for
 * empty tasks (no level: transport only).
 *
 * Run by bench/scale.mjs (`npm run bench:scale`), which starts Redis and
 * PostgreSQL when none is reachable and the worker processes.
 */

import { type ChildProcess, spawn } from "node:child_process";
import os from "node:os";
import { Queue, QueueEvents } from "bullmq";
import { solveConditionsOf } from "../lib/engine/resolveCondition";
import type { AnalysisResult } from "../lib/engine/types";
import { type BullmqConfig, bullmqConfigFromEnv, connect, TASKS_QUEUE } from "../lib/jobs/bullmqConfig";
import { queueTaskRunner } from "../lib/jobs/bullmqWorker";
import type { TaskRunner } from "../lib/jobs/types";
import { loadBuiltinMechanism } from "../lib/mechanism";
import { planSweep } from "../lib/profiles/planSweep";
import { runLevelBatch } from "../lib/profiles/runLevelBatch";
import { standardProfile } from "../lib/profiles/standardProfile";
import { EnginePool, POOL_DEFAULTS } from "../lib/runtime/pool";
import { planMonteCarlo } from "../lib/uncertainty/monteCarlo";

export const BENCH_DEFAULTS = {
  /** "mc" (lib/uncertainty sample batches) or "levels" (J-scaled level solves); default "mc" */
  workload: (process.env.BENCH_WORKLOAD ?? "mc") as "mc" | "levels",
  /** samples ("mc": per level, × 51); default 1000 levels, 20 per level for "mc" */
  samples: Number(process.env.BENCH_SAMPLES ?? (process.env.BENCH_WORKLOAD === "levels" ? 1000 : 20)),
  /** samples per task for "mc"; default 1 */
  batch: Number(process.env.BENCH_BATCH ?? 1),
  /** repeats of each configuration (the median is reported); default 3 */
  repeats: Number(process.env.BENCH_REPEATS ?? 3),
  /** tasks timed one at a time for the per-task overhead; default 60 */
  latencyTasks: 60,
  /** queue worker processes to try */
  workers: [1, 2, 4],
  /** σ of ln(J scale) */
  sigmaLnJ: 0.2,
  /** tasks kept in flight on the queue (the pool takes them all at once and queues them itself); default 16 */
  inFlight: 16,
};

const MECH = { id: "reference", title: "reference" };

type EngineTask = { kind: "profile-levels" | "uncertainty-samples"; mechanism: typeof MECH; batch: unknown };

/** Monte Carlo sample batches over the profile: the central analysis of each level in the pool, then planMonteCarlo. */
async function monteCarloTasks(pool: EnginePool, perLevel: number, batchSize: number): Promise<EngineTask[]> {
  const mech = loadBuiltinMechanism("reference").mechanism;
  const plan = planSweep(
    { mechanismId: "reference", profile: { kind: "standard" }, grid: { from_km: 10, to_km: 60, step_km: 1 } },
    standardProfile(),
    mech,
  );
  const centrals = await Promise.all(
    plan.tasks.map((t) => pool.run({ kind: "analysis", mechanism: MECH, request: t.request } as never)),
  );
  const out: EngineTask[] = [];
  for (const c of centrals as { result: AnalysisResult }[]) {
    const r = c.result;
    if (r.steadyState.status !== "converged") continue;
    const mc = planMonteCarlo(
      mech,
      solveConditionsOf(r.condition),
      r.steadyState,
      r.cycles,
      {
        fminRelative: r.options.fminRelative,
        oxDefinition: r.options.oxDefinition,
        heldSpecies: Object.keys(r.condition.held_cm3),
      },
      { samples: perLevel, seed: 1, batchSize },
    );
    for (const b of mc.batches) out.push({ kind: "uncertainty-samples", mechanism: MECH, batch: b });
  }
  return out;
}

/** Samples a task's result counts as done: the level, or the samples that did not fail. */
function goodSamples(out: unknown): number {
  const r = (out as { result: { levels?: { status: string }[]; values?: unknown[] } }).result;
  if (r.levels) return r.levels.filter((l) => l.status === "converged").length;
  return (r.values ?? []).filter((v) => v !== null).length;
}

const samplesIn = (t: EngineTask) =>
  t.kind === "uncertainty-samples"
    ? (t.batch as { count: number }).count
    : (t.batch as { tasks: unknown[] }).tasks.length;

/** Deterministic standard normal draws (mulberry32 + Box–Muller). */
function normals(n: number, seed = 12_345): number[] {
  let a = seed >>> 0;
  const u = () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
  };
  return Array.from({ length: n }, () => Math.sqrt(-2 * Math.log(u() || 1e-12)) * Math.cos(2 * Math.PI * u()));
}

/** The samples as engine tasks, from the nominal sweep's warm-start states. */
function sampleTasks(n: number, sigma: number): EngineTask[] {
  const mech = loadBuiltinMechanism("reference").mechanism;
  const plan = planSweep(
    { mechanismId: "reference", profile: { kind: "standard" }, grid: { from_km: 10, to_km: 60, step_km: 1 } },
    standardProfile(),
    mech,
  );
  // nominal states, one chain from the top down
  const top = [...plan.tasks].reverse();
  const nominal = runLevelBatch(mech, MECH, { tasks: top });
  const levels = top.map((t, i) => ({ task: t, state: nominal.states[i], M: nominal.M_cm3[i] }));
  const z = normals(n);
  return z.map((zk, k) => {
    const l = levels[k % levels.length];
    return {
      kind: "profile-levels",
      mechanism: MECH,
      batch: {
        chain: false,
        tasks: [
          {
            request: { ...l.task.request, condition: { ...l.task.request.condition, jScale: Math.exp(sigma * zk) } },
            ...(l.state ? { initialState: l.state, initialM_cm3: l.M ?? undefined } : {}),
          },
        ],
      },
    };
  });
}

/** Runs every task, at most `inFlight` at a time; wall time in ms. */
async function runAll(run: (t: EngineTask) => Promise<unknown>, tasks: EngineTask[], inFlight: number) {
  const t0 = performance.now();
  let next = 0;
  let converged = 0;
  await Promise.all(
    Array.from({ length: Math.min(inFlight, tasks.length) }, async () => {
      while (next < tasks.length) {
        // read after the await: `converged += await …` would add to a stale value
        const good = goodSamples(await run(tasks[next++]));
        converged += good;
      }
    }),
  );
  return { wall_ms: performance.now() - t0, converged };
}

/** Round trips of each task alone on a and then on b, ms: [a, b] per task. */
async function pairedLatencies(
  a: (t: EngineTask) => Promise<unknown>,
  b: (t: EngineTask) => Promise<unknown>,
  tasks: EngineTask[],
): Promise<[number, number][]> {
  const out: [number, number][] = [];
  for (const t of tasks) {
    const s = performance.now();
    await a(t);
    const m = performance.now();
    await b(t);
    out.push([m - s, performance.now() - m]);
  }
  return out;
}

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
};

function startWorkerProcess(env: Record<string, string>): Promise<ChildProcess> {
  return new Promise((resolve, reject) => {
    const p = spawn(process.execPath, ["scripts/worker.mjs"], {
      env: { ...process.env, ...env },
      stdio: ["ignore", "pipe", "inherit"],
    });
    let out = "";
    p.stdout?.on("data", (d) => {
      out += d;
      if (/queue worker \S+:/.test(out)) resolve(p);
    });
    p.once("exit", (code) => reject(new Error(`worker exited with ${code}: ${out}`)));
  });
}

const stopProcess = (p: ChildProcess) =>
  new Promise<void>((resolve) => {
    if (p.exitCode !== null || p.signalCode !== null) return resolve();
    p.once("exit", () => resolve());
    p.kill("SIGTERM");
  });

export interface ScaleRow {
  backend: string;
  consumers: number;
  samples: number;
  tasks: number;
  median_wall_ms: number;
  samplesPerSecond: number;
  converged: number;
  runs_ms: number[];
}

export async function main() {
  const o = BENCH_DEFAULTS;
  // the embedded back end's pool: one thread per core
  const pool = new EnginePool({ ...POOL_DEFAULTS, timeout_ms: 600_000 });
  const poolRun = (t: EngineTask) => pool.run(t as never);
  console.log(`preparing the "${o.workload}" workload over 51 levels…`);
  const tasks =
    o.workload === "mc" ? await monteCarloTasks(pool, o.samples, o.batch) : sampleTasks(o.samples, o.sigmaLnJ);
  const nSamples = tasks.reduce((s, t) => s + samplesIn(t), 0);
  console.log(`${nSamples} samples in ${tasks.length} tasks`);
  // spread over the levels, so that the first tasks (warm-up, latency) are not all at one altitude
  const spread = tasks.map((_, i) => tasks[(i * 7919) % tasks.length]);
  const latencyTasks = spread.slice(0, o.latencyTasks);
  const rows: ScaleRow[] = [];
  const report = (r: ScaleRow) => {
    rows.push(r);
    console.log(
      `${r.backend.padEnd(14)} ${String(r.consumers).padStart(2)} consumer(s)  median ${(r.median_wall_ms / 1000).toFixed(2).padStart(7)} s  ${r.samplesPerSecond.toFixed(1).padStart(7)} samples/s  good ${r.converged}/${r.samples}  runs ${r.runs_ms.map((x) => (x / 1000).toFixed(2)).join(", ")} s`,
    );
  };

  await runAll(poolRun, spread.slice(0, 20), o.inFlight); // warm-up: threads compile the mechanism
  const poolRuns: { wall_ms: number; converged: number }[] = [];
  for (let r = 0; r < o.repeats; r++) poolRuns.push(await runAll(poolRun, tasks, tasks.length));
  const poolWall = median(poolRuns.map((x) => x.wall_ms));
  report({
    backend: "embedded pool",
    consumers: POOL_DEFAULTS.size,
    samples: nSamples,
    tasks: tasks.length,
    median_wall_ms: poolWall,
    samplesPerSecond: nSamples / (poolWall / 1000),
    converged: poolRuns[0].converged,
    runs_ms: poolRuns.map((x) => x.wall_ms),
  });
  const base = bullmqConfigFromEnv();
  let paired: { sample: [number, number][]; empty: [number, number][] } = { sample: [], empty: [] };
  for (const n of o.workers) {
    const config: BullmqConfig = { ...base, prefix: `ozbench${process.pid}w${n}` };
    const procs = await Promise.all(
      Array.from({ length: n }, () =>
        startWorkerProcess({ OZONE_QUEUE_PREFIX: config.prefix, OZONE_WORKER_TASKS: "1", OZONE_WORKER_JOBS: "1" }),
      ),
    );
    const q = new Queue(TASKS_QUEUE, { connection: connect(config), prefix: config.prefix });
    const ev = new QueueEvents(TASKS_QUEUE, { connection: connect(config), prefix: config.prefix });
    await ev.waitUntilReady();
    ev.setMaxListeners(4 * o.inFlight + 16);
    q.setMaxListeners(4 * o.inFlight + 16);
    try {
      // every run has its own job id: task results are content-addressed per job and would be reused
      const runner = (id: string): TaskRunner => queueTaskRunner(config, q, ev, id);
      const warm = runner("warm");
      await runAll((t) => warm.run(t), spread.slice(0, 20 * n), o.inFlight);
      if (n === 1) {
        const lat = runner("latency");
        const empty: EngineTask[] = latencyTasks.map((_, i) => ({
          kind: "profile-levels",
          mechanism: MECH,
          batch: { tasks: [], chain: false, initialM_cm3: i },
        }));
        paired = {
          sample: await pairedLatencies(poolRun, (t) => lat.run(t), latencyTasks),
          empty: await pairedLatencies(poolRun, (t) => lat.run(t), empty),
        };
      }
      const runs: { wall_ms: number; converged: number }[] = [];
      for (let r = 0; r < o.repeats; r++) {
        const run = runner(`run${r}`);
        runs.push(await runAll((t) => run.run(t), tasks, o.inFlight));
      }
      const wall = median(runs.map((x) => x.wall_ms));
      report({
        backend: "BullMQ queue",
        consumers: n,
        samples: nSamples,
        tasks: tasks.length,
        median_wall_ms: wall,
        samplesPerSecond: nSamples / (wall / 1000),
        converged: runs[0].converged,
        runs_ms: runs.map((x) => x.wall_ms),
      });
    } finally {
      await ev.close();
      await q.obliterate({ force: true }).catch(() => {});
      await q.close();
      await Promise.all(procs.map(stopProcess));
    }
  }

  await pool.close();
  const summary = (pairs: [number, number][]) => ({
    poolRoundTrip_median_ms: median(pairs.map((p) => p[0])),
    queueRoundTrip_median_ms: median(pairs.map((p) => p[1])),
    queueOverheadPerTask_median_ms: median(pairs.map((p) => p[1] - p[0])),
    tasks: pairs.length,
  });
  const overhead = { sampleTasks: summary(paired.sample), emptyTasks: summary(paired.empty) };
  for (const [what, v] of Object.entries(overhead)) {
    console.log(
      `one ${what === "sampleTasks" ? "sample task" : "empty task"} at a time (${v.tasks}, alternating): pool ${v.poolRoundTrip_median_ms.toFixed(1)} ms, queue ${v.queueRoundTrip_median_ms.toFixed(1)} ms median round trip; queue overhead ${v.queueOverheadPerTask_median_ms.toFixed(1)} ms per task (median of paired differences)`,
    );
  }
  return { rows, overhead, settings: { ...o }, loadAverage: os.loadavg() };
}
