/**
 * Canonical JSON of plain data: object keys sorted by code point, no
 * whitespace, arrays in order. Equal documents (YAML or JSON, any key order
 * or layout) give equal text, so it can be hashed to identify content.
 */
export function canonicalJson(value: unknown): string {
  return JSON.stringify(value === undefined ? null : value, (_key, v) => {
    if (v === null || typeof v !== "object" || Array.isArray(v)) return v;
    const sorted: Record<string, unknown> = {};
    for (const k of Object.keys(v).sort()) sorted[k] = v[k];
    return sorted;
  });
}
