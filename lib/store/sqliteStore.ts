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
import {
  type AnalysisRow,
  analysisColumns,
  type MechanismRow,
  mechanismColumns,
  packAnalysisResult,
  type RecordRow,
  recordColumns,
  refTable,
  TOMBSTONE_SET,
  toAnalysis,
  toMechanism,
  toRecord,
} from "./rows";
import type { RecordRef, Store, StoredAnalysis, StoredRecord } from "./types";

export function openSqliteStore(file: string): Store {
  if (file !== ":memory:") mkdirSync(path.dirname(file), { recursive: true });
  const db = new Database(file);
  db.pragma("journal_mode = WAL");
  db.pragma("foreign_keys = ON");
  db.pragma("busy_timeout = 5000");
  migrate(db);

  const insertMechanism = db.prepare(
    `INSERT OR IGNORE INTO mechanisms (id, title, description, text, format, species_count, reaction_count, created_at,
       content_hash, owner_hash, delete_hash, stored_bytes)
     VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)`,
  );
  const selectMechanism = db.prepare("SELECT * FROM mechanisms WHERE id = ?");
  const listMechanisms = db.prepare(
    "SELECT * FROM mechanisms WHERE deleted_at IS NULL ORDER BY created_at DESC, id ASC LIMIT ?",
  );
  const listOwnMechanisms = db.prepare(
    "SELECT * FROM mechanisms WHERE owner_hash = ? AND deleted_at IS NULL ORDER BY created_at DESC, id ASC LIMIT ?",
  );
  const insertAnalysis = db.prepare(
    `INSERT INTO analyses (id, mechanism_id, engine_version, request_json, result_json, result_br, created_at,
       pinned, delete_hash, stored_bytes)
     VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?)`,
  );
  const selectAnalysis = db.prepare("SELECT * FROM analyses WHERE id = ?");
  const insertRecord = db.prepare(
    `INSERT INTO records (kind, id, engine_version, body_json, body_br, created_at, delete_hash, stored_bytes)
     VALUES (?, ?, ?, ?, ?, ?, ?, ?)`,
  );
  const selectRecord = db.prepare("SELECT * FROM records WHERE kind = ? AND id = ?");
  const pin = db.prepare("UPDATE analyses SET pinned = 1 WHERE id = ?");
  const oldestDrafts = db.prepare(
    "SELECT id FROM analyses WHERE pinned = 0 AND deleted_at IS NULL AND created_at < ? ORDER BY created_at ASC LIMIT ?",
  );
  const expireDraft = db.prepare(`UPDATE analyses SET ${TOMBSTONE_SET.analyses}, deleted_at = ? WHERE id = ?`);
  const sumBytes = db.prepare(
    `SELECT (SELECT COALESCE(SUM(stored_bytes), 0) FROM mechanisms) + (SELECT COALESCE(SUM(stored_bytes), 0) FROM analyses)
       + (SELECT COALESCE(SUM(stored_bytes), 0) FROM records) AS bytes`,
  );
  const where = (ref: RecordRef) => {
    const { table, byKind } = refTable(ref);
    return { table, sql: byKind ? "kind = ? AND id = ?" : "id = ?", params: byKind ? [ref.kind, ref.id] : [ref.id] };
  };
  const expire = db.transaction((before: string, at: string, limit: number) => {
    const ids = (oldestDrafts.all(before, limit) as { id: string }[]).map((r) => r.id);
    for (const id of ids) expireDraft.run(at, id);
    return ids.length;
  });

  return {
    backend: "sqlite",
    async putMechanism(m) {
      return insertMechanism.run(...mechanismColumns(m)).changes === 1;
    },
    async getMechanism(id) {
      const row = selectMechanism.get(id) as MechanismRow | undefined;
      return row ? toMechanism(row) : null;
    },
    async listMechanisms(limit, ownerHash) {
      const rows = ownerHash === undefined ? listMechanisms.all(limit) : listOwnMechanisms.all(ownerHash, limit);
      return (rows as MechanismRow[]).map(toMechanism);
    },
    async putAnalysis(a: StoredAnalysis) {
      insertAnalysis.run(...analysisColumns(a, packAnalysisResult(a)));
    },
    async getAnalysis(id) {
      const row = selectAnalysis.get(id) as AnalysisRow | undefined;
      return row ? toAnalysis(row) : null;
    },
    async putRecord(r: StoredRecord) {
      insertRecord.run(...recordColumns(r));
    },
    async getRecord(kind, id) {
      const row = selectRecord.get(kind, id) as RecordRow | undefined;
      return row ? toRecord(row) : null;
    },
    async lifecycle(ref) {
      const w = where(ref);
      const row = db.prepare(`SELECT delete_hash, deleted_at FROM ${w.table} WHERE ${w.sql}`).get(...w.params) as
        | { delete_hash: string | null; deleted_at: string | null }
        | undefined;
      return row ? { deleteHash: row.delete_hash, deletedAt: row.deleted_at } : null;
    },
    async tombstone(ref, deletedAt) {
      const w = where(ref);
      const sql = `UPDATE ${w.table} SET ${TOMBSTONE_SET[w.table]}, deleted_at = ? WHERE ${w.sql} AND deleted_at IS NULL`;
      return db.prepare(sql).run(deletedAt, ...w.params).changes === 1;
    },
    async pinAnalysis(id) {
      pin.run(id);
    },
    async expireDrafts(createdBefore, deletedAt, limit = 1000) {
      return expire(createdBefore, deletedAt, limit);
    },
    async storedBytes() {
      return Number((sumBytes.get() as { bytes: number }).bytes);
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
