/** Runs the real binary (bin/ozone-cycles.cjs) as a child process, as a user's shell would. */
import { execFile } from "node:child_process";
import path from "node:path";

export const ROOT = path.resolve(import.meta.dirname, "../..");
export const BIN = path.join(ROOT, "bin", "ozone-cycles.cjs");
export const FIXTURES = path.join(import.meta.dirname, "fixtures");

export interface CliRun {
  code: number;
  stdout: string;
  stderr: string;
}

/** `args` run from `cwd` (default: the fixtures folder, so that relative file names are the caller's). */
export function runCli(args: string[], cwd = FIXTURES): Promise<CliRun> {
  return new Promise((resolve) => {
    execFile(process.execPath, [BIN, ...args], { cwd, maxBuffer: 64 * 1024 * 1024 }, (err, stdout, stderr) => {
      const code = err ? (typeof err.code === "number" ? err.code : 1) : 0;
      resolve({ code, stdout, stderr });
    });
  });
}

/** A result without the fields that differ between two runs of the same input: timings and the engine version. */
export function withoutRunFields(v: unknown): unknown {
  if (Array.isArray(v)) return v.map(withoutRunFields);
  if (v && typeof v === "object") {
    return Object.fromEntries(
      Object.entries(v)
        .filter(([k]) => !/(_ms|^engineVersion)$/.test(k))
        .map(([k, x]) => [k, withoutRunFields(x)]),
    );
  }
  return v;
}
