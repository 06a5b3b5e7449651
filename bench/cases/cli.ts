/**
 * The command line (bin/ozone-cycles.mjs) as a user runs it: a new Node
 * process each time, its bundles already built. "First output" is the time
 * from spawning to the first bytes on stdout; the sweep is the whole process
 * over the 51 levels of the standard profile (10–60 km), to set beside the
 * service's sweep in bench/cases/profiles.ts.
 */
import { spawn } from "node:child_process";
import { DEMO_PROFILES } from "../../lib/atmosphere/demoProfiles";
import { compileSource } from "../../lib/engine/mechanismSource";
import { prepareSweep, runPreparedSweep } from "../../lib/profiles/prepareSweep";
import { runLevelBatch } from "../../lib/profiles/runLevelBatch";
import { inlineExecutor } from "../../lib/profiles/runSweep";
import type { BenchCase } from "../types";

const BIN = "bin/ozone-cycles.mjs";

/** ms from spawning the binary to its first output on stdout (the process is then left to finish). */
function firstOutput(args: string[]): Promise<number> {
  return new Promise((resolve, reject) => {
    const t0 = performance.now();
    const p = spawn(process.execPath, [BIN, ...args], { stdio: ["ignore", "pipe", "ignore"] });
    let first = -1;
    p.stdout.once("data", () => {
      first = performance.now() - t0;
    });
    p.stdout.resume();
    p.on("error", reject);
    p.on("close", (code) => (code === 0 && first >= 0 ? resolve(first) : reject(new Error(`exit ${code}`))));
  });
}

export const cases: BenchCase[] = [
  { name: "cli --help: start to first output", run: () => firstOutput(["--help"]), iterations: 10 },
  {
    name: "cli analyse, reference at 30 km: start to first output",
    run: () => firstOutput(["analyse", "--altitude", "30"]),
    iterations: 10,
    note: "the summary is written once the analysis is done, so this is start to result",
  },
  {
    name: "cli sweep, reference over the 51-level standard profile (whole process)",
    run: () => firstOutput(["sweep", "--csv", "levels"]),
    iterations: 3,
  },
  {
    name: "in-process sweep, reference over the 51-level standard profile, one chain (the service's instantaneous way)",
    run: () => {
      const src = { id: "reference", title: "Reference stratosphere" };
      const mech = compileSource(src);
      const p = prepareSweep({ mechanismId: "reference", profile: { kind: "standard" } }, src, DEMO_PROFILES);
      return runPreparedSweep(
        p,
        inlineExecutor((b) => runLevelBatch(mech, src, b)),
      );
    },
    iterations: 3,
  },
];
