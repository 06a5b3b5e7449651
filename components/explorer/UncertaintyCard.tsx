"use client";
/**
 * The explorer's "how sure" card: ranges already stored with the analysis
 * (a permalink of an uncertainty run), or a runner that computes Monte Carlo
 * ranges and sensitivities for the current conditions as a job.
 */
import type { AnalysisRequest, AnalysisResult } from "@/lib/engine/types";
import { AnalysisUncertaintyRunner, UncertaintyPanel } from "../uncertainty";
import { Panel } from "./Panel";

export function UncertaintyCard({ request, result }: { request: AnalysisRequest; result: AnalysisResult | null }) {
  return (
    <Panel
      title="How sure: kinetic uncertainty"
      id="uncertainty-title"
      right={<span className="text-[11px] text-stone-500">JPL f(T), log-normal</span>}
    >
      {result?.uncertainty ? (
        <UncertaintyPanel uncertainty={result.uncertainty} />
      ) : (
        <details className="text-[12px]">
          <summary className="cursor-pointer px-3 py-2 text-stone-700">
            Ranges (5–95 %) and the rate constants the numbers hang on
          </summary>
          <AnalysisUncertaintyRunner request={request} />
        </details>
      )}
    </Panel>
  );
}
