/**
 * Submitting, reading and cancelling uncertainty jobs on the shared job back
 * end (embedded, or BullMQ when REDIS_URL is set), so /api/jobs/{id} covers
 * these jobs too. The handler and the stored results are in
 * lib/service/uncertainty.ts; kept apart so that lib/service/jobs.ts can
 * register the handler without an import circle.
 */
import "server-only";
import type { JobStatus } from "../jobs/types";
import { notFound } from "./http";
import { jobBackend, submitForClient } from "./jobs";
import { validateUncertaintyJob } from "./uncertainty";

export interface UncertaintyJobView extends JobStatus {
  statusUrl: string;
  /** the stored result as JSON, when done */
  resultApiUrl?: string;
}

function view(s: JobStatus): UncertaintyJobView {
  const v: UncertaintyJobView = { ...s, statusUrl: `/api/uncertainty/jobs/${s.id}` };
  if (s.state === "done" && s.resultId)
    v.resultApiUrl =
      s.resultKind === "analysis" ? `/api/analyses/${s.resultId}` : `/api/uncertainty/profiles/${s.resultId}`;
  return v;
}

/** Validates and queues; throws InputError (400) before anything is queued. */
export async function startUncertaintyJob(body: unknown, client = "local"): Promise<UncertaintyJobView> {
  return view(await submitForClient(client, "uncertainty", await validateUncertaintyJob(body)));
}

const JOB_ID = /^[A-Za-z0-9_-]{16}$/;

export async function getUncertaintyJob(id: string): Promise<UncertaintyJobView> {
  const s = JOB_ID.test(id) ? await jobBackend().status(id) : null;
  if (!s) throw notFound("uncertainty job", id);
  return view(s);
}

/** Cancels a queued or running uncertainty job (no record is stored); a finished job is returned unchanged. */
export async function cancelUncertaintyJob(id: string): Promise<UncertaintyJobView> {
  const s = JOB_ID.test(id) ? await jobBackend().cancel(id) : null;
  if (!s) throw notFound("uncertainty job", id);
  return view(s);
}
