/**
 * Profile-sweep benchmarks: the reference mechanism on 51 levels (10–60 km,
 * 1 km), instantaneous and 24-hour, on one thread (one warm-started chain
 * from the top down, what one worker does) against two worker threads: two
 * warm-started chains from both ends meeting where the cost puts them (the
 * service's strategy), two fixed contiguous chunks, and 51 cold levels
 * spread over the two workers. The
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
    Atomics.add(m.flags, 0, 1);
    Atomics.notify(m.flags, 0);
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
  // index 0 counts finished batches; index i + 1 flags batch i
  const flags = new Int32Array(new SharedArrayBuffer(4 * (batches.length + 1)));
  const channels = batches.map(() => new MessageChannel());
  batches.forEach((batch, i) => {
    ws[i % ws.length].postMessage({ batch, port: channels[i].port2, flags, slot: i + 1 } satisfies WorkMessage, [
      channels[i].port2,
    ]);
  });
  return batches.map((_, i) => {
    while (Atomics.load(flags, i + 1) === 0) Atomics.wait(flags, 0, Atomics.load(flags, 0), 1000);
    const msg = receiveMessageOnPort(channels[i].port1);
    channels[i].port1.close();
    return msg?.message as LevelBatchResult;
  });
}

/**
 * Two warm-started chains over the top-down levels, one from the top and one
 * from the bottom, each handed its next level when its last one returns,
 * until they meet: the service's strategy (lib/profiles runSweep) for two workers.
 */
function runTwoEnded(t: LevelBatch["tasks"]): SweepLevel[] {
  const ws = workers();
  const flags = new Int32Array(new SharedArrayBuffer(4 * (ws.length + 1)));
  const levels: SweepLevel[] = new Array(t.length);
  let top = 0;
  let bottom = t.length - 1;
  const chains = ws.map((w, c) => ({
    w,
    c,
    state: null as number[] | null,
    M: null as number | null,
    at: -1,
    channel: new MessageChannel(),
  }));
  const assign = (ch: (typeof chains)[number]) => {
    if (top > bottom) return false;
    ch.at = ch.c === 0 ? top++ : bottom--;
    const port = new MessageChannel();
    ch.channel = port;
    Atomics.store(flags, ch.c + 1, 0);
    const batch: LevelBatch = { tasks: [t[ch.at]], initialState: ch.state, initialM_cm3: ch.M };
    ch.w.postMessage({ batch, port: port.port2, flags, slot: ch.c + 1 } satisfies WorkMessage, [port.port2]);
    return true;
  };
  let active = chains.filter(assign).length;
  while (active > 0) {
    for (const ch of chains) {
      if (ch.at < 0 || Atomics.load(flags, ch.c + 1) === 0) continue;
      const out = receiveMessageOnPort(ch.channel.port1)?.message as LevelBatchResult;
      ch.channel.port1.close();
      levels[ch.at] = out.levels[0];
      if (out.states[0]) {
        ch.state = out.states[0];
        ch.M = out.M_cm3[0];
      }
      ch.at = -1;
      if (!assign(ch)) active--;
    }
    if (active > 0 && chains.every((ch) => ch.at < 0 || Atomics.load(flags, ch.c + 1) === 0))
      Atomics.wait(flags, 0, Atomics.load(flags, 0), 1000);
  }
  return levels;
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

function twoEnded(mode: "instantaneous" | "diurnal"): string {
  return summary(runTwoEnded(tasksOf(mode)));
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
        name: "sweep 51 levels, instantaneous, 2 workers (two warm-started chains from both ends; the service's way)",
        run: () => twoEnded("instantaneous"),
        iterations: 5,
        note: "aim: under 1 s on the 2-core machine; the service runs instantaneous sweeps as one chain by default (useParallel)",
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
        name: "sweep 51 levels, 24-hour, 2 workers (two warm-started chains from both ends; the service's way)",
        run: () => twoEnded("diurnal"),
        iterations: 1,
      },
      {
        name: "sweep 51 levels, 24-hour, 2 workers (2 warm-started chunks)",
        run: () => chunked("diurnal"),
        iterations: 1,
      },
    ]
  : [];
