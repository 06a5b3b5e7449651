/**
 * The student record cut from the instructor's: a whitelist of fields
 * (title, mechanism, instructions, sheets), never a copy-and-delete, so that
 * a field added to the instructor record later cannot leak to students.
 */
import type { InstructorAssessment, SheetQuestion, StudentAssessment } from "./types";

function question(q: SheetQuestion): SheetQuestion {
  const out: SheetQuestion = { number: q.number, kind: q.kind, text: q.text, unit: q.unit, points: q.points };
  if (q.choices) out.choices = q.choices.map((c) => ({ letter: c.letter, value: c.value, text: c.text }));
  return out;
}

export function studentView(a: InstructorAssessment): StudentAssessment {
  return {
    studentId: a.studentId,
    title: a.title,
    mechanism: { id: a.mechanism.id, title: a.mechanism.title },
    instructions: a.instructions,
    createdAt: a.createdAt,
    sheets: a.sheets.map((s) => ({
      variant: s.variant,
      conditions: s.conditions.map((c) => ({ label: c.label, value: c.value })),
      questions: s.questions.map(question),
    })),
  };
}
