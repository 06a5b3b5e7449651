/**
 * Uncertainty jobs: Monte Carlo ranges (and sensitivities) of one analysis or
 * of every level of a stored profile sweep, with progress, on the shared job
 * back end (embedded, or BullMQ when REDIS_URL is set). The handler sends its
 * tasks to `ctx.tasks` when the back end distributes them (queue workers),
 * else to the process's engine pool. One analysis: the central solve is one
 * task, the samples go out in batches (task kind "uncertainty-samples";
 * scheduling in lib/engine/analysisWithUncertainty.ts and
 * lib/uncertainty/runSampleBatches.ts), and the result is stored as an
 * analysis record with `result.uncertainty` (so GET /api/analyses/{id} and
 * its CSV exports show it). A profile: the converged levels, a few at once,
 * each as one analysis with its samples, stored as a record of kind
 * "uncertainty-profile" with the family-share bands against altitude.
 *
 * The handler here is registered in lib/service/jobs.ts; submitting, reading
 * and cancelling go through lib/service/uncertaintyJobs.ts (see
 * docs/uncertainty.md, "Routes").
 */
import "server-only";
import { analysisWithUncertainty, type UncertaintyExecutor } from "../engine/analysisWithUncertainty";
import type { MechanismSource } from "../engine/mechanismSource";
import { parseWith } from "../engine/requestSchema";
import type { AnalysisRequest } from "../engine/types";
import type { JobContext, TaskRunner } from "../jobs/types";
import {
  inLanes,
  type MonteCarloResult,
  type ProfileBand,
  profileShareBands,
  type SensitivityReport,
} from "../uncertainty";
import { engineTasks } from "./engineTasks";
import { mechanismSource } from "./mechanisms";
import { getProfileRecord } from "./profiles";
import { liveRecord, putNewAnalysis, putNewRecord } from "./records";
import { type UncertaintyJobInput, uncertaintyJobSchema } from "./uncertaintyJobSchema";

export type { UncertaintyJobInput };

export const UNCERTAINTY_PROFILE_KIND = "uncertainty-profile";
export const MAX_UNCERTAINTY_BODY = 256 * 1024;

export interface UncertaintyProfileLevel {
  altitude_km: number;
  /** "ok", or why the level has no ranges */
  status: string;
  message: string;
  monteCarlo: MonteCarloResult | null;
  sensitivity: SensitivityReport | null;
}

export interface UncertaintyProfileBody {
  profileId: string;
  samples: number;
  seed: number;
  levels: UncertaintyProfileLevel[];
  /** family shares' median and 5–95 % range against altitude */
  bands: ProfileBand[];
  elapsed_ms: number;
}

export const UNCERTAINTY_JOB_DEFAULTS = {
  /** time limit of one engine-pool task of these jobs, ms (a sensitivity run at 10 km on the reference mechanism takes about a minute) */
  timeout_ms: 600_000,
};

/** The Monte Carlo's tasks, on queue workers or in the engine pool (engineTasks). */
function uncertaintyExecutor(src: MechanismSource, tasks?: TaskRunner): UncertaintyExecutor {
  const t = engineTasks(tasks, UNCERTAINTY_JOB_DEFAULTS.timeout_ms);
  return {
    workers: t.workers,
    analysis: (request) => t.run({ kind: "analysis", mechanism: src, request }),
    samples: (batch) => t.run({ kind: "uncertainty-samples", mechanism: src, batch }),
  };
}

/** One analysis: stores an analysis record with `result.uncertainty`. */
async function analysisJob(request: AnalysisRequest, ctx: JobContext) {
  const src = await mechanismSource(request.mechanismId);
  const samples = request.options?.uncertaintySamples ?? 0;
  let done = 0;
  const total = samples + 1;
  ctx.progress(0, total, "central steady state");
  const out = await analysisWithUncertainty(src, request, uncertaintyExecutor(src, ctx.tasks), {
    signal: ctx.signal,
    onProgress: (n, stage) => {
      done += n;
      ctx.progress(done, total, done > 1 ? `${stage} (${done - 1} of ${samples})` : stage);
    },
  });
  return { resultId: await putNewAnalysis({ mechanismId: src.id, request, result: out }), resultKind: "analysis" };
}

