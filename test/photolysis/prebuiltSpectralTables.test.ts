/**
 * The spectral tables as the command line's bundle stores them (scripts/cli-bundle.mjs: V8's serialised form;
 * the JSON form before it) give back every number bit for bit, so an analysis with stored tables is the
 * analysis with built ones.
 */
import { deserialize, serialize } from "node:v8";
import { describe, expect, it } from "vitest";
import { prebuiltSpectralTables } from "@/lib/photolysis/prebuiltSpectralTables";
import { buildSpectralTables, reviveSpectralTables, SPECTRAL_TABLES } from "@/lib/photolysis/spectralTables";

/** Every number of the tables with its place, Float64Arrays element by element. */
function numbers(v: unknown, at = ""): [string, number][] {
  if (typeof v === "number") return [[at, v]];
  if (v instanceof Float64Array) return Array.from(v, (x, i) => [`${at}[${i}]`, x] as [string, number]);
  if (Array.isArray(v)) return v.flatMap((x, i) => numbers(x, `${at}[${i}]`));
  if (v && typeof v === "object") return Object.entries(v).flatMap(([k, x]) => numbers(x, `${at}.${k}`));
  return [];
}

describe("stored spectral tables", () => {
  it("are not stored in the source: the engine builds its own", () => {
    expect(prebuiltSpectralTables()).toBeUndefined();
  });

  it("come back from their JSON form bit for bit, typed arrays and all", () => {
    const json = JSON.stringify(SPECTRAL_TABLES, (_, v) => (v instanceof Float64Array ? Array.from(v) : v));
    const revived = reviveSpectralTables(JSON.parse(json));
    expect(revived.o2).toBeInstanceOf(Float64Array);
    expect(revived.byTemperature.O3_O1D[0]).toBeInstanceOf(Float64Array);
    const a = numbers(SPECTRAL_TABLES);
    const b = numbers(revived);
    expect(b.map(([p]) => p)).toEqual(a.map(([p]) => p));
    expect(a.length).toBeGreaterThan(10_000);
    // Object.is tells -0 from 0 and compares NaN with itself: bit for bit but for NaN payloads
    expect(a.filter(([, x], i) => !Object.is(x, b[i][1]))).toEqual([]);
  });

  it("come back from V8's serialised form bit for bit, as the bundle's stored module revives them", () => {
    const revived = reviveSpectralTables(deserialize(serialize(SPECTRAL_TABLES)));
    expect(revived.o2).toBeInstanceOf(Float64Array);
    expect(revived.byTemperature.O3_O1D[0]).toBeInstanceOf(Float64Array);
    const a = numbers(SPECTRAL_TABLES);
    const b = numbers(revived);
    expect(b.map(([p]) => p)).toEqual(a.map(([p]) => p));
    expect(a.filter(([, x], i) => !Object.is(x, b[i][1]))).toEqual([]);
  });

  it("are the tables a fresh build gives", () => {
    const fresh = numbers(buildSpectralTables());
    const kept = numbers(SPECTRAL_TABLES);
    expect(fresh.filter(([, x], i) => !Object.is(x, kept[i][1]))).toEqual([]);
  });
});
