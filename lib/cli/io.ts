/**
 * What the command line reads and writes, passed in so that the commands run
 * the same in the real binary and in-process: the caller's working folder,
 * the two output streams, whether stderr is a terminal (progress is drawn only
 * then), the engine's worker-thread script for sweeps, and the folder where
 * solved radiative columns are kept between runs.
 */
import fs from "node:fs";
import path from "node:path";

export interface CliIo {
  /** folder relative file names are read and written in (the caller's, not the package's) */
  cwd: string;
  stdout: (text: string) => void;
  stderr: (text: string) => void;
  /** true when stderr is a terminal: progress bars are drawn on it */
  stderrIsTTY: boolean;
  /** the bundled engine worker (lib/runtime/workerEntry.ts) for sweeps; absent: levels run in this thread */
  workerScript?: string;
  /** folder of the diffuse fields kept between runs (diskFieldStore.ts); absent: every run solves its columns */
  fieldStoreDir?: string;
}

/** Exit codes, as common command-line practice has them. */
export const EXIT = { ok: 0, failure: 1, usage: 2 } as const;

/** A failure the user can act on, printed as one line without a stack; `exitCode` 1 or 2. */
export class CliError extends Error {
  readonly exitCode: number;
  constructor(message: string, exitCode: number = EXIT.failure) {
    super(message);
    this.name = "CliError";
    this.exitCode = exitCode;
  }
}

/** The text of a file named relative to the caller; a missing or unreadable file is a CliError naming it. */
export function readTextFile(io: CliIo, file: string, what: string): string {
  const full = path.resolve(io.cwd, file);
  try {
    return fs.readFileSync(full, "utf8");
  } catch (e) {
    throw new CliError(`cannot read ${what} ${file}: ${fileProblem(e, "no such file")}`);
  }
}

/** Writes `text` to `file` (relative to the caller), or to stdout when no file is given. */
export function writeOutput(io: CliIo, text: string, file: string | undefined): void {
  if (!file) {
    io.stdout(text);
    return;
  }
  try {
    fs.writeFileSync(path.resolve(io.cwd, file), text);
  } catch (e) {
    throw new CliError(`cannot write ${file}: ${fileProblem(e, "no such folder")}`);
  }
}

/** A file system error in a few words; `missing` for ENOENT (a missing file, or a missing folder to write in). */
function fileProblem(e: unknown, missing: string): string {
  const code = (e as NodeJS.ErrnoException).code;
  if (code === "ENOENT") return missing;
  if (code === "EISDIR") return "it is a folder";
  if (code === "EACCES" || code === "EPERM") return "permission denied";
  return (e as Error).message;
}
