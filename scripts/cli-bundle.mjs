// The command line's two bundles, built from lib/ when its sources change:
// .engine/cli-<key>.cjs (lib/cli/main.ts, CommonJS with its npm packages
// inside, run by the launcher with V8's code cache) and
// .engine/cli-worker-<key>.mjs (the engine's worker thread, for sweeps). The
// key hashes the path, size and modification time of every source file, so
// a clone runs without a build step; the stamp written beside the bundles
// (scripts/cli-stamp.cjs) lets the launcher re-check the key by statting
// alone, so an unchanged tree starts without loading this module.
// The engine's spectral tables (lib/photolysis/spectralTables.ts, ~0.3 s of
// CPU to build) and the loaded built-in mechanisms (the reference YAML takes
// ~0.15 s to parse) are made once here and stored beside the bundles
// (.engine/cli-stored-<key>.tables and .json), read in place of
// lib/photolysis/prebuiltSpectralTables.ts and lib/mechanism/prebuiltMechanisms.ts,
// so a run does neither. The runs themselves keep their solved radiative
// columns in .engine/cli-fields-<key>/ (lib/cli/diskFieldStore.ts).
import { createHash } from "node:crypto";
import { existsSync, mkdirSync, readdirSync, renameSync, rmSync, statSync, writeFileSync } from "node:fs";
import path from "node:path";
import { pathToFileURL } from "node:url";
import v8 from "node:v8";
import { CLI_RUNTIME, cliBundlePaths, STAMP_FILE } from "./cli-stamp.cjs";
import { NODE_BUNDLE, serverOnlyStub } from "./node-bundle.mjs";

/** The bundle key, and the stamp (scripts/cli-stamp.cjs) that lets the launcher re-check it by statting alone. */
export function sourceKey(root) {
  const h = createHash("sha256");
  // the stored tables, fields and code caches are V8's own formats (CLI_RUNTIME)
  h.update(`runtime:${CLI_RUNTIME}\n`);
  const files = [];
  const dirs = [];
  const add = (rel, s) => {
    h.update(`${rel}:${s.size}:${s.mtimeMs}\n`);
    files.push([rel, s.size, s.mtimeMs]);
  };
  const walk = (dir) => {
    dirs.push([path.relative(root, dir), statSync(dir).mtimeMs]);
    for (const e of readdirSync(dir, { withFileTypes: true }).sort((a, b) => (a.name < b.name ? -1 : 1))) {
      const p = path.join(dir, e.name);
      if (e.isDirectory()) walk(p);
      else if (/\.(ts|mjs|json)$/.test(e.name)) add(path.relative(root, p), statSync(p));
    }
  };
  walk(path.join(root, "lib"));
  for (const f of ["scripts/cli-bundle.mjs", "scripts/cli-stamp.cjs", "scripts/node-bundle.mjs", "package.json"]) {
    add(f, statSync(path.join(root, f)));
  }
  const key = h.digest("hex").slice(0, 16);
  return { key, stamp: { key, runtime: CLI_RUNTIME, files, dirs } };
}

/** Writes the stamp of `key` (temporary file and rename: several processes may write at once). */
export function writeStamp(dir, stamp) {
  const file = path.join(dir, STAMP_FILE);
  writeFileSync(`${file}.${process.pid}.tmp`, JSON.stringify(stamp));
  renameSync(`${file}.${process.pid}.tmp`, file);
}

/** Paths of the bundles for the current sources, building them first when they are missing. */
export async function ensureCliBundles(root) {
  const dir = path.join(root, ".engine");
  const { key, stamp } = sourceKey(root);
  const { cli, worker, storedJson, storedTables } = cliBundlePaths(dir, key);
  const stored = storedJson.replace(/\.json$/, ".mjs");
  const storedCjs = storedJson.replace(/\.json$/, ".cjs");
  // the bundles read the stored data (storeComputed) at run time
  if (existsSync(cli) && existsSync(worker) && existsSync(storedJson) && existsSync(storedTables)) {
    writeStamp(dir, stamp);
    return { cli, worker };
  }
  let build;
  try {
    ({ build } = await import("esbuild"));
  } catch {
    throw new Error("the command line is bundled from lib/ with esbuild, which is not installed: run npm ci");
  }
  mkdirSync(dir, { recursive: true });
  // bundles of older sources go; several processes may build at once, so each writes a temporary file and renames it
  for (const f of readdirSync(dir)) {
    if (
      /^cli-(worker-|stored-|tables-)?[0-9a-f]{16}\.(mjs|cjs|json|tables|([\w-]+\.)?cache)$/.test(f) &&
      !f.includes(key)
    )
      rmSync(path.join(dir, f), { force: true });
    // the radiative columns kept by older bundles' runs (lib/cli/diskFieldStore.ts)
    else if (/^cli-fields-[0-9a-f]{16}$/.test(f) && !f.includes(key))
      rmSync(path.join(dir, f), { recursive: true, force: true });
  }
  const base = { ...NODE_BUNDLE, absWorkingDir: root, packages: "external", plugins: [serverOnlyStub] };
  await storeComputed(build, base, root, stored, storedCjs, storedTables);
  const common = { ...base, plugins: [serverOnlyStub, prebuilt(stored)] };
  // the command line's own bundle takes its npm packages in too: esbuild then evaluates a package only when a module
  // that imports it first runs (the commands are imported when they run), where an external package is loaded at
  // start by the bundle's hoisted imports (yaml, zod, graphology: ~0.12 s of a --help run, measured at load 6)
  await Promise.all(
    [
      // CommonJS, so that the launcher can compile it as a vm.Script with V8's code cache (cli-<key>.cache)
      [
        cli,
        "lib/cli/main.ts",
        {
          packages: undefined,
          format: "cjs",
          banner: {},
          plugins: [serverOnlyStub, prebuilt(storedCjs)],
          // no comments and ASCII only: Node reads an ASCII file into a one-byte string several times faster than
          // one with a single non-ASCII character (the source's comments have µm², cm⁻³, →), 1.9 MB → 1.3 MB
          minifyWhitespace: true,
          legalComments: "none",
          charset: "ascii",
        },
      ],
      [worker, "lib/runtime/workerEntry.ts", {}],
    ].map(async ([out, entry, extra]) => {
      const tmp = `${out}.${process.pid}.tmp${path.extname(out)}`;
      await build({ ...common, ...extra, entryPoints: [entry], outfile: tmp });
      renameSync(tmp, out);
    }),
  );
  writeStamp(dir, stamp);
  return { cli, worker };
}

