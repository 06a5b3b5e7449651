"use client";
/**
 * Pick two sides (two profiles, one profile under two mechanisms, or two Cly
 * totals), the altitude levels, and run the comparison as a job.
 */
import { useCallback, useState } from "react";
import type { SweepGrid } from "@/lib/profiles/types";
import { type SubmittedJob, submitJob } from "../ui/apiClient";
import { GridFields } from "./GridFields";
import { JobProgress } from "./JobProgress";
import { SideFields } from "./SideFields";
import { defaultSide, type SideState, sideOf } from "./sideRequest";
import type { MechanismOption, ProfileOption } from "./types";

export function ComparisonForm({
  mechanisms,
  profiles,
  initialA,
}: {
  mechanisms: MechanismOption[];
  profiles: ProfileOption[];
  /** a stored sweep to put on side A (from a sweep page's "compare" link) */
  initialA?: string;
}) {
  const demos = profiles.filter((p) => p.demo);
  const demoA = demos[0] ? `demo:${demos[0].id}` : "standard";
  const demoB = demos[1] ? `demo:${demos[1].id}` : "standard";
  const [a, setA] = useState<SideState>(
    initialA ? defaultSide({ source: "stored", sweepId: initialA }) : defaultSide({ source: demoA }),
  );
  const [b, setB] = useState<SideState>(defaultSide({ source: demoB }));
  const [labels, setLabels] = useState({ a: "", b: "" });
  const [grid, setGrid] = useState<SweepGrid>({});
  const [job, setJob] = useState<SubmittedJob | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const onEnd = useCallback(() => setBusy(false), []);

  const preset = (kind: "demos" | "mechanisms" | "cly") => {
    if (kind === "demos") {
      setA(defaultSide({ source: demoA }));
      setB(defaultSide({ source: demoB }));
      setLabels({ a: "cold (demo)", b: "warm (demo)" });
    } else if (kind === "mechanisms") {
      setA(defaultSide({ mechanismId: "oxygen-chlorine" }));
      setB(defaultSide({ mechanismId: "reference" }));
      setLabels({ a: "oxygen-chlorine", b: "reference" });
    } else {
      setA(defaultSide({ cly_ppbv: 2 }));
      setB(defaultSide({ cly_ppbv: 3.3 }));
      setLabels({ a: "Cly 2 ppbv", b: "Cly 3.3 ppbv" });
    }
  };

  const submit = async (e: React.FormEvent) => {
    e.preventDefault();
    setError(null);
    setBusy(true);
    try {
      const body = {
        a: sideOf(a, grid),
        b: sideOf(b, grid),
        labels: { ...(labels.a ? { a: labels.a } : {}), ...(labels.b ? { b: labels.b } : {}) },
      };
      setJob(await submitJob("/api/comparisons", body));
    } catch (err) {
      setError((err as Error).message);
      setBusy(false);
    }
  };

  const presetButton =
    "rounded border border-stone-400 px-2 py-1 text-[12px] hover:bg-stone-100 focus:outline-2 focus:outline-offset-2";
  return (
    <form onSubmit={submit} className="space-y-3" aria-label="Comparison">
      <div className="flex flex-wrap items-center gap-2 text-[12px] text-stone-700">
        <span>Start from:</span>
        <button type="button" className={presetButton} onClick={() => preset("demos")}>
          the two demo profiles
        </button>
        <button type="button" className={presetButton} onClick={() => preset("mechanisms")}>
          one profile, two mechanisms
        </button>
        <button type="button" className={presetButton} onClick={() => preset("cly")}>
          two Cly totals
        </button>
      </div>
      <div className="grid gap-3 md:grid-cols-2">
        <div className="space-y-1">
          <SideFields label="Side A" value={a} onChange={setA} mechanisms={mechanisms} profiles={profiles} />
          <label className="block text-[12px] text-stone-600" htmlFor="label-a">
            Label of A (optional)
            <input
              id="label-a"
              className="mt-0.5 w-full rounded border border-stone-300 px-2 py-1 text-[13px]"
              value={labels.a}
              onChange={(e) => setLabels({ ...labels, a: e.target.value })}
              maxLength={60}
            />
          </label>
        </div>
        <div className="space-y-1">
          <SideFields label="Side B" value={b} onChange={setB} mechanisms={mechanisms} profiles={profiles} />
          <label className="block text-[12px] text-stone-600" htmlFor="label-b">
            Label of B (optional)
            <input
              id="label-b"
              className="mt-0.5 w-full rounded border border-stone-300 px-2 py-1 text-[13px]"
              value={labels.b}
              onChange={(e) => setLabels({ ...labels, b: e.target.value })}
              maxLength={60}
            />
          </label>
        </div>
      </div>
      <GridFields value={grid} onChange={setGrid} />
      <div className="flex items-center gap-3">
        <button
          type="submit"
          disabled={busy}
          className="rounded bg-slate-900 px-5 py-2 font-medium text-white hover:bg-slate-700 focus:outline-2 focus:outline-offset-2 disabled:opacity-50"
        >
          Compare
        </button>
        <span className="text-[12px] text-stone-600">
          Both sides are swept on the same levels; each sweep is stored with its own permalink.
        </span>
      </div>
      {error ? (
        <p role="alert" className="rounded bg-red-50 px-3 py-2 text-[13px] text-red-900">
          {error}
        </p>
      ) : null}
      {job ? <JobProgress jobId={job.id} deletionToken={job.deletionToken} what="Comparison" onEnd={onEnd} /> : null}
    </form>
  );
}
