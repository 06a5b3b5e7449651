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
      expect(back).toEqual({ ...a, pinned: true, request: { a: 1, nested: { x: [1, 2.5e-300, 0] } } });
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

    it("leaves a tombstone on deletion: no body, the hash and date kept, no bytes counted; a second deletion changes nothing", async () => {
      const s = await f.fresh();
      const body = { rows: Array.from({ length: 200 }, (_, i) => ({ cycle: "ClO + O", share: i / 200 })) };
      await s.putRecord({ kind: "profile", id: "p1", engineVersion: "0.1.0", body, createdAt: "x", deleteHash: "ab" });
      const before = await s.storedBytes();
      // brotli: the repetitive JSON is stored in a fraction of its length
      expect(before).toBeGreaterThan(0);
      expect(before).toBeLessThan(JSON.stringify(body).length / 4);
      expect(await s.lifecycle({ kind: "profile", id: "p1" })).toEqual({ deleteHash: "ab", deletedAt: null });
      expect(await s.tombstone({ kind: "profile", id: "p1" }, "2026-12-03T10:00:00.000Z")).toBe(true);
      expect(await s.tombstone({ kind: "profile", id: "p1" }, "2026-12-03T11:00:00.000Z")).toBe(false);
      const gone = await s.getRecord("profile", "p1");
      expect(gone).toMatchObject({ body: null, deletedAt: "2026-12-03T10:00:00.000Z", deleteHash: "ab" });
      expect(await s.storedBytes()).toBe(0);
      expect(await s.lifecycle({ kind: "analysis", id: "missing" })).toBeNull();
      await s.close();
    });

    it("expires unpinned drafts created before a date, oldest first, and keeps pinned ones", async () => {
      const s = await f.fresh();
      const draft = (id: string, day: number, pinned: boolean) => ({
        id,
        mechanismId: "oxygen",
        engineVersion: "0.1.0",
        request: { day },
        result: { day },
        createdAt: `2026-12-0${day}T00:00:00.000Z`,
        pinned,
      });
      await s.putAnalysis(draft("d1", 1, false));
      await s.putAnalysis(draft("d2", 2, false));
      await s.putAnalysis(draft("k1", 1, true));
      await s.putAnalysis(draft("d5", 5, false));
      await s.pinAnalysis("d2");
      expect(await s.expireDrafts("2026-12-04T00:00:00.000Z", "2026-12-09T00:00:00.000Z")).toBe(1);
      expect((await s.getAnalysis("d1"))?.deletedAt).toBe("2026-12-09T00:00:00.000Z");
      expect((await s.getAnalysis("d2"))?.result).toEqual({ day: 2 });
      expect((await s.getAnalysis("k1"))?.result).toEqual({ day: 1 });
      expect((await s.getAnalysis("d5"))?.deletedAt).toBeUndefined();
      // the budget's eviction: the oldest live draft goes first, `limit` at a time
      expect(await s.expireDrafts("2026-12-09T00:00:00.000Z", "2026-12-09T00:00:00.000Z", 1)).toBe(1);
      expect((await s.getAnalysis("d5"))?.deletedAt).toBeDefined();
      await s.close();
    });

    it("lists an owner's live uploads only when asked for one owner", async () => {
      const s = await f.fresh();
      const a = { ...mechanism("a", "2026-12-01T00:00:00.000Z"), ownerHash: "owner-a", contentHash: "m-1" };
      const b = { ...mechanism("b", "2026-12-02T00:00:00.000Z"), ownerHash: "owner-b" };
      await s.putMechanism(a);
      await s.putMechanism(b);
      expect((await s.listMechanisms(10, "owner-a")).map((m) => m.id)).toEqual([a.id]);
      expect(await s.listMechanisms(10, "nobody")).toEqual([]);
      expect(await s.getMechanism(a.id)).toEqual(a);
      await s.tombstone({ kind: "mechanism", id: a.id }, "2026-12-03T00:00:00.000Z");
      expect(await s.listMechanisms(10, "owner-a")).toEqual([]);
      await s.close();
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
