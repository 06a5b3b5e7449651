"use client";
/**
 * Follows a job by polling GET /api/jobs/{id}: a progress bar with the levels
 * done, a cancel button, and on success a move to the result's permalink
 * (carrying the stored record's deletion token in the address fragment, which
 * the page shows once with DeletionTokenNote and removes).
 */
import { useRouter } from "next/navigation";
import { useEffect, useState } from "react";
import { getJson, requestJson } from "../ui/apiClient";

interface JobView {
  id: string;
  state: "queued" | "running" | "done" | "failed" | "cancelled";
  done: number;
  total: number;
  stage: string;
  resultUrl?: string;
  error?: { code: string; message: string; path?: string };
}

export const POLL_MS = 400;

export function JobProgress({
  jobId,
  deletionToken,
  what,
  onEnd,
  unit = "levels",
}: {
  jobId: string;
  /** the token its start returned, for the result's page */
  deletionToken?: string;
  what: string;
  onEnd?(state: string): void;
  /** what `done` and `total` count; default "levels" */
  unit?: string;
}) {
  const router = useRouter();
  const [job, setJob] = useState<JobView | null>(null);
  const [netError, setNetError] = useState<string | null>(null);

  useEffect(() => {
    let stop = false;
    let timer: ReturnType<typeof setTimeout> | undefined;
    const tick = async () => {
      try {
        const body = await getJson<JobView>(`/api/jobs/${jobId}`);
        if (stop) return;
        setJob(body);
        setNetError(null);
        if (body.state === "done" && body.resultUrl) {
          onEnd?.("done");
          router.push(deletionToken ? `${body.resultUrl}#deletion-token=${deletionToken}` : body.resultUrl);
          return;
        }
        if (body.state === "failed" || body.state === "cancelled") {
          onEnd?.(body.state);
          return;
        }
      } catch (e) {
        if (stop) return;
        setNetError((e as Error).message);
      }
      timer = setTimeout(tick, POLL_MS);
    };
    void tick();
    return () => {
      stop = true;
      if (timer) clearTimeout(timer);
    };
  }, [jobId, deletionToken, router, onEnd]);

  const total = Math.max(job?.total ?? 0, 1);
  const done = Math.min(job?.done ?? 0, total);
  const pct = Math.round((done / total) * 100);
  const running = !job || job.state === "queued" || job.state === "running";
  return (
    <div className="rounded-md border border-stone-300 bg-white p-3" data-testid="job-progress">
      <div className="flex items-center justify-between text-[13px]">
        <span id={`job-${jobId}-label`} className="font-medium text-stone-800">
          {what}: {job ? job.state : "starting"}
          {job?.stage && job.state === "running" ? ` — ${job.stage}` : ""}
        </span>
        <span className="tabular-nums text-stone-600">{job ? `${job.done} of ${job.total} ${unit}` : ""}</span>
      </div>
      <div
        role="progressbar"
        aria-labelledby={`job-${jobId}-label`}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={pct}
        className="mt-2 h-3 w-full overflow-hidden rounded bg-stone-200"
      >
        <div className="h-full bg-slate-700 transition-[width] duration-300" style={{ width: `${pct}%` }} />
      </div>
      {job?.state === "failed" ? (
        <p role="alert" className="mt-2 text-[13px] text-red-800">
          Failed: {job.error?.message ?? "unknown error"}
        </p>
      ) : null}
      {job?.state === "cancelled" ? (
        <p className="mt-2 text-[13px] text-stone-700">Cancelled; nothing was stored.</p>
      ) : null}
      {job?.state === "done" ? <p className="mt-2 text-[13px] text-stone-700">Done — opening the result…</p> : null}
      {netError ? <p className="mt-2 text-[12px] text-amber-800">Connection problem ({netError}); retrying…</p> : null}
      {running ? (
        <button
          type="button"
          className="mt-2 rounded border border-stone-400 px-3 py-1 text-[12px] hover:bg-stone-100 focus:outline-2 focus:outline-offset-2"
          onClick={() => void requestJson(`/api/jobs/${jobId}`, { method: "DELETE" }).catch(() => {})}
        >
          Cancel
        </button>
      ) : null}
    </div>
  );
}
