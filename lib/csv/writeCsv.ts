/**
 * CSV writing for every export: RFC 4180 quoting, CRLF line ends, numbers in
 * their shortest round-trip form (nothing lost), and text that a spreadsheet
 * would run as a formula (=, +, -, @, tab, CR first, and not a plain number
 * such as "-5") written as text with a leading apostrophe.
 */

function isPlainNumber(s: string): boolean {
  return /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(s);
}

export function csvCell(v: unknown): string {
  if (v === null || v === undefined) return "";
  let s = String(v);
  if (typeof v === "string" && /^[=+\-@\t\r]/.test(s) && !isPlainNumber(s)) s = `'${s}`;
  return /[",\n\r]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

export function csvRow(cells: readonly unknown[]): string {
  return cells.map(csvCell).join(",");
}

/** A header row and data rows as one CSV text ending in CRLF. */
export function csvTable(header: readonly string[], rows: readonly (readonly unknown[])[]): string {
  return `${[header, ...rows].map(csvRow).join("\r\n")}\r\n`;
}
