/**
 * The files an instructor downloads: the answer key as CSV and JSON, a blank
 * answer sheet for the class, and the marks as CSV. Numbers in the key CSV
 * are full precision (for spreadsheets) beside the rounded display.
 */
import { writeCsv } from "./csv";
import { formatTolerance } from "./formatKey";
import type { ClassMarks, InstructorAssessment } from "./types";

type KeySource = Pick<
  InstructorAssessment,
  "title" | "spec" | "mechanism" | "engineVersion" | "questions" | "variants" | "key"
>;

export function keyCsv(a: KeySource): string {
  return writeCsv(
    [
      "variant",
      "variant_seed",
      "question",
      "kind",
      "answer",
      "answer_display",
      "unit",
      "tolerance",
      "accepted",
      "points",
    ],
    a.key.map((k) => [
      k.variant,
      a.variants.find((v) => v.number === k.variant)?.seed,
      k.question,
      k.kind,
      typeof k.value === "number" ? k.value.toPrecision(8) : k.value,
      k.display,
      k.unit,
      formatTolerance(k.tolerance, k.unit),
      k.accepted.join(" | "),
      k.points,
    ]),
  );
}

export function keyJson(a: KeySource) {
  return {
    title: a.title,
    mechanism: a.mechanism,
    engineVersion: a.engineVersion,
    seed: a.spec.seed,
    questions: a.questions,
    variants: a.variants.map((v) => ({
      ...v,
      answers: a.key
        .filter((k) => k.variant === v.number)
        .map(({ question, kind, value, display, unit, tolerance, accepted, points }) => ({
          question,
          kind,
          value,
          display,
          unit,
          tolerance,
          accepted,
          points,
        })),
    })),
  };
}

/** A file to fill in: the header and one empty row per variant. */
export function answerTemplateCsv(questions: number, variants: number): string {
  const qs = Array.from({ length: questions }, (_, i) => `q${i + 1}`);
  return writeCsv(
    ["student", "variant", ...qs],
    Array.from({ length: variants }, (_, v) => ["", v + 1, ...qs.map(() => "")]),
  );
}

export function marksCsv(m: ClassMarks, questions: number): string {
  const qs = Array.from({ length: questions }, (_, i) => `q${i + 1}`);
  return writeCsv(
    ["student", "variant", ...qs, "total", "out_of", ...qs.map((q) => `${q}_answer`), ...qs.map((q) => `${q}_status`)],
    m.students.map((s) => [
      s.student,
      s.variant,
      ...s.cells.map((c) => c.mark),
      s.total,
      s.outOf,
      ...s.cells.map((c) => c.given),
      ...s.cells.map((c) => c.status),
    ]),
  );
}
