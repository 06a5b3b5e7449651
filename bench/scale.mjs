// `npm run bench:scale`: the scale-out benchmark (bench/scale.ts) — the
// embedded pool against 1, 2 and 4 queue workers. Starts Redis (and
// PostgreSQL) on loopback ports when none is reachable, stops them after.
// Figures go to bench/results/scale.json. BENCH_SAMPLES and BENCH_REPEATS
// shrink it for a quick look.
import { existsSync, mkdirSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { pathToFileURL } from "node:url";
import { build } from "esbuild";
import { buildEngineWorker } from "../scripts/engine-bundle.mjs";
import { ensureServices } from "../scripts/services.mjs";

if (!existsSync(".engine/worker.mjs")) await buildEngineWorker();
const out = path.resolve(".engine/bench/scale.mjs");
mkdirSync(path.dirname(out), { recursive: true });
await build({
  entryPoints: ["bench/scale.ts"],
  outfile: out,
  bundle: true,
  platform: "node",
  format: "esm",
  target: "node20",
  packages: "external",
  logLevel: "warning",
  banner: { js: "import { createRequire as __cr } from 'node:module'; const require = __cr(import.meta.url);" },
});

const services = await ensureServices();
const stop = async () => services.stop();
for (const sig of ["SIGINT", "SIGTERM"]) process.on(sig, () => void stop().then(() => process.exit(130)));
let code = 0;
try {
  Object.assign(process.env, services.env);
  const { main } = await import(pathToFileURL(out).href);
  const figures = await main();
  mkdirSync("bench/results", { recursive: true });
  writeFileSync(
    "bench/results/scale.json",
    JSON.stringify(
      {
        date: new Date().toISOString(),
        node: process.version,
        cpus: os.cpus().length,
        cpuModel: os.cpus()[0]?.model,
        ...figures,
      },
      null,
      2,
    ),
  );
  console.log("figures written to bench/results/scale.json");
} catch (e) {
  console.error(e);
  code = 1;
} finally {
  await stop();
}
process.exit(code);
