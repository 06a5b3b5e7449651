/**
 * Stored bodies are brotli-compressed JSON (node:zlib). Quality 5 of 11: at
 * about a millisecond per 50 KB analysis it stays off the latency budget of
 * a write, and the ratio is close to the slow qualities' on this repetitive
 * JSON (DEVELOPERS.md gives the measured figures).
 */
import { brotliCompressSync, brotliDecompressSync, constants } from "node:zlib";

export const COMPRESSION_DEFAULTS = {
  /** brotli quality 0–11; default 5 */
  quality: 5,
};

const paramsOf = (quality: number) => ({
  params: { [constants.BROTLI_PARAM_QUALITY]: quality, [constants.BROTLI_PARAM_MODE]: constants.BROTLI_MODE_TEXT },
});

export function packJson(value: unknown, quality = COMPRESSION_DEFAULTS.quality): Buffer {
  return brotliCompressSync(Buffer.from(JSON.stringify(value), "utf8"), paramsOf(quality));
}

/**
 * JSON text already written (UTF-8), compressed as it is: the same bytes as
 * packJson of the parsed value, without writing it again. Synchronous on
 * purpose: zlib's asynchronous brotli (libuv's thread pool) took 24–38 ms of
 * wall time for a 170 KB text where the synchronous call took 6 ms, on the 2
 * shared cores at load average 12 (DEVELOPERS.md, service benchmark).
 */
export function packJsonText(text: Uint8Array, quality = COMPRESSION_DEFAULTS.quality): Buffer {
  return brotliCompressSync(text, paramsOf(quality));
}

export function unpackJson(packed: Uint8Array): unknown {
  return JSON.parse(brotliDecompressSync(packed).toString("utf8"));
}
