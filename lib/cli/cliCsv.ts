/**
 * CSV output of the command line: a table named on the command line
 * ("cycles" or "cycles.csv"), and the provenance block of the routes before
 * it, stamped now and without a permalink (the result is not stored).
 */
import { type CsvProvenance, provenanceBlock } from "../service/provenanceBlock";
import { CliError, EXIT } from "./io";

/** The file name of a table named on the command line: "cycles" or "cycles.csv" is cycles.csv. */
export const csvFileName = (name: string) => (name.endsWith(".csv") ? name : `${name}.csv`);

export function csvChoice<T>(tables: Record<string, T>, name: string): T {
  const file = csvFileName(name);
  if (Object.hasOwn(tables, file)) return tables[file];
  const names = Object.keys(tables).map((f) => f.replace(/\.csv$/, ""));
  throw new CliError(`unknown table "${name}"; the tables are ${names.join(", ")}`, EXIT.usage);
}

/** `csv` after its provenance block, or alone when `comments` is false (--no-comments). */
export function cliCsv(csv: string, p: Omit<CsvProvenance, "computedAt" | "bareTable">, comments: boolean): string {
  if (!comments) return csv;
  const block = provenanceBlock(
    {
      ...p,
      computedAt: new Date().toISOString(),
      bareTable: "run again with --no-comments for the table without these # lines",
    },
    "",
  );
  return block + csv;
}
