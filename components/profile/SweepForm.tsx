"use client";
/** One profile, its levels, and the sweep run as a job. */
import { useCallback, useState } from "react";
import type { SweepGrid } from "@/lib/profiles/types";
import { type SubmittedJob, submitJob } from "../ui/apiClient";
import { GridFields } from "./GridFields";
import { JobProgress } from "./JobProgress";
import { SideFields } from "./SideFields";
import { defaultSide, type SideState, sweepRequestOf } from "./sideRequest";
import type { MechanismOption, ProfileOption } from "./types";

export function SweepForm({ mechanisms, profiles }: { mechanisms: MechanismOption[]; profiles: ProfileOption[] }) {
  const [side, setSide] = useState<SideState>(defaultSide());
  const [grid, setGrid] = useState<SweepGrid>({});
  const [job, setJob] = useState<SubmittedJob | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const onEnd = useCallback(() => setBusy(false), []);
  const submit = async (e: React.FormEvent) => {
    e.preventDefault();
    setError(null);
    setBusy(true);
    try {
      setJob(await submitJob("/api/profiles", sweepRequestOf(side, grid)));
    } catch (err) {
      setError((err as Error).message);
      setBusy(false);
    }
  };
  return (
    <form onSubmit={submit} className="space-y-3" aria-label="Profile sweep">
      <SideFields
        label="Profile and chemistry"
        value={side}
        onChange={setSide}
        mechanisms={mechanisms}
        profiles={profiles}
        allowStored={false}
      />
      <GridFields value={grid} onChange={setGrid} />
      <button
        type="submit"
        disabled={busy}
        className="rounded bg-slate-900 px-5 py-2 font-medium text-white hover:bg-slate-700 focus:outline-2 focus:outline-offset-2 disabled:opacity-50"
      >
        Run the sweep
      </button>
      {error ? (
        <p role="alert" className="rounded bg-red-50 px-3 py-2 text-[13px] text-red-900">
          {error}
        </p>
      ) : null}
      {job ? <JobProgress jobId={job.id} deletionToken={job.deletionToken} what="Sweep" onEnd={onEnd} /> : null}
    </form>
  );
}
