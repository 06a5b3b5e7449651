/**
 * The `# key: value` provenance block of a CSV export and the condition lines
 * of one analysis. Free of storage and of the request, so that the
 * command-line tool writes the same block as the routes (lib/service/csvProvenance.ts
 * adds the request's origin and the stored mechanism's version).
 */
import { CAUTION_LINE } from "../caution";
import { type CsvCommentEntry, csvCommentBlock } from "../csv";
import type { ResolvedCondition } from "../engine/types";

export interface CsvMechanism {
  id: string;
  title: string;
  /** the document's own version; missing when the mechanism can no longer be loaded */
  version?: string;
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
  /** path of the result's page, e.g. /a/{id}; absent for a result that is not stored (command line) */
  permalink?: string;
  /** path of the stored result as JSON, e.g. /api/analyses/{id} */
  record?: string;
  /** entries particular to the table, after the standard ones */
  extra?: CsvCommentEntry[];
  /** how to get the table without the block; default: the `?comments=none` address parameter */
  bareTable?: string;
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
  if (p.permalink) entries.push(["permalink", `${origin}${p.permalink}`]);
  if (p.record) entries.push(["record", `${origin}${p.record}`]);
  entries.push(...(p.extra ?? []));
  entries.push(["caution", CAUTION_LINE]);
  entries.push(["bare-table", p.bareTable ?? "add ?comments=none to the address for the table without these # lines"]);
  return csvCommentBlock(entries);
}
