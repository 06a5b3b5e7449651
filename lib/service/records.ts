/**
 * Storing and reading the service's records in one place: a new record gets
 * a fresh id (unless the caller chose one, e.g. an assessment's two links),
 * this engine's version and the time; reading checks the id's form, gets the
 * record and answers 404 (never stored) or 410 (deleted, expired) for it.
 */
import "server-only";
import { ENGINE_VERSION } from "../engine/version";
import { getStore, ID_PATTERN, newRecordId, type StoredAnalysis, type StoredRecord } from "../store";
import { liveOrThrow } from "./lifecycle";

/** What a new record may be given instead of the defaults. */
export interface NewRecordOptions {
  /** default: a new random id (newRecordId) */
  id?: string;
  /** ISO 8601; default now */
  createdAt?: string;
  /** default: this engine's ENGINE_VERSION */
  engineVersion?: string;
  /** hex SHA-256 of the deletion token handed out (lib/service/lifecycle.ts); default none */
  deleteHash?: string;
}

/** A stored record as the routes return it: with the engine version it was computed by and the current one. */
export interface RecordView<T> {
  id: string;
  createdAt: string;
  engineVersion: string;
  currentEngineVersion: string;
  body: T;
}

function stamp(o: NewRecordOptions) {
  return {
    id: o.id ?? newRecordId(),
    engineVersion: o.engineVersion ?? ENGINE_VERSION,
    createdAt: o.createdAt ?? new Date().toISOString(),
    ...(o.deleteHash !== undefined ? { deleteHash: o.deleteHash } : {}),
  };
}

/** Stores a new record of `kind`; resolves to its id. */
export async function putNewRecord(kind: string, body: unknown, o: NewRecordOptions = {}): Promise<string> {
  const r: StoredRecord = { kind, body, ...stamp(o) };
  await getStore().putRecord(r);
  return r.id;
}

/** Stores a new analysis; resolves to its id. `pinned` false: an explorer draft (lib/service/retention.ts). */
export async function putNewAnalysis(
  a: Pick<StoredAnalysis, "mechanismId" | "request" | "result" | "pinned" | "resultJson">,
  o: NewRecordOptions = {},
): Promise<string> {
  const r: StoredAnalysis = { ...a, ...stamp(o) };
  if (a.pinned === undefined) delete r.pinned;
  await getStore().putAnalysis(r);
  return r.id;
}

/** The live record of `kind`, or the 404/410 that answers for `what` (e.g. "profile sweep"). */
export async function liveRecord(kind: string, id: string, what: string): Promise<StoredRecord> {
  return liveOrThrow(ID_PATTERN.test(id) ? await getStore().getRecord(kind, id) : null, what, id);
}

/** The live analysis, or the 404/410 that answers for it. */
export async function liveAnalysis(id: string): Promise<StoredAnalysis> {
  return liveOrThrow(ID_PATTERN.test(id) ? await getStore().getAnalysis(id) : null, "analysis", id);
}

/** What the routes say of any stored record or analysis: its id, when and by which engine it was computed, and the current engine. */
export function provenanceOf(
  r: Pick<StoredRecord, "id" | "createdAt" | "engineVersion">,
): Omit<RecordView<never>, "body"> {
  return { id: r.id, createdAt: r.createdAt, engineVersion: r.engineVersion, currentEngineVersion: ENGINE_VERSION };
}

/** The route's view of a stored record, its body typed as the caller knows it. */
export function recordView<T>(r: StoredRecord): RecordView<T> {
  return { ...provenanceOf(r), body: r.body as T };
}
