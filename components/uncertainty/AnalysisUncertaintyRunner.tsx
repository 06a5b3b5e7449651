"use client";
/**
 * For the explorer: runs Monte Carlo ranges and sensitivities of the current
 * analysis request as a job with progress, then shows the stored result's
 * uncertainty panel and its CSV exports.
 */
import { useState } from "react";
import type { AnalysisRequest, AnalysisResult } from "@/lib/engine/types";
import { JobBar } from "./JobBar";
import { UncertaintyPanel } from "./UncertaintyPanel";
import { useUncertaintyJob } from "./useUncertaintyJob";

export function AnalysisUncertaintyRunner({ request }: { request: AnalysisRequest }) {
  const { job, start } = useUncertaintyJob();
  const [samples, setSamples] = useState(1000);
  const [seed, setSeed] = useState(1);
  const record = job.result as { id: string; result: AnalysisResult } | null;
  const busy = job.state === "queued" || job.state === "running";
  return (
    <div data-testid="uncertainty-runner" className="space-y-1">
      <form
        className="flex flex-wrap items-end gap-2 px-3 pt-2 text-[11px]"
        onSubmit={(e) => {
          e.preventDefault();
          void start({
            analysis: {
              ...request,
              options: { ...request.options, uncertaintySamples: samples, uncertaintySeed: seed, sensitivity: true },
            },
          });
        }}
      >
        <label className="flex flex-col">
          samples
          <input
            type="number"
            min={1}
            max={100000}
            value={samples}
            onChange={(e) => setSamples(Number(e.target.value))}
            className="w-20 rounded border border-stone-300 px-1"
          />
        </label>
        <label className="flex flex-col">
          seed
          <input
            type="number"
            min={0}
            value={seed}
            onChange={(e) => setSeed(Number(e.target.value))}
            className="w-16 rounded border border-stone-300 px-1"
          />
        </label>
        <button
          type="submit"
          disabled={busy}
          className="rounded border border-stone-400 px-2 py-0.5 disabled:opacity-50"
        >
          Run uncertainty
        </button>
      </form>
      <JobBar job={job} />
      {record?.result.uncertainty && (
        <>
          <UncertaintyPanel uncertainty={record.result.uncertainty} />
          <p className="px-3 text-[11px]">
            <a className="underline" href={`/api/analyses/${record.id}/uncertainty.csv`}>
              uncertainty.csv
            </a>{" "}
            ·{" "}
            <a className="underline" href={`/api/analyses/${record.id}/sensitivities.csv`}>
              sensitivities.csv
            </a>
          </p>
        </>
      )}
    </div>
  );
}
