import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { ENGINE_VERSION } from "@/lib/engine/version";

vi.mock("server-only", () => ({}));

const dir = mkdtempSync(path.join(tmpdir(), "ozone-records-"));
let records: typeof import("@/lib/service/records");
let store: typeof import("@/lib/store");

beforeAll(async () => {
  // the process-wide store opens on first use, in this folder
  vi.stubEnv("DATABASE_URL", "");
  vi.stubEnv("OZONE_DATA_DIR", dir);
  records = await import("@/lib/service/records");
  store = await import("@/lib/store");
});

afterAll(async () => {
  await store.getStore().close();
  vi.unstubAllEnvs();
  rmSync(dir, { recursive: true, force: true });
});

describe("putNewRecord and liveRecord", () => {
  it("gives a new record a fresh id, this engine's version and the time, and reads it back", async () => {
    const before = Date.now();
    const id = await records.putNewRecord("profile", { levels: [1, 2] });
    expect(id).toMatch(/^[A-Za-z0-9_-]{16}$/);
    const r = await records.liveRecord("profile", id, "profile sweep");
    expect(r).toMatchObject({ kind: "profile", id, engineVersion: ENGINE_VERSION, body: { levels: [1, 2] } });
    expect(Date.parse(r.createdAt)).toBeGreaterThanOrEqual(before - 1000);
    expect(r.deleteHash).toBeUndefined();
  });

  it("keeps a chosen id, time, engine version and deletion hash", async () => {
    const o = { id: "chosen-id", createdAt: "2026-01-02T03:04:05.000Z", engineVersion: "0.0.1", deleteHash: "ab" };
    await records.putNewRecord("assessment", { t: 1 }, o);
    expect(await records.liveRecord("assessment", "chosen-id", "assessment")).toMatchObject({ ...o, body: { t: 1 } });
  });

  it("answers 404 for an id that was never stored or is not an id, 410 for a tombstone", async () => {
    await expect(records.liveRecord("profile", "nope", "profile sweep")).rejects.toMatchObject({
      status: 404,
      code: "not-found",
    });
    await expect(records.liveRecord("profile", "../etc", "profile sweep")).rejects.toMatchObject({ status: 404 });
    const id = await records.putNewRecord("profile", {});
    await store.getStore().tombstone({ kind: "profile", id }, new Date().toISOString());
    await expect(records.liveRecord("profile", id, "profile sweep")).rejects.toMatchObject({
      status: 410,
      code: "gone",
    });
  });
});

describe("putNewAnalysis and liveAnalysis", () => {
  it("stores an analysis pinned unless it is a draft, and reads it back live", async () => {
    const kept = await records.putNewAnalysis({ mechanismId: "oxygen", request: { a: 1 }, result: { b: 2 } });
    const draft = await records.putNewAnalysis({ mechanismId: "oxygen", request: {}, result: {}, pinned: false });
    expect(await records.liveAnalysis(kept)).toMatchObject({
      mechanismId: "oxygen",
      engineVersion: ENGINE_VERSION,
      request: { a: 1 },
      result: { b: 2 },
      pinned: true,
    });
    expect((await records.liveAnalysis(draft)).pinned).toBe(false);
  });
});

describe("recordView", () => {
  it("adds the current engine version to a record's provenance", () => {
    const view = records.recordView<{ x: number }>({
      kind: "run",
      id: "r1",
      engineVersion: "0.0.1",
      createdAt: "2026-01-01T00:00:00.000Z",
      body: { x: 3 },
    });
    expect(view).toEqual({
      id: "r1",
      createdAt: "2026-01-01T00:00:00.000Z",
      engineVersion: "0.0.1",
      currentEngineVersion: ENGINE_VERSION,
      body: { x: 3 },
    });
  });
});
