/**
 * SQLite back end of the store (better-sqlite3 12): WAL mode, foreign keys
 * on, migrations run at open, every write in one transaction so that nothing
 * is half-stored. The driver is synchronous; the methods return settled
 * promises to fit the store's asynchronous interface.
 */
import { mkdirSync } from "node:fs";
import path from "node:path";
import Database from "better-sqlite3";
import { MIGRATIONS, migrationSql } from "./migrations";
import { type AnalysisRow, type MechanismRow, type RecordRow, toAnalysis, toMechanism, toRecord } from "./rows";
import type { Store, StoredAnalysis, StoredRecord } from "./types";

export function openSqliteStore(file: string): Store {
  if (file !== ":memory:") mkdirSync(path.dirname(file), { recursive: true });
  const db = new Database(file);
  db.pragma("journal_mode = WAL");
  db.pragma("foreign_keys = ON");
  db.pragma("busy_timeout = 5000");
  migrate(db);

  const insertMechanism = db.prepare(
    `INSERT OR IGNORE INTO mechanisms (id, title, description, text, format, species_count, reaction_count, created_at)
     VALUES (@id, @title, @description, @text, @format, @speciesCount, @reactionCount, @createdAt)`,
  );
  const selectMechanism = db.prepare("SELECT * FROM mechanisms WHERE id = ?");
  const listMechanisms = db.prepare("SELECT * FROM mechanisms ORDER BY created_at DESC, id ASC LIMIT ?");
  const insertAnalysis = db.prepare(
    `INSERT INTO analyses (id, mechanism_id, engine_version, request_json, result_json, created_at)
     VALUES (?, ?, ?, ?, ?, ?)`,
  );
  const selectAnalysis = db.prepare("SELECT * FROM analyses WHERE id = ?");
  const insertRecord = db.prepare(
    "INSERT INTO records (kind, id, engine_version, body_json, created_at) VALUES (?, ?, ?, ?, ?)",
  );
  const selectRecord = db.prepare("SELECT * FROM records WHERE kind = ? AND id = ?");

  return {
    backend: "sqlite",
    async putMechanism(m) {
      return insertMechanism.run(m).changes === 1;
    },
    async getMechanism(id) {
      const row = selectMechanism.get(id) as MechanismRow | undefined;
      return row ? toMechanism(row) : null;
    },
    async listMechanisms(limit) {
      return (listMechanisms.all(limit) as MechanismRow[]).map(toMechanism);
    },
    async putAnalysis(a: StoredAnalysis) {
      insertAnalysis.run(
        a.id,
        a.mechanismId,
        a.engineVersion,
        JSON.stringify(a.request),
        JSON.stringify(a.result),
        a.createdAt,
      );
    },
    async getAnalysis(id) {
      const row = selectAnalysis.get(id) as AnalysisRow | undefined;
      return row ? toAnalysis(row) : null;
    },
    async putRecord(r: StoredRecord) {
      insertRecord.run(r.kind, r.id, r.engineVersion, JSON.stringify(r.body), r.createdAt);
    },
    async getRecord(kind, id) {
      const row = selectRecord.get(kind, id) as RecordRow | undefined;
      return row ? toRecord(row) : null;
    },
    async close() {
      db.close();
    },
  };
}

function migrate(db: Database.Database): void {
  db.exec("CREATE TABLE IF NOT EXISTS schema_migrations (version INTEGER PRIMARY KEY, applied_at TEXT NOT NULL)");
  const done = new Set(
    (db.prepare("SELECT version FROM schema_migrations").all() as { version: number }[]).map((r) => r.version),
  );
  for (const m of MIGRATIONS) {
    if (done.has(m.version)) continue;
    db.transaction(() => {
      db.exec(migrationSql(m, "sqlite"));
      db.prepare("INSERT INTO schema_migrations (version, applied_at) VALUES (?, ?)").run(
        m.version,
        new Date().toISOString(),
      );
    })();
  }
}
