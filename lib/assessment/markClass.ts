/**
 * Marking a class from an uploaded CSV of answers: a header row with the
 * columns `student`, `variant` and `q1` … `qN` (any order, case ignored),
 * then one row per student. Structural problems (a missing or unknown
 * column, a variant that does not exist) throw, naming the row and column;
 * an answer that cannot be read gets no mark and a warning.
 */
import { InputError } from "../errors";
import { readCsv } from "./csv";
import { markAnswer } from "./markAnswer";
import type { ClassMarks, KeyEntry, QuestionSummary, StudentMarks } from "./types";

export const LIMITS = {
  /** student rows per upload */
  maxStudents: 2000,
};

function bad(row: number, column: string, message: string): InputError {
  return new InputError(`row ${row}, column ${column}`, message, "invalid-csv");
}

export function markClass(
  csvText: string,
  key: KeyEntry[],
  assessment: { variants: number; questions: number },
): ClassMarks {
  const all = readCsv(csvText);
  // leading `# key: value` lines (the answer template's provenance block) are skipped; row numbers stay the file's
  let skip = 0;
  while (skip < all.length && (all[skip][0] ?? "").trimStart().startsWith("#")) skip++;
  const rows = all.slice(skip);
  if (rows.length === 0)
    throw new InputError(
      `row ${skip + 1}`,
      "the file is empty: expected a header row student,variant,q1,…",
      "invalid-csv",
    );
  const header = rows[0].map((h) => h.trim().toLowerCase());
  const col = new Map<string, number>();
  header.forEach((h, i) => {
    const name = h || `(column ${i + 1})`;
    if (h !== "student" && h !== "variant" && !/^q[1-9]\d*$/.test(h))
      throw bad(
        skip + 1,
        name,
        `unknown column "${rows[0][i]}"; expected student, variant and q1–q${assessment.questions}`,
      );
    if (col.has(h)) throw bad(skip + 1, name, `the column ${h} appears twice`);
    const q = h.startsWith("q") ? Number(h.slice(1)) : 0;
    if (q > assessment.questions)
      throw bad(skip + 1, name, `there is no question ${q}; this assessment has ${assessment.questions}`);
    col.set(h, i);
  });
  for (const required of ["student", "variant", ...Array.from({ length: assessment.questions }, (_, i) => `q${i + 1}`)])
    if (!col.has(required)) throw bad(skip + 1, required, `the column ${required} is missing`);
  if (rows.length - 1 > LIMITS.maxStudents)
    throw new InputError(
      `row ${skip + LIMITS.maxStudents + 2}`,
      `at most ${LIMITS.maxStudents} students per file`,
      "invalid-csv",
    );

  const keyOf = new Map(key.map((k) => [`${k.variant}/${k.question}`, k]));
  const warnings: string[] = [];
  const seen = new Map<string, number>();
  const students: StudentMarks[] = [];
  rows.slice(1).forEach((cells, i) => {
    const row = skip + i + 2;
    if (cells.every((c) => c.trim() === "")) return;
    if (cells.length > header.length)
      throw bad(row, `${cells.length}`, `this row has ${cells.length} cells but the header has ${header.length}`);
    const at = (name: string) => (cells[col.get(name) as number] ?? "").trim();
    const student = at("student");
    if (!student) throw bad(row, "student", "the student name or id is empty");
    const vText = at("variant");
    const variant = Number(vText);
    if (!/^\d+$/.test(vText) || variant < 1 || variant > assessment.variants)
      throw bad(row, "variant", `"${vText}" is not a variant of this assessment (1–${assessment.variants})`);
    if (seen.has(student)) warnings.push(`row ${row}: student "${student}" also appears on row ${seen.get(student)}`);
    else seen.set(student, row);
    const marks = Array.from({ length: assessment.questions }, (_, q) => {
      const entry = keyOf.get(`${variant}/${q + 1}`);
      if (!entry) throw new Error(`markClass: the key has no entry for variant ${variant}, question ${q + 1}`);
      const cell = markAnswer(entry, at(`q${q + 1}`));
      if (cell.status === "unreadable") warnings.push(`row ${row}, column q${q + 1}: ${cell.note}; no mark given`);
      return cell;
    });
    const outOf = key.filter((k) => k.variant === variant).reduce((s, k) => s + k.points, 0);
    students.push({ row, student, variant, cells: marks, total: marks.reduce((s, c) => s + c.mark, 0), outOf });
  });

  const questions: QuestionSummary[] = Array.from({ length: assessment.questions }, (_, q) => {
    const cells = students.map((s) => s.cells[q]);
    return {
      question: q + 1,
      correct: cells.filter((c) => c.status === "correct").length,
      answered: cells.filter((c) => c.status !== "blank").length,
      students: cells.length,
      meanMark: cells.length ? cells.reduce((s, c) => s + c.mark, 0) / cells.length : 0,
    };
  });
  return { students, questions, warnings };
}
