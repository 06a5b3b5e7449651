/**
 * `compare <a> <b>`: two sweeps saved by `sweep --json`, compared level by
 * level as the service compares them (lib/profiles/compareSweeps.ts): the Ox
 * loss by family, the difference B − A and the cycles that explain it. CSV
 * after its provenance block, or JSON.
 */
import { compareSweeps } from "../profiles/compareSweeps";
import type { SweepResult } from "../profiles/types";
import { COMPARISON_TABLE, comparisonCsv, comparisonSide } from "../service/sweepCsvTables";
import { cliCsv } from "./cliCsv";
import { CliError, type CliIo, EXIT, readTextFile, writeOutput } from "./io";

export interface CompareFlags {
  labelA?: string;
  labelB?: string;
  top?: number;
  json?: boolean;
  comments: boolean;
  output?: string;
}

/** A sweep result written by `sweep --json`. */
export function readSweepFile(io: CliIo, file: string): SweepResult {
  const text = readTextFile(io, file, "sweep file");
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (e) {
    throw new CliError(`sweep file ${file} is not JSON (${(e as Error).message}); write one with sweep --json`);
  }
  const r = data as Partial<SweepResult> | null;
  if (!r || typeof r !== "object" || !Array.isArray(r.levels) || !r.mechanism || !r.profile) {
    throw new CliError(
      `sweep file ${file} is not a sweep result (levels, mechanism, profile); write one with sweep --json`,
    );
  }
  return r as SweepResult;
}

export function compareCommand(io: CliIo, fileA: string, fileB: string, flags: CompareFlags): number {
  const a = readSweepFile(io, fileA);
  const b = readSweepFile(io, fileB);
  const result = compareSweeps(a, b, {
    labels: { a: flags.labelA, b: flags.labelB },
    topCycles: flags.top,
    engineVersion: a.engineVersion,
  });
  let text: string;
  if (flags.json) text = `${JSON.stringify(result, null, 2)}\n`;
  else {
    const csv = comparisonCsv(result);
    text = cliCsv(
      csv,
      {
        table: COMPARISON_TABLE,
        mechanisms: [
          { ...result.a.mechanism, side: "a" },
          { ...result.b.mechanism, side: "b" },
        ],
        condition: [
          ["condition", "per level and side: see the two sweeps"],
          ...comparisonSide(result, "a", fileA),
          ...comparisonSide(result, "b", fileB),
        ],
        engineVersion: result.engineVersion,
      },
      flags.comments,
    );
  }
  writeOutput(io, text, flags.output);
  return EXIT.ok;
}
