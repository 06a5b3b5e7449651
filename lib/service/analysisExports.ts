/**
 * The CSV exports of a stored analysis (rates, species, cycles, uncertainty,
 * sensitivities), each after its provenance block (lib/service/csvProvenance.ts).
 */
import "server-only";
import { getAnalysisRecord } from "./analyses";
import { ANALYSIS_CSV_TABLES } from "./csv";
import { type CsvExportOptions, conditionEntries, csvExport, csvMechanism } from "./csvProvenance";

/** A CSV export of a stored analysis with its provenance block; null for an unknown file. */
export async function analysisExport(
  id: string,
  file: string,
  o: CsvExportOptions,
): Promise<{ csv: string; filename: string } | null> {
  const entry = Object.hasOwn(ANALYSIS_CSV_TABLES, file) ? ANALYSIS_CSV_TABLES[file] : undefined;
  if (!entry) return null;
  const { make, table, notes } = entry;
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
