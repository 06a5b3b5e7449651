import { describe, expect, test } from "vitest";
import {
  type KeyEntry,
  markAnswer,
  normaliseName,
  parseNumberAnswer,
  readCsv,
  withinTolerance,
  writeCsv,
} from "@/lib/assessment";

describe("parseNumberAnswer", () => {
  test("reads the ways people type numbers", () => {
    const cases: [string, number][] = [
      ["42", 42],
      [" 3.2e-7 ", 3.2e-7],
      ["3.2E-7", 3.2e-7],
      ["3.2×10^-7", 3.2e-7],
      ["3.2 x 10^-7", 3.2e-7],
      ["3.2*10^(-7)", 3.2e-7],
      ["3.2·10⁻⁷", 3.2e-7],
      ["10^5", 1e5],
      ["−12 %", -12],
      ["-12 pp", -12],
      ["+0.5", 0.5],
      [".25", 0.25],
      ["1,234", 1234],
      ["150 turnovers", 150],
    ];
    for (const [s, v] of cases) expect(parseNumberAnswer(s), s).toBe(v);
  });

  test("refuses what is not a number", () => {
    for (const s of ["", "abc", "1.2.3", "3,2", "1e", "ClOx", "NaN", "Infinity", "1/2"])
      expect(parseNumberAnswer(s), s).toBeNull();
  });
});

describe("normaliseName", () => {
  test("ignores case, spaces, arrow style and brackets around a letter", () => {
    expect(normaliseName(" ClOx ")).toBe("clox");
    expect(normaliseName("ClO + O → Cl + O2")).toBe(normaliseName("clo+o->cl+o2"));
    expect(normaliseName("ClO + O = Cl + O2")).toBe("clo+o->cl+o2");
    expect(normaliseName("(b)")).toBe("b");
    expect(normaliseName("b)")).toBe("b");
    expect(normaliseName("B.")).toBe("b");
    expect(normaliseName("ClOx–NOx")).toBe("clox-nox");
  });
});

const numeric = (value: number, tolerance: KeyEntry["tolerance"]): KeyEntry => ({
  variant: 1,
  question: 1,
  kind: "chain-length",
  value,
  display: String(value),
  unit: "turnovers",
  tolerance,
  accepted: [],
  points: 2,
});

describe("withinTolerance and markAnswer", () => {
  test("accept a number on the edge of a relative tolerance and refuse one just beyond", () => {
    const t = { kind: "relative", rel: 0.1 } as const;
    expect(withinTolerance(110, 100, t)).toBe(true);
    expect(withinTolerance(90, 100, t)).toBe(true);
    expect(withinTolerance(110.01, 100, t)).toBe(false);
    expect(withinTolerance(-110, -100, t)).toBe(true);
  });

  test("accept a number within an absolute tolerance in the question's unit", () => {
    const t = { kind: "absolute", abs: 2 } as const;
    expect(withinTolerance(-3, -1, t)).toBe(true);
    expect(withinTolerance(1.01, -1, t)).toBe(false);
  });

  test("give the question's points for a correct number and none otherwise, saying why", () => {
    const e = numeric(150, { kind: "relative", rel: 0.1 });
    expect(markAnswer(e, "1.6e2")).toMatchObject({ status: "correct", mark: 2 });
    expect(markAnswer(e, "170")).toMatchObject({ status: "incorrect", mark: 0 });
    expect(markAnswer(e, "  ")).toMatchObject({ status: "blank", mark: 0 });
    const u = markAnswer(e, "lots");
    expect(u).toMatchObject({ status: "unreadable", mark: 0 });
    expect(u.note).toContain('"lots" is not a number');
  });

  test("mark a named answer by the canonical value, the letter or the equation", () => {
    const e: KeyEntry = {
      ...numeric(0, { kind: "exact" }),
      kind: "rate-limiting-step",
      value: "R4",
      accepted: ["b", "ClO + O -> Cl + O2"],
    };
    for (const g of ["R4", "r4", "b", "(b)", "ClO + O → Cl + O2"]) expect(markAnswer(e, g).status, g).toBe("correct");
    for (const g of ["a", "R3", "Cl + O3 -> ClO + O2"]) expect(markAnswer(e, g).status, g).toBe("incorrect");
  });
});

describe("CSV", () => {
  test("round-trips fields with commas, quotes and line breaks", () => {
    const rows = [
      ["a,b", 'say "hi"', "two\nlines"],
      ["", "x", "3.5"],
    ];
    const text = writeCsv(["h1", "h2", "h3"], rows);
    expect(readCsv(text)).toEqual([["h1", "h2", "h3"], ...rows]);
  });

  test("reads LF files, a byte-order mark and trailing blank lines as spreadsheets write them", () => {
    expect(readCsv("\ufeffstudent,variant\nAda,1\n\n\n")).toEqual([
      ["student", "variant"],
      ["Ada", "1"],
    ]);
  });

  test("throws if a quoted field is never closed, naming its row", () => {
    expect(() => readCsv('a,b\n1,"open\n2,3')).toThrow(/row 2: a quoted field is never closed/);
  });
});
