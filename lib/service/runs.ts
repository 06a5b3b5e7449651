/**
 * Runs over days: validate the request (nothing is queued unless the
 * mechanism, the first condition and the trajectory fit), run the start
 * state and then spans of days in the engine pool (or the job back end's
 * task runner) as a job with progress, and store the result immutably under
 * an unguessable id (record kind "run"). Cancelling stops the job between
 * spans (each about a third of a second). A failed integration is a stored
 * result with its status and the hours up to the failure, not a failed job.
 */
import "server-only";
import { compileSource, type MechanismSource } from "../engine/mechanismSource";
import { ENGINE_VERSION } from "../engine/version";
import { InputError } from "../errors";
import type { JobContext, TaskRunner } from "../jobs/types";
import {
  assembleRun,
  compactRun,
  DEMO_RUNS,
  hourSnapshot,
  type JCache,
  type PlannedRun,
  parseRunRequest,
  planRun,
  type RunDaysTask,
  type RunRequest,
  type RunResult,
  type RunSegment,
  type RunStartTask,
  runDailyCsv,
  runHoursCsv,
  runRatesCsv,
  type StartSpec,
  type StartState,
} from "../runs";
import { getStore, ID_PATTERN } from "../store";
import { getAnalysisRecord } from "./analyses";
import { type CsvExportOptions, csvExport, csvMechanism } from "./csvProvenance";
import { engineTasks } from "./engineTasks";
import { notFound } from "./http";
import { deleteWithToken } from "./lifecycle";
import { mechanismSource } from "./mechanisms";
import { liveRecord, putNewAnalysis, putNewRecord, type RecordView, recordView } from "./records";

export const RUN_KIND = "run";
/** Largest run body, bytes (a trajectory CSV of up to 1 MiB, with room). */
export const MAX_RUN_BODY = 1.5 * 1024 * 1024;
/** Days per engine task: small enough that a cancelled run stops within a second. */
export const RUN_SPAN_DAYS = 3;

export const runPath = (id: string) => `/runs/${id}`;

interface Prepared {
  request: RunRequest;
  src: MechanismSource;
  planned: PlannedRun;
  start: StartSpec;
}

async function prepareRun(request: RunRequest): Promise<Prepared> {
  let src: MechanismSource;
  try {
    src = await mechanismSource(request.mechanismId);
  } catch {
    throw new InputError("mechanismId", `unknown mechanism ${request.mechanismId}`, "unknown-mechanism");
  }
  const mech = compileSource(src);
  const planned = planRun(mech, request);
  const s = request.start ?? { kind: "periodic" };
  let start: StartSpec;
  if (s.kind === "analysis") {
    let record: Awaited<ReturnType<typeof getAnalysisRecord>>;
    try {
      record = await getAnalysisRecord(s.analysisId);
    } catch {
      throw new InputError("start.analysisId", `no stored analysis with id ${s.analysisId}`, "not-found");
    }
    if (record.result.mechanism.id !== src.id)
      throw new InputError(
        "start.analysisId",
        `the analysis used mechanism ${record.result.mechanism.id}, the run ${src.id}: start from an analysis of the same mechanism`,
      );
    const d = record.result.diurnal;
    start = {
      kind: "state",
      state_cm3: d ? d.atLocalTime_cm3 : record.result.steadyState.numberDensity_cm3,
      M_cm3: record.result.condition.M_cm3,
    };
    planned.warnings.push(
      `started from stored analysis ${s.analysisId} (its state at ${d ? `${d.reportAt_h} h local time of its 24-hour solution` : "its instantaneous steady state"}), scaled to this run's air density; the run starts at local midnight`,
    );
  } else start = s;
  return { request, src, planned, start };
}

/** Parses and checks a run request; throws InputError (400) before anything is queued. */
export async function validateRun(body: unknown): Promise<RunRequest> {
  const request = parseRunRequest(body);
  await prepareRun(request);
  return request;
}

/** The run's tasks, on queue workers or in the engine pool (engineTasks). */
function runTask(src: MechanismSource, tasks?: TaskRunner) {
  const t = engineTasks(tasks);
  return {
    start: (task: RunStartTask): Promise<StartState> => t.run({ kind: "run-start", mechanism: src, task }),
    days: (task: RunDaysTask): Promise<RunSegment> => t.run({ kind: "run-days", mechanism: src, task }),
  };
}

export interface RunRecordBody {
  request: RunRequest;
  result: RunResult;
}

