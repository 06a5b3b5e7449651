/**
 * A pool of engine worker threads sized to the cores, with a time limit per
 * job: a job over its limit has its worker terminated and replaced, and fails
 * with code "timeout", so the server stays responsive.
 */
import { availableParallelism } from "node:os";
import path from "node:path";
import { Worker } from "node:worker_threads";
import { EngineError } from "../errors";
import type { EngineJob, EngineJobResult } from "./taskTable";

/** The most engine workers OZONE_ENGINE_WORKERS may ask for: 4 a core (each loads the engine and its tables). */
export const MAX_ENGINE_WORKERS = 4 * Math.max(1, availableParallelism());

/**
 * OZONE_ENGINE_WORKERS when set (digits only, 1 to MAX_ENGINE_WORKERS), else
 * the number of cores. It sizes the server's pool and the command line's
 * sweep lanes alike. scripts/serve.mjs checks it the same way before the
 * server listens, so a bad value stops the start, not a later request.
 */
export function engineWorkerCount(env: string | undefined): number {
  if (env === undefined || env === "") return Math.max(1, availableParallelism());
  const n = /^[1-9][0-9]*$/.test(env) ? Number(env) : Number.NaN;
  if (!(n >= 1 && n <= MAX_ENGINE_WORKERS))
    throw new RangeError(
      `EnginePool: invalid OZONE_ENGINE_WORKERS: ${JSON.stringify(env)} (expected a whole number from 1 to ${MAX_ENGINE_WORKERS})`,
    );
  return n;
}

export const POOL_DEFAULTS = {
  /** worker threads; default: the number of cores, or OZONE_ENGINE_WORKERS */
  size: engineWorkerCount(process.env.OZONE_ENGINE_WORKERS),
  /** ms a job may run before its worker is terminated */
  timeout_ms: Number(process.env.OZONE_JOB_TIMEOUT_MS ?? 30_000),
  /** the bundled worker script */
  script: path.join(process.cwd(), ".engine", "worker.mjs"),
};

interface Pending {
  id: number;
  job: EngineJob;
  /** buffers moved to the worker instead of copied (a large upload body) */
  transfer: ArrayBuffer[];
  timeout_ms: number;
  resolve: (v: EngineJobResult) => void;
  reject: (e: Error) => void;
}

interface Slot {
  worker: Worker;
  current: Pending | null;
  timer: NodeJS.Timeout | null;
}

export class EnginePool {
  private readonly slots: Slot[] = [];
  private readonly queue: Pending[] = [];
  private nextId = 1;

  constructor(private readonly options = POOL_DEFAULTS) {
    for (let i = 0; i < options.size; i++) this.slots.push(this.spawn());
  }

  /** Runs a job in a worker; the result has the job's kind. */
  run<K extends EngineJob["kind"]>(
    job: Extract<EngineJob, { kind: K }>,
    timeout_ms = this.options.timeout_ms,
    transfer: ArrayBuffer[] = [],
  ): Promise<Extract<EngineJobResult, { kind: K }>> {
    return new Promise((resolve, reject) => {
      this.queue.push({
        id: this.nextId++,
        job,
        transfer,
        timeout_ms,
        resolve: resolve as (v: EngineJobResult) => void,
        reject,
      });
      this.dispatch();
    });
  }

  async close(): Promise<void> {
    await Promise.all(this.slots.map((s) => s.worker.terminate()));
  }

  private spawn(): Slot {
    const slot: Slot = { worker: new Worker(this.options.script), current: null, timer: null };
    slot.worker.unref();
    slot.worker.on("message", (msg: { id: number; ok: boolean; value?: EngineJobResult; error?: ErrorJson }) => {
      const p = slot.current;
      if (!p || p.id !== msg.id) return;
      this.finish(slot);
      if (msg.ok) p.resolve(msg.value as EngineJobResult);
      else p.reject(toEngineError(msg.error));
    });
    slot.worker.on("error", (e) =>
      this.replace(slot, new EngineError("engine-failure", `engine worker failed: ${e.message}`)),
    );
    slot.worker.on("exit", (code) => {
      if (slot.current) this.replace(slot, new EngineError("engine-failure", `engine worker exited with code ${code}`));
    });
    return slot;
  }

  private dispatch(): void {
    for (const slot of this.slots) {
      if (slot.current || this.queue.length === 0) continue;
      const p = this.queue.shift() as Pending;
      slot.current = p;
      slot.timer = setTimeout(() => {
        this.replace(
          slot,
          new EngineError(
            "timeout",
            `the computation took longer than ${(p.timeout_ms / 1000).toFixed(0)} s and was stopped; try a smaller mechanism or fewer levels`,
          ),
        );
      }, p.timeout_ms);
      slot.worker.postMessage({ id: p.id, job: p.job }, p.transfer);
    }
  }

  private finish(slot: Slot): void {
    if (slot.timer) clearTimeout(slot.timer);
    slot.timer = null;
    slot.current = null;
    queueMicrotask(() => this.dispatch());
  }

  private replace(slot: Slot, error: EngineError): void {
    const p = slot.current;
    this.finish(slot);
    const i = this.slots.indexOf(slot);
    slot.worker.removeAllListeners("exit");
    void slot.worker.terminate();
    if (i >= 0) this.slots[i] = this.spawn();
    p?.reject(error);
    this.dispatch();
  }
}

interface ErrorJson {
  code: string;
  message: string;
  path?: string;
  line?: number;
  column?: number;
  name?: string;
  problems?: unknown;
}

function toEngineError(e: ErrorJson | undefined): EngineError {
  const err = new EngineError(e?.code ?? "engine-failure", e?.message ?? "engine failure", {
    path: e?.path,
    line: e?.line,
    column: e?.column,
  });
  if (e?.name) err.name = e.name;
  if (e?.problems) Object.assign(err, { problems: e.problems });
  return err;
}

let shared: EnginePool | null = null;

/** The process-wide pool. */
export function enginePool(): EnginePool {
  shared ??= new EnginePool();
  return shared;
}
