/**
 * Profile sweeps and comparisons: validate the request (nothing is queued
 * unless the profile, the grid and the mechanism fit), run the levels in the
 * engine pool as a job, and store the result immutably under an unguessable
 * id (record kinds "profile" and "comparison"). A level that fails is part
 * of the stored result, not a failed job.
 */
import "server-only";
import { DEMO_PROFILES } from "../atmosphere/demoProfiles";
import type { DemoProfile } from "../atmosphere/types";
import type { MechanismSource } from "../engine/mechanismSource";
import { ENGINE_VERSION } from "../engine/version";
import { InputError } from "../errors";
import type { JobContext, TaskRunner } from "../jobs/types";
import { builtinProfiles } from "../profiles/builtinProfiles";
import { compareSweeps } from "../profiles/compareSweeps";
import { comparisonCsv } from "../profiles/csvTables";
import { type PreparedSweep, prepareSweep, runPreparedSweep } from "../profiles/prepareSweep";
import { profileToCsv } from "../profiles/profileToCsv";
import { parseComparisonRequest, parseSweepRequest } from "../profiles/requestSchema";
import type { SweepExecutor, SweepProgress } from "../profiles/runSweep";
import type { ComparisonRequest, ComparisonResult, Profile, SweepRequest, SweepResult } from "../profiles/types";
import { getStore, ID_PATTERN } from "../store";
import { type CsvExportOptions, csvExport, csvMechanism } from "./csvProvenance";
import { engineTasks } from "./engineTasks";
import { liveOrThrow } from "./lifecycle";
import { listMechanisms, mechanismSource } from "./mechanisms";
import {
  COMPARISON_TABLE,
  comparisonSide,
  type ProfileRecordBody,
  SWEEP_CSV_TABLES,
  sweepCondition,
} from "./sweepCsvTables";

export type { ProfileRecordBody } from "./sweepCsvTables";

import { liveRecord, putNewRecord, type RecordView, recordView } from "./records";
import { keepWithinBudget } from "./retention";

export const PROFILE_KIND = "profile";
export const COMPARISON_KIND = "comparison";
/** Largest sweep or comparison body, bytes (two CSV profiles of up to 512 KiB each, with room). */
export const MAX_PROFILE_BODY = 1.5 * 1024 * 1024;

export const profilePath = (id: string) => `/profiles/${id}`;
export const comparisonPath = (id: string) => `/compare/${id}`;

const DEMOS: readonly DemoProfile[] = DEMO_PROFILES;

/** The default profile and the invented demo profiles, with their CSV form. */
export function listProfiles(): Profile[] {
  return builtinProfiles(DEMOS);
}

export function demoProfiles(): readonly DemoProfile[] {
  return DEMOS;
}

/** Checks everything a sweep needs before it is queued; `path` prefixes error paths (e.g. "a"). */
async function prepare(request: SweepRequest, path = ""): Promise<PreparedSweep> {
  let src: MechanismSource;
  try {
    src = await mechanismSource(request.mechanismId);
  } catch {
    const at = path ? `${path}.mechanismId` : "mechanismId";
    throw new InputError(at, `unknown mechanism ${request.mechanismId}`, "unknown-mechanism");
  }
  return prepareSweep(request, src, DEMOS, path);
}

/** The sweep's level batches, on queue workers or in the engine pool (engineTasks). */
function poolExecutor(src: MechanismSource, tasks?: TaskRunner): SweepExecutor {
  const t = engineTasks(tasks);
  return { workers: t.workers, run: (batch) => t.run({ kind: "profile-levels", mechanism: src, batch }) };
}

function runPrepared(
  p: PreparedSweep,
  signal: AbortSignal,
  onProgress: (q: SweepProgress) => void,
  tasks?: TaskRunner,
): Promise<SweepResult> {
  return runPreparedSweep(p, poolExecutor(p.src, tasks), { signal, onProgress });
}

const stageOf = (q: SweepProgress) => (q.pass > 1 ? `levels, pass ${q.pass} (overhead O3 column)` : "levels");

