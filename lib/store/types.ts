/**
 * The storage interface: mechanisms are content-addressed, analyses are
 * immutable. One implementation per back end (SQLite is the default).
 */

export interface StoredMechanism {
  /** "m-" + 32 hex characters of the SHA-256 of the canonical document */
  id: string;
  title: string;
  description: string;
  /** the document as uploaded */
  text: string;
  format: "yaml" | "json";
  speciesCount: number;
  reactionCount: number;
  /** ISO 8601 */
  createdAt: string;
}

export interface StoredAnalysis<Request = unknown, Result = unknown> {
  /** 96 random bits, base64url (16 characters) */
  id: string;
  mechanismId: string;
  engineVersion: string;
  request: Request;
  result: Result;
  /** ISO 8601 */
  createdAt: string;
}

/** A stored record of any other kind (profiles, comparisons, assessments): immutable JSON by id. */
export interface StoredRecord<T = unknown> {
  id: string;
  kind: string;
  engineVersion: string;
  body: T;
  createdAt: string;
}

export interface Store {
  /** Inserts the mechanism if its id is new; returns whether it was inserted. */
  putMechanism(m: StoredMechanism): boolean;
  getMechanism(id: string): StoredMechanism | null;
  /** Most recent uploads first. */
  listMechanisms(limit: number): StoredMechanism[];
  putAnalysis(a: StoredAnalysis): void;
  getAnalysis(id: string): StoredAnalysis | null;
  putRecord(r: StoredRecord): void;
  getRecord(kind: string, id: string): StoredRecord | null;
  close(): void;
}
