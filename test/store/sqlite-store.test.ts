import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterEach, describe, expect, it } from "vitest";
import { mechanismContentId, newRecordId } from "@/lib/store/ids";
import { openSqliteStore } from "@/lib/store/sqlite-store";

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
  it("creates its directory and runs the migrations on first open", () => {
    const s = openSqliteStore(tempFile());
    expect(s.listMechanisms(10)).toEqual([]);
    s.close();
  });

  it("stores a mechanism once by content id and keeps the first copy", () => {
    const s = openSqliteStore(tempFile());
    expect(s.putMechanism(mech)).toBe(true);
    expect(s.putMechanism({ ...mech, title: "other" })).toBe(false);
    expect(s.getMechanism(mech.id)?.title).toBe("t");
    expect(s.getMechanism("m-missing")).toBeNull();
    s.close();
  });

  it("keeps analyses immutable: a second write under the same id is refused", () => {
    const s = openSqliteStore(tempFile());
    const a = {
      id: newRecordId(),
      mechanismId: mech.id,
      engineVersion: "0.1.0",
      request: { a: 1 },
      result: { b: [1, 2] },
      createdAt: "x",
    };
    s.putAnalysis(a);
    expect(() => s.putAnalysis({ ...a, result: { b: [3] } })).toThrow();
    expect(s.getAnalysis(a.id)?.result).toEqual({ b: [1, 2] });
    s.close();
  });

  it("keeps what it stored across a close and reopen", () => {
    const file = tempFile();
    const s = openSqliteStore(file);
    s.putMechanism(mech);
    s.putRecord({ kind: "profile", id: "p1", engineVersion: "0.1.0", body: { levels: [1] }, createdAt: "x" });
    s.close();
    const again = openSqliteStore(file);
    expect(again.getMechanism(mech.id)?.text).toBe("title: t");
    expect(again.getRecord("profile", "p1")?.body).toEqual({ levels: [1] });
    expect(again.getRecord("assessment", "p1")).toBeNull();
    again.close();
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
