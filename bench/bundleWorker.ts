/**
 * Bundles the engine worker (lib/runtime/workerEntry.ts) for a benchmark's
 * own pool into .engine/bench/<name>.mjs and returns its path. esbuild is
 * imported at run time: it cannot be bundled into the case file itself.
 */
import path from "node:path";

export async function bundleEngineWorker(name: string): Promise<string> {
  const out = path.resolve(`.engine/bench/${name}.mjs`);
  const specifier = "esbuild";
  const { build } = (await import(specifier)) as typeof import("esbuild");
  await build({
    entryPoints: ["lib/runtime/workerEntry.ts"],
    outfile: out,
    bundle: true,
    platform: "node",
    format: "esm",
    target: "node20",
    logLevel: "warning",
    banner: { js: "import { createRequire as __cr } from 'node:module'; const require = __cr(import.meta.url);" },
  });
  return out;
}
