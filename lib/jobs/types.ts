/**
 * The job interface for long work (profile sweeps, comparisons): submit,
 * progress, cancel, result. Back-end neutral: inputs are plain JSON, results
 * are stored records named by id, so that a queue in another process (e.g.
 * Redis) can implement the same interface with the same handlers.
 */

export type JobState = "queued" | "running" | "done" | "failed" | "cancelled";

export interface JobError {
  code: string;
  message: string;
  path?: string;
}

/** What GET /api/jobs/{id} returns. */
export interface JobStatus {
  /** unguessable id (96 random bits, base64url) */
  id: string;
  kind: string;
  state: JobState;
  /** units of work finished (levels, for a sweep) */
  done: number;
  /** units of work known so far; may grow (e.g. another pass over the levels) */
  total: number;
  /** what is running now, for people, e.g. "pass 2 of at most 3" */
  stage: string;
  /** id of the stored result, when done */
  resultId?: string;
  /** record kind of the result, e.g. "profile", "comparison" */
  resultKind?: string;
  /** why it failed, when failed */
  error?: JobError;
  /** ISO 8601 */
  createdAt: string;
  /** ISO 8601 */
  updatedAt: string;
}

/**
 * Where a job's units of work (JSON tasks: a batch of levels, a block of
 * samples) are computed. Given to handlers by back ends that distribute
 * tasks (BullMQ: queue workers on any machine); absent on the embedded back
 * end, whose handlers use the engine pool of their own process.
 */
export interface TaskRunner {
  /** how many tasks are worth running at once (e.g. the number of sweep chunks) */
  parallel: number;
  /** computes one engine task (plain JSON, e.g. { kind: "profile-levels", … }); resolves to its result */
  run(task: unknown): Promise<unknown>;
}

/** What a handler is given besides its input. */
export interface JobContext {
  jobId: string;
  /** aborted when the job is cancelled; handlers check it between units of work */
  signal: AbortSignal;
  /** reports progress; `stage` is optional text for people */
  progress(done: number, total: number, stage?: string): void;
  /** where to send the job's tasks; absent: the process's own engine pool */
  tasks?: TaskRunner;
}

/** Does the work of one job kind and stores its result; returns where. */
export type JobHandler<Input = unknown> = (
  input: Input,
  ctx: JobContext,
) => Promise<{ resultId: string; resultKind: string }>;

export interface JobBackend {
  /** queues a job; the input must be plain JSON */
  submit(kind: string, input: unknown): Promise<JobStatus>;
  /** null when unknown (or expired) */
  status(id: string): Promise<JobStatus | null>;
  /** cancels a queued or running job; a finished job is returned unchanged; null when unknown */
  cancel(id: string): Promise<JobStatus | null>;
  /** calls `listener` on every change (first with the current status) until the job ends; returns an unsubscribe function */
  watch(id: string, listener: (s: JobStatus) => void): () => void;
  close(): Promise<void>;
}

/** A job in a final state. */
export const isFinal = (s: JobState): boolean => s === "done" || s === "failed" || s === "cancelled";
