/**
 * CSV reading after RFC 4180: fields with a comma, quote or line break in
 * double quotes, quotes doubled; LF or CRLF line ends, a leading byte-order
 * mark and trailing blank lines accepted (as spreadsheets write them).
 */
import { InputError } from "../errors";

/** Rows of cells; throws an InputError naming the line of an unclosed quote. */
export function readCsv(text: string): string[][] {
  const s = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const rows: string[][] = [];
  let row: string[] = [];
  let field = "";
  let quoted = false;
  let line = 1;
  let quoteLine = 0;
  for (let i = 0; i < s.length; i++) {
    const c = s[i];
    if (quoted) {
      if (c === '"') {
        if (s[i + 1] === '"') {
          field += '"';
          i++;
        } else quoted = false;
      } else {
        if (c === "\n") line++;
        field += c;
      }
    } else if (c === '"' && field === "") {
      quoted = true;
      quoteLine = line;
    } else if (c === ",") {
      row.push(field);
      field = "";
    } else if (c === "\n" || c === "\r") {
      if (c === "\r" && s[i + 1] === "\n") i++;
      row.push(field);
      rows.push(row);
      row = [];
      field = "";
      line++;
    } else field += c;
  }
  if (quoted) throw new InputError(`row ${quoteLine}`, "a quoted field is never closed", "invalid-csv");
  if (field !== "" || row.length > 0) {
    row.push(field);
    rows.push(row);
  }
  while (rows.length > 0 && rows[rows.length - 1].every((f) => f.trim() === "")) rows.pop();
  return rows;
}