/** What a job's input carries besides the request: the hash of the deletion token handed to the client. */
export interface Deletable {
  deleteHash?: string;
}

async function storeSweep(p: PreparedSweep, result: SweepResult, deleteHash?: string): Promise<string> {
  // the CSV text is kept once, as the parsed profile
  const request: SweepRequest =
    p.request.profile.kind === "csv"
      ? { ...p.request, profile: { kind: "csv", csv: "", name: p.request.profile.name } }
      : p.request;
  const body: ProfileRecordBody = { request, profile: p.profile, result };
  await keepWithinBudget();
  return putNewRecord(PROFILE_KIND, body, { deleteHash });
}

/** Parses and checks a sweep request; throws InputError (400) before anything is queued. */
export async function validateSweep(body: unknown): Promise<SweepRequest> {
  const request = parseSweepRequest(body);
  await prepare(request);
  return request;
}

/** Job handler "profile-sweep". */
export async function sweepJob(job: SweepRequest & Deletable, ctx: JobContext) {
  const { deleteHash, ...input } = job;
  const p = await prepare(input);
  const result = await runPrepared(p, ctx.signal, (q) => ctx.progress(q.done, q.total, stageOf(q)), ctx.tasks);
  if (ctx.signal.aborted) throw ctx.signal.reason;
  return { resultId: await storeSweep(p, result, deleteHash), resultKind: PROFILE_KIND };
}

/** Parses and checks a comparison request; stored sides must exist. */
export async function validateComparison(body: unknown): Promise<ComparisonRequest> {
  const request = parseComparisonRequest(body);
  for (const key of ["a", "b"] as const) {
    const side = request[key];
    if ("sweepId" in side) await getProfileRecord(side.sweepId, `${key}.sweepId`);
    else await prepare(side, key);
  }
  return request;
}

export interface ComparisonRecordBody {
  request: ComparisonRequest;
  result: ComparisonResult;
}

/** Job handler "comparison": runs the sides that are not stored yet (each stored as a sweep), then compares. */
export async function comparisonJob(job: ComparisonRequest & Deletable, ctx: JobContext) {
  // the sweeps computed for the comparison take its deletion token too
  const { deleteHash, ...input } = job;
  const prepared = await Promise.all(
    (["a", "b"] as const).map((key) => {
      const side = input[key];
      return "sweepId" in side ? null : prepare(side, key);
    }),
  );
  const done = [0, 0];
  const totals = prepared.map((p) => p?.plan.tasks.length ?? 0);
  const sides: { id: string; result: SweepResult }[] = [];
  for (const [k, key] of (["a", "b"] as const).entries()) {
    const side = input[key];
    const p = prepared[k];
    if ("sweepId" in side || !p) {
      const rec = await getProfileRecord((side as { sweepId: string }).sweepId, `${key}.sweepId`);
      sides.push({ id: rec.id, result: rec.body.result });
      continue;
    }
    const result = await runPrepared(
      p,
      ctx.signal,
      (q) => {
        done[k] = q.done;
        totals[k] = q.total;
        ctx.progress(done[0] + done[1], totals[0] + totals[1], `${key.toUpperCase()}: ${stageOf(q)}`);
      },
      ctx.tasks,
    );
    if (ctx.signal.aborted) throw ctx.signal.reason;
    sides.push({ id: await storeSweep(p, result, deleteHash), result });
  }
  const result = compareSweeps(sides[0].result, sides[1].result, {
    labels: input.labels,
    topCycles: input.topCycles,
    sweepIds: { a: sides[0].id, b: sides[1].id },
    engineVersion: ENGINE_VERSION,
  });
  const body: ComparisonRecordBody = {
    request: { ...input, a: { sweepId: sides[0].id }, b: { sweepId: sides[1].id } },
    result,
  };
  return { resultId: await putNewRecord(COMPARISON_KIND, body, { deleteHash }), resultKind: COMPARISON_KIND };
}

export type StoredProfileRecord = RecordView<ProfileRecordBody>;

