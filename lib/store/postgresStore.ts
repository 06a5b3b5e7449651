/**
 * PostgreSQL back end of the store (node-postgres 8): the same tables and
 * the same numbered migrations as SQLite (migrations.ts), so that several web
 * instances and queue workers share mechanisms, analyses and results.
 * Migrations run once per database under an advisory lock (instances that
 * start together wait for each other); every write is one statement, so
 * nothing is half-stored. Text is ordered byte-wise (COLLATE "C"), as in
 * SQLite, so listings agree between the back ends.
 */
import pg from "pg";
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
import type { RecordRef, Store } from "./types";

export const POSTGRES_DEFAULTS = {
  /** most connections this process opens; default 5 */
  maxConnections: 5,
  /** ms to wait for a connection before a query fails; default 10 s */
  connectTimeout_ms: 10_000,
  /** key of the advisory lock held while migrating (any constant shared by all instances) */
  migrationLockKey: 7_310_411,
};

export type PostgresOptions = Partial<typeof POSTGRES_DEFAULTS>;

/** Opens the store at a postgres:// URL; migrations run before the first query. */
export function openPostgresStore(url: string, options: PostgresOptions = {}): Store {
  const o = { ...POSTGRES_DEFAULTS, ...options };
  const pool = new pg.Pool({
    connectionString: url,
    max: o.maxConnections,
    connectionTimeoutMillis: o.connectTimeout_ms,
  });
  // an idle client that loses its server must not crash the process; the next query reports it
  pool.on("error", (e) => console.error(`postgres store: idle connection failed: ${e.message}`));
  const ready = migrate(pool, o.migrationLockKey);
  // a failed migration is reported by every call; keep it from being an unhandled rejection
  ready.catch(() => {});

  async function query<R extends pg.QueryResultRow>(sql: string, params: unknown[]): Promise<pg.QueryResult<R>> {
    await ready;
    return pool.query<R>(sql, params);
  }

  const where = (ref: RecordRef, first: number) => {
    const { table, byKind } = refTable(ref);
    return byKind
      ? { table, sql: `kind = $${first} AND id = $${first + 1}`, params: [ref.kind, ref.id] }
      : { table, sql: `id = $${first}`, params: [ref.id] };
  };

  return {
    backend: "postgres",
    async putMechanism(m) {
      const r = await query(
        `INSERT INTO mechanisms (id, title, description, text, format, species_count, reaction_count, created_at,
           content_hash, owner_hash, delete_hash, stored_bytes)
         VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10, $11, $12) ON CONFLICT (id) DO NOTHING`,
        mechanismColumns(m),
      );
      return r.rowCount === 1;
    },
    async getMechanism(id) {
      const r = await query<MechanismRow>("SELECT * FROM mechanisms WHERE id = $1", [id]);
      return r.rows[0] ? toMechanism(r.rows[0]) : null;
    },
    async listMechanisms(limit, ownerHash) {
      const order = `ORDER BY created_at COLLATE "C" DESC, id COLLATE "C" ASC`;
      const r =
        ownerHash === undefined
          ? await query<MechanismRow>(`SELECT * FROM mechanisms WHERE deleted_at IS NULL ${order} LIMIT $1`, [limit])
          : await query<MechanismRow>(
              `SELECT * FROM mechanisms WHERE owner_hash = $1 AND deleted_at IS NULL ${order} LIMIT $2`,
              [ownerHash, limit],
            );
      return r.rows.map(toMechanism);
    },
    async putAnalysis(a) {
      await query(
        `INSERT INTO analyses (id, mechanism_id, engine_version, request_json, result_json, result_br, created_at,
           pinned, delete_hash, stored_bytes)
         VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10)`,
        analysisColumns(a, packAnalysisResult(a)),
      );
    },
    async getAnalysis(id) {
      const r = await query<AnalysisRow>("SELECT * FROM analyses WHERE id = $1", [id]);
      return r.rows[0] ? toAnalysis(r.rows[0]) : null;
    },
    async putRecord(rec) {
      await query(
        `INSERT INTO records (kind, id, engine_version, body_json, body_br, created_at, delete_hash, stored_bytes)
         VALUES ($1, $2, $3, $4, $5, $6, $7, $8)`,
        recordColumns(rec),
      );
    },
    async getRecord(kind, id) {
      const r = await query<RecordRow>("SELECT * FROM records WHERE kind = $1 AND id = $2", [kind, id]);
      return r.rows[0] ? toRecord(r.rows[0]) : null;
    },
    async lifecycle(ref) {
      const w = where(ref, 1);
      const r = await query<{ delete_hash: string | null; deleted_at: string | null }>(
        `SELECT delete_hash, deleted_at FROM ${w.table} WHERE ${w.sql}`,
        w.params,
      );
      const row = r.rows[0];
      return row ? { deleteHash: row.delete_hash, deletedAt: row.deleted_at } : null;
    },
    async tombstone(ref, deletedAt) {
      const w = where(ref, 2);
      const r = await query(
        `UPDATE ${w.table} SET ${TOMBSTONE_SET[w.table]}, deleted_at = $1 WHERE ${w.sql} AND deleted_at IS NULL`,
        [deletedAt, ...w.params],
      );
      return r.rowCount === 1;
    },
    async pinAnalysis(id) {
      await query("UPDATE analyses SET pinned = 1 WHERE id = $1", [id]);
    },
    async expireDrafts(createdBefore, deletedAt, limit = 1000) {
      // one statement: instances expiring at once each take different rows (SKIP LOCKED)
      const r = await query(
        `UPDATE analyses SET ${TOMBSTONE_SET.analyses}, deleted_at = $1 WHERE id IN (
           SELECT id FROM analyses WHERE pinned = 0 AND deleted_at IS NULL AND created_at COLLATE "C" < $2
           ORDER BY created_at COLLATE "C" ASC LIMIT $3 FOR UPDATE SKIP LOCKED)`,
        [deletedAt, createdBefore, limit],
      );
      return r.rowCount ?? 0;
    },
    async storedBytes() {
      const r = await query<{ bytes: string }>(
        `SELECT (SELECT COALESCE(SUM(stored_bytes), 0) FROM mechanisms) + (SELECT COALESCE(SUM(stored_bytes), 0) FROM analyses)
           + (SELECT COALESCE(SUM(stored_bytes), 0) FROM records) AS bytes`,
        [],
      );
      return Number(r.rows[0]?.bytes ?? 0);
    },
    async close() {
      await ready.catch(() => {});
      await pool.end();
    },
  };
}

async function migrate(pool: pg.Pool, lockKey: number): Promise<void> {
  const client = await pool.connect();
  try {
    await client.query("BEGIN");
    // held until COMMIT: a second instance starting now waits, then finds the work done
    await client.query("SELECT pg_advisory_xact_lock($1)", [lockKey]);
    await client.query(
      "CREATE TABLE IF NOT EXISTS schema_migrations (version INTEGER PRIMARY KEY, applied_at TEXT NOT NULL)",
    );
    const done = new Set(
      (await client.query<{ version: number }>("SELECT version FROM schema_migrations")).rows.map((r) => r.version),
    );
    for (const m of MIGRATIONS) {
      if (done.has(m.version)) continue;
      await client.query(migrationSql(m, "postgres"));
      await client.query("INSERT INTO schema_migrations (version, applied_at) VALUES ($1, $2)", [
        m.version,
        new Date().toISOString(),
      ]);
    }
    await client.query("COMMIT");
  } catch (e) {
    await client.query("ROLLBACK").catch(() => {});
    throw e;
  } finally {
    client.release();
  }
}
