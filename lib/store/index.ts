import "server-only";
import { openStore } from "./openStore";
import type { Store } from "./types";

export { ID_PATTERN, mechanismContentId, newRecordId } from "./ids";
export { openStore, type StoreConfig } from "./openStore";
export { openPostgresStore, POSTGRES_DEFAULTS, type PostgresOptions } from "./postgresStore";
export { openSqliteStore } from "./sqliteStore";
export type { RecordRef, Store, StoredAnalysis, StoredMechanism, StoredRecord } from "./types";

let store: Store | null = null;

/** The process-wide store: PostgreSQL when DATABASE_URL is set, else SQLite at $OZONE_DATA_DIR/ozone.sqlite (default ./data). */
export function getStore(): Store {
  store ??= openStore();
  return store;
}
