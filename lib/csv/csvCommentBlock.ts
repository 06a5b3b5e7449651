/**
 * The block of `# key: value` comment lines that starts every CSV export
 * (DEVELOPERS.md, "CSV exports"). Readers skip it with pandas
 * `read_csv(..., comment="#")` or R `read.csv(..., comment.char = "#")`.
 * Keys are lower-case words joined by hyphens; values are one line each
 * (line breaks become spaces); entries without a value are left out.
 */

export type CsvCommentEntry = readonly [key: string, value: string | number | undefined | null];

const KEY = /^[a-z][a-z0-9-]*$/;

/** The comment lines, each ending in CRLF like the table after them; "" for no entries. */
export function csvCommentBlock(entries: readonly CsvCommentEntry[]): string {
  let out = "";
  for (const [key, value] of entries) {
    if (!KEY.test(key)) throw new RangeError(`csvCommentBlock: invalid key "${key}" (lower-case words and hyphens)`);
    if (value === undefined || value === null || value === "") continue;
    out += `# ${key}: ${String(value)
      .replace(/[\r\n]+/g, " ")
      .trim()}\r\n`;
  }
  return out;
}

/** Drops the leading `#` lines (and blank lines among them) of a CSV text: what `comment="#"` readers see. */
export function withoutCsvComments(text: string): string {
  const lines = text.replace(/^\uFEFF/, "").split(/(?<=\n)/);
  let i = 0;
  while (i < lines.length && (lines[i].trimStart().startsWith("#") || lines[i].trim() === "")) i++;
  return lines.slice(i).join("");
}
