/**
 * Uncertainty jobs: Monte Carlo ranges (and sensitivities) of one analysis or
 * of every level of a stored profile sweep, run in the engine pool with
 * progress. One analysis: the central solve is one pool job, the samples go
 * out in batches (job kind "uncertainty-samples"), and the result is stored
 * as an analysis record with `result.uncertainty` (so GET /api/analyses/{id}
 * and its CSV exports show it). A profile: one pool job per level (the
 * level's analysis with the uncertainty options, samples in that worker),
 * stored as a record of kind "uncertainty-profile" with the family-share
 * bands against altitude.
 *
 * The handler here is registered in lib/service/jobs.ts; submitting, reading
 * and cancelling go through lib/service/uncertaintyJobs.ts (see
 * docs/uncertainty.md, "Routes").
 */
import { solveConditionsOf } from "../engine/resolve-condition";
import "server-only";
import { z } from "zod";
import { compileSource, type MechanismSource } from "../engine/mechanism-source";
import { analysisRequestSchema, parseWith } from "../engine/request-schema";
import type { AnalysisRequest, AnalysisResult } from "../engine/types";
import { ENGINE_VERSION } from "../engine/version";
import type { JobContext } from "../jobs/types";
import { enginePool, POOL_DEFAULTS } from "../runtime/pool";
import { getStore, ID_PATTERN, newRecordId } from "../store";
import {
  finishMonteCarlo,
  type MonteCarloResult,
  type ProfileBand,
  planMonteCarlo,
  profileShareBands,
  type SampleBatchResult,
  type SensitivityReport,
} from "../uncertainty";
import { notFound } from "./http";
import { mechanismSource } from "./mechanisms";
import { getProfileRecord } from "./profiles";

export const UNCERTAINTY_PROFILE_KIND = "uncertainty-profile";
export const MAX_UNCERTAINTY_BODY = 256 * 1024;

const seed = z.number().int().min(0).max(0xffffffff);
const jobSchema = z.union([
  z.object({ analysis: analysisRequestSchema }).strict(),
  z
    .object({
      profileId: z.string().regex(/^[A-Za-z0-9_-]{1,80}$/, "expected a stored profile sweep id"),
      samples: z.number().int("expected a whole number of samples").min(0).max(100_000),
      seed: seed.optional(),
      sensitivity: z.boolean().optional(),
    })
    .strict(),
]);

export type UncertaintyJobInput = z.infer<typeof jobSchema>;

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

/**
 * Runs `work` over the items with at most one more in flight than the pool
 * has workers, in item order, checking for cancellation before each; the
 * results keep the items' order.
 */
async function inLanes<T, R>(items: readonly T[], signal: AbortSignal, work: (item: T) => Promise<R>): Promise<R[]> {
  const out = new Array<R>(items.length);
  let next = 0;
  const lane = async () => {
    while (next < items.length) {
      if (signal.aborted) throw signal.reason;
      const i = next++;
      out[i] = await work(items[i]);
    }
  };
  await Promise.all(Array.from({ length: Math.min(items.length, POOL_DEFAULTS.size + 1) }, lane));
  return out;
}

export const UNCERTAINTY_JOB_DEFAULTS = {
  /** time limit of one pool job of these kinds, ms (a sensitivity run at 10 km on the reference mechanism takes about a minute) */
  timeout_ms: 600_000,
  /** samples in the first batch of a level, which measures the cost of a sample */
  probeBatch: 4,
  /** later batches are sized to take about this long, ms */
  batchTarget_ms: 1500,
  /** most samples in one batch */
  maxBatch: 50,
};

/** Counts units of work for the progress report of one job. */
interface Progress {
  step(done: number, stage: string): void;
}

/**
 * One analysis with its uncertainty: the central solve (with the
 * sensitivities when asked) as one pool job, then the samples in batches,
 * the first small and the rest sized from its cost, so that no job runs
 * long whatever the level costs (a sample at 10 km costs ~40× one at 40 km).
 */
