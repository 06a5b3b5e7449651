/**
 * Chooses the store's back end from configuration: PostgreSQL when
 * DATABASE_URL is set (shared by several web instances and workers), else
 * SQLite at $OZONE_DATA_DIR/ozone.sqlite (default ./data).
 */
import path from "node:path";
import { openPostgresStore } from "./postgresStore";
import { openSqliteStore } from "./sqliteStore";
import type { Store } from "./types";

export interface StoreConfig {
  /** postgres:// URL; default process.env.DATABASE_URL; when empty, SQLite is used */
  databaseUrl?: string;
  /** folder of the SQLite file; default process.env.OZONE_DATA_DIR, else ./data */
  dataDir?: string;
}

export function openStore(config: StoreConfig = {}): Store {
  const url = config.databaseUrl ?? process.env.DATABASE_URL ?? "";
  if (url) return openPostgresStore(url);
  const dir = config.dataDir ?? process.env.OZONE_DATA_DIR ?? path.join(process.cwd(), "data");
  return openSqliteStore(path.join(dir, "ozone.sqlite"));
}
