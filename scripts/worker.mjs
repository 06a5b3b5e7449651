// `npm run worker`: a queue worker of the BullMQ job back end. Start any
// number, on any machines that reach the same Redis (REDIS_URL) and the same
// database (DATABASE_URL; SQLite under OZONE_DATA_DIR only when every process
// runs on one machine). Each takes job orchestrations and tasks (level
// batches, sample blocks) from Redis and computes tasks in its own engine
// worker threads (OZONE_WORKER_TASKS, default: the cores). Stops cleanly on
// SIGTERM/SIGINT: entries it had not finished are taken back by the others.
import { existsSync, readdirSync, renameSync, rmSync } from "node:fs";
import path from "node:path";
import { pathToFileURL } from "node:url";
import { build } from "esbuild";
import { requireBanner, serverOnlyStub } from "./node-bundle.mjs";

if (!process.env.REDIS_URL) {
  console.error("npm run worker: set REDIS_URL (redis://host:port) to the Redis that the web instances use");
  process.exit(2);
}

const root = process.cwd();
const banner = requireBanner;
const serverOnly = serverOnlyStub;

// the engine's worker-thread bundle, built when missing (to a temporary name first: several workers may start at once)
const engineBundle = path.join(root, ".engine", "worker.mjs");
if (!existsSync(engineBundle)) {
  const tmp = `${engineBundle}.${process.pid}.tmp.mjs`;
  await build({
    entryPoints: ["lib/runtime/workerEntry.ts"],
    outfile: tmp,
    bundle: true,
    platform: "node",
    format: "esm",
    target: "node20",
    logLevel: "warning",
    banner,
  });
  renameSync(tmp, engineBundle);
}

// each worker bundles to its own file; files of workers that are gone (killed) are removed
for (const f of readdirSync(path.join(root, ".engine"))) {
  const m = /^queue-worker\.(\d+)\.mjs$/.exec(f);
  if (!m) continue;
  try {
    process.kill(Number(m[1]), 0);
  } catch {
    rmSync(path.join(root, ".engine", f), { force: true });
  }
}
const out = path.join(root, ".engine", `queue-worker.${process.pid}.mjs`);
process.on("exit", () => rmSync(out, { force: true }));
await build({
  // the process itself is TypeScript in lib/, type-checked and linted with the rest
  entryPoints: ["lib/worker/queueWorkerMain.ts"],
  outfile: out,
  bundle: true,
  platform: "node",
  format: "esm",
  target: "node20",
  packages: "external",
  logLevel: "warning",
  banner,
  plugins: [serverOnly],
});

let running = null;
let stopping = false;
async function stop(code) {
  if (stopping) return;
  stopping = true;
  try {
    await running?.close();
  } finally {
    rmSync(out, { force: true });
    process.exit(code);
  }
}
for (const sig of ["SIGINT", "SIGTERM"]) process.on(sig, () => void stop(0));

try {
  const { main } = await import(pathToFileURL(out).href);
  running = await main();
  const c = running.config;
  console.log(
    `queue worker ${running.worker.name}: ${c.workerTasks} task thread(s), ${c.workerJobs} job(s) at once, Redis at ${new URL(c.url).host}, store ${process.env.DATABASE_URL ? "PostgreSQL" : "SQLite"}`,
  );
} catch (e) {
  console.error(`queue worker failed to start: ${e instanceof Error ? e.message : e}`);
  await stop(1);
}
