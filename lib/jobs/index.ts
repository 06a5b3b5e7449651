export { BULLMQ_BACKEND_DEFAULTS, BullmqJobBackend, parseJobError, toJobStatus } from "./bullmqBackend";
export { BULLMQ_DEFAULTS, type BullmqConfig, bullmqConfigFromEnv } from "./bullmqConfig";
export {
  type QueueWorker,
  type QueueWorkerOptions,
  queueTaskRunner,
  startQueueWorker,
  taskId,
  WORKER_DEFAULTS,
} from "./bullmqWorker";
export { createJobBackend } from "./createJobBackend";
export { EMBEDDED_DEFAULTS, EmbeddedJobBackend, type EmbeddedOptions } from "./embeddedBackend";
export type * from "./types";
export { isFinal } from "./types";
