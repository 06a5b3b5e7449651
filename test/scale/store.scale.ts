// The storage suite against both back ends: SQLite in a temporary folder,
// PostgreSQL on the server of DATABASE_URL (a fresh database per test).
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import pg from "pg";
import { afterAll, describe, expect, it } from "vitest";
import { openStore } from "@/lib/store/openStore";
import { openPostgresStore } from "@/lib/store/postgresStore";
import { openSqliteStore } from "@/lib/store/sqliteStore";
import { databaseUrl } from "./services";
import { describeStoreContract } from "./storeContract";

const dirs: string[] = [];
afterAll(() => {
  for (const d of dirs.splice(0)) rmSync(d, { recursive: true, force: true });
});

let sqliteFile = "";
describeStoreContract({
  name: "sqlite",
  async fresh() {
    const d = mkdtempSync(path.join(tmpdir(), "ozone-scale-store-"));
    dirs.push(d);
    sqliteFile = path.join(d, "ozone.sqlite");
    return openSqliteStore(sqliteFile);
  },
  async again() {
    return openSqliteStore(sqliteFile);
  },
});

let pgUrl = "";
let dbCount = 0;
async function createDatabase(): Promise<string> {
  const admin = new pg.Client({ connectionString: databaseUrl() });
  await admin.connect();
  const name = `ozone_test_${process.pid}_${++dbCount}`;
  await admin.query(`DROP DATABASE IF EXISTS ${name}`);
  await admin.query(`CREATE DATABASE ${name}`);
  await admin.end();
  const u = new URL(databaseUrl());
  u.pathname = `/${name}`;
  return u.toString();
}

describeStoreContract({
  name: "postgres",
  async fresh() {
    pgUrl = await createDatabase();
    return openPostgresStore(pgUrl);
  },
  async again() {
    return openPostgresStore(pgUrl);
  },
});

describe("choosing the store", () => {
  it("uses PostgreSQL when a database URL is given and SQLite otherwise", async () => {
    const url = await createDatabase();
    const p = openStore({ databaseUrl: url });
    expect(p.backend).toBe("postgres");
    await p.close();
    const d = mkdtempSync(path.join(tmpdir(), "ozone-scale-store-"));
    dirs.push(d);
    const s = openStore({ databaseUrl: "", dataDir: d });
    expect(s.backend).toBe("sqlite");
    await s.close();
  });

  it("applies the same migrations to both: the same tables and columns", async () => {
    const url = await createDatabase();
    const p = openPostgresStore(url);
    await p.listMechanisms(1);
    const c = new pg.Client({ connectionString: url });
    await c.connect();
    const cols = await c.query<{ table_name: string; column_name: string }>(
      "SELECT table_name, column_name FROM information_schema.columns WHERE table_schema = 'public' ORDER BY table_name, ordinal_position",
    );
    const versions = await c.query<{ version: number }>("SELECT version FROM schema_migrations ORDER BY version");
    await c.end();
    await p.close();

    const d = mkdtempSync(path.join(tmpdir(), "ozone-scale-store-"));
    dirs.push(d);
    const file = path.join(d, "ozone.sqlite");
    const s = openSqliteStore(file);
    await s.close();
    const Database = (await import("better-sqlite3")).default;
    const db = new Database(file, { readonly: true });
    const tables = (
      db.prepare("SELECT name FROM sqlite_master WHERE type = 'table' ORDER BY name").all() as { name: string }[]
    ).map((t) => t.name);
    const sqliteCols = tables.flatMap((t) =>
      (db.prepare(`PRAGMA table_info(${t})`).all() as { name: string }[]).map((col) => `${t}.${col.name}`),
    );
    const sqliteVersions = (
      db.prepare("SELECT version FROM schema_migrations ORDER BY version").all() as {
        version: number;
      }[]
    ).map((v) => v.version);
    db.close();
    expect(cols.rows.map((r) => `${r.table_name}.${r.column_name}`).sort()).toEqual(sqliteCols.sort());
    expect(versions.rows.map((v) => v.version)).toEqual(sqliteVersions);
  });

  it("throws if the PostgreSQL server cannot be reached, naming the failure on the first call", async () => {
    const s = openPostgresStore("postgres://ozone@127.0.0.1:1/none", { connectTimeout_ms: 2000 });
    await expect(s.getMechanism("m-x")).rejects.toThrow(/ECONNREFUSED|connect/);
    await s.close();
  });
});
