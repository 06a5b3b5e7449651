/**
 * `sweep`: a profile sweep (the built-in standard profile, an invented demo
 * profile, or a profile CSV file) prepared and run as the service's sweep
 * jobs are (lib/profiles/prepareSweep.ts). Writes one CSV table after its
 * provenance block (levels by default), or the whole result as JSON, which
 * `compare` reads. With --server the sweep runs as a job of a running
 * service instead (serverCall.ts), and its permalink is printed on stderr.
 */
import path from "node:path";
import { DEMO_PROFILES } from "../atmosphere/demoProfiles";
import { CLIENT_DEFAULTS } from "../client";
import type { MechanismSource } from "../engine/mechanismSource";
import { compileSource } from "../engine/mechanismSource";
import { prepareSweep, runPreparedSweep } from "../profiles/prepareSweep";
import { parseSweepRequest } from "../profiles/requestSchema";
import { useParallel } from "../profiles/runSweep";
import { STANDARD_PROFILE_ID } from "../profiles/standardProfile";
import type { ProfileSpec, SweepRequest } from "../profiles/types";
import { SWEEP_CSV_TABLES, sweepCondition } from "../service/sweepCsvTables";
import { cliCsv, csvChoice, csvFileName } from "./cliCsv";
import { conditionFromFlags } from "./conditionFlags";
import { CliError, type CliIo, EXIT, readTextFile, writeOutput } from "./io";
import { mechanismArgument } from "./mechanismArgument";
import { progressBar } from "./progressBar";
import { onServer, serverClient, serverMechanismId, serverPermalink } from "./serverCall";
import { sweepExecutor } from "./sweepExecutor";

export interface SweepFlags extends Record<string, unknown> {
  mechanism: string;
  profile: string;
  conditionFile?: string;
  from?: number;
  to?: number;
  step?: number;
  parallel?: "auto" | "parallel" | "sequential";
  columnPasses?: number;
  columnTolerance?: number;
  fmin?: number;
  oxFamily?: "standard" | "extended";
  json?: boolean;
  csv: string;
  comments: boolean;
  output?: string;
  /** a running service to send the sweep to */
  server?: string;
}

/** "standard", a demo profile's id, or else a CSV file. */
export function profileArgument(io: CliIo, value: string): ProfileSpec {
  if (value === "standard" || value === STANDARD_PROFILE_ID) return { kind: "standard" };
  if (DEMO_PROFILES.some((d) => d.id === value)) return { kind: "demo", id: value };
  const csv = readTextFile(
    io,
    value,
    `profile (not "standard" or a demo profile: ${DEMO_PROFILES.map((d) => d.id).join(", ")}; so read as a CSV file)`,
  );
  return { kind: "csv", csv, name: path.basename(value) };
}

function definedOnly<T extends object>(o: T): T | undefined {
  const e = Object.entries(o).filter(([, v]) => v !== undefined);
  return e.length ? (Object.fromEntries(e) as T) : undefined;
}

export async function sweepCommand(io: CliIo, flags: SweepFlags): Promise<number> {
  const table = flags.json ? undefined : csvChoice(SWEEP_CSV_TABLES, flags.csv);
  const src = mechanismArgument(io, flags.mechanism);
  const condition = definedOnly(conditionFromFlags(io, flags, flags.conditionFile));
  const grid = definedOnly({ from_km: flags.from, to_km: flags.to, step_km: flags.step });
  const options = definedOnly({
    fminRelative: flags.fmin,
    oxDefinition: flags.oxFamily,
    parallel: flags.parallel,
    maxColumnPasses: flags.columnPasses,
    columnTolerance: flags.columnTolerance,
  });
  const request: SweepRequest = parseSweepRequest({
    mechanismId: src.id,
    profile: profileArgument(io, flags.profile),
    ...(grid ? { grid } : {}),
    ...(condition ? { condition } : {}),
    ...(options ? { options } : {}),
  });
  if (flags.server) return sweepOnServer(io, flags, flags.server, src, request);
  const prepared = prepareSweep(request, src, DEMO_PROFILES);
  const severalChains = useParallel(request.options?.parallel ?? "auto", prepared.plan.mode);
  const executor = sweepExecutor(src, io.workerScript, severalChains);
  const bar = progressBar(io);
  let result: Awaited<ReturnType<typeof runPreparedSweep>>;
  try {
    result = await runPreparedSweep(prepared, executor, {
      onProgress: (q) => bar.update(q.done, q.total, q.pass > 1 ? `levels, pass ${q.pass}` : "levels"),
    });
  } finally {
    bar.end();
    await executor.close();
  }
  let text: string;
  if (!table) text = `${JSON.stringify(result, null, 2)}\n`;
  else {
    const csv = table.make({ request, profile: prepared.profile, result });
    text = cliCsv(
      csv,
      {
        table: table.table,
        mechanisms: [{ ...result.mechanism, version: compileSource(src).version }],
        condition: sweepCondition(result, request),
        engineVersion: result.engineVersion,
      },
      flags.comments,
    );
  }
  writeOutput(io, text, flags.output);
  for (const w of result.warnings) io.stderr(`warning: ${w}\n`);
  return EXIT.ok;
}

/** The sweep as a job of the service: progress from its status, then the stored result or one of its tables. */
async function sweepOnServer(
  io: CliIo,
  flags: SweepFlags,
  url: string,
  src: MechanismSource,
  request: SweepRequest,
): Promise<number> {
  const client = serverClient(url);
  const bar = progressBar(io);
  const { text, warnings } = await onServer(url, async () => {
    const mechanismId = await serverMechanismId(client, src);
    let job = await client.startSweep({ ...request, mechanismId });
    try {
      while (job.state === "queued" || job.state === "running") {
        bar.update(job.done, job.total, "levels on the service");
        await new Promise((r) => setTimeout(r, CLIENT_DEFAULTS.pollInterval_ms / 2));
        job = await client.getJob(job.id);
      }
    } finally {
      bar.end();
    }
    if (job.state !== "done" || !job.resultId) {
      throw new CliError(`the sweep on ${url} ${job.state}: ${job.error?.message ?? "no result"}`);
    }
    io.stderr(`permalink: ${serverPermalink(url, job.resultUrl ?? `/api/profiles/${job.resultId}`)}\n`);
    const record = await client.getSweep(job.resultId);
    if (flags.json)
      return { text: `${JSON.stringify(record.body.result, null, 2)}\n`, warnings: record.body.result.warnings };
    const file = csvFileName(flags.csv) as Parameters<typeof client.sweepCsv>[1];
    return { text: await client.sweepCsv(job.resultId, file, flags.comments), warnings: record.body.result.warnings };
  });
  writeOutput(io, text, flags.output);
  for (const w of warnings) io.stderr(`warning: ${w}\n`);
  return EXIT.ok;
}
