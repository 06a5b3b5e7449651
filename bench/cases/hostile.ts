/**
 * Hostile bodies (issue: one request must not stall everyone). Against a
 * really started production server (scripts/serve.mjs on BENCH_PORT, default
 * 3293): the time to refuse each hostile shape, and GET /api/health while
 * such uploads run back to back (its worst latency is printed at the end).
 * In process: the main thread's share of an upload (one copy of the body's
 * chunks into a buffer that is then transferred to a worker, which decodes,
 * pre-scans and parses), which must stay under 50 ms; and, for comparison,
 * the pre-scan that now runs in the worker.
 * Needs a build; without one the server cases are skipped.
 */
import { existsSync } from "node:fs";
import path from "node:path";
import { JsonDepthScanner, jsonTooDeep } from "../../lib/mechanism/nestingDepth";
import { startBenchServer } from "../server.mjs";
import type { BenchCase } from "../types";

const PORT = Number(process.env.BENCH_PORT ?? 3293);
const base = `http://127.0.0.1:${PORT}`;
let server: { stop(): void } | null = null;

const MB4 = 4 * 1024 * 1024 - 64;
const chunk4mb = new Uint8Array(MB4).fill(91);
const nested = `${"[".repeat(MB4 / 2)}${"]".repeat(MB4 / 2)}`;
const nestedYaml = `title: x\nspecies: ${"[".repeat(MB4 / 2 - 16)}`;
const flat = JSON.stringify({ text: `title: ${"x".repeat(MB4 - 40)}` });
const species = ["title: big", 'version: "1"', "species:"];
for (let i = 0; i < 5_001; i++) species.push(`  - { id: X${i}, role: solved, atoms: { C: 1 } }`);
const tooMany = `${species.join("\n")}\nreactions: []\n`;
const binary = new Blob([Uint8Array.from({ length: 1024 * 1024 }, (_, i) => (i * 131) % 256)]);

const SHAPES: [string, string, string | Blob][] = [
  ["4 MB of nested brackets as JSON", "application/json", nested],
  ["4 MB of nested brackets as YAML", "application/yaml", nestedYaml],
  ["a 4 MB plain scalar in the JSON wrapper (parsed in the worker)", "application/json", flat],
  ["5,001 species (413)", "application/yaml", tooMany],
  ["1 MB of binary", "application/json", binary],
];

const upload = (type: string, body: string | Blob) =>
  fetch(`${base}/api/mechanisms`, {
    method: "POST",
    // each upload its own client, so that the rate limit does not end the benchmark
    headers: {
      "content-type": type,
      "x-forwarded-for": `10.9.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250)}`,
    },
    body,
  }).then(async (r) => {
    await r.arrayBuffer();
    if (r.status < 400 || r.status >= 500) throw new Error(`status ${r.status}`);
    return r.status;
  });

let worstHealth_ms = 0;
let hostileRunning = false;
let background: Promise<void> | null = null;

async function health(): Promise<number> {
  const t0 = performance.now();
  const r = await fetch(`${base}/api/health`);
  await r.arrayBuffer();
  const dt = performance.now() - t0;
  worstHealth_ms = Math.max(worstHealth_ms, dt);
  return dt;
}

const flatBytes = new TextEncoder().encode(flat);
const chunked = (bytes: Uint8Array) => {
  const s = new JsonDepthScanner();
  for (let i = 0; i < bytes.length; i += 65_536) if (s.feed(bytes.subarray(i, i + 65_536))) return true;
  return false;
};

const inProcess: BenchCase[] = [
  {
    name: "hostile (main thread): chunked nesting scan of a flat 4 MB JSON body as it arrives (64 KiB chunks)",
    run: () => chunked(flatBytes),
  },
  { name: "hostile (in the worker): nesting pre-scan of 4 MB nested brackets", run: () => jsonTooDeep(nested) },
  { name: "hostile (in the worker): nesting pre-scan of a flat 4 MB JSON body", run: () => jsonTooDeep(flat) },
  {
    name: "hostile (main thread): what the upload route does with 4 MB: one copy of the chunks, then a transfer",
    run: () => {
      const bytes = new Uint8Array(MB4);
      bytes.set(chunk4mb);
      return structuredClone(bytes, { transfer: [bytes.buffer] });
    },
  },
];

export async function setup(): Promise<BenchCase[]> {
  const dist = process.env.NEXT_DIST_DIR ?? ".next";
  if (!existsSync(path.join(dist, "BUILD_ID")) || !existsSync(".engine/worker.mjs")) {
    console.log("hostile: no build found, server cases skipped (run npm run build first)");
    return inProcess;
  }
  server = await startBenchServer(PORT, { OZONE_TRUSTED_PROXIES: "1" });
  return [
    ...inProcess,
    ...SHAPES.map(([what, type, body]) => ({
      name: `hostile: refusal of ${what} (per request)`,
      run: () => upload(type, body),
      iterations: 8,
    })),
    {
      name: "hostile: GET /api/health while hostile uploads run back to back",
      run: () => {
        if (!hostileRunning) {
          hostileRunning = true;
          background = (async () => {
            let i = 0;
            while (hostileRunning) {
              const [, type, body] = SHAPES[i++ % SHAPES.length];
              await upload(type, body).catch(() => {});
            }
          })();
        }
        return health();
      },
      iterations: 200,
      note: "the worst of these is printed after the run",
    },
  ];
}

export async function teardown(): Promise<void> {
  hostileRunning = false;
  await background;
  if (server)
    console.log(`hostile: worst GET /api/health latency during hostile uploads ${worstHealth_ms.toFixed(0)} ms`);
  server?.stop();
}
