import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterEach, describe, expect, it, vi } from "vitest";
import { RETENTION_DEFAULTS, retentionConfigFromEnv, retentionPass } from "@/lib/service/retention";
import { openSqliteStore } from "@/lib/store/sqliteStore";
import type { Store } from "@/lib/store/types";

vi.mock("server-only", () => ({}));

const DAY = 86_400_000;
const T0 = Date.parse("2026-12-01T00:00:00.000Z");
const dirs: string[] = [];
const stores: Store[] = [];
afterEach(async () => {
  for (const s of stores.splice(0)) await s.close();
  for (const d of dirs.splice(0)) rmSync(d, { recursive: true, force: true });
});

function fresh(): Store {
  const d = mkdtempSync(path.join(tmpdir(), "ozone-retention-"));
  dirs.push(d);
  const s = openSqliteStore(path.join(d, "ozone.sqlite"));
  stores.push(s);
  return s;
}

/** An analysis body of about `kb` KB of incompressible text (random digits), so that sizes are predictable. */
const put = (s: Store, id: string, atMs: number, pinned: boolean, kb = 1) =>
  s.putAnalysis({
    id,
    mechanismId: "oxygen",
    engineVersion: "0.1.0",
    request: {},
    result: { noise: Array.from({ length: kb * 1024 }, () => Math.floor(Math.random() * 10)).join("") },
    createdAt: new Date(atMs).toISOString(),
    pinned,
  });

describe("retention of drafts and the storage budget", () => {
  it("expires a draft after the TTL on the test clock, while a pinned record of the same age stays", async () => {
    const s = fresh();
    await put(s, "draft", T0, false);
    await put(s, "kept", T0, true);
    const config = { ...RETENTION_DEFAULTS, draftTtl_days: 7 };
    expect((await retentionPass(s, config, T0 + 6.9 * DAY)).expired).toBe(0);
    expect((await s.getAnalysis("draft"))?.deletedAt).toBeUndefined();
    expect((await retentionPass(s, config, T0 + 7.1 * DAY)).expired).toBe(1);
    expect((await s.getAnalysis("draft"))?.deletedAt).toBe(new Date(T0 + 7.1 * DAY).toISOString());
    expect((await s.getAnalysis("kept"))?.result).toBeTruthy();
  });

  it("evicts the oldest drafts first when the store is over its budget", async () => {
    const s = fresh();
    for (let i = 0; i < 30; i++) await put(s, `d${i}`, T0 + i * 1000, false, 5);
    const total = await s.storedBytes();
    // random digits compress to about 0.42 bytes each (log2(10)/8): thirty bodies of 5 KB are some 60 kB
    expect(total).toBeGreaterThan(30 * 5 * 1024 * 0.3);
    const pass = await retentionPass(s, { ...RETENTION_DEFAULTS, maxStore_MB: (total * 0.6) / 1e6 }, T0 + 60_000);
    expect(pass.evicted).toBeGreaterThanOrEqual(12);
    expect(pass.evicted).toBeLessThanOrEqual(20);
    expect(pass.bytes).toBeLessThanOrEqual(total * 0.6);
    expect((await s.getAnalysis("d0"))?.deletedAt).toBeDefined();
    expect((await s.getAnalysis("d29"))?.deletedAt).toBeUndefined();
  });

  it("refuses with 507 storage-full when kept records alone exceed the budget", async () => {
    const s = fresh();
    await put(s, "k", T0, true, 20);
    await expect(retentionPass(s, { ...RETENTION_DEFAULTS, maxStore_MB: 0.001 }, T0)).rejects.toMatchObject({
      status: 507,
      code: "storage-full",
    });
  });

  it("reads its settings from the environment and throws on a bad value", () => {
    expect(retentionConfigFromEnv({ OZONE_DRAFT_TTL_DAYS: "2", OZONE_STORE_MAX_MB: "50" })).toMatchObject({
      draftTtl_days: 2,
      maxStore_MB: 50,
    });
    expect(() => retentionConfigFromEnv({ OZONE_STORE_MAX_MB: "-1" })).toThrow(/OZONE_STORE_MAX_MB/);
  });
});
