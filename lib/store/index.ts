import "server-only";
import path from "node:path";
import { openSqliteStore } from "./sqlite-store";
import type { Store } from "./types";

export { ID_PATTERN, mechanismContentId, newRecordId } from "./ids";
export { openSqliteStore } from "./sqlite-store";
export type { Store, StoredAnalysis, StoredMechanism, StoredRecord } from "./types";

let store: Store | null = null;

/** The process-wide store: SQLite at $OZONE_DATA_DIR/ozone.sqlite (default ./data). */
export function getStore(): Store {
  if (!store) {
    const dir = process.env.OZONE_DATA_DIR ?? path.join(process.cwd(), "data");
    store = openSqliteStore(path.join(dir, "ozone.sqlite"));
  }
  return store;
}