/** Job handler "run"; `deleteHash`: the hash of the deletion token its start returned. */
export async function runJob(job: RunRequest & { deleteHash?: string }, ctx: JobContext) {
  const { deleteHash, ...input } = job;
  const t0 = performance.now();
  const p = await prepareRun(input);
  const mech = compileSource(p.src);
  const run = runTask(p.src, ctx.tasks);
  const total = input.days;
  ctx.progress(0, total, "start state (24-hour solution)");
  const startState = await run.start({ plan: p.planned.plan, start: p.start });
  if (ctx.signal.aborted) throw ctx.signal.reason;
  const plan = { ...p.planned.plan, initial_cm3: startState.state_cm3 };
  const segments: RunSegment[] = [];
  let state = plan.initial_cm3;
  let jCache: JCache = {};
  for (let d = 0; d < total; d += RUN_SPAN_DAYS) {
    ctx.progress(d, total, `days ${d + 1}–${Math.min(total, d + RUN_SPAN_DAYS)}`);
    const seg = await run.days({
      plan,
      firstDay: d,
      dayCount: Math.min(RUN_SPAN_DAYS, total - d),
      state_cm3: state,
      jCache,
    });
    if (ctx.signal.aborted) throw ctx.signal.reason;
    segments.push(seg);
    if (seg.status !== "ok") break;
    state = seg.final_cm3;
    jCache = seg.jCache;
  }
  ctx.progress(total, total, "storing");
  const result = compactRun(
    assembleRun(mech, plan, segments, {
      engineVersion: ENGINE_VERSION,
      mechanism: { id: p.src.id, title: p.src.title },
      title:
        input.title ?? (input.trajectory ? `Trajectory ${input.trajectory.name ?? ""}`.trim() : "Run at a fixed place"),
      warnings: [...p.planned.warnings, ...startState.warnings],
      elapsed_ms: performance.now() - t0,
    }),
  );
  const body: RunRecordBody = { request: input, result };
  return { resultId: await putNewRecord(RUN_KIND, body, { deleteHash }), resultKind: RUN_KIND };
}

export type StoredRunRecord = RecordView<RunRecordBody>;

/** DELETE of a stored run with the token its job was started with (its hourly analyses stay: records of their own). */
export async function deleteRunRecord(id: string, token: string | null): Promise<void> {
  await deleteWithToken([{ kind: RUN_KIND, id }], token, "run");
}

export async function getRunRecord(id: string): Promise<StoredRunRecord> {
  return recordView(await liveRecord(RUN_KIND, id, "run"));
}

const RUN_EXPORTS = {
  "hours.csv": [
    runHoursCsv,
    "hours.csv: the run's hourly state: T, [M], zenith angle, O3 in ppbv and every species' number density",
  ],
  "rates.csv": [runRatesCsv, "rates.csv: the run's hourly rate of every reaction"],
  "daily.csv": [
    runDailyCsv,
    "daily.csv: each day's O3 change, Ox production and loss (pathway analysis of the day's integrated rates), the budget closure, the loss by family and the pool totals",
  ],
} as const;

/** A CSV export of a stored run after its provenance block; null for an unknown file. */
export async function runExport(
  id: string,
  file: string,
  o: CsvExportOptions,
): Promise<{ csv: string; filename: string } | null> {
  if (!Object.hasOwn(RUN_EXPORTS, file)) return null;
  const [make, table] = RUN_EXPORTS[file as keyof typeof RUN_EXPORTS];
  const record = await getRunRecord(id);
  const r = record.body.result;
  const { trajectory, ...settings } = record.body.request;
  const csv = csvExport(
    make(r),
    {
      table,
      mechanisms: [await csvMechanism(r.mechanism)],
      condition: [
        [
          "condition",
          trajectory
            ? `along the trajectory ${trajectory.name ?? "(uploaded)"}; base ${JSON.stringify(settings.condition)}`
            : JSON.stringify(settings.condition),
        ],
        ["request", JSON.stringify({ days: settings.days, start: settings.start, options: r.options })],
      ],
      engineVersion: r.engineVersion,
      computedAt: record.createdAt,
      permalink: runPath(id),
      record: `/api/runs/${id}`,
      extra: [["run-status", `${r.status}: ${r.message}`]],
    },
    o,
  );
  return { csv, filename: `run-${id}-${file}` };
}

/** The invented demo runs offered on the page. */
export function runCatalogue() {
  return { demos: DEMO_RUNS.map((d) => ({ id: d.id, title: d.title, note: d.note, request: d.request })) };
}

/**
 * Hour `hour` of a stored run as a stored analysis (status "instant", not a steady state), so that the explorer,
 * its permalink and its CSV exports work on it as on any analysis. Its id is the run's id and the hour, so
 * opening the same hour again finds the same record.
 */
export async function storeRunHour(id: string, hour: number): Promise<string> {
  const analysisId = `${id}-h${hour}`;
  if (!ID_PATTERN.test(id) || !Number.isInteger(hour)) throw notFound("run hour", analysisId);
  if (await getStore().getAnalysis(analysisId)) return analysisId;
  const record = await getRunRecord(id);
  const request = record.body.request;
  const mech = compileSource(await mechanismSource(request.mechanismId));
  const result = hourSnapshot(mech, request, record.body.result, hour);
  const c = result.condition;
  const condition = {
    ...request.condition,
    altitude_km: c.altitude_km,
    T_K: c.T_K,
    p_hPa: c.p_hPa,
    latitude_deg: c.latitude_deg,
    date: c.date,
    localSolarTime_h: c.localSolarTime_h,
    ozone: "solved" as const,
  };
  try {
    await putNewAnalysis(
      { mechanismId: request.mechanismId, request: { mechanismId: request.mechanismId, condition }, result },
      { id: analysisId, engineVersion: record.engineVersion },
    );
  } catch (e) {
    // opened twice at once: the other request stored it
    if (!(await getStore().getAnalysis(analysisId))) throw e;
  }
  return analysisId;
}
