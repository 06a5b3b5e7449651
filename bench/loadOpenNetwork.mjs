// The generator of large invented networks (bench/generators/openNetwork.ts),
// bundled for plain Node under .engine/bench/ and imported, for the browser
// benchmark scripts that upload one.
import { mkdirSync } from "node:fs";
import path from "node:path";
import { pathToFileURL } from "node:url";
import { build } from "esbuild";

/** `openNetwork` from bench/generators/openNetwork.ts. */
export async function loadOpenNetwork() {
  const gen = path.resolve(".engine/bench/openNetwork.mjs");
  mkdirSync(path.dirname(gen), { recursive: true });
  await build({
    entryPoints: ["bench/generators/openNetwork.ts"],
    outfile: gen,
    bundle: true,
    platform: "node",
    format: "esm",
    logLevel: "warning",
  });
  return (await import(pathToFileURL(gen).href)).openNetwork;
}
