/**
 * A queue worker of the BullMQ back end (started by `npm run worker`, any
 * number of them on any machines that reach the same Redis and database).
 * Each process takes from both queues:
 *
 * - "jobs": runs a job's handler (the same handlers as the embedded back
 *   end), whose context sends its tasks to the "tasks" queue and waits for
 *   them; progress goes to BullMQ's progress field; the result is stored by
 *   the handler (shared store) and its id returned.
 * - "tasks": computes one task (e.g. a "profile-levels" engine job) with the
 *   given `runTask` (the process's engine pool).
 *
 * Idempotence: a task's BullMQ id is the job id plus a SHA-256 of the task's
 * JSON, so a task asked for twice (its job's orchestration restarted after a
 * worker died) is queued once and its stored result is reused; a task whose
 * worker died is taken back after the lock expires and retried (with
 * exponential backoff after failures). The job's result is built from one
 * result per task id, so nothing is counted twice.
 */
import { createHash } from "node:crypto";
import { hostname } from "node:os";
import { type Job, Queue, QueueEvents, UnrecoverableError, Worker } from "bullmq";
import { EngineError } from "../errors";
import { parseJobError } from "./bullmqBackend";
import {
  type BullmqConfig,
  cancelKey,
  connect,
  connectLazily,
  JOBS_QUEUE,
  type JobData,
  type JobProgress,
  ready,
  TASKS_QUEUE,
  type TaskData,
} from "./bullmqConfig";
import type { JobContext, JobHandler, TaskRunner } from "./types";

export const WORKER_DEFAULTS = {
  /** ms between checks of a running job's cancellation mark; default 500 */
  cancelPoll_ms: 500,
  /** least ms between two progress writes of one job (the last one is always written); default 200 */
  progressEvery_ms: 200,
};

export type QueueWorkerOptions = Partial<typeof WORKER_DEFAULTS> & {
  handlers: Readonly<Record<string, JobHandler<never>>>;
  /** computes one task in this process */
  runTask: (task: unknown) => Promise<unknown>;
  /** this worker's name in Redis (shown as the processor of its entries); default host-pid */
  name?: string;
  /** called when the connection to Redis is lost for good (it is re-opened for a minute first) */
  onLost?: () => void;
};

export interface QueueWorker {
  readonly name: string;
  /** stops taking entries, lets running ones finish, closes the connections */
  close(): Promise<void>;
}

/** The BullMQ id of a task: the job's id and the task's content, so the same task is the same entry. */
export function taskId(jobId: string, task: unknown): string {
  return `${jobId}-${createHash("sha256").update(JSON.stringify(task)).digest("hex").slice(0, 32)}`;
}

/** The task's result, or the abort reason as soon as the signal fires (the task is then left to the queue). */
function untilFinishedOrAborted<T>(finished: Promise<T>, signal?: AbortSignal): Promise<T> {
  if (!signal) return finished;
  return new Promise<T>((resolve, reject) => {
    const onAbort = () => reject(signal.reason);
    // handlers first: a task that fails after the abort must not become an unhandled rejection
    finished.then(resolve, reject).finally(() => signal.removeEventListener("abort", onAbort));
    if (signal.aborted) onAbort();
    else signal.addEventListener("abort", onAbort, { once: true });
  });
}

/**
 * A job's task runner on the "tasks" queue: each task is queued under its
 * content id and awaited through the queue's events. Used by the jobs'
 * orchestration, and by anything else that fans JSON tasks out to workers.
 */
export function queueTaskRunner(
  config: BullmqConfig,
  tasksQueue: Queue,
  taskEvents: QueueEvents,
  jobId: string,
  signal?: AbortSignal,
): TaskRunner {
  return {
    parallel: config.parallel,
    async run(task) {
      if (signal?.aborted) throw signal.reason;
      const entry = await tasksQueue.add("task", { jobId, task } satisfies TaskData, {
        jobId: taskId(jobId, task),
        attempts: config.taskAttempts,
        backoff: { type: "exponential", delay: config.backoff_ms },
        removeOnComplete: { age: config.keep_s },
        removeOnFail: { age: config.keep_s },
      });
      try {
        return await untilFinishedOrAborted(entry.waitUntilFinished(taskEvents), signal);
      } catch (e) {
        // a cancellation while the task waits or runs: the job stops now, the task itself is skipped or ignored
        if (signal?.aborted && e === signal.reason) throw e;
        // the task's own error as the embedded pool would have thrown it (e.g. "timeout"), after its retries
        const err = parseJobError((e as Error).message);
        if (err.code === "internal") throw new EngineError("engine-failure", `a task of job ${jobId} failed`);
        throw new EngineError(err.code, err.message, err.path ? { path: err.path } : undefined);
      }
    },
  };
}

const errorJson = (e: EngineError) =>
  JSON.stringify({ code: e.code, message: e.message, ...(e.path ? { path: e.path } : {}) });