/** Builds the spectral tables and loads the built-in mechanisms once, and writes the module that returns them. */
async function storeComputed(build, options, root, out, outCjs, tablesFile) {
  const tmp = `${out}.${process.pid}.build.mjs`;
  const entry = [
    'export { SPECTRAL_TABLES } from "./lib/photolysis/spectralTables.ts";',
    'export { WAVELENGTH_GRID } from "./lib/photolysis/wavelengthGrid.ts";',
    'export { loadBuiltinMechanism } from "./lib/mechanism/builtinMechanisms.ts";',
    'export { BUILTIN_MECHANISMS } from "./lib/mechanisms/index.ts";',
  ].join("\n");
  await build({ ...options, stdin: { contents: entry, resolveDir: root, loader: "ts" }, outfile: tmp });
  const cwd = process.cwd();
  try {
    const m = await import(pathToFileURL(tmp).href);
    process.chdir(root); // the built-in documents are read relative to the working folder
    const mechanisms = Object.fromEntries(m.BUILTIN_MECHANISMS.map((b) => [b.id, m.loadBuiltinMechanism(b.id)]));
    // the data in files beside the bundles, read on first use: a --help run neither compiles nor reads them. The
    // tables (60,000 float64) are V8's serialised form, whose Float64Arrays are their bytes: read back 3-5 times
    // faster than parsing them as JSON numbers (measured 13-30 ms against 64-78 ms at load 4-6), bit for bit alike
    const tablesPart = `${tablesFile}.${process.pid}.tmp`;
    writeFileSync(tablesPart, v8.serialize({ tables: m.SPECTRAL_TABLES, grid: m.WAVELENGTH_GRID }));
    renameSync(tablesPart, tablesFile);
    const json = out.replace(/\.mjs$/, ".json");
    const part = `${json}.${process.pid}.tmp`;
    writeFileSync(part, JSON.stringify({ mechanisms }));
    renameSync(part, json);
    writeFileSync(
      `${out}.${process.pid}.tmp`,
      [
        'import { readFileSync } from "node:fs";',
        'import { deserialize } from "node:v8";',
        "let data;",
        "let spectral;",
        `const stored = () => (data ??= JSON.parse(readFileSync(new URL(${JSON.stringify(`./${path.basename(json)}`)}, import.meta.url), "utf8")));`,
        // a file that cannot be read back (damaged) gives undefined: the engine builds its grid and tables then
        `const storedSpectral = () => (spectral ??= (() => { try { return deserialize(readFileSync(new URL(${JSON.stringify(`./${path.basename(tablesFile)}`)}, import.meta.url))); } catch { return {}; } })());`,
        "export const prebuiltSpectralTables = () => storedSpectral().tables;",
        "export const prebuiltWavelengthGrid = () => storedSpectral().grid;",
        "export const prebuiltMechanisms = () => stored().mechanisms;",
        "",
      ].join("\n"),
    );
    renameSync(`${out}.${process.pid}.tmp`, out);
    writeFileSync(
      `${outCjs}.${process.pid}.tmp`,
      [
        'const { readFileSync } = require("node:fs");',
        'const { join } = require("node:path");',
        'const { deserialize } = require("node:v8");',
        "let data;",
        "let spectral;",
        `const stored = () => (data ??= JSON.parse(readFileSync(join(__dirname, ${JSON.stringify(path.basename(json))}), "utf8")));`,
        `const storedSpectral = () => (spectral ??= (() => { try { return deserialize(readFileSync(join(__dirname, ${JSON.stringify(path.basename(tablesFile))}))); } catch { return {}; } })());`,
        "exports.prebuiltSpectralTables = () => storedSpectral().tables;",
        "exports.prebuiltWavelengthGrid = () => storedSpectral().grid;",
        "exports.prebuiltMechanisms = () => stored().mechanisms;",
        "",
      ].join("\n"),
    );
    renameSync(`${outCjs}.${process.pid}.tmp`, outCjs);
  } finally {
    process.chdir(cwd);
    rmSync(tmp, { force: true });
  }
}

/** Resolves lib/photolysis/prebuiltSpectralTables.ts and lib/mechanism/prebuiltMechanisms.ts to the stored module. */
const prebuilt = (file) => ({
  name: "prebuilt",
  setup(b) {
    b.onResolve({ filter: /^\.\/prebuilt(SpectralTables|WavelengthGrid|Mechanisms)$/ }, (args) =>
      /lib[\\/](photolysis|mechanism)[\\/]/.test(args.importer) ? { path: file } : undefined,
    );
  },
});
