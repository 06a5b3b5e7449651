/**
 * `analyse`: one analysis at a condition from flags and/or a condition file,
 * run in this process by the engine's own unit of work (runJob, the same as
 * the service's worker threads run for POST /api/analyses). Prints the
 * summary, the whole result as JSON, or one CSV table after its provenance
 * block. With --server the request goes to a running service instead
 * (serverCall.ts): the summary, JSON and tables are then the service's, and
 * its permalink is printed. Exit 1 when the steady state did not converge.
 */

import type { MechanismSource } from "../engine/mechanismSource";
import { compileSource } from "../engine/mechanismSource";
import { parseAnalysisRequest } from "../engine/requestSchema";
import type { AnalysisRequest, AnalysisResult } from "../engine/types";
import { runJob } from "../runtime/taskTable";
import { ANALYSIS_CSV_TABLES, type AnalysisCsvTable } from "../service/csv";
import { conditionEntries } from "../service/provenanceBlock";
import { analysisSummary } from "./analysisSummary";
import { cliCsv, csvChoice, csvFileName } from "./cliCsv";
import { conditionFromFlags, optionsFromFlags } from "./conditionFlags";
import { CliError, type CliIo, EXIT, writeOutput } from "./io";
import { mechanismArgument } from "./mechanismArgument";
import { onServer, serverClient, serverMechanismId, serverPermalink } from "./serverCall";

export interface AnalyseFlags extends Record<string, unknown> {
  mechanism: string;
  conditionFile?: string;
  json?: boolean;
  csv?: string;
  comments: boolean;
  output?: string;
  top: number;
  /** a running service to send the analysis to */
  server?: string;
}

export async function analyseCommand(io: CliIo, flags: AnalyseFlags): Promise<number> {
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
  const { result, text } = flags.server
    ? await analyseOnServer(io, flags, flags.server, src, request, table)
    : analyseHere(flags, src, request, table);
  writeOutput(io, text, flags.output);
  if (result.steadyState.status !== "converged") {
    io.stderr(`the steady state did not converge: ${result.steadyState.message}\n`);
    return EXIT.failure;
  }
  return EXIT.ok;
}

interface Analysed {
  result: AnalysisResult;
  text: string;
}

function analyseHere(
  flags: AnalyseFlags,
  src: MechanismSource,
  request: AnalysisRequest,
  table: AnalysisCsvTable | undefined,
): Analysed {
  const out = runJob({ kind: "analysis", mechanism: src, request });
  const result = (out as { result: AnalysisResult }).result;
  if (flags.json) return { result, text: `${JSON.stringify(result, null, 2)}\n` };
  if (!table) return { result, text: analysisSummary(result, { topCycles: flags.top }) };
  const text = cliCsv(
    table.make(result),
    {
      table: table.table,
      mechanisms: [{ ...result.mechanism, version: compileSource(src).version }],
      condition: conditionEntries(result.condition),
      engineVersion: result.engineVersion,
      extra: table.notes(result),
    },
    flags.comments,
  );
  return { result, text };
}

/** The analysis stored by the service: its result, its table as the service serves it, and its permalink. */
async function analyseOnServer(
  io: CliIo,
  flags: AnalyseFlags,
  url: string,
  src: MechanismSource,
  request: AnalysisRequest,
  table: AnalysisCsvTable | undefined,
): Promise<Analysed> {
  const client = serverClient(url);
  return onServer(url, async () => {
    const mechanismId = await serverMechanismId(client, src);
    const { id, result } = await client.createAnalysis({ ...request, mechanismId });
    const permalink = serverPermalink(url, `/a/${encodeURIComponent(id)}`);
    if (!flags.json && !table) {
      return { result, text: `${analysisSummary(result, { topCycles: flags.top })}permalink: ${permalink}\n` };
    }
    // stdout stays the JSON or the table alone
    io.stderr(`permalink: ${permalink}\n`);
    if (flags.json) return { result, text: `${JSON.stringify(result, null, 2)}\n` };
    const file = csvFileName(flags.csv as string) as Parameters<typeof client.analysisCsv>[1];
    return { result, text: await client.analysisCsv(id, file, flags.comments) };
  });
}
