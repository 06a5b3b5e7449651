// The command line's two bundles, built from lib/ when its sources change:
// .engine/cli-<key>.mjs (lib/cli/main.ts) and .engine/cli-worker-<key>.mjs
// (the engine's worker thread, for sweeps). The key hashes the path, size
// and modification time of every source file, so a clone runs without a
// build step and an unchanged tree starts without bundling (tens of ms).
import { createHash } from "node:crypto";
import { existsSync, mkdirSync, readdirSync, renameSync, rmSync, statSync } from "node:fs";
import path from "node:path";
import { NODE_BUNDLE, serverOnlyStub } from "./node-bundle.mjs";

function sourceKey(root) {
  const h = createHash("sha256");
  const walk = (dir) => {
    for (const e of readdirSync(dir, { withFileTypes: true }).sort((a, b) => (a.name < b.name ? -1 : 1))) {
      const p = path.join(dir, e.name);
      if (e.isDirectory()) walk(p);
      else if (/\.(ts|mjs|json)$/.test(e.name)) {
        const s = statSync(p);
        h.update(`${path.relative(root, p)}:${s.size}:${s.mtimeMs}\n`);
      }
    }
  };
  walk(path.join(root, "lib"));
  for (const f of ["scripts/cli-bundle.mjs", "scripts/node-bundle.mjs", "package.json"]) {
    const s = statSync(path.join(root, f));
    h.update(`${f}:${s.size}:${s.mtimeMs}\n`);
  }
  return h.digest("hex").slice(0, 16);
}

/** Paths of the bundles for the current sources, building them first when they are missing. */
export async function ensureCliBundles(root) {
  const dir = path.join(root, ".engine");
  const key = sourceKey(root);
  const cli = path.join(dir, `cli-${key}.mjs`);
  const worker = path.join(dir, `cli-worker-${key}.mjs`);
  if (existsSync(cli) && existsSync(worker)) return { cli, worker };
  let build;
  try {
    ({ build } = await import("esbuild"));
  } catch {
    throw new Error("the command line is bundled from lib/ with esbuild, which is not installed: run npm ci");
  }
  mkdirSync(dir, { recursive: true });
  // bundles of older sources go; several processes may build at once, so each writes a temporary file and renames it
  for (const f of readdirSync(dir)) {
    if (/^cli-(worker-)?[0-9a-f]{16}\.mjs$/.test(f) && !f.includes(key)) rmSync(path.join(dir, f), { force: true });
  }
  const common = { ...NODE_BUNDLE, absWorkingDir: root, packages: "external", plugins: [serverOnlyStub] };
  await Promise.all(
    [
      [cli, "lib/cli/main.ts"],
      [worker, "lib/runtime/workerEntry.ts"],
    ].map(async ([out, entry]) => {
      const tmp = `${out}.${process.pid}.tmp.mjs`;
      await build({ ...common, entryPoints: [entry], outfile: tmp });
      renameSync(tmp, out);
    }),
  );
  return { cli, worker };
}
