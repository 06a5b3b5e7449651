import { describe, expect, it } from "vitest";
import { csvCell, csvTable } from "@/lib/csv";

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
    expect(csvCell("+1")).toBe("'+1");
    expect(csvCell("@x")).toBe("'@x");
    expect(csvCell(-2)).toBe("-2");
  });

  it("ends every row with CRLF", () => {
    expect(csvTable(["a", "b"], [[1, "x"]])).toBe("a,b\r\n1,x\r\n");
  });
});
