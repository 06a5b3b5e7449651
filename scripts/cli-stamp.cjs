// The launcher's cheap check that the command line's bundles are current:
// .engine/cli-stamp.json, written when scripts/cli-bundle.mjs computes the
// bundle key, lists the key, the size and modification time of every source
// file that went into the key and the modification time of every folder under
// lib/. Statting those (no directory listing, no hashing, no reading beyond
// the stamp) tells whether the key still holds: an edited file changes its
// size or time, and a file added, removed or renamed changes its folder's
// time. When anything differs the launcher falls back to the full check in
// scripts/cli-bundle.mjs, which rebuilds only when the key has changed.
// CommonJS, so that the launcher (bin/ozone-cycles.cjs) starts without the ES module loader.
const { readFileSync, statSync } = require("node:fs");
const path = require("node:path");

const STAMP_FILE = "cli-stamp.json";

/**
 * The runtime the stored files belong to: V8's serialised tables, the radiative fields and the code caches
 * are read back only by the V8 (and CPU architecture) that wrote them, so a change of Node is a new key.
 */
const CLI_RUNTIME = `v8 ${process.versions.v8} ${process.arch}`;

/** `{ cli, worker }` when the stamp in `root`/.engine still matches the sources and the bundles are there, else null. */
function stampedCliBundles(root) {
  const dir = path.join(root, ".engine");
  let stamp;
  try {
    stamp = JSON.parse(readFileSync(path.join(dir, STAMP_FILE), "utf8"));
  } catch {
    return null;
  }
  if (!stamp || typeof stamp.key !== "string" || !Array.isArray(stamp.files) || !Array.isArray(stamp.dirs)) return null;
  if (stamp.runtime !== CLI_RUNTIME) return null;
  const same = (rel, size, mtimeMs) => {
    // joined by hand: the paths are path.relative's, already normal, and a cold path.join over ~400 of them
    // doubled the check's CPU (25 against 13 ms, 3 runs each at load 11)
    const s = statSync(root + path.sep + rel, { throwIfNoEntry: false });
    return s !== undefined && s.mtimeMs === mtimeMs && (size === null || s.size === size);
  };
  for (const [rel, mtimeMs] of stamp.dirs) if (!same(rel, null, mtimeMs)) return null;
  for (const [rel, size, mtimeMs] of stamp.files) if (!same(rel, size, mtimeMs)) return null;
  const bundles = cliBundlePaths(dir, stamp.key);
  for (const f of [bundles.cli, bundles.worker, bundles.storedJson, bundles.storedTables])
    if (!statSync(f, { throwIfNoEntry: false })) return null;
  return { cli: bundles.cli, worker: bundles.worker };
}

/** The files of the bundles of key `key` in `dir`. */
function cliBundlePaths(dir, key) {
  return {
    cli: path.join(dir, `cli-${key}.cjs`),
    worker: path.join(dir, `cli-worker-${key}.mjs`),
    storedJson: path.join(dir, `cli-stored-${key}.json`),
    storedTables: path.join(dir, `cli-stored-${key}.tables`),
    codeCache: path.join(dir, `cli-${key}.cache`),
  };
}

module.exports = { STAMP_FILE, CLI_RUNTIME, stampedCliBundles, cliBundlePaths };
