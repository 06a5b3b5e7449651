/**
 * The embedded job back end: jobs live in this process's memory and run as
 * async handlers here; the compute inside a handler goes to the engine's
 * worker pool. At most `concurrency` jobs run at once (the pool bounds the
 * threads; this bounds how many sweeps share them). Finished jobs are kept
 * for `keep_ms` so their status can still be read, then forgotten; jobs do
 * not survive a restart, but their stored results do.
 */
import { randomBytes } from "node:crypto";
import { EngineError } from "../errors";
import { isFinal, type JobBackend, type JobHandler, type JobStatus } from "./types";

export const EMBEDDED_DEFAULTS = {
  /** jobs running at once; default 2 */
  concurrency: 2,
  /** how long a finished job's status is kept, ms; default 1 h */
  keep_ms: 3_600_000,
  /** most jobs held (queued, running and finished); default 1000 */
  maxJobs: 1000,
};

export type EmbeddedOptions = Partial<typeof EMBEDDED_DEFAULTS>;

interface Entry {
  status: JobStatus;
  input: unknown;
  controller: AbortController;
  listeners: Set<(s: JobStatus) => void>;
  finishedAt?: number;
}

export class EmbeddedJobBackend implements JobBackend {
  private readonly jobs = new Map<string, Entry>();
  private readonly queue: string[] = [];
  private running = 0;
  private readonly o: typeof EMBEDDED_DEFAULTS;

  constructor(
    private readonly handlers: Readonly<Record<string, JobHandler<never>>>,
    options: EmbeddedOptions = {},
  ) {
    this.o = { ...EMBEDDED_DEFAULTS, ...options };
  }

  async submit(kind: string, input: unknown): Promise<JobStatus> {
    if (!this.handlers[kind]) throw new EngineError("unknown-job", `no job handler for kind "${kind}"`);
    this.evict();
    if (this.jobs.size >= this.o.maxJobs) {
      throw new EngineError("busy", `the server holds ${this.o.maxJobs} jobs already; try again in a few minutes`);
    }
    const now = new Date().toISOString();
    const id = randomBytes(12).toString("base64url");
    const status: JobStatus = {
      id,
      kind,
      state: "queued",
      done: 0,
      total: 0,
      stage: "queued",
      createdAt: now,
      updatedAt: now,
    };
    // a JSON copy: what a queue in another process would see
    this.jobs.set(id, {
      status,
      input: JSON.parse(JSON.stringify(input)),
      controller: new AbortController(),
      listeners: new Set(),
    });
    this.queue.push(id);
    queueMicrotask(() => this.pump());
    return { ...status };
  }

  async status(id: string): Promise<JobStatus | null> {
    const e = this.jobs.get(id);
    return e ? { ...e.status } : null;
  }

  async cancel(id: string): Promise<JobStatus | null> {
    const e = this.jobs.get(id);
    if (!e) return null;
    if (isFinal(e.status.state)) return { ...e.status };
    const i = this.queue.indexOf(id);
    if (i >= 0) this.queue.splice(i, 1);
    e.controller.abort(new EngineError("cancelled", "the job was cancelled"));
    this.update(e, { state: "cancelled", stage: "cancelled" });
    return { ...e.status };
  }

  watch(id: string, listener: (s: JobStatus) => void): () => void {
    const e = this.jobs.get(id);
    if (!e) return () => {};
    listener({ ...e.status });
    if (isFinal(e.status.state)) return () => {};
    e.listeners.add(listener);
    return () => e.listeners.delete(listener);
  }

  async close(): Promise<void> {
    for (const id of [...this.jobs.keys()]) await this.cancel(id);
  }

  private pump(): void {
    while (this.running < this.o.concurrency && this.queue.length > 0) {
      const id = this.queue.shift() as string;
      const e = this.jobs.get(id);
      if (e?.status.state !== "queued") continue;
      this.running++;
      void this.execute(e).finally(() => {
        this.running--;
        this.pump();
      });
    }
  }

  private async execute(e: Entry): Promise<void> {
    const handler = this.handlers[e.status.kind] as JobHandler<unknown>;
    this.update(e, { state: "running", stage: "running" });
    try {
      const out = await handler(e.input, {
        jobId: e.status.id,
        signal: e.controller.signal,
        progress: (done, total, stage) => {
          if (e.status.state === "running") this.update(e, { done, total, stage: stage ?? e.status.stage });
        },
      });
      if (e.status.state === "running") this.update(e, { state: "done", stage: "done", ...out });
    } catch (err) {
      if (e.status.state !== "running") return;
      const error =
        err instanceof EngineError
          ? { code: err.code, message: err.message, ...(err.path ? { path: err.path } : {}) }
          : { code: "internal", message: "internal error; nothing was stored" };
      if (!(err instanceof EngineError)) console.error(err);
      this.update(e, { state: "failed", stage: "failed", error });
    }
  }

  private update(e: Entry, patch: Partial<JobStatus>): void {
    e.status = { ...e.status, ...patch, updatedAt: new Date().toISOString() };
    if (isFinal(e.status.state)) e.finishedAt = Date.now();
    const snapshot = { ...e.status };
    for (const l of e.listeners) l(snapshot);
    if (isFinal(e.status.state)) e.listeners.clear();
  }

  private evict(): void {
    const cutoff = Date.now() - this.o.keep_ms;
    for (const [id, e] of this.jobs) if (e.finishedAt !== undefined && e.finishedAt < cutoff) this.jobs.delete(id);
  }
}
