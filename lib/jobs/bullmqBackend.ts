/**
 * The BullMQ back end of the job interface, as a web instance uses it: a job
 * is an entry in the "jobs" queue in Redis, run by a queue worker on any
 * machine (`npm run worker`, see bullmqWorker.ts). Everything about a job
 * lives in Redis (state, progress, result id, error, cancellation mark), so
 * any web instance, also one restarted mid-job, reads the same status.
 * `watch` follows BullMQ's queue events, with a slow poll as a safety net.
 */
import { randomBytes } from "node:crypto";
import { type Job, Queue, QueueEvents } from "bullmq";
import type { Redis } from "ioredis";
import { EngineError } from "../errors";
import {
  type BullmqConfig,
  cancelKey,
  connect,
  connectLazily,
  JOBS_QUEUE,
  type JobData,
  type JobProgress,
  ready,
} from "./bullmqConfig";
import { isFinal, type JobBackend, type JobError, type JobStatus } from "./types";

export const BULLMQ_BACKEND_DEFAULTS = {
  /** ms between status reads while a job is watched (events usually come first); default 1000 */
  poll_ms: 1000,
};

export type BullmqBackendOptions = Partial<typeof BULLMQ_BACKEND_DEFAULTS> & {
  /** job kinds that workers know; submit refuses others */
  kinds: readonly string[];
};

const iso = (ms: number | undefined, fallback: string) => (ms ? new Date(ms).toISOString() : fallback);

/** The failure of a job as stored by the worker (a JSON JobError), or a generic one. */
export function parseJobError(reason: string | undefined): JobError {
  try {
    const e = JSON.parse(reason ?? "");
    if (e && typeof e.code === "string" && typeof e.message === "string") return e;
  } catch {
    // not ours: a worker crash or a Redis-side failure
  }
  return { code: "internal", message: "internal error; nothing was stored" };
}

/** A BullMQ job as the job interface's status. */
export function toJobStatus(job: Job, state: string, cancelledAt: string | null): JobStatus {
  const data = job.data as JobData;
  const p = (job.progress && typeof job.progress === "object" ? job.progress : {}) as Partial<JobProgress>;
  const base: JobStatus = {
    id: job.id as string,
    kind: job.name,
    state: "queued",
    done: p.done ?? 0,
    total: p.total ?? 0,
    stage: p.stage ?? "queued",
    createdAt: data.createdAt,
    updatedAt: p.updatedAt ?? data.createdAt,
  };
  if (state === "completed") {
    const out = job.returnvalue as { resultId: string; resultKind: string };
    return { ...base, state: "done", stage: "done", ...out, updatedAt: iso(job.finishedOn, base.updatedAt) };
  }
  const cancelled = cancelledAt ?? data.cancelledAt ?? null;
  if (cancelled) return { ...base, state: "cancelled", stage: "cancelled", updatedAt: cancelled };
  if (state === "failed") {
    return {
      ...base,
      state: "failed",
      stage: "failed",
      error: parseJobError(job.failedReason),
      updatedAt: iso(job.finishedOn, base.updatedAt),
    };
  }
  if (state === "active") return { ...base, state: "running", stage: p.stage ?? "running" };
  return base;
}

export class BullmqJobBackend implements JobBackend {
  private readonly queue: Queue;
  private events: QueueEvents | null = null;
  private readonly o: typeof BULLMQ_BACKEND_DEFAULTS & BullmqBackendOptions;
  private readonly watchers = new Set<() => void>();
  /** a plain connection for the cancellation marks */
  private readonly client: Redis;

  constructor(
    private readonly config: BullmqConfig,
    options: BullmqBackendOptions,
  ) {
    this.o = { ...BULLMQ_BACKEND_DEFAULTS, ...options };
    this.queue = new Queue(JOBS_QUEUE, { connection: connect(config), prefix: config.prefix });
    this.client = connectLazily(config);
  }

  private redis(): Promise<Redis> {
    return ready(this.client);
  }

