import { describe, expect, it, vi } from "vitest";
import { parseAnalysisRequest } from "@/lib/engine/requestSchema";
import { runJob } from "@/lib/runtime/taskTable";
import { ResultCache, resultKey } from "@/lib/service/resultCache";

vi.mock("server-only", () => ({}));

const src = { id: "reference", title: "Reference" };
const request = parseAnalysisRequest({ mechanismId: "reference", condition: { altitude_km: 31.5, zenith_deg: 40 } });

/** A result with its timing taken out: the one field a recomputation may change. */
function untimed(r: { elapsed_ms: number }) {
  return { ...r, elapsed_ms: 0 };
}

describe("the result cache's premise: an analysis is deterministic", () => {
  it("gives the same result, bit for bit but for elapsed_ms, when the same request is computed twice", () => {
    const a = runJob({ kind: "analysis", mechanism: src, request });
    const b = runJob({ kind: "analysis", mechanism: src, request });
    if (a.kind !== "analysis" || b.kind !== "analysis") throw new Error("wrong kind");
    expect(a.result.steadyState.status).toBe("converged");
    expect(untimed(b.result)).toStrictEqual(untimed(a.result));
  });

  it("writes as JSON text (analysis-json) exactly the result the object job gives", () => {
    const obj = runJob({ kind: "analysis", mechanism: src, request });
    const bytes = runJob({ kind: "analysis-json", mechanism: src, request });
    if (obj.kind !== "analysis" || bytes.kind !== "analysis-json") throw new Error("wrong kind");
    expect(bytes.result).toBeInstanceOf(Uint8Array);
    const parsed = JSON.parse(new TextDecoder().decode(bytes.result));
    // JSON keeps every finite double exactly (shortest round-trip form), so the parsed numbers are the same
    expect(untimed(parsed)).toStrictEqual(JSON.parse(JSON.stringify(untimed(obj.result))));
    expect(parsed.steadyState.numberDensity_cm3).toStrictEqual(obj.result.steadyState.numberDensity_cm3);
  });
});

describe("resultKey", () => {
  it("is the same for two bodies that ask the same thing with their keys in another order", () => {
    const reordered = parseAnalysisRequest({
      condition: { zenith_deg: 40, altitude_km: 31.5 },
      mechanismId: "reference",
    });
    expect(resultKey("reference", reordered)).toBe(resultKey("reference", request));
  });

  it("differs for another condition, other options or another mechanism", () => {
    const key = resultKey("reference", request);
    const other = parseAnalysisRequest({ mechanismId: "reference", condition: { altitude_km: 31.6, zenith_deg: 40 } });
    const options = parseAnalysisRequest({ ...request, options: { fminRelative: 1e-3 } });
    expect(resultKey("reference", other)).not.toBe(key);
    expect(resultKey("reference", options)).not.toBe(key);
    expect(resultKey("upload-abc", request)).not.toBe(key);
  });
});

describe("ResultCache", () => {
  const bytes = (n: number) => new Uint8Array(n);

  it("drops the least recently used entry beyond maxEntries", () => {
    const c = new ResultCache({ maxEntries: 2, maxBytes: 1000 });
    c.set("a", bytes(1));
    c.set("b", bytes(1));
    expect(c.get("a")).toBeDefined(); // a is now the most recent
    c.set("c", bytes(1));
    expect(c.get("b")).toBeUndefined();
    expect(c.get("a")).toBeDefined();
    expect(c.get("c")).toBeDefined();
    expect(c.size).toBe(2);
  });

  it("keeps the total under maxBytes and does not keep a result larger than it", () => {
    const c = new ResultCache({ maxEntries: 10, maxBytes: 10 });
    c.set("a", bytes(4));
    c.set("b", bytes(4));
    c.set("c", bytes(4));
    expect(c.get("a")).toBeUndefined();
    expect(c.size).toBe(2);
    c.set("huge", bytes(11));
    expect(c.get("huge")).toBeUndefined();
    c.set("b", bytes(6)); // replacing counts the new size only
    expect(c.get("c")).toBeDefined();
    expect(c.get("b")?.byteLength).toBe(6);
  });

  it("throws on limits that are not numbers ≥ 0", () => {
    expect(() => new ResultCache({ maxEntries: -1, maxBytes: 10 })).toThrow(/ResultCache: invalid limits/);
    expect(() => new ResultCache({ maxEntries: 1, maxBytes: Number.NaN })).toThrow(/ResultCache/);
  });
});
