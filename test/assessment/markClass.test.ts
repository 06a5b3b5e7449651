import { describe, expect, test } from "vitest";
import { type KeyEntry, markClass, marksCsv, readCsv } from "@/lib/assessment";

// A hand-made key and answer file (invented values); the expected marks below are worked by hand.
const entry = (variant: number, question: number, value: number | string, extra: Partial<KeyEntry> = {}): KeyEntry => ({
  variant,
  question,
  kind: typeof value === "number" ? "chain-length" : "dominant-family",
  value,
  display: String(value),
  unit: typeof value === "number" ? "turnovers" : "",
  tolerance: typeof value === "number" ? { kind: "relative", rel: 0.1 } : { kind: "exact" },
  accepted: [],
  points: 1,
  ...extra,
});

const key: KeyEntry[] = [
  entry(1, 1, "ClOx", { accepted: ["d"] }),
  entry(1, 2, 150),
  entry(1, 3, -4.2, { kind: "clox-share-change", tolerance: { kind: "absolute", abs: 2 }, points: 2 }),
  entry(2, 1, "NOx", { accepted: ["c"] }),
  entry(2, 2, 80),
  entry(2, 3, 1.5, { kind: "clox-share-change", tolerance: { kind: "absolute", abs: 2 }, points: 2 }),
];
const shape = { variants: 2, questions: 3 };

const answers = [
  "student,variant,q1,q2,q3",
  "Ada,1,ClOx,160,-5", // 1 + 1 (|160−150| = 10 ≤ 15) + 2 (|−5+4.2| = 0.8 ≤ 2) = 4
  "Ben,1,d,170,-7", // 1 (letter d) + 0 (20 > 15) + 0 (2.8 > 2) = 1
  'Cy,2,"NOx",7.9e1,', // 1 + 1 (|79−80| = 1 ≤ 8) + 0 (blank) = 2
  "Dee,2,ClOx,eighty,3.4", // 0 + 0 (unreadable) + 2 (|3.4−1.5| = 1.9 ≤ 2) = 2
].join("\n");

describe("markClass", () => {
  test("marks a hand-made answer file with the stored tolerances, per question and per student", () => {
    const m = markClass(answers, key, shape);
    expect(m.students.map((s) => [s.student, s.variant, s.total, s.outOf])).toEqual([
      ["Ada", 1, 4, 4],
      ["Ben", 1, 1, 4],
      ["Cy", 2, 2, 4],
      ["Dee", 2, 2, 4],
    ]);
    expect(m.students[2].cells.map((c) => c.status)).toEqual(["correct", "correct", "blank"]);
    expect(m.students[3].cells.map((c) => c.status)).toEqual(["incorrect", "unreadable", "correct"]);
    expect(m.questions.map((q) => [q.question, q.correct, q.answered])).toEqual([
      [1, 3, 4],
      [2, 2, 4],
      [3, 2, 3],
    ]);
    expect(m.questions[2].meanMark).toBe(1);
    expect(m.warnings).toEqual(['row 5, column q2: "eighty" is not a number; no mark given']);
  });

  test("skips the # lines a downloaded answer template starts with, and still names the file's own rows", () => {
    const withBlock = `# table: answers-template.csv: invented\r\n# caution: research and teaching tool\r\n${answers}`;
    const m = markClass(withBlock, key, shape);
    expect(m.students.map((s) => s.total)).toEqual([4, 1, 2, 2]);
    // "eighty" is on line 7 of the file: two # lines, the header, then Ada, Ben, Cy, Dee
    expect(m.warnings).toEqual(['row 7, column q2: "eighty" is not a number; no mark given']);
    expect(() => markClass("# only a comment\nstudent,variant,q1,q2\n", key, shape)).toThrow(/row 2, column q3/);
  });

  test("accepts the columns in any order and in any case", () => {
    const m = markClass("Q3,Variant,q2,STUDENT,q1\n-5,1,160,Ada,ClOx\n", key, shape);
    expect(m.students[0].total).toBe(4);
  });

  test("warns when a student appears twice", () => {
    const m = markClass("student,variant,q1,q2,q3\nAda,1,ClOx,150,-4\nAda,2,NOx,80,1\n", key, shape);
    expect(m.warnings).toEqual(['row 3: student "Ada" also appears on row 2']);
  });

  test("writes the marks as CSV with one row per student, the total and the given answers", () => {
    const m = markClass(answers, key, shape);
    const rows = readCsv(marksCsv(m, 3));
    expect(rows[0]).toEqual([
      "student",
      "variant",
      "q1",
      "q2",
      "q3",
      "total",
      "out_of",
      "q1_answer",
      "q2_answer",
      "q3_answer",
      "q1_status",
      "q2_status",
      "q3_status",
    ]);
    expect(rows[1]).toEqual([
      "Ada",
      "1",
      "1",
      "1",
      "2",
      "4",
      "4",
      "ClOx",
      "160",
      "-5",
      "correct",
      "correct",
      "correct",
    ]);
    expect(rows).toHaveLength(5);
  });

  test("throws if the file is malformed, naming the row and the column", () => {
    const cases: [string, RegExp][] = [
      ["", /row 1: the file is empty/],
      ["student,variant,q1,q2\nAda,1,a,1\n", /row 1, column q3: the column q3 is missing/],
      ["student,variant,q1,q2,q3,q4\n", /row 1, column q4: there is no question 4/],
      ["student,variant,q1,q2,q3,mark\n", /row 1, column mark: unknown column "mark"/],
      ["student,variant,q1,q1,q2,q3\n", /row 1, column q1: the column q1 appears twice/],
      [
        "student,variant,q1,q2,q3\nAda,3,a,1,1\n",
        /row 2, column variant: "3" is not a variant of this assessment \(1–2\)/,
      ],
      ["student,variant,q1,q2,q3\nAda,one,a,1,1\n", /row 2, column variant/],
      ["student,variant,q1,q2,q3\n,1,a,1,1\n", /row 2, column student: the student name or id is empty/],
      ["student,variant,q1,q2,q3\nAda,1,a,1,1,9\n", /row 2, column 6: this row has 6 cells but the header has 5/],
    ];
    for (const [text, re] of cases) expect(() => markClass(text, key, shape), text).toThrow(re);
  });
});
