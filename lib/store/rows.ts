/**
 * Table rows to stored objects, shared by every back end: the schema is the
 * same everywhere (migrations.ts), so the mapping is written once.
 */
import type { StoredAnalysis, StoredMechanism, StoredRecord } from "./types";

export interface MechanismRow {
  id: string;
  title: string;
  description: string;
  text: string;
  format: "yaml" | "json";
  species_count: number;
  reaction_count: number;
  created_at: string;
}

export interface AnalysisRow {
  id: string;
  mechanism_id: string;
  engine_version: string;
  request_json: string;
  result_json: string;
  created_at: string;
}

export interface RecordRow {
  kind: string;
  id: string;
  engine_version: string;
  body_json: string;
  created_at: string;
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
  };
}

export function toAnalysis(r: AnalysisRow): StoredAnalysis {
  return {
    id: r.id,
    mechanismId: r.mechanism_id,
    engineVersion: r.engine_version,
    request: JSON.parse(r.request_json),
    result: JSON.parse(r.result_json),
    createdAt: r.created_at,
  };
}

export function toRecord(r: RecordRow): StoredRecord {
  return {
    kind: r.kind,
    id: r.id,
    engineVersion: r.engine_version,
    body: JSON.parse(r.body_json),
    createdAt: r.created_at,
  };
}
