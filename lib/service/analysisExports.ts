/**
 * The CSV exports of a stored analysis (rates, species, cycles, uncertainty,
 * sensitivities), each after its provenance block (lib/service/csvProvenance.ts).
 */
import "server-only";
import type { CsvCommentEntry } from "../csv";
import type { AnalysisResult } from "../engine/types";
import { getAnalysisRecord } from "./analyses";
import {
  cyclesCsv,
  ratesCsv,
  sensitivitiesCsv,
  sensitivitiesNotes,
  speciesCsv,
  uncertaintyCsv,
  uncertaintyNotes,
} from "./csv";
import { type CsvExportOptions, conditionEntries, csvExport, csvMechanism } from "./csvProvenance";

type Table = (r: AnalysisResult) => string;
const none = (): CsvCommentEntry[] => [];

const ANALYSIS_EXPORTS: Record<string, [Table, string, (r: AnalysisResult) => CsvCommentEntry[]]> = {
  "rates.csv": [
    ratesCsv,
    "rates.csv: every reaction's rate constant, rate and odd-oxygen effect at the steady state",
    none,
  ],
  "species.csv": [
    speciesCsv,
    "species.csv: every species' amount, production, loss and lifetime at the steady state",
    none,
  ],
  "cycles.csv": [cyclesCsv, "cycles.csv: the catalytic cycles with rate, share of the Ox loss and chain length", none],
  "uncertainty.csv": [
    uncertaintyCsv,
    "uncertainty.csv: Monte Carlo medians and 5–95 % ranges of the outputs",
    uncertaintyNotes,
  ],
  "sensitivities.csv": [
    sensitivitiesCsv,
    "sensitivities.csv: normalised sensitivities d ln(output) / d ln(k)",
    sensitivitiesNotes,
  ],
};

/** A CSV export of a stored analysis with its provenance block; null for an unknown file. */
export async function analysisExport(
  id: string,
  file: string,
  o: CsvExportOptions,
): Promise<{ csv: string; filename: string } | null> {
  const entry = Object.hasOwn(ANALYSIS_EXPORTS, file) ? ANALYSIS_EXPORTS[file] : undefined;
  if (!entry) return null;
  const [make, table, notes] = entry;
  const record = await getAnalysisRecord(id);
  const r = record.result;
  const csv = csvExport(
    make(r),
    {
      table,
      mechanisms: [await csvMechanism(r.mechanism)],
      condition: conditionEntries(r.condition),
      engineVersion: r.engineVersion,
      computedAt: record.createdAt,
      permalink: `/a/${id}`,
      record: `/api/analyses/${id}`,
      extra: notes(r),
    },
    o,
  );
  return { csv, filename: `analysis-${id}-${file}` };
}
