/**
 * The process's job back end with the handlers of every long job kind:
 * embedded (in memory, compute in the engine pool) by default, BullMQ on
 * Redis when REDIS_URL is set (the handlers then run in `npm run worker`
 * processes, which import JOB_HANDLERS from here). Routes submit and read
 * jobs only through this module.
 */
import "server-only";
import { createJobBackend } from "../jobs/createJobBackend";
import type { JobBackend, JobHandler, JobStatus } from "../jobs/types";
import { notFound } from "./http";
import { jobLedger, jobLimitFromEnv, submitWithinLimit } from "./jobLimit";
import { DELETION_NOTE, deleteWithToken, newDeletionToken } from "./lifecycle";
import {
  COMPARISON_KIND,
  comparisonJob,
  comparisonPath,
  PROFILE_KIND,
  profilePath,
  sweepJob,
  validateComparison,
  validateSweep,
} from "./profiles";
import { RUN_KIND, runJob, runPath, validateRun } from "./runs";
import { uncertaintyJob } from "./uncertainty";

/** The handler of every job kind (also run by the queue workers). */
export const JOB_HANDLERS: Record<string, JobHandler<never>> = {
  "profile-sweep": sweepJob as JobHandler<never>,
  comparison: comparisonJob as JobHandler<never>,
  uncertainty: uncertaintyJob as JobHandler<never>,
  run: runJob as JobHandler<never>,
};

const KEY = Symbol.for("ozone.jobBackend");

/** The process-wide back end (kept on globalThis so that every route module sees the same one). */
export function jobBackend(): JobBackend {
  const g = globalThis as unknown as Record<symbol, JobBackend | undefined>;
  g[KEY] ??= createJobBackend(JOB_HANDLERS);
  return g[KEY];
}

/** A job's status as the routes return it, with the result's links when done. */
export interface JobView extends JobStatus {
  /** GET this to poll */
  statusUrl: string;
  /** the permalink page of the result, when done */
  resultUrl?: string;
  /** the stored result as JSON, when done */
  resultApiUrl?: string;
}

export function jobView(s: JobStatus): JobView {
  const view: JobView = { ...s, statusUrl: `/api/jobs/${s.id}` };
  if (s.state === "done" && s.resultId) {
    if (s.resultKind === RUN_KIND) {
      view.resultUrl = runPath(s.resultId);
      view.resultApiUrl = `/api/runs/${s.resultId}`;
    } else {
      view.resultUrl = s.resultKind === "comparison" ? comparisonPath(s.resultId) : profilePath(s.resultId);
      view.resultApiUrl =
        s.resultKind === "comparison" ? `/api/comparisons/${s.resultId}` : `/api/profiles/${s.resultId}`;
    }
  }
  return view;
}

/** A started job with the deletion token of the record it will store (shown once). */
export interface StartedJob extends JobView {
  deletionToken: string;
  deletionNote: string;
}

/** Submits a job for a client address, within its limit of jobs at once (jobLimit.ts). */
export function submitForClient(client: string, kind: string, input: unknown): Promise<JobStatus> {
  const backend = jobBackend();
  return submitWithinLimit(jobLedger(), backend, client, jobLimitFromEnv(), () => backend.submit(kind, input));
}

async function submitDeletable(kind: string, input: object, client: string): Promise<StartedJob> {
  const deletion = newDeletionToken();
  const view = jobView(await submitForClient(client, kind, { ...input, deleteHash: deletion.hash }));
  return { ...view, deletionToken: deletion.token, deletionNote: DELETION_NOTE };
}

/** `client`: the address the rate limits count by (rateLimit.ts `clientOf`); "local" for callers inside the process. */
export async function startSweep(body: unknown, client = "local"): Promise<StartedJob> {
  return submitDeletable("profile-sweep", await validateSweep(body), client);
}

export async function startComparison(body: unknown, client = "local"): Promise<StartedJob> {
  return submitDeletable("comparison", await validateComparison(body), client);
}

/** DELETE of a stored sweep or comparison with the token its job was started with. */
export async function deleteSweepRecord(kind: "profile" | "comparison", id: string, token: string | null) {
  const what = kind === "profile" ? "profile sweep" : "comparison";
  await deleteWithToken([{ kind: kind === "profile" ? PROFILE_KIND : COMPARISON_KIND, id }], token, what);
}

/** Starts a run over days (no deletion token: a run record is kept until retention removes it). */
export async function startRun(body: unknown, client = "local"): Promise<StartedJob> {
  return submitDeletable("run", await validateRun(body), client);
}

const JOB_ID = /^[A-Za-z0-9_-]{16}$/;

export async function getJob(id: string): Promise<JobView> {
  const s = JOB_ID.test(id) ? await jobBackend().status(id) : null;
  if (!s) throw notFound("job", id);
  return jobView(s);
}

export async function cancelJob(id: string): Promise<JobView> {
  const s = JOB_ID.test(id) ? await jobBackend().cancel(id) : null;
  if (!s) throw notFound("job", id);
  return jobView(s);
}

/** Server-sent events of a job's status until it ends. */
export function jobEvents(id: string, signal: AbortSignal): Response {
  if (!JOB_ID.test(id)) throw notFound("job", id);
  const encoder = new TextEncoder();
  let unsubscribe = () => {};
  const stream = new ReadableStream<Uint8Array>({
    // the first status is read before watching: a back end in another process answers asynchronously
    async start(controller) {
      let closed = false;
      const close = () => {
        if (closed) return;
        closed = true;
        unsubscribe();
        controller.close();
      };
      const first = await jobBackend()
        .status(id)
        .catch(() => null);
      if (first) {
        unsubscribe = jobBackend().watch(id, (s) => {
          if (closed) return;
          controller.enqueue(encoder.encode(`event: status\ndata: ${JSON.stringify(jobView(s))}\n\n`));
          if (s.state === "done" || s.state === "failed" || s.state === "cancelled") queueMicrotask(close);
        });
      } else {
        controller.enqueue(
          encoder.encode(
            `event: error\ndata: ${JSON.stringify({ code: "not-found", message: `no job with id ${id}` })}\n\n`,
          ),
        );
        close();
      }
      signal.addEventListener("abort", close);
    },
    cancel() {
      unsubscribe();
    },
  });
  return new Response(stream, {
    headers: {
      "content-type": "text/event-stream; charset=utf-8",
      "cache-control": "no-cache, no-transform",
      connection: "keep-alive",
    },
  });
}
