/**
 * Compression of stored results (lib/store/compress.ts): the size of the
 * JSON of reference analyses (20, 30, 40 km, and 40 km with sensitivities)
 * and of its brotli form at quality 5 (what the store writes), 11 and gzip
 * level 6 for comparison, with the time each takes. The ratios are printed
 * once and go to DEVELOPERS.md ("Storage").
 */
import { brotliCompressSync, constants, gzipSync } from "node:zlib";
import { runAnalysis } from "../../lib/engine/runAnalysis";
import { loadBuiltinMechanism } from "../../lib/mechanism";
import { packJson, unpackJson } from "../../lib/store/compress";
import type { BenchCase } from "../types";

const mech = loadBuiltinMechanism("reference").mechanism;
const results = [20, 30, 40].map((z) =>
  runAnalysis(
    mech,
    { id: "reference", title: mech.title },
    { mechanismId: "reference", condition: { altitude_km: z } },
  ),
);
const json = results.map((r) => Buffer.from(JSON.stringify(r), "utf8"));
const brotli = (b: Buffer, q: number) =>
  brotliCompressSync(b, {
    params: { [constants.BROTLI_PARAM_QUALITY]: q, [constants.BROTLI_PARAM_MODE]: constants.BROTLI_MODE_TEXT },
  });
const sum = (xs: number[]) => xs.reduce((a, b) => a + b, 0);
const raw = sum(json.map((b) => b.length));
const ratio = (f: (b: Buffer) => Buffer) => raw / sum(json.map((b) => f(b).length));
console.log(
  `store: ${json.length} reference analyses, ${(raw / json.length / 1024).toFixed(1)} KiB of JSON each; ` +
    `brotli q5 ${ratio((b) => brotli(b, 5)).toFixed(1)}×, q11 ${ratio((b) => brotli(b, 11)).toFixed(1)}×, ` +
    `gzip 6 ${ratio((b) => gzipSync(b, { level: 6 })).toFixed(1)}× smaller`,
);
const packed = packJson(results[2]);

export const cases: BenchCase[] = [
  { name: "store: brotli q5 of a 40 km reference analysis (as stored)", run: () => packJson(results[2]) },
  { name: "store: brotli q11 of the same", run: () => brotli(json[2], 11) },
  { name: "store: gzip 6 of the same", run: () => gzipSync(json[2], { level: 6 }) },
  { name: "store: unpack (brotli + JSON.parse) of the same", run: () => unpackJson(packed) },
];
