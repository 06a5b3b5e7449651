/**
 * The queue worker's process (`npm run worker`; scripts/worker.mjs bundles
 * this file to .engine/queue-worker.<pid>.mjs and calls `main`): it takes job
 * orchestrations and tasks from Redis (lib/jobs/bullmqWorker.ts), runs the
 * service's job handlers, and computes tasks in its own engine worker
 * threads (OZONE_WORKER_TASKS, default: the cores).
 */
import { bullmqConfigFromEnv } from "../jobs/bullmqConfig";
import { type QueueWorker, startQueueWorker } from "../jobs/bullmqWorker";
import { EnginePool, POOL_DEFAULTS } from "../runtime/pool";
import type { EngineJob } from "../runtime/taskTable";
import { JOB_HANDLERS } from "../service/jobs";
import { UNCERTAINTY_JOB_DEFAULTS } from "../service/uncertainty";

/**
 * Task kinds with a longer time limit than the pool's default, as the
 * embedded back end gives them (only uncertainty jobs send "analysis" tasks
 * to the queue: their central solve, with sensitivities when asked).
 */
const TASK_TIMEOUTS_MS: Partial<Record<EngineJob["kind"], number>> = {
  analysis: UNCERTAINTY_JOB_DEFAULTS.timeout_ms,
  "uncertainty-samples": UNCERTAINTY_JOB_DEFAULTS.timeout_ms,
};

export interface RunningQueueWorker {
  worker: QueueWorker;
  config: ReturnType<typeof bullmqConfigFromEnv>;
  /** stops taking entries, lets running ones finish, then ends the engine threads */
  close(): Promise<void>;
}

export async function main(): Promise<RunningQueueWorker> {
  const config = bullmqConfigFromEnv();
  const pool = new EnginePool({ ...POOL_DEFAULTS, size: config.workerTasks });
  const worker = await startQueueWorker(config, {
    handlers: JOB_HANDLERS,
    runTask: (task) => pool.run(task as EngineJob, TASK_TIMEOUTS_MS[(task as EngineJob).kind]),
    // Redis gone for good: exit, so that a supervisor starts a fresh worker
    onLost: () => {
      console.error("queue worker: the connection to Redis is lost; exiting");
      process.exit(1);
    },
  });
  return {
    worker,
    config,
    close: async () => {
      await worker.close();
      await pool.close();
    },
  };
}
