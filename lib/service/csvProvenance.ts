/**
 * The provenance block of every CSV export: `# key: value` lines saying what
 * the table is and what it was computed from (mechanism id, title and
 * version; the condition as resolved; engine version; when; permalink; the
 * caution), then the table. `?comments=none` gives the bare table. New CSV
 * exports build a `CsvProvenance` and call `csvExport` (DEVELOPERS.md,
 * "CSV exports"; the keys are listed there).
 */
import "server-only";
import { compileSource } from "../engine/mechanismSource";
import { InputError } from "../errors";
import { mechanismSource } from "./mechanisms";
import { type CsvMechanism, type CsvProvenance, provenanceBlock } from "./provenanceBlock";

export { type CsvMechanism, type CsvProvenance, conditionEntries, provenanceBlock } from "./provenanceBlock";

export interface CsvExportOptions {
  /** scheme, host and port of the request, prefixed to the permalinks */
  origin: string;
  /** false for the bare table (`?comments=none`); default true */
  comments: boolean;
}

/**
 * The export options of a request: `?comments=none` for the bare table (any other value is an error), and
 * the origin the client used (Host, or X-Forwarded-Host/-Proto behind a proxy) for absolute permalinks.
 */
export function csvExportOptions(req: Request): CsvExportOptions {
  const url = new URL(req.url);
  const c = url.searchParams.get("comments");
  if (c !== null && c !== "none")
    throw new InputError(
      "comments",
      `unknown value "${c}": use comments=none for the table without its # lines, or leave the parameter out`,
    );
  const first = (h: string | null) => h?.split(",")[0].trim() || null;
  const host = first(req.headers.get("x-forwarded-host")) ?? first(req.headers.get("host")) ?? url.host;
  const proto = first(req.headers.get("x-forwarded-proto")) ?? url.protocol.replace(/:$/, "");
  return { origin: `${proto}://${host}`, comments: c === null };
}

/** A result's mechanism with its document version (built-ins and uploads are cached after the first load). */
export async function csvMechanism(m: { id: string; title: string }): Promise<CsvMechanism> {
  try {
    return { id: m.id, title: m.title, version: compileSource(await mechanismSource(m.id)).version };
  } catch {
    return { id: m.id, title: m.title };
  }
}

/** The export as sent: the provenance block and the table, or the table alone when `comments` is false. */
export function csvExport(table: string, p: CsvProvenance, o: CsvExportOptions): string {
  return o.comments ? provenanceBlock(p, o.origin) + table : table;
}
