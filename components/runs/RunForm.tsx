"use client";
/** A run at a fixed place or along an uploaded trajectory, or one of the invented demos, started as a job. */
import { useCallback, useState } from "react";
import { JobProgress } from "@/components/profile/JobProgress";
import { type SubmittedJob, submitJob } from "@/components/ui/apiClient";
import { CONDITION_DEFAULTS } from "@/lib/atmosphere/condition";
import type { RunRequest } from "@/lib/runs/types";

export interface DemoOption {
  id: string;
  title: string;
  note: string;
  request: RunRequest;
}

const field = "rounded border border-stone-300 px-2 py-1 text-[13px]";

export function RunForm({ mechanisms, demos }: { mechanisms: { id: string; title: string }[]; demos: DemoOption[] }) {
  // the full reference chemistry, as the sweep form and the command line default to, not the list's first entry
  // (pure oxygen, which has no catalytic cycles to follow over days)
  const [mechanismId, setMechanismId] = useState(
    mechanisms.find((m) => m.id === "reference")?.id ?? mechanisms[0]?.id ?? "reference",
  );
  const [altitude, setAltitude] = useState("20");
  const [latitude, setLatitude] = useState(String(CONDITION_DEFAULTS.latitude_deg));
  const [date, setDate] = useState<string>(CONDITION_DEFAULTS.date);
  const [days, setDays] = useState("10");
  const [trajectory, setTrajectory] = useState("");
  const [job, setJob] = useState<SubmittedJob | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const onEnd = useCallback(() => setBusy(false), []);

  const start = async (request: RunRequest) => {
    setError(null);
    setBusy(true);
    setJob(null);
    try {
      setJob(await submitJob("/api/runs", request));
    } catch (err) {
      setError((err as Error).message);
      setBusy(false);
    }
  };
  const submit = (e: React.FormEvent) => {
    e.preventDefault();
    const request: RunRequest = {
      mechanismId,
      condition: { altitude_km: Number(altitude), latitude_deg: Number(latitude), date },
      days: Number(days),
      ...(trajectory.trim() ? { trajectory: { csv: trajectory, name: "trajectory.csv" } } : {}),
    };
    void start(request);
  };

  return (
    <div className="space-y-4">
      <section aria-label="Invented demos" className="space-y-2">
        <h2 className="text-[15px] font-semibold">Invented demos</h2>
        <ul className="space-y-2">
          {demos.map((d) => (
            <li
              key={d.id}
              className="flex flex-wrap items-center gap-3 rounded border border-stone-300 bg-white px-3 py-2"
            >
              <span className="min-w-0 flex-1 text-[13px]">
                <b className="font-medium">{d.title}</b> <span className="text-stone-600">({d.note})</span>
              </span>
              <button
                type="button"
                disabled={busy}
                data-testid={`demo-${d.id}`}
                className="rounded bg-slate-900 px-3 py-1 text-[13px] text-white hover:bg-slate-700 disabled:opacity-50"
                onClick={() => void start(d.request)}
              >
                Run this demo
              </button>
            </li>
          ))}
        </ul>
      </section>
      <form onSubmit={submit} className="space-y-3" aria-label="Run">
        <h2 className="text-[15px] font-semibold">Your own run</h2>
        <div className="flex flex-wrap gap-3 text-[13px]">
          <label className="flex flex-col">
            Mechanism
            <select className={field} value={mechanismId} onChange={(e) => setMechanismId(e.target.value)}>
              {mechanisms.map((m) => (
                <option key={m.id} value={m.id}>
                  {m.title}
                </option>
              ))}
            </select>
          </label>
          <TextField label="Altitude (km)" value={altitude} onChange={setAltitude} />
          <TextField label="Latitude (°N)" value={latitude} onChange={setLatitude} />
          <TextField label="Start date" value={date} onChange={setDate} />
          <TextField label="Days (1–60)" value={days} onChange={setDays} />
        </div>
        <label className="flex flex-col text-[13px]">
          Trajectory CSV (optional; leave empty for a fixed place)
          <textarea
            className={`${field} h-28 font-mono text-[12px]`}
            placeholder={"time_h,T_K,p_hPa,latitude_deg\n0,195,50,70\n24,196,50,71"}
            value={trajectory}
            onChange={(e) => setTrajectory(e.target.value)}
          />
        </label>
        <button
          type="submit"
          disabled={busy}
          className="rounded bg-slate-900 px-5 py-2 font-medium text-white hover:bg-slate-700 focus:outline-2 focus:outline-offset-2 disabled:opacity-50"
        >
          Start the run
        </button>
      </form>
      {error ? (
        <p role="alert" className="rounded bg-red-50 px-3 py-2 text-[13px] text-red-900">
          {error}
        </p>
      ) : null}
      {job ? (
        <JobProgress jobId={job.id} deletionToken={job.deletionToken} what="Run" onEnd={onEnd} unit="days" />
      ) : null}
    </div>
  );
}

function TextField({ label, value, onChange }: { label: string; value: string; onChange(v: string): void }) {
  return (
    <label className="flex flex-col">
      {label}
      <input className={field} value={value} onChange={(e) => onChange(e.target.value)} />
    </label>
  );
}
