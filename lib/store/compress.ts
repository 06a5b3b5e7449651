/**
 * Stored bodies are brotli-compressed JSON (node:zlib). Quality 5 of 11: at
 * about a millisecond per 50 KB analysis it stays off the latency budget of
 * a write, and the ratio is close to the slow qualities' on this repetitive
 * JSON (DEVELOPERS.md gives the measured figures).
 */
import { promisify } from "node:util";
import { brotliCompress, brotliCompressSync, brotliDecompressSync, constants } from "node:zlib";

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

const brotliCompressAsync = promisify(brotliCompress);

/**
 * JSON text already written (UTF-8), compressed on libuv's thread pool, so
 * that the main thread serves other requests meanwhile; the same bytes as
 * packJson of the parsed value.
 */
export function packJsonText(text: Uint8Array, quality = COMPRESSION_DEFAULTS.quality): Promise<Buffer> {
  return brotliCompressAsync(text, paramsOf(quality));
}

export function unpackJson(packed: Uint8Array): unknown {
  return JSON.parse(brotliDecompressSync(packed).toString("utf8"));
}
