/**
 * `analyse`: one analysis at a condition from flags and/or a condition file,
 * run in this process by the engine's own unit of work (runJob, the same as
 * the service's worker threads run for POST /api/analyses). Prints the
 * summary, the whole result as JSON, or one CSV table after its provenance
 * block. Exit 1 when the steady state did not converge.
 */

import { compileSource } from "../engine/mechanismSource";
import { parseAnalysisRequest } from "../engine/requestSchema";
import type { AnalysisResult } from "../engine/types";
import { runJob } from "../runtime/taskTable";
import { ANALYSIS_CSV_TABLES } from "../service/csv";
import { conditionEntries } from "../service/provenanceBlock";
import { analysisSummary } from "./analysisSummary";
import { cliCsv, csvChoice } from "./cliCsv";
import { conditionFromFlags, optionsFromFlags } from "./conditionFlags";
import { CliError, type CliIo, EXIT, writeOutput } from "./io";
import { mechanismArgument } from "./mechanismArgument";

export interface AnalyseFlags extends Record<string, unknown> {
  mechanism: string;
  conditionFile?: string;
  json?: boolean;
  csv?: string;
  comments: boolean;
  output?: string;
  top: number;
}

export function analyseCommand(io: CliIo, flags: AnalyseFlags): number {
  const table = flags.csv === undefined ? undefined : csvChoice(ANALYSIS_CSV_TABLES, flags.csv);
  const src = mechanismArgument(io, flags.mechanism);
  const options = optionsFromFlags(flags);
  const condition = conditionFromFlags(io, flags, flags.conditionFile);
  if (condition.altitude_km === undefined) {
    throw new CliError("no altitude: give --altitude <km>, or altitude_km in the condition file", EXIT.usage);
  }
  const request = parseAnalysisRequest({
    mechanismId: src.id,
    condition,
    ...(Object.keys(options).length ? { options } : {}),
  });
  const out = runJob({ kind: "analysis", mechanism: src, request });
  const result = (out as { result: AnalysisResult }).result;
  let text: string;
  if (flags.json) text = `${JSON.stringify(result, null, 2)}\n`;
  else if (table) {
    const csv = table.make(result);
    text = cliCsv(
      csv,
      {
        table: table.table,
        mechanisms: [{ ...result.mechanism, version: compileSource(src).version }],
        condition: conditionEntries(result.condition),
        engineVersion: result.engineVersion,
        extra: table.notes(result),
      },
      flags.comments,
    );
  } else text = analysisSummary(result, { topCycles: flags.top });
  writeOutput(io, text, flags.output);
  if (result.steadyState.status !== "converged") {
    io.stderr(`the steady state did not converge: ${result.steadyState.message}\n`);
    return EXIT.failure;
  }
  return EXIT.ok;
}
