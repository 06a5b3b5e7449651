/** Progress of an uncertainty job: stage text and a bar of the units done. */
import type { UncertaintyJobState } from "./useUncertaintyJob";

export function JobBar({ job }: { job: UncertaintyJobState }) {
  if (job.state === "idle") return null;
  const f = job.total > 0 ? job.done / job.total : 0;
  return (
    <div data-testid="uncertainty-progress" className="px-3 py-1.5 text-[11px] text-stone-600" aria-live="polite">
      {job.error ? (
        <p className="text-red-800">{job.error}</p>
      ) : (
        <>
          <p>
            {job.stage} {job.total > 0 ? `(${job.done} of ${job.total})` : ""}
          </p>
          <div
            className="mt-0.5 h-1.5 w-full rounded bg-stone-200"
            role="progressbar"
            aria-valuemin={0}
            aria-valuemax={job.total}
            aria-valuenow={job.done}
          >
            <div className="h-1.5 rounded bg-stone-700" style={{ width: `${Math.round(f * 100)}%` }} />
          </div>
        </>
      )}
    </div>
  );
}
