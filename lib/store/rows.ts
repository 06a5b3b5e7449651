/**
 * Table rows to stored objects, shared by every back end: the schema is the
 * same everywhere (migrations.ts), so the mapping is written once. Bodies
 * written since migration 2 are brotli-compressed JSON (compress.ts); older
 * rows keep their plain JSON text and read as before.
 */
import { packJson, packJsonText, unpackJson } from "./compress";
import type { RecordRef, StoredAnalysis, StoredMechanism, StoredRecord } from "./types";

export interface MechanismRow {
  id: string;
  title: string;
  description: string;
  text: string;
  format: "yaml" | "json";
  species_count: number;
  reaction_count: number;
  created_at: string;
  content_hash: string | null;
  owner_hash: string | null;
  delete_hash: string | null;
  deleted_at: string | null;
}

export interface AnalysisRow {
  id: string;
  mechanism_id: string;
  engine_version: string;
  request_json: string;
  result_json: string;
  result_br: Uint8Array | null;
  created_at: string;
  pinned: number;
  delete_hash: string | null;
  deleted_at: string | null;
}

export interface RecordRow {
  kind: string;
  id: string;
  engine_version: string;
  body_json: string;
  body_br: Uint8Array | null;
  created_at: string;
  delete_hash: string | null;
  deleted_at: string | null;
}

/** The optional columns that are set, as optional fields (absent, not null, when unset). */
function lifecycleOf(r: { delete_hash: string | null; deleted_at: string | null }) {
  return {
    ...(r.delete_hash ? { deleteHash: r.delete_hash } : {}),
    ...(r.deleted_at ? { deletedAt: r.deleted_at } : {}),
  };
}

export function toMechanism(r: MechanismRow): StoredMechanism {
  return {
    id: r.id,
    title: r.title,
    description: r.description,
    text: r.text,
    format: r.format,
    speciesCount: Number(r.species_count),
    reactionCount: Number(r.reaction_count),
    createdAt: r.created_at,
    ...(r.content_hash ? { contentHash: r.content_hash } : {}),
    ...(r.owner_hash ? { ownerHash: r.owner_hash } : {}),
    ...lifecycleOf(r),
  };
}

export function toAnalysis(r: AnalysisRow): StoredAnalysis {
  const gone = Boolean(r.deleted_at);
  return {
    id: r.id,
    mechanismId: r.mechanism_id,
    engineVersion: r.engine_version,
    request: gone ? null : JSON.parse(r.request_json),
    result: gone ? null : r.result_br ? unpackJson(r.result_br) : JSON.parse(r.result_json),
    createdAt: r.created_at,
    pinned: Number(r.pinned) === 1,
    ...lifecycleOf(r),
  };
}

export function toRecord(r: RecordRow): StoredRecord {
  return {
    kind: r.kind,
    id: r.id,
    engineVersion: r.engine_version,
    body: r.deleted_at ? null : r.body_br ? unpackJson(r.body_br) : JSON.parse(r.body_json),
    createdAt: r.created_at,
    ...lifecycleOf(r),
  };
}

/** The columns of a new analysis, in the order of the INSERT statements of both back ends. */
/** The compressed result of a new analysis: its JSON text as given, or written here. */
export function packAnalysisResult(a: StoredAnalysis): Buffer {
  return packJsonText(a.resultJson ?? Buffer.from(JSON.stringify(a.result), "utf8"));
}

/** The columns of a new analysis, in the order of the INSERT statements of both back ends; `packed` from packAnalysisResult. */
export function analysisColumns(a: StoredAnalysis, packed: Uint8Array): unknown[] {
  const request = JSON.stringify(a.request);
  return [
    a.id,
    a.mechanismId,
    a.engineVersion,
    request,
    "",
    packed,
    a.createdAt,
    a.pinned === false ? 0 : 1,
    a.deleteHash ?? null,
    request.length + packed.byteLength,
  ];
}

/** The columns of a new record, in the order of the INSERT statements of both back ends. */
export function recordColumns(r: StoredRecord): unknown[] {
  const packed = packJson(r.body);
  return [r.kind, r.id, r.engineVersion, "", packed, r.createdAt, r.deleteHash ?? null, packed.byteLength];
}

/** The columns of a new mechanism, in the order of the INSERT statements of both back ends. */
export function mechanismColumns(m: StoredMechanism): unknown[] {
  return [
    m.id,
    m.title,
    m.description,
    m.text,
    m.format,
    m.speciesCount,
    m.reactionCount,
    m.createdAt,
    m.contentHash ?? null,
    m.ownerHash ?? null,
    m.deleteHash ?? null,
    Buffer.byteLength(m.text, "utf8"),
  ];
}

/** The table and key of a stored thing (kind "mechanism", "analysis", or a record kind). */
export function refTable(ref: RecordRef): { table: "mechanisms" | "analyses" | "records"; byKind: boolean } {
  if (ref.kind === "mechanism") return { table: "mechanisms", byKind: false };
  if (ref.kind === "analysis") return { table: "analyses", byKind: false };
  return { table: "records", byKind: true };
}

/** What a tombstone keeps of each table: the body columns emptied, the size zeroed. */
export const TOMBSTONE_SET: Record<"mechanisms" | "analyses" | "records", string> = {
  mechanisms: "text = '', stored_bytes = 0",
  analyses: "request_json = 'null', result_json = '', result_br = NULL, stored_bytes = 0",
  records: "body_json = '', body_br = NULL, stored_bytes = 0",
};
