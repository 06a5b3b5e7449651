/**
 * The command line's store of diffuse fields on disk (lib/cli/diskFieldStore.ts) behind the in-memory cache of
 * lib/photolysis/radiativeColumn.ts: a field read back is the solved one bit for bit, a run that finds its field
 * in the store gives the analysis a run that solves it gives, and files that are not whole fields are ignored.
 * These are identities of the code, not outside references.
 */
import { mkdtempSync, readdirSync, rmSync, utimesSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { decodeField, diskFieldStore, encodeField } from "@/lib/cli/diskFieldStore";
import { runAnalysis } from "@/lib/engine/runAnalysis";
import { loadBuiltinMechanism } from "@/lib/mechanism";
import { setDiffuseFieldStore } from "@/lib/photolysis/diffuseFieldStore";
import { computeDiffuseField } from "@/lib/photolysis/radiativeColumn";
import { withoutRunFields } from "./runCli";

let dir: string;
beforeEach(() => {
  dir = mkdtempSync(path.join(tmpdir(), "cli-fields-"));
});
afterEach(() => {
  setDiffuseFieldStore(undefined);
  rmSync(dir, { recursive: true, force: true });
});

/** A sunlit column at 50°, albedo 0.1, no aerosol. */
const sunAt50 = () =>
  computeDiffuseField({ zenith_deg: 50, albedo: 0.1, aerosolOpticalDepth: 0, o3Scale: 1, rayleigh: true });

const bits = (a: Float32Array | Float64Array) => Buffer.from(a.buffer, a.byteOffset, a.byteLength).toString("hex");

describe("diskFieldStore", () => {
  it("gives back a solved field bit for bit, and a dark one as dark", () => {
    for (const zenith_deg of [37.5, 120]) {
      const field = computeDiffuseField({
        zenith_deg,
        albedo: 0.3,
        aerosolOpticalDepth: 0.05,
        o3Scale: 1,
        rayleigh: true,
      });
      const store = diskFieldStore(dir);
      store.put(`k${zenith_deg}`, field);
      const back = store.get(`k${zenith_deg}`);
      expect(back?.sunlit).toBe(field.sunlit);
      expect(back?.firstBin).toBe(field.firstBin);
      expect(back?.bins).toBe(field.bins);
      expect(bits(back?.flux ?? new Float32Array())).toBe(bits(field.flux));
      expect(bits(back?.z_km ?? new Float64Array())).toBe(bits(field.z_km));
    }
    expect(diskFieldStore(dir).get("never written")).toBeUndefined();
  });

  it("ignores a file cut short or of another format, and stops writing at maxFiles", () => {
    const field = sunAt50();
    const whole = encodeField(field);
    expect(decodeField(whole.subarray(0, whole.length - 4))).toBeUndefined();
    const other = Buffer.from(whole);
    other.writeInt32LE(2, 0);
    expect(decodeField(other)).toBeUndefined();
    expect(decodeField(Buffer.alloc(3))).toBeUndefined();
    // a header whose sizes do not fit the grid (one value per interface and bin), though the length adds up
    const misshapen = Buffer.from(whole);
    misshapen.writeInt32LE(field.bins + 1, 12);
    expect(field.bins).toBeGreaterThan(0);
    expect(decodeField(misshapen)).toBeUndefined();
    const store = diskFieldStore(dir);
    store.put("a", field);
    const [name] = readdirSync(dir);
    writeFileSync(path.join(dir, name), whole.subarray(0, 100));
    expect(store.get("a")).toBeUndefined();
    const full = diskFieldStore(dir, 1);
    full.put("b", field);
    expect(readdirSync(dir)).toEqual([name]);
  });

  it("removes a temporary file an interrupted run left over an hour ago, and counts only fields", () => {
    const field = sunAt50();
    const stale = path.join(dir, "abc.field.123.tmp");
    const fresh = path.join(dir, "def.field.456.tmp");
    writeFileSync(stale, "x");
    writeFileSync(fresh, "x");
    const twoHoursAgo = (Date.now() - 7_200_000) / 1000;
    utimesSync(stale, twoHoursAgo, twoHoursAgo);
    // two temporary files, no field: a store of one field still has room
    diskFieldStore(dir, 1).put("a", field);
    const names = readdirSync(dir);
    expect(names.filter((n) => n.endsWith(".tmp"))).toEqual([path.basename(fresh)]);
    expect(names.filter((n) => n.endsWith(".field"))).toHaveLength(1);
  });

  it("serves the engine's columns: an analysis from stored fields equals one from solved fields", async () => {
    const mech = loadBuiltinMechanism("reference").mechanism;
    const src = { id: "reference", title: "Reference stratosphere" };
    // a sun no other test of this file solves, so the in-memory cache starts without its columns
    const request = {
      mechanismId: "reference",
      condition: { altitude_km: 33, latitude_deg: 13.7, localSolarTime_h: 9.3 },
    };
    const disk = diskFieldStore(dir);
    const puts: string[] = [];
    setDiffuseFieldStore({
      get: (k) => disk.get(k),
      put: (k, f) => {
        puts.push(k);
        disk.put(k, f);
      },
    });
    const solved = runAnalysis(mech, src, request);
    expect(puts.length).toBeGreaterThan(0);
    expect(readdirSync(dir).length).toBe(puts.length);
    // a new process: a fresh module graph has an empty in-memory cache, and the store on disk
    vi.resetModules();
    const engine = await import("@/lib/engine/runAnalysis");
    const storeModule = await import("@/lib/photolysis/diffuseFieldStore");
    const reads: string[] = [];
    storeModule.setDiffuseFieldStore({
      get: (k) => {
        reads.push(k);
        return disk.get(k);
      },
      put: () => {
        throw new Error("a stored field was solved again");
      },
    });
    const read = engine.runAnalysis(mech, src, request);
    storeModule.setDiffuseFieldStore(undefined);
    expect(reads.sort()).toEqual([...puts].sort());
    expect(withoutRunFields(JSON.parse(JSON.stringify(read)))).toEqual(
      withoutRunFields(JSON.parse(JSON.stringify(solved))),
    );
  });
});
