/**
 * Configuration of the BullMQ back end, shared by the web side (submit,
 * status, cancel, watch) and the queue workers (`npm run worker`). Two
 * queues: "jobs" holds one entry per submitted job (its orchestration, e.g.
 * a sweep's pass logic), "tasks" holds the units of work the jobs split into
 * (a batch of levels, a block of samples).
 */
import { availableParallelism } from "node:os";
import { Redis } from "ioredis";

export const BULLMQ_DEFAULTS = {
  /** key prefix in Redis (OZONE_QUEUE_PREFIX); default "ozone" */
  prefix: "ozone",
  /** runs of a job's orchestration, counting the first (a worker that died mid-job); default 3 */
  jobAttempts: 3,
  /** runs of one task, counting the first (a failed or lost task is retried); default 4 */
  taskAttempts: 4,
  /** first retry delay, ms, doubled at each retry; default 1000 */
  backoff_ms: 1000,
  /** how long finished jobs and task results are kept, s; default 24 h */
  keep_s: 86_400,
  /** ms a worker's lock on a job or task lasts without renewal (OZONE_QUEUE_LOCK_MS): a worker silent this long is taken for dead and its entries retried; default 30 s */
  lock_ms: 30_000,
  /** times an entry may be taken back from a dead worker before it fails; default 5 */
  maxStalledCount: 5,
  /** tasks one worker process computes at once (OZONE_WORKER_TASKS); default: its cores */
  workerTasks: Math.max(1, availableParallelism()),
  /** orchestrations one worker process runs at once (OZONE_WORKER_JOBS; mostly waiting); default 4 */
  workerJobs: 4,
  /** tasks a job keeps in flight, e.g. sweep chunks (OZONE_QUEUE_PARALLEL); default: the cores of the orchestrating process, as the embedded pool */
  parallel: Math.max(1, availableParallelism()),
};

export type BullmqConfig = typeof BULLMQ_DEFAULTS & {
  /** redis://host:port[/db] */
  url: string;
};

const int = (v: string | undefined, name: string, min: number): number | undefined => {
  if (v === undefined || v === "") return undefined;
  const n = Number(v);
  if (!Number.isInteger(n) || n < min)
    throw new Error(`${name}: expected an integer ≥ ${min}, got ${JSON.stringify(v)}`);
  return n;
};

/** The configuration from the environment; REDIS_URL must be set. */
export function bullmqConfigFromEnv(env: NodeJS.ProcessEnv = process.env): BullmqConfig {
  const url = env.REDIS_URL;
  if (!url) throw new Error("REDIS_URL is not set: the BullMQ back end needs redis://host:port");
  const pick = <T>(v: T | undefined, d: T) => (v === undefined ? d : v);
  return {
    ...BULLMQ_DEFAULTS,
    url,
    prefix: env.OZONE_QUEUE_PREFIX || BULLMQ_DEFAULTS.prefix,
    lock_ms: pick(int(env.OZONE_QUEUE_LOCK_MS, "OZONE_QUEUE_LOCK_MS", 500), BULLMQ_DEFAULTS.lock_ms),
    workerTasks: pick(int(env.OZONE_WORKER_TASKS, "OZONE_WORKER_TASKS", 1), BULLMQ_DEFAULTS.workerTasks),
    workerJobs: pick(int(env.OZONE_WORKER_JOBS, "OZONE_WORKER_JOBS", 1), BULLMQ_DEFAULTS.workerJobs),
    parallel: pick(int(env.OZONE_QUEUE_PARALLEL, "OZONE_QUEUE_PARALLEL", 1), BULLMQ_DEFAULTS.parallel),
  };
}

export const JOBS_QUEUE = "jobs";
export const TASKS_QUEUE = "tasks";

/** Redis key of a job's cancellation mark. */
export const cancelKey = (c: BullmqConfig, jobId: string) => `${c.prefix}:cancelled:${jobId}`;

/**
 * A new ioredis connection for one BullMQ object (each Queue, Worker and
 * QueueEvents holds its own). BullMQ needs maxRetriesPerRequest: null for its
 * blocking connections; ioredis reconnects with backoff after a lost connection.
 */
export const connect = (c: BullmqConfig): Redis => new Redis(c.url, { maxRetriesPerRequest: null });

/** A connection of our own (cancellation marks), connected on first use. */
export const connectLazily = (c: BullmqConfig): Redis =>
  new Redis(c.url, { maxRetriesPerRequest: null, lazyConnect: true });

/** Connects a lazily created client once; later calls return at once. */
export async function ready(client: Redis): Promise<Redis> {
  if (client.status === "wait") await client.connect();
  return client;
}

/** What the "jobs" queue holds for a job. */
export interface JobData {
  input: unknown;
  /** ISO 8601 */
  createdAt: string;
  /** ISO 8601; set when the job is cancelled before any worker took it (it stays queued, and is never run) */
  cancelledAt?: string;
}

/** What the "tasks" queue holds for a task. */
export interface TaskData {
  jobId: string;
  task: unknown;
}

/** A job's progress as stored in BullMQ's progress field. */
export interface JobProgress {
  done: number;
  total: number;
  stage: string;
  /** ISO 8601 */
  updatedAt: string;
}
