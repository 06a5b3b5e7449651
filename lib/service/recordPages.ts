/**
 * The pages that show one stored thing, and whether the thing behind a page
 * address was deleted or has expired. proxy.ts asks before the page renders and
 * answers a deleted one with 410 Gone and the page app/gone/page.tsx, since an
 * App Router page can only end in 404 (`notFound()`), a redirect or an error.
 * The kinds are the stored kinds of lib/service (analyses, profiles,
 * assessments, runs; test/service/recordPages.test.ts checks them) written out
 * here, so that the proxy does not load the services that compute.
 */
import "server-only";
import { getStore, ID_PATTERN, type RecordRef } from "../store";

/** What a gone page says was deleted: the keys of GONE_WHAT, passed as `?what=`. */
export const GONE_WHAT = {
  analysis: "stored analysis",
  profile: "profile sweep",
  comparison: "profile comparison",
  assessment: "assessment (instructor link)",
  student: "assessment sheets (student link)",
  run: "run",
  mechanism: "uploaded mechanism",
} as const;
export type GoneWhat = keyof typeof GONE_WHAT;

/** The address of the page shown for a deleted record (proxy.ts rewrites to it with status 410). */
export const GONE_PATH = "/gone";

const PAGES: readonly { pattern: RegExp; kind: string; what: GoneWhat }[] = [
  { pattern: /^\/a\/([^/]+)\/?$/, kind: "analysis", what: "analysis" },
  { pattern: /^\/profiles\/([^/]+)\/?$/, kind: "profile", what: "profile" },
  { pattern: /^\/compare\/([^/]+)\/?$/, kind: "comparison", what: "comparison" },
  { pattern: /^\/assess\/i\/([^/]+)\/?$/, kind: "assessment", what: "assessment" },
  { pattern: /^\/assess\/s\/([^/]+)\/?$/, kind: "assessment-student", what: "student" },
  { pattern: /^\/runs\/([^/]+)(?:\/at\/[^/]+)?\/?$/, kind: "run", what: "run" },
];

/** The stored thing a page address shows, or null (not a record page, or an id we never hand out). */
export function recordOfPage(pathname: string, search: URLSearchParams): (RecordRef & { what: GoneWhat }) | null {
  for (const p of PAGES) {
    const m = p.pattern.exec(pathname);
    if (!m) continue;
    const id = safeDecode(m[1]);
    return id !== null && ID_PATTERN.test(id) ? { kind: p.kind, id, what: p.what } : null;
  }
  // the explorer opened on an upload: /explore?m=u-…
  const m = search.get("m");
  if (/^\/explore\/?$/.test(pathname) && m && /^u-/.test(m) && ID_PATTERN.test(m)) {
    return { kind: "mechanism", id: m, what: "mechanism" };
  }
  return null;
}

/** What the page at this address showed, when its record was deleted or has expired; else null. */
export async function goneRecordOfPage(pathname: string, search: URLSearchParams): Promise<GoneWhat | null> {
  const ref = recordOfPage(pathname, search);
  if (!ref) return null;
  const life = await getStore().lifecycle(ref);
  return life?.deletedAt ? ref.what : null;
}

function safeDecode(s: string): string | null {
  try {
    return decodeURIComponent(s);
  } catch {
    return null;
  }
}
