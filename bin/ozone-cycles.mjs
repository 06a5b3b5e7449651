#!/usr/bin/env node
// `ozone-cycles`: the command line of Ozone Loss Cycles (lib/cli). Runs the
// engine in this process; `ozone-cycles --help` lists the commands.
import path from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import { stampedCliBundles } from "../scripts/cli-stamp.mjs";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
const cwd = process.cwd();
const debug = process.argv.includes("--debug");
try {
  // the stamp check stats the sources; only when it fails is the bundler's module loaded (it walks lib/ and may rebuild)
  const { cli, worker } =
    stampedCliBundles(root) ?? (await (await import("../scripts/cli-bundle.mjs")).ensureCliBundles(root));
  // the engine reads its built-in documents relative to the working folder; the caller's files are read relative to `cwd`
  process.chdir(root);
  const { main } = await import(pathToFileURL(cli).href);
  process.exitCode = await main(process.argv.slice(2), {
    cwd,
    stdout: (s) => process.stdout.write(s),
    stderr: (s) => process.stderr.write(s),
    stderrIsTTY: Boolean(process.stderr.isTTY),
    workerScript: worker,
  });
} catch (e) {
  process.stderr.write(`ozone-cycles: ${e instanceof Error ? e.message : e}\n`);
  if (debug && e instanceof Error) process.stderr.write(`${e.stack}\n`);
  process.exitCode = 1;
}
