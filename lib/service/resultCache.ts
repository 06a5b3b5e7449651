/**
 * The analyses computed lately, as the JSON bytes of their results, keyed by
 * the canonical request (the mechanism's content-addressed id and the request
 * as the schema parsed it: unknown keys are refused and the keys come out in
 * the schema's order, so two bodies that ask the same thing share a key). The
 * engine is deterministic (test/service/resultCache.test.ts), so a hit is the
 * result a new computation would give, but for `elapsed_ms`, which stays the
 * first computation's. Least recently used entries go first.
 */
import "server-only";
import type { AnalysisRequest } from "../engine/types";

export const RESULT_CACHE_DEFAULTS = {
  /** results kept (each about 70 KB for the reference mechanism); default 256 */
  maxEntries: 256,
  /** total bytes kept; default 32 MiB */
  maxBytes: 32 * 1024 * 1024,
};

export type ResultCacheOptions = typeof RESULT_CACHE_DEFAULTS;

/** The cache key of a request against one mechanism (its id is content-addressed for uploads). */
export function resultKey(mechanismId: string, request: AnalysisRequest): string {
  return `${mechanismId}\n${JSON.stringify(request)}`;
}

export class ResultCache {
  private readonly entries = new Map<string, Uint8Array>();
  private bytes = 0;

  constructor(private readonly options: ResultCacheOptions = RESULT_CACHE_DEFAULTS) {
    if (!(options.maxEntries >= 0) || !(options.maxBytes >= 0))
      throw new RangeError(`ResultCache: invalid limits ${JSON.stringify(options)}`);
  }

  get size(): number {
    return this.entries.size;
  }

  get(key: string): Uint8Array | undefined {
    const hit = this.entries.get(key);
    if (hit) {
      this.entries.delete(key);
      this.entries.set(key, hit);
    }
    return hit;
  }

  /** A result larger than the byte limit is not kept. */
  set(key: string, json: Uint8Array): void {
    const old = this.entries.get(key);
    if (old) {
      this.entries.delete(key);
      this.bytes -= old.byteLength;
    }
    if (json.byteLength > this.options.maxBytes || this.options.maxEntries === 0) return;
    this.entries.set(key, json);
    this.bytes += json.byteLength;
    while (this.entries.size > this.options.maxEntries || this.bytes > this.options.maxBytes) {
      const [k, v] = this.entries.entries().next().value as [string, Uint8Array];
      this.entries.delete(k);
      this.bytes -= v.byteLength;
    }
  }
}
