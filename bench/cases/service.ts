/**
 * Latency of POST /api/analyses (computed and stored) and of POST
 * /api/analyses/preview (computed only: the explorer's recompute) for the
 * reference mechanism against a really started production server, with 1 and
 * 8 concurrent clients. Needs a build (`npm run build`); without one the
 * suite reports nothing. Port: BENCH_PORT (default 3291).
 *
 * The service keeps recent results (lib/service/resultCache.ts), so the
 * distinct cases never ask for a condition twice in a run: the altitude steps
 * through 20–50 km by the golden ratio's fraction of a kilometre. The
 * "identical" cases send one condition from all 8 clients (a class on the
 * same step): after the first batch they measure the cache, not the engine.
 *
 * The server is `npm start`'s (scripts/serve.mjs, NODE_ENV=production). The
 * client asks as Node's fetch and browsers do (Accept-Encoding: gzip,
 * deflate) and times each request to the last byte of the body as sent: the
 * bytes are counted, never decompressed or parsed, so that the client's own
 * CPU on the same 2 cores is small (0.7–1.6 ms a request by process.cpuUsage
 * for the same client code, bench/results/service-p95/b-load-client.mjs) and
 * the same whatever the server sends.
 */
import { type ChildProcess, spawn } from "node:child_process";
import { existsSync, mkdtempSync, rmSync } from "node:fs";
import http from "node:http";
import { tmpdir } from "node:os";
import path from "node:path";
import type { BenchCase } from "../types";

const PORT = Number(process.env.BENCH_PORT ?? 3291);
const base = `http://127.0.0.1:${PORT}`;
let server: ChildProcess | null = null;
let dataDir = "";
let step = 0;

/** A new altitude each call, km, never the same twice in a run (the step is irrational). */
function nextAltitude(): number {
  step++;
  return 20 + ((step * 0.6180339887498949) % 30);
}

const agent = new http.Agent({ keepAlive: true, maxSockets: 16 });

/**
 * One analysis at `altitude_km` (default: a new one); `path` is the storing
 * route or the preview. Resolves with the body's length in bytes as sent, at its last byte.
 */
function analysis(path = "/api/analyses", altitude_km = nextAltitude()): Promise<number> {
  const body = JSON.stringify({ mechanismId: "reference", condition: { altitude_km, zenith_deg: 40 } });
  return new Promise((resolve, reject) => {
    const req = http.request(
      {
        host: "127.0.0.1",
        port: PORT,
        path,
        method: "POST",
        agent,
        headers: {
          "content-type": "application/json",
          "content-length": Buffer.byteLength(body),
          "accept-encoding": "gzip, deflate",
        },
      },
      (res) => {
        let bytes = 0;
        res.on("data", (chunk: Buffer) => {
          bytes += chunk.byteLength;
        });
        res.on("end", () => {
          const ok = res.statusCode === 200 || res.statusCode === 201;
          if (ok) resolve(bytes);
          else reject(new Error(`status ${res.statusCode}`));
        });
        res.on("error", reject);
      },
    );
    req.on("error", reject);
    req.end(body);
  });
}

const preview = () => analysis("/api/analyses/preview");
const samePreview = () => analysis("/api/analyses/preview", 30);

export async function setup(): Promise<BenchCase[]> {
  const dist = process.env.NEXT_DIST_DIR ?? ".next";
  if (!existsSync(path.join(dist, "BUILD_ID")) || !existsSync(".engine/worker.mjs")) {
    console.log("service: no build found, skipped (run npm run build first)");
    return [];
  }
  dataDir = mkdtempSync(path.join(tmpdir(), "ozone-bench-"));
  server = spawn("node", ["scripts/serve.mjs", String(PORT)], {
    // the rate limit (600 a minute per address by default) is not what is measured here
    env: {
      ...process.env,
      NODE_ENV: "production",
      OZONE_DATA_DIR: dataDir,
      NEXT_TELEMETRY_DISABLED: "1",
      OZONE_RATE_LIMIT: "100000",
    },
    stdio: "ignore",
  });
  const end = Date.now() + 60_000;
  for (;;) {
    try {
      if ((await fetch(`${base}/api/health`)).ok) break;
    } catch {
      if (Date.now() > end) throw new Error("server did not start");
      await new Promise((r) => setTimeout(r, 250));
    }
  }
  return [
    { name: "POST /api/analyses, 1 client (per request)", run: () => analysis(), iterations: 40 },
    {
      name: "POST /api/analyses, 8 concurrent clients, distinct conditions (per batch of 8)",
      run: () => Promise.all(Array.from({ length: 8 }, () => analysis())),
      iterations: 10,
      note: "latency of the slowest of 8 simultaneous requests",
    },
    { name: "POST /api/analyses/preview, 1 client (per request)", run: preview, iterations: 40 },
    {
      name: "POST /api/analyses/preview, 8 concurrent clients, distinct conditions (per batch of 8)",
      run: () => Promise.all(Array.from({ length: 8 }, preview)),
      iterations: 20,
      note: "latency of the slowest of 8 simultaneous requests",
    },
    {
      name: "POST /api/analyses/preview, 8 clients, identical condition (per batch of 8)",
      run: () => Promise.all(Array.from({ length: 8 }, samePreview)),
      iterations: 20,
      note: "one condition from all 8: served from the recent results after the first batch",
    },
  ];
}

export async function teardown(): Promise<void> {
  agent.destroy();
  server?.kill("SIGKILL");
  if (dataDir) rmSync(dataDir, { recursive: true, force: true });
}