async function analysisWithUncertainty(
  src: MechanismSource,
  request: AnalysisRequest,
  signal: AbortSignal,
  progress: Progress,
): Promise<AnalysisResult> {
  const t0 = performance.now();
  const samples = request.options?.uncertaintySamples ?? 0;
  const centralRequest = { ...request, options: { ...request.options, uncertaintySamples: 0 } };
  const limit = UNCERTAINTY_JOB_DEFAULTS.timeout_ms;
  const { result } = await enginePool().run({ kind: "analysis", mechanism: src, request: centralRequest }, limit);
  progress.step(1, "central steady state");
  const out: AnalysisResult = { ...result, options: { ...result.options, ...request.options } };
  const warnings = [...(result.uncertainty?.warnings ?? [])];
  if (samples > 0 && result.condition.mode === "diurnal")
    warnings.push("Monte Carlo ranges need the instantaneous steady state; not computed in the 24-hour mode");
  else if (samples > 0 && result.steadyState.status !== "converged")
    warnings.push(`no Monte Carlo ranges: the central steady state did not converge (${result.steadyState.message})`);
  else if (samples > 0) {
    const mech = compileSource(src);
    const plan = planMonteCarlo(
      mech,
      // every field the engine solved with (also the aerosol surface of uptake reactions)
      solveConditionsOf(result.condition),
      result.steadyState,
      result.cycles,
      {
        fminRelative: result.options.fminRelative,
        oxDefinition: result.options.oxDefinition,
        heldSpecies: Object.keys(result.condition.held_cm3),
      },
      { samples, seed: request.options?.uncertaintySeed, batchSize: samples },
    );
    const template = plan.batches[0];
    const { probeBatch, batchTarget_ms, maxBatch } = UNCERTAINTY_JOB_DEFAULTS;
    let cursor = 0;
    let spent_ms = 0;
    let measured = 0;
    const results: SampleBatchResult[] = [];
    const runOne = async () => {
      if (signal.aborted) throw signal.reason;
      const size =
        measured === 0
          ? probeBatch
          : Math.max(1, Math.min(maxBatch, Math.floor(batchTarget_ms / (spent_ms / measured))));
      const batch = { ...template, start: cursor, count: Math.min(size, samples - cursor) };
      cursor += batch.count;
      const b0 = performance.now();
      results.push((await enginePool().run({ kind: "uncertainty-samples", mechanism: src, batch }, limit)).result);
      spent_ms += performance.now() - b0;
      measured += batch.count;
      progress.step(batch.count, "Monte Carlo samples");
    };
    // the probe batch alone, then one lane more than the pool has workers
    await runOne();
    await Promise.all(
      Array.from({ length: POOL_DEFAULTS.size + 1 }, async () => {
        while (cursor < samples) await runOne();
      }),
    );
    const monteCarlo: MonteCarloResult = finishMonteCarlo(plan, results, performance.now() - t0);
    out.uncertainty = { ...result.uncertainty, monteCarlo, warnings };
  }
  if (!out.uncertainty && warnings.length > 0) out.uncertainty = { warnings };
  return out;
}

/** One analysis: stores an analysis record with `result.uncertainty`. */
async function analysisJob(request: AnalysisRequest, ctx: JobContext) {
  const src = await mechanismSource(request.mechanismId);
  const samples = request.options?.uncertaintySamples ?? 0;
  let done = 0;
  const total = samples + 1;
  ctx.progress(0, total, "central steady state");
  const out = await analysisWithUncertainty(src, request, ctx.signal, {
    step: (n, stage) => {
      done += n;
      ctx.progress(done, total, done > 1 ? `${stage} (${done - 1} of ${samples})` : stage);
    },
  });
  const id = newRecordId();
  await getStore().putAnalysis({
    id,
    mechanismId: src.id,
    engineVersion: ENGINE_VERSION,
    request,
    result: out,
    createdAt: new Date().toISOString(),
  });
  return { resultId: id, resultKind: "analysis" };
}

/** Every converged level of a stored sweep, as analysisWithUncertainty; stores an uncertainty-profile record. */
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
  const progress: Progress = {
    step: (n) => {
      done += n;
      ctx.progress(done, total, `levels (${levelsDone} of ${converged} done)`);
    },
  };
  const results: UncertaintyProfileLevel[] = await inLanes(
    levels.map((level, i) => ({ level, i })),
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
        const result = await analysisWithUncertainty(src, request, ctx.signal, progress);
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
  const id = newRecordId();
  await getStore().putRecord({
    id,
    kind: UNCERTAINTY_PROFILE_KIND,
    engineVersion: ENGINE_VERSION,
    body,
    createdAt: new Date().toISOString(),
  });
  return { resultId: id, resultKind: UNCERTAINTY_PROFILE_KIND };
}

/** The job handler (registered with the shared job back end in lib/service/jobs.ts). */
export async function uncertaintyJob(input: UncertaintyJobInput, ctx: JobContext) {
  return "analysis" in input ? analysisJob(input.analysis as AnalysisRequest, ctx) : profileJob(input, ctx);
}

/** Validates a job's input; throws InputError (400) before anything is queued. */
export async function validateUncertaintyJob(body: unknown): Promise<UncertaintyJobInput> {
  const input = parseWith(jobSchema, body) as UncertaintyJobInput;
  if ("analysis" in input) await mechanismSource(input.analysis.mechanismId);
  else await getProfileRecord(input.profileId, "profileId");
  return input;
}

export async function getUncertaintyProfile(
  id: string,
): Promise<{ id: string; createdAt: string; body: UncertaintyProfileBody }> {
  const r = ID_PATTERN.test(id) ? await getStore().getRecord(UNCERTAINTY_PROFILE_KIND, id) : null;
  if (!r) throw notFound("uncertainty profile", id);
  return { id: r.id, createdAt: r.createdAt, body: r.body as UncertaintyProfileBody };
}
