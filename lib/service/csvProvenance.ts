/**
 * The provenance block of every CSV export: `# key: value` lines saying what
 * the table is and what it was computed from (mechanism id, title and
 * version; the condition as resolved; engine version; when; permalink; the
 * caution), then the table. `?comments=none` gives the bare table. New CSV
 * exports build a `CsvProvenance` and call `csvExport` (DEVELOPERS.md,
 * "CSV exports"; the keys are listed there).
 */
import "server-only";
import { CAUTION_LINE } from "../caution";
import { type CsvCommentEntry, csvCommentBlock } from "../csv";
import { compileSource } from "../engine/mechanism-source";
import type { ResolvedCondition } from "../engine/types";
import { InputError } from "../errors";
import { mechanismSource } from "./mechanisms";

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

export interface CsvMechanism {
  id: string;
  title: string;
  /** the document's own version; missing when the mechanism can no longer be loaded */
  version?: string;
}

/** A result's mechanism with its document version (built-ins and uploads are cached after the first load). */
export async function csvMechanism(m: { id: string; title: string }): Promise<CsvMechanism> {
  try {
    return { id: m.id, title: m.title, version: compileSource(await mechanismSource(m.id)).version };
  } catch {
    return { id: m.id, title: m.title };
  }
}

export interface CsvProvenance {
  /** what the table is, one line */
  table: string;
  /** the mechanism(s), with a key prefix for the sides of a comparison ("a", "b") */
  mechanisms: (CsvMechanism & { side?: string })[];
  /** entries describing the condition(s), e.g. from `conditionEntries` */
  condition: CsvCommentEntry[];
  engineVersion: string;
  /** when the stored result was computed, ISO 8601 */
  computedAt?: string;
  /** path of the result's page, e.g. /a/{id} */
  permalink: string;
  /** path of the stored result as JSON, e.g. /api/analyses/{id} */
  record?: string;
  /** entries particular to the table, after the standard ones */
  extra?: CsvCommentEntry[];
}

const round = (v: number) => (Number.isFinite(v) ? Number(v.toPrecision(6)) : v);

/** The resolved condition of one analysis: its scalar fields (rounded to 6 digits), then the pool totals. */
export function conditionEntries(c: ResolvedCondition): CsvCommentEntry[] {
  const scalars = Object.entries(c)
    .filter(([, v]) => typeof v === "number" || typeof v === "string")
    .map(([k, v]) => `${k}=${typeof v === "number" ? round(v) : v}`);
  const pools = Object.entries(c.poolTotals_cm3 ?? {}).map(([k, v]) => `${k}=${round(v)}`);
  const entries: CsvCommentEntry[] = [
    ["condition", scalars.join("; ")],
    ["pool-totals-cm3", pools.join("; ")],
  ];
  if (c.cloud) {
    const cloud = Object.entries(c.cloud)
      .filter(([, v]) => v !== null)
      .map(([k, v]) => `${k}=${typeof v === "number" ? round(v) : v}`);
    entries.push(["cloud", cloud.join("; ")]);
  }
  return entries;
}

/** The comment lines of `p`; permalinks absolute under `origin`. */
export function provenanceBlock(p: CsvProvenance, origin: string): string {
  const entries: CsvCommentEntry[] = [["table", p.table]];
  for (const m of p.mechanisms) {
    const pre = m.side ? `${m.side}-` : "";
    entries.push(
      [`${pre}mechanism-id`, m.id],
      [`${pre}mechanism-title`, m.title],
      [`${pre}mechanism-version`, m.version],
    );
  }
  entries.push(...p.condition);
  entries.push(["engine-version", p.engineVersion], ["computed-at", p.computedAt]);
  entries.push(["permalink", `${origin}${p.permalink}`]);
  if (p.record) entries.push(["record", `${origin}${p.record}`]);
  entries.push(...(p.extra ?? []));
  entries.push(["caution", CAUTION_LINE]);
  entries.push(["bare-table", "add ?comments=none to the address for the table without these # lines"]);
  return csvCommentBlock(entries);
}

/** The export as sent: the provenance block and the table, or the table alone when `comments` is false. */
export function csvExport(table: string, p: CsvProvenance, o: CsvExportOptions): string {
  return o.comments ? provenanceBlock(p, o.origin) + table : table;
}
