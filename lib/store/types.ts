/**
 * The storage interface: mechanisms are content-addressed, analyses are
 * immutable. One implementation per back end (SQLite is the default,
 * PostgreSQL when DATABASE_URL is set); every method is asynchronous so that
 * a networked database fits the same interface.
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
  /** which back end this is, for diagnostics */
  readonly backend: "sqlite" | "postgres";
  /** Inserts the mechanism if its id is new; resolves to whether it was inserted. */
  putMechanism(m: StoredMechanism): Promise<boolean>;
  getMechanism(id: string): Promise<StoredMechanism | null>;
  /** Most recent uploads first. */
  listMechanisms(limit: number): Promise<StoredMechanism[]>;
  /** Rejects when the id is taken (analyses are immutable). */
  putAnalysis(a: StoredAnalysis): Promise<void>;
  getAnalysis(id: string): Promise<StoredAnalysis | null>;
  /** Rejects when (kind, id) is taken (records are immutable). */
  putRecord(r: StoredRecord): Promise<void>;
  getRecord(kind: string, id: string): Promise<StoredRecord | null>;
  close(): Promise<void>;
}
