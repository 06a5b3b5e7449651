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
import { type AnalysisRow, type MechanismRow, type RecordRow, toAnalysis, toMechanism, toRecord } from "./rows";
import type { Store } from "./types";

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

  return {
    backend: "postgres",
    async putMechanism(m) {
      const r = await query(
        `INSERT INTO mechanisms (id, title, description, text, format, species_count, reaction_count, created_at)
         VALUES ($1, $2, $3, $4, $5, $6, $7, $8) ON CONFLICT (id) DO NOTHING`,
        [m.id, m.title, m.description, m.text, m.format, m.speciesCount, m.reactionCount, m.createdAt],
      );
      return r.rowCount === 1;
    },
    async getMechanism(id) {
      const r = await query<MechanismRow>("SELECT * FROM mechanisms WHERE id = $1", [id]);
      return r.rows[0] ? toMechanism(r.rows[0]) : null;
    },
    async listMechanisms(limit) {
      const r = await query<MechanismRow>(
        `SELECT * FROM mechanisms ORDER BY created_at COLLATE "C" DESC, id COLLATE "C" ASC LIMIT $1`,
        [limit],
      );
      return r.rows.map(toMechanism);
    },
    async putAnalysis(a) {
      await query(
        `INSERT INTO analyses (id, mechanism_id, engine_version, request_json, result_json, created_at)
         VALUES ($1, $2, $3, $4, $5, $6)`,
        [a.id, a.mechanismId, a.engineVersion, JSON.stringify(a.request), JSON.stringify(a.result), a.createdAt],
      );
    },
    async getAnalysis(id) {
      const r = await query<AnalysisRow>("SELECT * FROM analyses WHERE id = $1", [id]);
      return r.rows[0] ? toAnalysis(r.rows[0]) : null;
    },
    async putRecord(rec) {
      await query("INSERT INTO records (kind, id, engine_version, body_json, created_at) VALUES ($1, $2, $3, $4, $5)", [
        rec.kind,
        rec.id,
        rec.engineVersion,
        JSON.stringify(rec.body),
        rec.createdAt,
      ]);
    },
    async getRecord(kind, id) {
      const r = await query<RecordRow>("SELECT * FROM records WHERE kind = $1 AND id = $2", [kind, id]);
      return r.rows[0] ? toRecord(r.rows[0]) : null;
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
