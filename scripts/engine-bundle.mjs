// Bundles lib/runtime/workerEntry.ts into .engine/worker.mjs: the engine runs
// in worker threads off the request thread, and a worker needs a plain JS file.
import { build } from "esbuild";

export async function buildEngineWorker() {
  await build({
    entryPoints: ["lib/runtime/workerEntry.ts"],
    outfile: ".engine/worker.mjs",
    bundle: true,
    platform: "node",
    format: "esm",
    target: "node20",
    sourcemap: true,
    logLevel: "warning",
    // createRequire shim: bundled CommonJS dependencies (yaml, graphology) call require.
    banner: { js: "import { createRequire as __cr } from 'node:module'; const require = __cr(import.meta.url);" },
  });
}

if (import.meta.url === `file://${process.argv[1]}`) await buildEngineWorker();