/** Every converged level of a stored sweep, each as analysisWithUncertainty; stores an uncertainty-profile record. */
async function profileJob(input: Extract<UncertaintyJobInput, { profileId: string }>, ctx: JobContext) {
  const t0 = performance.now();
  const profile = await getProfileRecord(input.profileId, "profileId");
  const levels = profile.body.result.levels;
  const src = await mechanismSource(profile.body.request.mechanismId);
  const seedValue = input.seed ?? 1;
  const converged = levels.filter((l) => l.status === "converged").length;
  const total = converged * (input.samples + 1);
  let done = 0;
  let levelsDone = 0;
  ctx.progress(0, total, "levels");
  const executor = uncertaintyExecutor(src, ctx.tasks);
  const onProgress = (n: number) => {
    done += n;
    ctx.progress(done, total, `levels (${levelsDone} of ${converged} done)`);
  };
  const results: UncertaintyProfileLevel[] = await inLanes(
    levels.map((level, i) => ({ level, i })),
    // one level more in flight than the executor has workers
    executor.workers + 1,
    ctx.signal,
    async ({ level, i }): Promise<UncertaintyProfileLevel> => {
      const base = { altitude_km: level.altitude_km, monteCarlo: null, sensitivity: null };
      if (level.status !== "converged")
        return { ...base, status: level.status, message: `the sweep level did not converge: ${level.message}` };
      const request: AnalysisRequest = {
        ...level.request,
        options: {
          ...level.request.options,
          uncertaintySamples: input.samples,
          // a different stream per level, reproducible from the one seed
          uncertaintySeed: (seedValue + Math.imul(i, 0x9e3779b1)) >>> 0,
          sensitivity: input.sensitivity ?? false,
        },
      };
      try {
        const result = await analysisWithUncertainty(src, request, executor, { signal: ctx.signal, onProgress });
        levelsDone++;
        return {
          ...base,
          status: result.steadyState.status === "converged" ? "ok" : result.steadyState.status,
          message: result.uncertainty?.warnings.join("; ") ?? "",
          monteCarlo: result.uncertainty?.monteCarlo ?? null,
          sensitivity: result.uncertainty?.sensitivity ?? null,
        };
      } catch (e) {
        if (ctx.signal.aborted) throw e;
        levelsDone++;
        return { ...base, status: "failed", message: e instanceof Error ? e.message : String(e) };
      }
    },
  );
  const body: UncertaintyProfileBody = {
    profileId: input.profileId,
    samples: input.samples,
    seed: seedValue,
    levels: results,
    bands: profileShareBands(results),
    elapsed_ms: performance.now() - t0,
  };
  return { resultId: await putNewRecord(UNCERTAINTY_PROFILE_KIND, body), resultKind: UNCERTAINTY_PROFILE_KIND };
}

/** The job handler (registered with the shared job back end in lib/service/jobs.ts). */
export async function uncertaintyJob(input: UncertaintyJobInput, ctx: JobContext) {
  return "analysis" in input ? analysisJob(input.analysis as AnalysisRequest, ctx) : profileJob(input, ctx);
}

/** Validates a job's input; throws InputError (400) before anything is queued. */
export async function validateUncertaintyJob(body: unknown): Promise<UncertaintyJobInput> {
  const input = parseWith(uncertaintyJobSchema, body) as UncertaintyJobInput;
  if ("analysis" in input) await mechanismSource(input.analysis.mechanismId);
  else await getProfileRecord(input.profileId, "profileId");
  return input;
}

export async function getUncertaintyProfile(
  id: string,
): Promise<{ id: string; createdAt: string; body: UncertaintyProfileBody }> {
  const r = await liveRecord(UNCERTAINTY_PROFILE_KIND, id, "uncertainty profile");
  return { id: r.id, createdAt: r.createdAt, body: r.body as UncertaintyProfileBody };
}