export async function getProfileRecord(id: string, path = "id"): Promise<StoredProfileRecord> {
  const found = ID_PATTERN.test(id) ? await getStore().getRecord(PROFILE_KIND, id) : null;
  if (path !== "id" && (!found || found.deletedAt)) {
    throw new InputError(path, `no stored profile sweep with id ${id}${found ? " (it was deleted)" : ""}`, "not-found");
  }
  return recordView(liveOrThrow(found, "profile sweep", id));
}

export type StoredComparisonRecord = RecordView<ComparisonRecordBody>;

export async function getComparisonRecord(id: string): Promise<StoredComparisonRecord> {
  return recordView(await liveRecord(COMPARISON_KIND, id, "comparison"));
}

/** GET /api/profiles: the profiles offered without an upload, each with its CSV. */
export function profileCatalogue() {
  return {
    profiles: listProfiles().map((p) => ({
      id: p.id,
      title: p.title,
      source: p.source,
      demo: p.demo,
      note: p.note,
      levels: p.levels.length,
      range_km: [p.levels[0]?.altitude_km ?? 0, p.levels[p.levels.length - 1]?.altitude_km ?? 0],
      csv: profileToCsv(p),
    })),
  };
}

/** A CSV export of a stored sweep (levels.csv, cycles.csv, profile.csv) after its provenance block; null for an unknown file. */
export async function profileExport(
  id: string,
  file: string,
  o: CsvExportOptions,
): Promise<{ csv: string; filename: string } | null> {
  if (!Object.hasOwn(SWEEP_CSV_TABLES, file)) return null;
  const { make, table } = SWEEP_CSV_TABLES[file];
  const record = await getProfileRecord(id);
  const r = record.body.result;
  const csv = csvExport(
    make(record.body),
    {
      table,
      mechanisms: [await csvMechanism(r.mechanism)],
      condition: sweepCondition(r, record.body.request),
      engineVersion: r.engineVersion,
      computedAt: record.createdAt,
      permalink: profilePath(id),
      record: `/api/profiles/${id}`,
    },
    o,
  );
  return { csv, filename: `profile-${id}-${file}` };
}

/** The CSV export of a stored comparison after its provenance block; null for an unknown file. */
export async function comparisonExport(
  id: string,
  file: string,
  o: CsvExportOptions,
): Promise<{ csv: string; filename: string } | null> {
  if (file !== "comparison.csv") return null;
  const record = await getComparisonRecord(id);
  const r = record.body.result;
  const side = (k: "a" | "b") => comparisonSide(r, k, `${o.origin}${profilePath(r[k].sweepId)}`);
  const csv = csvExport(
    comparisonCsv(r),
    {
      table: COMPARISON_TABLE,
      mechanisms: [
        { ...(await csvMechanism(r.a.mechanism)), side: "a" },
        { ...(await csvMechanism(r.b.mechanism)), side: "b" },
      ],
      condition: [["condition", "per level and side: see the two sweeps"], ...side("a"), ...side("b")],
      engineVersion: r.engineVersion,
      computedAt: record.createdAt,
      permalink: comparisonPath(id),
      record: `/api/comparisons/${id}`,
    },
    o,
  );
  return { csv, filename: `comparison-${id}.csv` };
}

/** What the profile forms offer: mechanisms (id, title; uploads of this owner cookie only) and the built-in profiles (without their levels). */
export async function profileFormOptions(owner?: string) {
  let mechanisms: { id: string; title: string }[] = [];
  try {
    mechanisms = (await listMechanisms(owner)).mechanisms.map((m) => ({
      id: m.id,
      title: m.builtin ? m.title : `${m.title} (upload)`,
    }));
  } catch {
    mechanisms = [{ id: "reference", title: "reference" }];
  }
  const profiles = listProfiles().map((p) => ({
    id: p.id,
    title: p.title,
    demo: p.demo,
    note: p.note,
    range_km: [p.levels[0]?.altitude_km ?? 0, p.levels[p.levels.length - 1]?.altitude_km ?? 0] as [number, number],
  }));
  return { mechanisms, profiles };
}
