import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterEach, describe, expect, it } from "vitest";
import { mechanismContentId, newRecordId } from "@/lib/store/ids";
import { openSqliteStore } from "@/lib/store/sqliteStore";
import { describeStoreContract } from "../scale/storeContract";

const dirs: string[] = [];
function tempFile(): string {
  const d = mkdtempSync(path.join(tmpdir(), "ozone-store-"));
  dirs.push(d);
  return path.join(d, "nested", "ozone.sqlite");
}
afterEach(() => {
  for (const d of dirs.splice(0)) rmSync(d, { recursive: true, force: true });
});

const mech = {
  id: mechanismContentId('{"title":"t"}'),
  title: "t",
  description: "d",
  text: "title: t",
  format: "yaml" as const,
  speciesCount: 3,
  reactionCount: 4,
  createdAt: "2026-12-01T00:00:00.000Z",
};

describe("the SQLite store", () => {
  it("creates its directory and runs the migrations on first open", async () => {
    const s = openSqliteStore(tempFile());
    expect(await s.listMechanisms(10)).toEqual([]);
    await s.close();
  });

  it("stores a mechanism once by content id and keeps the first copy", async () => {
    const s = openSqliteStore(tempFile());
    expect(await s.putMechanism(mech)).toBe(true);
    expect(await s.putMechanism({ ...mech, title: "other" })).toBe(false);
    expect((await s.getMechanism(mech.id))?.title).toBe("t");
    expect(await s.getMechanism("m-missing")).toBeNull();
    await s.close();
  });

  it("keeps analyses immutable: a second write under the same id is refused", async () => {
    const s = openSqliteStore(tempFile());
    const a = {
      id: newRecordId(),
      mechanismId: mech.id,
      engineVersion: "0.1.0",
      request: { a: 1 },
      result: { b: [1, 2] },
      createdAt: "x",
    };
    await s.putAnalysis(a);
    await expect(s.putAnalysis({ ...a, result: { b: [3] } })).rejects.toThrow();
    expect((await s.getAnalysis(a.id))?.result).toEqual({ b: [1, 2] });
    await s.close();
  });

  it("stores the result's JSON text when it is given (resultJson) and reads back the same result", async () => {
    const s = openSqliteStore(tempFile());
    const result = { b: [0.1, 1e-300, 6.02214076e23], c: "x" };
    const a = { id: newRecordId(), mechanismId: mech.id, engineVersion: "0.1.0", request: { a: 1 }, createdAt: "x" };
    await s.putAnalysis({ ...a, result, resultJson: Buffer.from(JSON.stringify(result)) });
    const back = await s.getAnalysis(a.id);
    expect(back?.result).toStrictEqual(result);
    expect(back).not.toHaveProperty("resultJson");
    await s.close();
  });

  it("keeps what it stored across a close and reopen", async () => {
    const file = tempFile();
    const s = openSqliteStore(file);
    await s.putMechanism(mech);
    await s.putRecord({ kind: "profile", id: "p1", engineVersion: "0.1.0", body: { levels: [1] }, createdAt: "x" });
    await s.close();
    const again = openSqliteStore(file);
    expect((await again.getMechanism(mech.id))?.text).toBe("title: t");
    expect((await again.getRecord("profile", "p1"))?.body).toEqual({ levels: [1] });
    expect(await again.getRecord("assessment", "p1")).toBeNull();
    await again.close();
  });
});

describe("ids", () => {
  it("gives 96-bit random record ids of 16 base64url characters", () => {
    const ids = new Set(Array.from({ length: 1000 }, newRecordId));
    expect(ids.size).toBe(1000);
    for (const id of ids) expect(id).toMatch(/^[A-Za-z0-9_-]{16}$/);
  });

  it("content-addresses mechanisms by SHA-256 of the canonical form", () => {
    // SHA-256("abc") = ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad (FIPS 180-2, appendix B.1)
    expect(mechanismContentId("abc")).toBe("m-ba7816bf8f01cfea414140de5dae2223");
  });
});

// The storage contract of every back end (test/scale runs it against PostgreSQL too).
let contractFile = "";
describeStoreContract({
  name: "sqlite",
  async fresh() {
    contractFile = tempFile();
    return openSqliteStore(contractFile);
  },
  async again() {
    return openSqliteStore(contractFile);
  },
});
