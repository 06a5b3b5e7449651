/**
 * Profile-sweep benchmarks: the reference mechanism on 51 levels (10–60 km,
 * 1 km), instantaneous and 24-hour, on one thread (one warm-started chain
 * from the top down, what one worker does) against two worker threads (two
 * contiguous chunks, each warm-started along itself, as the service's pool
 * runs it), and against 51 cold levels spread over the two workers. The
 * worker cases run this same bundle in worker threads and wait for them with
 * Atomics.wait, so that each case stays a synchronous run(); results cross
 * the thread boundary by structured clone, as in the service.
 */
import {
  isMainThread,
  MessageChannel,
  type MessagePort,
  parentPort,
  receiveMessageOnPort,
  Worker,
  workerData,
} from "node:worker_threads";
import { loadBuiltinMechanism } from "../../lib/mechanism";
import { planSweep } from "../../lib/profiles/planSweep";
import { type LevelBatch, type LevelBatchResult, runLevelBatch } from "../../lib/profiles/runLevelBatch";
import { splitChunks } from "../../lib/profiles/splitChunks";
import { standardProfile } from "../../lib/profiles/standardProfile";
import type { SweepLevel } from "../../lib/profiles/types";
import type { BenchCase } from "../types";

const REF = { id: "reference", title: "reference" };
const WORKERS = 2;

function mechanism() {
  return loadBuiltinMechanism("reference").mechanism;
}

function tasks(mode: "instantaneous" | "diurnal") {
  const plan = planSweep(
    {
      mechanismId: "reference",
      profile: { kind: "standard" },
      grid: { from_km: 10, to_km: 60, step_km: 1 },
      condition: { mode },
    },
    standardProfile(),
    mechanism(),
  );
  return [...plan.tasks].reverse(); // top down
}

interface WorkMessage {
  batch: LevelBatch;
  port: MessagePort;
  flags: Int32Array;
  slot: number;
}

if (!isMainThread && (workerData as { profilesBench?: boolean } | null)?.profilesBench) {
  const mech = mechanism();
  parentPort?.on("message", (m: WorkMessage) => {
    const out = runLevelBatch(mech, REF, m.batch);
    m.port.postMessage(out);
    Atomics.store(m.flags, m.slot, 1);
    Atomics.notify(m.flags, m.slot);
  });
}

let pool: Worker[] | null = null;
function workers(): Worker[] {
  pool ??= Array.from({ length: WORKERS }, () => {
    const w = new Worker(new URL(import.meta.url), { workerData: { profilesBench: true } });
    w.unref();
    return w;
  });
  return pool;
}

/** Runs the batches on the workers (batch i on worker i mod WORKERS, in order) and blocks until all are back. */
function runOnWorkers(batches: LevelBatch[]): LevelBatchResult[] {
  const ws = workers();
  const flags = new Int32Array(new SharedArrayBuffer(4 * batches.length));
  const channels = batches.map(() => new MessageChannel());
  batches.forEach((batch, i) => {
    ws[i % ws.length].postMessage({ batch, port: channels[i].port2, flags, slot: i } satisfies WorkMessage, [
      channels[i].port2,
    ]);
  });
  return batches.map((_, i) => {
    while (Atomics.load(flags, i) === 0) Atomics.wait(flags, i, 0, 600_000);
    const msg = receiveMessageOnPort(channels[i].port1);
    channels[i].port1.close();
    return msg?.message as LevelBatchResult;
  });
}

function summary(levels: SweepLevel[]): string {
  const failed = levels.filter((l) => l.status !== "converged").length;
  return `${levels.length} levels, ${failed} not converged`;
}

const cache = new Map<string, ReturnType<typeof tasks>>();
const tasksOf = (mode: "instantaneous" | "diurnal") => {
  let t = cache.get(mode);
  if (!t) {
    t = tasks(mode);
    cache.set(mode, t);
  }
  return t;
};

function oneThread(mode: "instantaneous" | "diurnal"): string {
  const out = runLevelBatch(mechanism(), REF, { tasks: tasksOf(mode) });
  return summary(out.levels);
}

function chunked(mode: "instantaneous" | "diurnal"): string {
  const t = tasksOf(mode);
  const batches = splitChunks(t.length, WORKERS).map((c) => ({ tasks: c.map((i) => t[i]) }));
  return summary(runOnWorkers(batches).flatMap((r) => r.levels));
}

function coldSpread(mode: "instantaneous" | "diurnal"): string {
  const t = tasksOf(mode);
  // alternate levels over the workers so that the slow low levels are shared; no warm start
  const batches = Array.from({ length: WORKERS }, (_, w) => ({
    tasks: t.filter((_, i) => i % WORKERS === w),
    chain: false,
  }));
  return summary(runOnWorkers(batches).flatMap((r) => r.levels));
}

export const cases: BenchCase[] = isMainThread
  ? [
      {
        name: "sweep 51 levels, instantaneous, one thread (warm-started chain)",
        run: () => oneThread("instantaneous"),
        iterations: 3,
      },
      {
        name: "sweep 51 levels, instantaneous, 2 workers (2 warm-started chunks)",
        run: () => chunked("instantaneous"),
        iterations: 3,
      },
      {
        name: "sweep 51 levels, instantaneous, 2 workers (cold, alternate levels)",
        run: () => coldSpread("instantaneous"),
        iterations: 3,
      },
      {
        name: "sweep 51 levels, 24-hour, one thread (warm-started chain)",
        run: () => oneThread("diurnal"),
        iterations: 1,
      },
      {
        name: "sweep 51 levels, 24-hour, 2 workers (2 warm-started chunks)",
        run: () => chunked("diurnal"),
        iterations: 1,
      },
    ]
  : [];
