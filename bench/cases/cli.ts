/**
 * The command line (bin/ozone-cycles.cjs) as a user runs it: a new Node
 * process each time, its bundles already built. "First output" is the time
 * from spawning to the first bytes on stdout; the sweep is the whole process
 * over the 51 levels of the standard profile (10–60 km), set beside the same
 * sweep as a job of a really started production server (POST /api/profiles,
 * polled every 20 ms until done; scripts/serve.mjs on BENCH_CLI_PORT, default
 * 3294). Without a build (npm run build) the service cases are left out.
 */
import { spawn } from "node:child_process";
import { existsSync } from "node:fs";
import { DEMO_PROFILES } from "../../lib/atmosphere/demoProfiles";
import { compileSource } from "../../lib/engine/mechanismSource";
import { prepareSweep, runPreparedSweep } from "../../lib/profiles/prepareSweep";
import { runLevelBatch } from "../../lib/profiles/runLevelBatch";
import { inlineExecutor } from "../../lib/profiles/runSweep";
import { startBenchServer, sweepAsJob } from "../server.mjs";
import type { BenchCase } from "../types";

const BIN = "bin/ozone-cycles.cjs";

/** ms from spawning the binary to its first output on stdout (the process is then left to finish). */
function firstOutput(args: string[]): Promise<number> {
  return new Promise((resolve, reject) => {
    const t0 = performance.now();
    const p = spawn(process.execPath, [BIN, ...args], { stdio: ["ignore", "pipe", "ignore"] });
    let first = -1;
    p.stdout.once("data", () => {
      first = performance.now() - t0;
    });
    p.stdout.resume();
    p.on("error", reject);
    p.on("close", (code) => (code === 0 && first >= 0 ? resolve(first) : reject(new Error(`exit ${code}`))));
  });
}

const PORT = Number(process.env.BENCH_CLI_PORT ?? 3294);
const base = `http://127.0.0.1:${PORT}`;
let server: { stop(): void } | null = null;

async function post(path: string, body: unknown): Promise<{ id: string }> {
  const r = await fetch(`${base}${path}`, {
    method: "POST",
    headers: { "content-type": "application/json" },
    body: JSON.stringify(body),
  });
  if (!r.ok) throw new Error(`${path}: ${r.status} ${await r.text()}`);
  return r.json();
}

const serviceCases: BenchCase[] = [
  {
    name: "service sweep, reference over the 51-level standard profile (POST to job done)",
    run: () => sweepAsJob(base),
    iterations: 3,
    note: "set beside the cli sweep above: the issue's aim is within 20 %",
  },
  {
    name: "service analysis, reference at 30 km (POST /api/analyses, stored)",
    run: () => post("/api/analyses", { mechanismId: "reference", condition: { altitude_km: 30 } }),
    iterations: 10,
  },
];

export async function setup(): Promise<BenchCase[]> {
  if (!existsSync(".next/BUILD_ID") || !existsSync(".engine/worker.mjs")) {
    console.log("cli: no build found, the service cases are left out (run npm run build first)");
    return cases;
  }
  server = await startBenchServer(PORT);
  return [...cases, ...serviceCases];
}

export async function teardown(): Promise<void> {
  server?.stop();
}

const cases: BenchCase[] = [
  { name: "cli --help: start to first output", run: () => firstOutput(["--help"]), iterations: 10 },
  {
    name: "cli analyse, reference at 30 km: start to first output",
    run: () => firstOutput(["analyse", "--altitude", "30"]),
    iterations: 10,
    note: "the summary is written once the analysis is done, so this is start to result",
  },
  {
    name: "cli sweep, reference over the 51-level standard profile (whole process)",
    run: () => firstOutput(["sweep", "--csv", "levels"]),
    iterations: 3,
  },
  {
    name: "in-process sweep, reference over the 51-level standard profile, one chain (the service's instantaneous way)",
    run: () => {
      const src = { id: "reference", title: "Reference stratosphere" };
      const mech = compileSource(src);
      const p = prepareSweep({ mechanismId: "reference", profile: { kind: "standard" } }, src, DEMO_PROFILES);
      return runPreparedSweep(
        p,
        inlineExecutor((b) => runLevelBatch(mech, src, b)),
      );
    },
    iterations: 3,
  },
];