export async function startQueueWorker(config: BullmqConfig, options: QueueWorkerOptions): Promise<QueueWorker> {
  const o = { ...WORKER_DEFAULTS, ...options };
  const name = o.name ?? `${hostname()}-${process.pid}`;
  const common = { prefix: config.prefix };
  const tasksQueue = new Queue(TASKS_QUEUE, { connection: connect(config), ...common });
  const taskEvents = new QueueEvents(TASKS_QUEUE, { connection: connect(config), ...common });
  await taskEvents.waitUntilReady();
  const redis = await ready(connectLazily(config));
  let closing = false;
  redis.on("end", () => {
    if (!closing) o.onLost?.();
  });
  const isCancelled = async (jobId: string) => (await redis.get(cancelKey(config, jobId))) !== null;
  const workerOptions = {
    ...common,
    name,
    lockDuration: config.lock_ms,
    stalledInterval: Math.max(250, Math.floor(config.lock_ms / 2)),
    maxStalledCount: config.maxStalledCount,
  };

  const runnerFor = (jobId: string, signal: AbortSignal) =>
    queueTaskRunner(config, tasksQueue, taskEvents, jobId, signal);

  const tasksWorker = new Worker(
    TASKS_QUEUE,
    async (job: Job<TaskData>) => {
      // a cancelled job's remaining tasks are not computed
      if (await isCancelled(job.data.jobId)) return null;
      try {
        return await o.runTask(job.data.task);
      } catch (e) {
        if (!(e instanceof EngineError)) throw e;
        // a crashed engine thread is worth another try; a time limit or a bad input would fail again
        if (e.code === "engine-failure") throw new Error(errorJson(e));
        throw new UnrecoverableError(errorJson(e));
      }
    },
    { ...workerOptions, connection: connect(config), concurrency: config.workerTasks },
  );

  const jobsWorker = new Worker(
    JOBS_QUEUE,
    async (job: Job<JobData>) => {
      const id = job.id as string;
      const handler = o.handlers[job.name] as JobHandler<unknown> | undefined;
      if (!handler) {
        throw new UnrecoverableError(
          errorJson(new EngineError("unknown-job", `this worker has no handler for job kind "${job.name}"`)),
        );
      }
      const controller = new AbortController();
      const cancelled = new EngineError("cancelled", "the job was cancelled");
      const poll = setInterval(async () => {
        if (!controller.signal.aborted && (await isCancelled(id).catch(() => false))) controller.abort(cancelled);
      }, o.cancelPoll_ms);
      // a job taken over from a worker that died starts its handler again; its finished tasks come back from
      // their stored results at once, and the progress shown does not fall back meanwhile
      const before = (job.progress && typeof job.progress === "object" ? job.progress : {}) as Partial<JobProgress>;
      let lastWrite = 0;
      let pending: JobProgress | null = null;
      let flushTimer: NodeJS.Timeout | null = null;
      let flushing: Promise<void> = Promise.resolve();
      const write = (p: JobProgress) => {
        flushing = flushing.then(() => job.updateProgress(p as unknown as object)).catch(() => {});
      };
      const ctx: JobContext = {
        jobId: id,
        signal: controller.signal,
        progress(done, total, stage) {
          const shown = before.total === total ? Math.max(done, before.done ?? 0) : done;
          const p: JobProgress = { done: shown, total, stage: stage ?? "running", updatedAt: new Date().toISOString() };
          const now = Date.now();
          if (now - lastWrite >= o.progressEvery_ms) {
            lastWrite = now;
            pending = null;
            write(p);
          } else {
            pending = p;
            // written a little later unless a newer one comes first
            flushTimer ??= setTimeout(() => {
              flushTimer = null;
              if (pending) {
                lastWrite = Date.now();
                write(pending);
                pending = null;
              }
            }, o.progressEvery_ms);
          }
        },
        tasks: runnerFor(id, controller.signal),
      };
      try {
        if (job.data.cancelledAt || (await isCancelled(id))) throw cancelled;
        const out = await handler(job.data.input, ctx);
        if (pending) write(pending);
        await flushing;
        if (controller.signal.aborted) throw cancelled;
        return out;
      } catch (e) {
        await flushing;
        if (e instanceof EngineError) throw new UnrecoverableError(errorJson(e));
        console.error(e);
        throw e instanceof Error ? e : new Error(String(e));
      } finally {
        clearInterval(poll);
        if (flushTimer) clearTimeout(flushTimer);
      }
    },
    { ...workerOptions, connection: connect(config), concurrency: config.workerJobs },
  );

  for (const w of [tasksWorker, jobsWorker]) {
    w.on("error", (e) => console.error(`queue worker ${name}: ${e.message}`));
  }
  await Promise.all([tasksWorker.waitUntilReady(), jobsWorker.waitUntilReady()]);

  return {
    name,
    async close() {
      closing = true;
      await Promise.all([jobsWorker.close(), tasksWorker.close()]);
      await taskEvents.close();
      await tasksQueue.close();
      await redis.quit();
    },
  };
}
