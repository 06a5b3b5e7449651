/**
 * The storage interface's contract, run against every back end (SQLite and
 * PostgreSQL) so that both behave the same: content-addressed mechanisms,
 * immutable analyses and records, newest-first listings, persistence across
 * a reopen, and shared state between two open stores.
 */
import { describe, expect, it } from "vitest";
import { mechanismContentId, newRecordId } from "@/lib/store/ids";
import type { Store, StoredMechanism } from "@/lib/store/types";

export interface StoreFactory {
  name: string;
  /** opens a store on a fresh, empty database */
  fresh(): Promise<Store>;
  /** opens a second store on the database of the last `fresh()` */
  again(): Promise<Store>;
}

const mechanism = (title: string, createdAt: string): StoredMechanism => ({
  id: mechanismContentId(`{"title":"${title}"}`),
  title,
  description: `invented test mechanism ${title}`,
  text: `title: ${title}`,
  format: "yaml",
  speciesCount: 3,
  reactionCount: 4,
  createdAt,
});

export function describeStoreContract(f: StoreFactory): void {
  describe(`the ${f.name} store`, () => {
    it("starts empty after its migrations and says which back end it is", async () => {
      const s = await f.fresh();
      expect(s.backend).toBe(f.name);
      expect(await s.listMechanisms(10)).toEqual([]);
      expect(await s.getMechanism("m-missing")).toBeNull();
      expect(await s.getAnalysis("missing")).toBeNull();
      expect(await s.getRecord("profile", "missing")).toBeNull();
      await s.close();
    });

    it("stores a mechanism once by content id and keeps the first copy", async () => {
      const s = await f.fresh();
      const m = mechanism("t", "2026-12-01T00:00:00.000Z");
      expect(await s.putMechanism(m)).toBe(true);
      expect(await s.putMechanism({ ...m, title: "other" })).toBe(false);
      expect(await s.getMechanism(m.id)).toEqual(m);
      await s.close();
    });

    it("lists uploads newest first, ties in byte order of the id, up to the limit", async () => {
      const s = await f.fresh();
      const a = mechanism("a", "2026-12-01T00:00:00.000Z");
      const b = mechanism("b", "2026-12-02T00:00:00.000Z");
      const c = mechanism("c", "2026-12-02T00:00:00.000Z");
      for (const m of [a, b, c]) await s.putMechanism(m);
      const listed = await s.listMechanisms(10);
      const tie = [b, c].sort((x, y) => (x.id < y.id ? -1 : 1)).map((m) => m.id);
      expect(listed.map((m) => m.id)).toEqual([...tie, a.id]);
      expect((await s.listMechanisms(2)).length).toBe(2);
      await s.close();
    });

    it("keeps analyses immutable: a second write under the same id is refused", async () => {
      const s = await f.fresh();
      const a = {
        id: newRecordId(),
        mechanismId: "reference",
        engineVersion: "0.1.0",
        request: { a: 1, nested: { x: [1, 2.5e-300, -0] } },
        result: { b: [1, 2], text: "Ox → O2 ☀" },
        createdAt: "2026-12-01T00:00:00.000Z",
      };
      await s.putAnalysis(a);
      await expect(s.putAnalysis({ ...a, result: { b: [3] } })).rejects.toThrow();
      const back = await s.getAnalysis(a.id);
      // JSON round trip: −0 is written as 0
      expect(back).toEqual({ ...a, request: { a: 1, nested: { x: [1, 2.5e-300, 0] } } });
      await s.close();
    });

    it("keeps records by kind and id, immutable", async () => {
      const s = await f.fresh();
      const r = { kind: "profile", id: "p1", engineVersion: "0.1.0", body: { levels: [1] }, createdAt: "x" };
      await s.putRecord(r);
      await expect(s.putRecord({ ...r, body: { levels: [2] } })).rejects.toThrow();
      await s.putRecord({ ...r, kind: "comparison", body: { other: true } });
      expect((await s.getRecord("profile", "p1"))?.body).toEqual({ levels: [1] });
      expect((await s.getRecord("comparison", "p1"))?.body).toEqual({ other: true });
      expect(await s.getRecord("assessment", "p1")).toBeNull();
      await s.close();
    });

    it("keeps what it stored across a close and reopen, and runs no migration twice", async () => {
      const s = await f.fresh();
      const m = mechanism("kept", "2026-12-03T00:00:00.000Z");
      await s.putMechanism(m);
      await s.close();
      const again = await f.again();
      expect((await again.getMechanism(m.id))?.text).toBe("title: kept");
      await again.close();
    });

    it("shares one database between two open stores (two web instances)", async () => {
      const one = await f.fresh();
      const two = await f.again();
      const id = newRecordId();
      await one.putRecord({ kind: "profile", id, engineVersion: "0.1.0", body: { from: "one" }, createdAt: "x" });
      expect((await two.getRecord("profile", id))?.body).toEqual({ from: "one" });
      await Promise.all([one.close(), two.close()]);
    });
  });
}
