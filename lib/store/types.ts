/**
 * The storage interface: every record is immutable under its id until it is
 * deleted with its token or expires (a draft); then a tombstone stays, so
 * that its links answer 410 and not 404. Bodies are stored compressed. One implementation per back end (SQLite is the default,
 * PostgreSQL when DATABASE_URL is set); every method is asynchronous so that
 * a networked database fits the same interface.
 */

/** What every kind of stored thing may carry besides its body (absent fields are not stored). */
export interface Lifecycle {
  /** hex SHA-256 of the deletion token handed out once at creation */
  deleteHash?: string;
  /** ISO 8601, set on a tombstone: the body is gone */
  deletedAt?: string;
}

export interface StoredMechanism extends Lifecycle {
  /** a random upload id ("u-" + 22 base64url characters); before version 2, "m-" + 32 hex of the content hash */
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
  /** "m-" + 32 hex of the SHA-256 of the canonical document; kept inside the store, never handed out */
  contentHash?: string;
  /** hex SHA-256 of the uploader's owner cookie: the uploads listed to that client */
  ownerHash?: string;
}

export interface StoredAnalysis<Request = unknown, Result = unknown> extends Lifecycle {
  /** 96 random bits, base64url (16 characters) */
  id: string;
  mechanismId: string;
  engineVersion: string;
  request: Request;
  result: Result;
  /** ISO 8601 */
  createdAt: string;
  /** false for an explorer draft, which expires; default true (kept) */
  pinned?: boolean;
  /** on a write only: `result`'s JSON text (UTF-8) when the caller has it, stored instead of writing it again */
  resultJson?: Uint8Array;
}

/** A stored record of any other kind (profiles, comparisons, assessments): immutable JSON by id. */
export interface StoredRecord<T = unknown> extends Lifecycle {
  id: string;
  kind: string;
  engineVersion: string;
  body: T;
  createdAt: string;
}

/** A stored thing: kind "mechanism", "analysis", or a record kind ("profile", "assessment", …). */
export interface RecordRef {
  kind: string;
  id: string;
}

export interface Store {
  /** which back end this is, for diagnostics */
  readonly backend: "sqlite" | "postgres";
  /** Inserts the mechanism if its id is new; resolves to whether it was inserted. */
  putMechanism(m: StoredMechanism): Promise<boolean>;
  getMechanism(id: string): Promise<StoredMechanism | null>;
  /** Live uploads, most recent first; only those of one owner when `ownerHash` is given. */
  listMechanisms(limit: number, ownerHash?: string): Promise<StoredMechanism[]>;
  /** Rejects when the id is taken (analyses are immutable). */
  putAnalysis(a: StoredAnalysis): Promise<void>;
  getAnalysis(id: string): Promise<StoredAnalysis | null>;
  /** Rejects when (kind, id) is taken (records are immutable). */
  putRecord(r: StoredRecord): Promise<void>;
  getRecord(kind: string, id: string): Promise<StoredRecord | null>;
  /** The deletion hash and tombstone date of a stored thing, without its body; null when there is none. */
  lifecycle(ref: RecordRef): Promise<{ deleteHash: string | null; deletedAt: string | null } | null>;
  /** Drops the body and leaves a tombstone; resolves to whether the thing was live. */
  tombstone(ref: RecordRef, deletedAt: string): Promise<boolean>;
  /** Keeps an analysis for good (its permalink was asked for). */
  pinAnalysis(id: string): Promise<void>;
  /** Tombstones the unpinned analyses created before `createdBefore` (ISO 8601), oldest first, at most `limit`; resolves to how many. */
  expireDrafts(createdBefore: string, deletedAt: string, limit?: number): Promise<number>;
  /** Bytes of the stored bodies (compressed) and documents, for the storage budget. */
  storedBytes(): Promise<number>;
  close(): Promise<void>;
}