  async submit(kind: string, input: unknown): Promise<JobStatus> {
    if (!this.o.kinds.includes(kind)) throw new EngineError("unknown-job", `no job handler for kind "${kind}"`);
    const id = randomBytes(12).toString("base64url");
    const data: JobData = { input: JSON.parse(JSON.stringify(input)), createdAt: new Date().toISOString() };
    await this.queue.add(kind, data, {
      jobId: id,
      attempts: this.config.jobAttempts,
      backoff: { type: "exponential", delay: this.config.backoff_ms },
      removeOnComplete: { age: this.config.keep_s },
      removeOnFail: { age: this.config.keep_s },
    });
    return {
      id,
      kind,
      state: "queued",
      done: 0,
      total: 0,
      stage: "queued",
      createdAt: data.createdAt,
      updatedAt: data.createdAt,
    };
  }

  async status(id: string): Promise<JobStatus | null> {
    let job = await this.queue.getJob(id);
    if (!job) return null;
    const client = await this.redis();
    const [state, cancelledAt] = await Promise.all([job.getState(), client.get(cancelKey(this.config, id))]);
    // finished between the two reads: read the job again for its result or failure
    if ((state === "completed" || state === "failed") && !job.finishedOn) job = (await this.queue.getJob(id)) ?? job;
    return toJobStatus(job, state, cancelledAt);
  }

  async cancel(id: string): Promise<JobStatus | null> {
    const s = await this.status(id);
    if (!s || isFinal(s.state)) return s;
    const client = await this.redis();
    await client.set(cancelKey(this.config, id), new Date().toISOString(), "EX", this.config.keep_s);
    // A job nobody has started yet keeps the mark in its own data, which lives as long as the job (the Redis mark
    // expires): a worker that takes it later ends it at once, and its status stays readable. A running job stops
    // at its next task, or at once when it is waiting for one.
    const job = await this.queue.getJob(id);
    if (job && ["waiting", "delayed", "prioritized", "waiting-children"].includes(await job.getState()))
      await job.updateData({ ...(job.data as JobData), cancelledAt: new Date().toISOString() }).catch(() => {});
    return (
      (await this.status(id)) ?? { ...s, state: "cancelled", stage: "cancelled", updatedAt: new Date().toISOString() }
    );
  }

  watch(id: string, listener: (s: JobStatus) => void): () => void {
    let last = "";
    let stopped = false;
    let reading = false;
    let again = false;
    const check = async () => {
      if (stopped) return;
      if (reading) {
        again = true;
        return;
      }
      reading = true;
      try {
        const s = await this.status(id);
        if (s && !stopped) {
          const key = JSON.stringify(s);
          if (key !== last) {
            last = key;
            listener(s);
          }
          if (isFinal(s.state)) stop();
        }
      } catch {
        // Redis unreachable for a moment: the next event or poll tries again
      } finally {
        reading = false;
        if (again && !stopped) {
          again = false;
          void check();
        }
      }
    };
    const onEvent = (e: { jobId: string }) => {
      if (e.jobId === id) void check();
    };
    const events = this.queueEvents();
    const names = ["active", "progress", "completed", "failed", "removed"] as const;
    for (const n of names) events.on(n, onEvent);
    const timer = setInterval(check, this.o.poll_ms);
    timer.unref();
    const stop = () => {
      if (stopped) return;
      stopped = true;
      clearInterval(timer);
      for (const n of names) events.off(n, onEvent);
      this.watchers.delete(stop);
    };
    this.watchers.add(stop);
    void check();
    return stop;
  }

  async close(): Promise<void> {
    for (const stop of [...this.watchers]) stop();
    await this.events?.close();
    await this.queue.close();
    await this.client.quit();
  }

  private queueEvents(): QueueEvents {
    this.events ??= new QueueEvents(JOBS_QUEUE, { connection: connect(this.config), prefix: this.config.prefix });
    return this.events;
  }
}
