/**
 * SQLite back end of the store (better-sqlite3 12): WAL mode, foreign keys
 * on, migrations run at open, every write in one transaction so that nothing
 * is half-stored.
 */
import { mkdirSync } from "node:fs";
import path from "node:path";
import Database from "better-sqlite3";
import { MIGRATIONS } from "./migrations";
import type { Store, StoredAnalysis, StoredMechanism, StoredRecord } from "./types";

interface MechanismRow {
  id: string;
  title: string;
  description: string;
  text: string;
  format: "yaml" | "json";
  species_count: number;
  reaction_count: number;
  created_at: string;
}

function toMechanism(r: MechanismRow): StoredMechanism {
  return {
    id: r.id,
    title: r.title,
    description: r.description,
    text: r.text,
    format: r.format,
    speciesCount: r.species_count,
    reactionCount: r.reaction_count,
    createdAt: r.created_at,
  };
}

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
  const listMechanisms = db.prepare("SELECT * FROM mechanisms ORDER BY created_at DESC, id LIMIT ?");
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
    putMechanism(m) {
      return insertMechanism.run(m).changes === 1;
    },
    getMechanism(id) {
      const row = selectMechanism.get(id) as MechanismRow | undefined;
      return row ? toMechanism(row) : null;
    },
    listMechanisms(limit) {
      return (listMechanisms.all(limit) as MechanismRow[]).map(toMechanism);
    },
    putAnalysis(a: StoredAnalysis) {
      insertAnalysis.run(
        a.id,
        a.mechanismId,
        a.engineVersion,
        JSON.stringify(a.request),
        JSON.stringify(a.result),
        a.createdAt,
      );
    },
    getAnalysis(id) {
      const row = selectAnalysis.get(id) as
        | {
            id: string;
            mechanism_id: string;
            engine_version: string;
            request_json: string;
            result_json: string;
            created_at: string;
          }
        | undefined;
      if (!row) return null;
      return {
        id: row.id,
        mechanismId: row.mechanism_id,
        engineVersion: row.engine_version,
        request: JSON.parse(row.request_json),
        result: JSON.parse(row.result_json),
        createdAt: row.created_at,
      };
    },
    putRecord(r: StoredRecord) {
      insertRecord.run(r.kind, r.id, r.engineVersion, JSON.stringify(r.body), r.createdAt);
    },
    getRecord(kind, id) {
      const row = selectRecord.get(kind, id) as
        | { kind: string; id: string; engine_version: string; body_json: string; created_at: string }
        | undefined;
      if (!row) return null;
      return {
        kind: row.kind,
        id: row.id,
        engineVersion: row.engine_version,
        body: JSON.parse(row.body_json),
        createdAt: row.created_at,
      };
    },
    close() {
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
      db.exec(m.sql);
      db.prepare("INSERT INTO schema_migrations (version, applied_at) VALUES (?, ?)").run(
        m.version,
        new Date().toISOString(),
      );
    })();
  }
}
