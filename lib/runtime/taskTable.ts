/**
 * The task table: every kind of engine task (an analysis, profile levels,
 * Monte Carlo samples, days of a run, an upload check), as plain messages
 * that cross a worker-thread or queue boundary. `runJob` executes one in the
 * current thread (lib/runtime/workerEntry.ts in a worker thread, the
 * command line in its own).
 */

import { checkUploadBody, type UploadCheck } from "../engine/checkUpload";
import { compileSource, type MechanismSource } from "../engine/mechanismSource";
import { summarise } from "../engine/mechanismSummary";
import { runAnalysis } from "../engine/runAnalysis";
import type { AnalysisRequest, AnalysisResult } from "../engine/types";
import { EngineError } from "../errors";
import { type LevelBatch, type LevelBatchResult, runLevelBatch } from "../profiles/runLevelBatch";
import { type RunDaysTask, type RunStartTask, runDaysTask, runStartTask } from "../runs/runTasks";
import type { StartState } from "../runs/startState";
import type { RunSegment } from "../runs/types";
import { runSampleBatch, type SampleBatch } from "../uncertainty/runSampleBatch";
import type { SampleBatchResult } from "../uncertainty/types";

export type EngineJob =
  | { kind: "analysis"; mechanism: MechanismSource; request: AnalysisRequest; initialState?: number[] }
  /** an analysis whose result comes back as its JSON text in UTF-8 (transferred, not cloned): what a route sends as is */
  | { kind: "analysis-json"; mechanism: MechanismSource; request: AnalysisRequest }
  /** neighbouring levels of a profile sweep, each warm-started from the one before (lib/profiles) */
  | { kind: "profile-levels"; mechanism: MechanismSource; batch: LevelBatch }
  /** a batch of Monte Carlo samples around a central steady state (lib/uncertainty) */
  | { kind: "uncertainty-samples"; mechanism: MechanismSource; batch: SampleBatch }
  /** the state a run starts from (lib/runs) */
  | { kind: "run-start"; mechanism: MechanismSource; task: RunStartTask }
  /** a span of days of a run from a state (lib/runs) */
  | { kind: "run-days"; mechanism: MechanismSource; task: RunDaysTask }
  /** parse and check an upload's raw body off the main thread (lib/engine/checkUpload.ts); `body` is transferred */
  | { kind: "check-upload"; body: Uint8Array; contentType: string }
  /** an uploaded mechanism's species, reactions and pools (its text stays with the caller) */
  | { kind: "describe-mechanism"; mechanism: MechanismSource };

export type EngineJobResult =
  | { kind: "analysis"; result: AnalysisResult }
  | { kind: "analysis-json"; result: Uint8Array }
  | { kind: "profile-levels"; result: LevelBatchResult }
  | { kind: "uncertainty-samples"; result: SampleBatchResult }
  | { kind: "run-start"; result: StartState }
  | { kind: "run-days"; result: RunSegment }
  | { kind: "check-upload"; result: UploadCheck & { text: string } }
  | { kind: "describe-mechanism"; result: ReturnType<typeof summarise> };

/** One analysis of a request against its mechanism, as both analysis task kinds compute it. */
function analyse(
  job: { mechanism: MechanismSource; request: AnalysisRequest },
  initialState?: number[],
): AnalysisResult {
  const mech = compileSource(job.mechanism);
  return runAnalysis(mech, { id: job.mechanism.id, title: job.mechanism.title }, job.request, { initialState });
}

export function runJob(job: EngineJob): EngineJobResult {
  switch (job.kind) {
    case "analysis":
      return { kind: "analysis", result: analyse(job, job.initialState) };
    case "analysis-json":
      return { kind: "analysis-json", result: new TextEncoder().encode(JSON.stringify(analyse(job))) };
    case "profile-levels": {
      const mech = compileSource(job.mechanism);
      return {
        kind: "profile-levels",
        result: runLevelBatch(mech, { id: job.mechanism.id, title: job.mechanism.title }, job.batch),
      };
    }
    case "uncertainty-samples": {
      const mech = compileSource(job.mechanism);
      return { kind: "uncertainty-samples", result: runSampleBatch(mech, job.batch) };
    }
    case "run-start":
      return { kind: "run-start", result: runStartTask(compileSource(job.mechanism), job.task) };
    case "run-days":
      return { kind: "run-days", result: runDaysTask(compileSource(job.mechanism), job.task) };
    case "check-upload":
      return { kind: "check-upload", result: checkUploadBody(job.body, job.contentType) };
    case "describe-mechanism": {
      const m = job.mechanism;
      return { kind: "describe-mechanism", result: summarise(m.id, false, compileSource(m), "") };
    }
    default:
      throw new EngineError("unknown-job", `unknown engine job kind ${(job as { kind: string }).kind}`);
  }
}
