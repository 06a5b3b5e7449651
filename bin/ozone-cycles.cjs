#!/usr/bin/env node
// `ozone-cycles`: the command line of Ozone Loss Cycles (lib/cli). Runs the
// engine in this process; `ozone-cycles --help` lists the commands.
// CommonJS, and no node:crypto: an ES module entry starts Node's module loader and importing node:crypto compiles
// it, together ~10 ms of a ~300 ms analysis (the bundler, an ES module, is imported only when the stamp fails).
"use strict";
const { isAscii } = require("node:buffer");
const { readFileSync, renameSync, writeFileSync } = require("node:fs");
const { createRequire } = require("node:module");
const path = require("node:path");
const vm = require("node:vm");
const { cliBundlePaths, stampedCliBundles } = require("../scripts/cli-stamp.cjs");

// V8 optimises a function after 3 ticks of its interrupt budget by default, before a cold run's type feedback has
// settled (a 51-level sweep: 177 optimised compiles and 29 deoptimisations; at 30 ticks 117 and 13, by
// --trace-opt and --trace-deopt). At 30 ticks that sweep took 0.92 against 1.09 s of
// wall and 1.36 against 1.78 s of CPU (9 alternate runs, Node 20, load 1.4-1.8), `analyse --samples 200` 1.12
// against 1.35 s, a diurnal sweep (long enough to optimise everything) 8.5 against 8.8 s; results identical. Measured on
// V8 11 (Node 20) only, so set there alone (another V8 prints an error for a flag it lacks), and never over the
// caller's own value. Set before the bundle is compiled, so that its code cache is made and read under it.
const TIER_UP_FLAG = "--ticks-before-optimization";
if (
  process.versions.v8.startsWith("11.") &&
  ![...process.execArgv, process.env.NODE_OPTIONS ?? ""].some((f) => f.includes(TIER_UP_FLAG))
)
  require("node:v8").setFlagsFromString(`${TIER_UP_FLAG}=30`);

const root = path.resolve(__dirname, "..");
const cwd = process.cwd();
const debug = process.argv.includes("--debug");

const COMMANDS = new Set(["analyse", "analyze", "sweep", "check", "compare"]);

/** 32-bit FNV-1a of `text`, 8 hex digits: names a code cache per set of node flags (a clash only costs a rewrite). */
function fnv1a(text) {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) h = Math.imul(h ^ text.charCodeAt(i), 0x01000193) >>> 0;
  return h.toString(16).padStart(8, "0");
}

/**
 * Runs the CommonJS bundle `file` as a vm.Script with V8's code cache beside it, one per command (the cache holds
 * the functions that had been compiled when it was written, so a --help run's would not serve an analysis): the
 * first run of a command that succeeds writes its cache once the command is done, later runs skip compiling those functions.
 * A cache V8 refuses (another Node, other flags) is written again.
 */
function loadBundle(file, command) {
  const key = path.basename(file).replace(/^cli-|\.cjs$/g, "");
  // V8 refuses a cache written under other flags, so runs with other node flags keep their own; the flags that
  // name a file, a port or a folder (a profile's name, an inspector) change nothing V8 compiles and are left out,
  // so that they do not leave a cache per value, and NODE_OPTIONS counts as the command line does
  // (with the value after such a flag, `--cpu-prof-interval 100`)
  const v8Flags = [];
  let dropValue = false;
  for (const f of [...(process.env.NODE_OPTIONS ?? "").split(/\s+/), ...process.execArgv]) {
    if (!f) continue;
    if (!f.startsWith("-") && dropValue) {
      dropValue = false;
      continue;
    }
    dropValue = /^--(cpu-prof|heap-prof|inspect|debug-port|diagnostic-dir|report-)/.test(f);
    if (!dropValue) v8Flags.push(f);
  }
  const flags = v8Flags.length ? `-${fnv1a(v8Flags.join("\0"))}` : "";
  const cacheFile = cliBundlePaths(path.dirname(file), key).codeCache.replace(/\.cache$/, `.${command}${flags}.cache`);
  let cachedData;
  try {
    cachedData = readFileSync(cacheFile);
  } catch {}
  // the bundle is ASCII (scripts/cli-bundle.mjs): read as Latin-1, the same text, it is copied into a one-byte
  // string without UTF-8 decoding; a bundle that is not (a non-ASCII regular expression) is decoded as UTF-8
  const bytes = readFileSync(file);
  const source = isAscii(bytes) ? bytes.toString("latin1") : bytes.toString("utf8");
  const wrapped = `(function (exports, require, module, __filename, __dirname) {${source}\n})`;
  const script = new vm.Script(wrapped, { filename: file, cachedData });
  const module = { exports: {} };
  script.runInThisContext()(module.exports, createRequire(file), module, file, path.dirname(file));
  const writeCache = () => {
    if (cachedData && !script.cachedDataRejected) return;
    try {
      const tmp = `${cacheFile}.${process.pid}.tmp`;
      writeFileSync(tmp, script.createCachedData());
      renameSync(tmp, cacheFile);
    } catch {} // a cache that cannot be written only costs the next run its compile
  };
  return { main: module.exports.main, writeCache };
}

async function run() {
  try {
    // the stamp check stats the sources; only when it fails is the bundler's module loaded (it walks lib/ and may rebuild)
    const { cli, worker } =
      stampedCliBundles(root) ?? (await (await import("../scripts/cli-bundle.mjs")).ensureCliBundles(root));
    // the engine reads its built-in documents relative to the working folder; the caller's files are read relative to `cwd`
    process.chdir(root);
    const command = process.argv.slice(2).find((a) => !a.startsWith("-"));
    const { main, writeCache } = loadBundle(
      cli,
      COMMANDS.has(command) ? command.replace("analyze", "analyse") : "other",
    );
    process.exitCode = await main(process.argv.slice(2), {
      cwd,
      stdout: (s) => process.stdout.write(s),
      stderr: (s) => process.stderr.write(s),
      stderrIsTTY: Boolean(process.stderr.isTTY),
      workerScript: worker,
      // solved radiative columns, kept per bundle key (lib/cli/diskFieldStore.ts)
      fieldStoreDir: cli.replace(/cli-([0-9a-f]{16})\.cjs$/, "cli-fields-$1"),
    });
    // only a run that did its work compiled what the command needs (a usage error's cache would hold the parser alone)
    if (process.exitCode === 0) writeCache();
  } catch (e) {
    process.stderr.write(`ozone-cycles: ${e instanceof Error ? e.message : e}\n`);
    if (debug && e instanceof Error) process.stderr.write(`${e.stack}\n`);
    process.exitCode = 1;
  }
  // The work is done and every file written synchronously. Left to end by itself, Node waits for V8's background
  // tasks (a concurrent marking, optimising compiles nobody will run) before it exits: ~25 ms after the last output
  // of an analysis. So exit now, unless output is still queued (stdout and stderr are synchronous on Linux for
  // files, pipes and terminals, not everywhere), which the natural end flushes.
  if (process.stdout.writableLength === 0 && process.stderr.writableLength === 0) process.exit();
}

run();
