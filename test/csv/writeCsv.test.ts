import { describe, expect, it } from "vitest";
import { csvCell, csvTable, readCsv } from "@/lib/csv";

describe("CSV writing (RFC 4180)", () => {
  it("quotes cells with commas, quotes or line breaks and doubles inner quotes", () => {
    expect(csvCell("a,b")).toBe('"a,b"');
    expect(csvCell('say "hi"')).toBe('"say ""hi"""');
    expect(csvCell("two\nlines")).toBe('"two\nlines"');
    expect(csvCell("plain")).toBe("plain");
  });

  it("writes numbers in their shortest round-trip form, so nothing is lost", () => {
    for (const v of [1.234567890123e-17, 6.02214076e23, -3.5e-9, 0.1 + 0.2]) expect(Number(csvCell(v))).toBe(v);
    expect(csvCell(null)).toBe("");
    expect(csvCell(undefined)).toBe("");
  });

  it("writes text that a spreadsheet would run as a formula as text", () => {
    expect(csvCell("=HYPERLINK(1)")).toBe("'=HYPERLINK(1)");
    expect(csvCell("+1+2")).toBe("'+1+2");
    expect(csvCell("-5")).toBe("-5");
    expect(csvCell("-3.2e-7")).toBe("-3.2e-7");
    expect(csvCell("@x")).toBe("'@x");
    expect(csvCell(-2)).toBe("-2");
  });

  it("ends every row with CRLF", () => {
    expect(csvTable(["a", "b"], [[1, "x"]])).toBe("a,b\r\n1,x\r\n");
  });
});

describe("CSV reading (RFC 4180)", () => {
  it("reads what it writes, including quotes, commas and line breaks inside fields", () => {
    const rows = [
      ["a", "b,c"],
      ['say "hi"', "two\nlines"],
    ];
    expect(readCsv(csvTable(rows[0], [rows[1]]))).toEqual(rows);
  });

  it("accepts a byte-order mark, LF line ends and trailing blank lines", () => {
    expect(readCsv("\ufeffx,y\n1,2\n\n")).toEqual([
      ["x", "y"],
      ["1", "2"],
    ]);
  });

  it("throws if a quoted field is never closed, naming its row", () => {
    expect(() => readCsv('a,b\n"open,2\n')).toThrow(/row 2/);
  });
});
