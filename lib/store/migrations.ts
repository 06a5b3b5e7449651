/**
 * Numbered schema migrations, applied in order at start by every back end.
 * Never edit a migration that has shipped: add the next number. `sql` is
 * written in the common subset of SQLite and PostgreSQL; a migration that
 * needs dialect-specific SQL gives `postgres` as well (then `sql` is
 * SQLite's).
 */
export interface Migration {
  version: number;
  /** SQLite, and PostgreSQL too unless `postgres` is given */
  sql: string;
  /** PostgreSQL's form, when it differs */
  postgres?: string;
}

/** The SQL of a migration in a dialect. */
export const migrationSql = (m: Migration, dialect: "sqlite" | "postgres"): string =>
  dialect === "postgres" ? (m.postgres ?? m.sql) : m.sql;

const PUBLIC_SERVICE_SQL = `
      ALTER TABLE mechanisms ADD COLUMN content_hash TEXT;
      ALTER TABLE mechanisms ADD COLUMN owner_hash TEXT;
      ALTER TABLE mechanisms ADD COLUMN delete_hash TEXT;
      ALTER TABLE mechanisms ADD COLUMN deleted_at TEXT;
      ALTER TABLE mechanisms ADD COLUMN stored_bytes INTEGER NOT NULL DEFAULT 0;
      CREATE INDEX mechanisms_owner ON mechanisms (owner_hash, created_at);
      ALTER TABLE analyses ADD COLUMN result_br BLOB;
      ALTER TABLE analyses ADD COLUMN pinned INTEGER NOT NULL DEFAULT 1;
      ALTER TABLE analyses ADD COLUMN delete_hash TEXT;
      ALTER TABLE analyses ADD COLUMN deleted_at TEXT;
      ALTER TABLE analyses ADD COLUMN stored_bytes INTEGER NOT NULL DEFAULT 0;
      CREATE INDEX analyses_drafts ON analyses (pinned, created_at);
      ALTER TABLE records ADD COLUMN body_br BLOB;
      ALTER TABLE records ADD COLUMN delete_hash TEXT;
      ALTER TABLE records ADD COLUMN deleted_at TEXT;
      ALTER TABLE records ADD COLUMN stored_bytes INTEGER NOT NULL DEFAULT 0;
    `;

export const MIGRATIONS: Migration[] = [
  {
    version: 1,
    sql: `
      CREATE TABLE mechanisms (
        id TEXT PRIMARY KEY,
        title TEXT NOT NULL,
        description TEXT NOT NULL,
        text TEXT NOT NULL,
        format TEXT NOT NULL CHECK (format IN ('yaml', 'json')),
        species_count INTEGER NOT NULL,
        reaction_count INTEGER NOT NULL,
        created_at TEXT NOT NULL
      );
      CREATE TABLE analyses (
        id TEXT PRIMARY KEY,
        mechanism_id TEXT NOT NULL,
        engine_version TEXT NOT NULL,
        request_json TEXT NOT NULL,
        result_json TEXT NOT NULL,
        created_at TEXT NOT NULL
      );
      CREATE INDEX analyses_mechanism ON analyses (mechanism_id);
      CREATE TABLE records (
        kind TEXT NOT NULL,
        id TEXT NOT NULL,
        engine_version TEXT NOT NULL,
        body_json TEXT NOT NULL,
        created_at TEXT NOT NULL,
        PRIMARY KEY (kind, id)
      );
    `,
  },
  {
    // Running in public: deletion tokens (their SHA-256), tombstones that answer 410,
    // private uploads (owner and content hash), pinned drafts, compressed bodies and
    // their stored size for the budget. Rows stored before this stay pinned and unowned.
    version: 2,
    sql: PUBLIC_SERVICE_SQL,
    postgres: PUBLIC_SERVICE_SQL.replaceAll("BLOB", "BYTEA"),
  },
];
