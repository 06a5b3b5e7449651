import { describe, expect, it } from "vitest";
import { csvCommentBlock, csvTable, readCsv, withoutCsvComments } from "@/lib/csv";

describe("the comment block of a CSV export", () => {
  it("writes one `# key: value` line per entry, CRLF-ended like the table, and leaves out empty values", () => {
    const block = csvCommentBlock([
      ["table", "rates.csv: invented example"],
      ["mechanism-version", undefined],
      ["engine-version", "0.2.0"],
      ["variants", 3],
      ["note", ""],
    ]);
    expect(block).toBe("# table: rates.csv: invented example\r\n# engine-version: 0.2.0\r\n# variants: 3\r\n");
  });

  it("keeps each value on one line", () => {
    expect(csvCommentBlock([["note", "two\r\nlines\nhere "]])).toBe("# note: two lines here\r\n");
  });

  it("throws on a key that is not lower-case words joined by hyphens", () => {
    expect(() => csvCommentBlock([["Mechanism Id", "x"]])).toThrow(/invalid key "Mechanism Id"/);
    expect(() => csvCommentBlock([["a:b", "x"]])).toThrow(RangeError);
  });

  it("gives back exactly the table when a reader drops the # lines, as pandas comment='#' does", () => {
    const table = csvTable(
      ["id", "value (s-1)"],
      [
        ["J1", 1.5e-3],
        ["#2 in text", "x"],
      ],
    );
    const text =
      csvCommentBlock([
        ["table", "invented"],
        ["caution", 'a, b; c "quoted"'],
      ]) + table;
    expect(withoutCsvComments(text)).toBe(table);
    expect(readCsv(withoutCsvComments(text))).toEqual([
      ["id", "value (s-1)"],
      ["J1", "0.0015"],
      ["#2 in text", "x"],
    ]);
    // only the leading block is dropped; a byte-order mark before it is too
    expect(withoutCsvComments(`\uFEFF# a: 1\n\n${table}`)).toBe(table);
    expect(withoutCsvComments(table)).toBe(table);
  });
});
