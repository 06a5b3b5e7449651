/**
 * Retention and the storage budget. Explorer drafts (analyses computed on
 * screen whose permalink nobody asked for) expire OZONE_DRAFT_TTL_DAYS after
 * they were computed. When the stored bodies exceed OZONE_STORE_MAX_MB, the
 * oldest drafts go first; when only kept records are left, new records are
 * refused with 507 until an operator makes room. Expired and deleted records
 * leave a tombstone (their links answer 410).
 */
import "server-only";
import { getStore, type Store } from "../store";
import { HttpError } from "./http";

export const RETENTION_DEFAULTS = {
  /** days an unpinned draft is kept (OZONE_DRAFT_TTL_DAYS); default 7 */
  draftTtl_days: 7,
  /** budget of stored bodies, MB of 10⁶ bytes (OZONE_STORE_MAX_MB); default 2000 */
  maxStore_MB: 2000,
  /** least time between two expiry passes, ms; default 60 s */
  sweepEvery_ms: 60_000,
  /** drafts evicted at a time while over budget (the stored size is summed again after each batch); default 10 */
  evictBatch: 10,
};

export type RetentionConfig = typeof RETENTION_DEFAULTS;

const positive = (v: string | undefined, name: string, d: number): number => {
  if (v === undefined || v === "") return d;
  const n = Number(v);
  if (!Number.isFinite(n) || n <= 0) throw new Error(`${name}: expected a positive number, got ${JSON.stringify(v)}`);
  return n;
};

export function retentionConfigFromEnv(env: Record<string, string | undefined> = process.env): RetentionConfig {
  return {
    ...RETENTION_DEFAULTS,
    draftTtl_days: positive(env.OZONE_DRAFT_TTL_DAYS, "OZONE_DRAFT_TTL_DAYS", RETENTION_DEFAULTS.draftTtl_days),
    maxStore_MB: positive(env.OZONE_STORE_MAX_MB, "OZONE_STORE_MAX_MB", RETENTION_DEFAULTS.maxStore_MB),
  };
}

const DAY_MS = 86_400_000;
const iso = (ms: number) => new Date(ms).toISOString();

export interface RetentionPass {
  /** drafts expired by age */
  expired: number;
  /** drafts evicted to stay within the budget */
  evicted: number;
  /** stored bytes after the pass */
  bytes: number;
}

/**
 * Expires old drafts, then evicts the oldest drafts while the store is over
 * budget. `now_ms` is the clock (tests pass their own). Throws 507 when the
 * budget is spent on kept records alone.
 */
export async function retentionPass(store: Store, config: RetentionConfig, now_ms: number): Promise<RetentionPass> {
  const at = iso(now_ms);
  const expired = await store.expireDrafts(iso(now_ms - config.draftTtl_days * DAY_MS), at);
  let evicted = 0;
  let bytes = await store.storedBytes();
  const budget = config.maxStore_MB * 1e6;
  while (bytes > budget) {
    const n = await store.expireDrafts(at, at, config.evictBatch);
    if (n === 0) {
      throw new HttpError(
        507,
        "storage-full",
        `the store holds ${(bytes / 1e6).toFixed(1)} MB of kept records, over its budget of ${config.maxStore_MB} MB; nothing more can be stored until an operator makes room`,
        "(store)",
      );
    }
    evicted += n;
    bytes = await store.storedBytes();
  }
  return { expired, evicted, bytes };
}

let last = { at_ms: Number.NEGATIVE_INFINITY, bytes: 0 };

/** Before a new record: a retention pass at most every `sweepEvery_ms`, and the budget checked against the last count. */
export async function keepWithinBudget(now_ms = Date.now()): Promise<void> {
  const config = retentionConfigFromEnv();
  if (now_ms - last.at_ms < config.sweepEvery_ms && last.bytes <= config.maxStore_MB * 1e6) return;
  const pass = await retentionPass(getStore(), config, now_ms);
  last = { at_ms: now_ms, bytes: pass.bytes };
}
