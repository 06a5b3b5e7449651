/**
 * Assessments: validate the instructor's request, generate the variants with
 * the engine pool (every analysis of every variant started at once), store
 * two records under two unrelated random ids: "assessment" (everything, the
 * key included; the instructor link) and "assessment-student" (questions and
 * conditions only; the student link). Student routes read only the second.
 */
import "server-only";
import { randomBytes } from "node:crypto";
import {
  type AssessmentSpec,
  answerTemplateCsv,
  assessmentPreviewSchema,
  type ClassMarks,
  checkAgainstMechanism,
  generateAssessment,
  type InstructorAssessment,
  keyCsv,
  markClass,
  marksCsv,
  parseAssessmentSpec,
  qtiPackage,
  type StudentAssessment,
  sheetConditions,
  studentView,
} from "../assessment";
import { sortFamilies, stepsInMechanismOrder, stepText } from "../assessment/templates/cycleText";
import { parseWith } from "../engine/requestSchema";
import type { AnalysisRequest, AnalysisResult, ConditionInput } from "../engine/types";
import { ENGINE_VERSION } from "../engine/version";
import { enginePool } from "../runtime/pool";
import { newRecordId } from "../store";
import { type CsvExportOptions, type CsvProvenance, csvExport, csvMechanism } from "./csvProvenance";
import { DELETION_NOTE, deleteWithToken, newDeletionToken } from "./lifecycle";
import { mechanismDetail, mechanismSource } from "./mechanisms";
import { liveRecord, putNewAnalysis, putNewRecord } from "./records";
import { keepWithinBudget } from "./retention";

export const ASSESSMENT_KIND = "assessment";
export const STUDENT_KIND = "assessment-student";
/** Largest assessment request, bytes. */
export const MAX_ASSESSMENT_BODY = 64 * 1024;
/** Largest answers upload, bytes. */
export const MAX_ANSWERS_BODY = 1024 * 1024;

export const instructorPath = (id: string) => `/assess/i/${id}`;
export const studentPath = (id: string) => `/assess/s/${id}`;

async function analyser(mechanismId: string) {
  const src = await mechanismSource(mechanismId);
  return async (request: AnalysisRequest): Promise<AnalysisResult> =>
    (await enginePool().run({ kind: "analysis", mechanism: src, request })).result;
}

async function offerOf(mechanismId: string) {
  const m = await mechanismDetail(mechanismId);
  return {
    title: m.title,
    solvedSpecies: m.species.filter((s) => s.role === "solved").map((s) => s.id),
    pools: m.pools.map((p) => p.id),
  };
}

/** What the builder needs to offer questions: the cycles, families and species at the base condition. Nothing is stored. */
export async function previewAssessment(body: unknown) {
  const { mechanismId, condition } = parseWith(assessmentPreviewSchema, body) as {
    mechanismId: string;
    condition: ConditionInput;
  };
  const offer = await offerOf(mechanismId);
  const result = await (await analyser(mechanismId))({ mechanismId, condition });
  return {
    mechanism: result.mechanism,
    status: result.steadyState.status,
    message: result.steadyState.message,
    conditions: sheetConditions(condition, result.condition),
    families: sortFamilies(result.cycles.budget.byFamily.map((f) => f.family)),
    cycles: result.cycles.cycles.map((c) => ({
      id: c.id,
      family: c.family,
      netEquation: c.netEquation,
      steps: stepsInMechanismOrder(result, c).map(stepText),
      share: c.share,
      hasChainLength: c.chainLength !== null && Number.isFinite(c.chainLength),
      stepCount: c.steps.length,
    })),
    solvedSpecies: offer.solvedSpecies,
    pools: offer.pools,
  };
}

export async function createAssessment(body: unknown): Promise<{
  instructorId: string;
  studentId: string;
  instructorUrl: string;
  studentUrl: string;
  assessment: InstructorAssessment;
  /** shown once: DELETE /api/assessments/{instructorId} with it removes both links; on the student id, the student link alone */
  deletionToken: string;
  deletionNote: string;
}> {
  const parsed = parseAssessmentSpec(body);
  const offer = await offerOf(parsed.mechanismId);
  checkAgainstMechanism(parsed, offer);
  const spec: AssessmentSpec & { seed: number } = { ...parsed, seed: parsed.seed ?? randomBytes(4).readUInt32BE(0) };
  const generated = await generateAssessment(spec, { analyse: await analyser(spec.mechanismId) });

  await keepWithinBudget();
  const deletion = newDeletionToken();
  const createdAt = new Date().toISOString();
  const analyses: InstructorAssessment["analyses"] = [];
  for (const a of generated.analyses) {
    for (const [role, request, result] of [
      ["base", a.baseRequest, a.base],
      ["doubled-Cly", a.extraRequest, a.extra],
    ] as const) {
      if (!request || !result) continue;
      const id = await putNewAnalysis({ mechanismId: spec.mechanismId, request, result }, { createdAt });
      analyses.push({ variant: a.variant, role, analysisId: id });
    }
  }
  const instructorId = newRecordId();
  const studentId = newRecordId();
  const assessment: InstructorAssessment = {
    instructorId,
    studentId,
    title: spec.title,
    instructions: generated.instructions,
    spec,
    mechanism: generated.mechanism,
    engineVersion: ENGINE_VERSION,
    createdAt,
    variants: generated.variants,
    questions: generated.questions,
    key: generated.key,
    analyses,
    sheets: generated.sheets,
    warnings: generated.warnings,
  };
  // The instructor record (with the key) first: a student link is never live without its key.
  await putNewRecord(ASSESSMENT_KIND, assessment, { id: instructorId, createdAt, deleteHash: deletion.hash });
  await putNewRecord(STUDENT_KIND, studentView(assessment), { id: studentId, createdAt, deleteHash: deletion.hash });
  return {
    instructorId,
    studentId,
    instructorUrl: instructorPath(instructorId),
    studentUrl: studentPath(studentId),
    assessment,
    deletionToken: deletion.token,
    deletionNote: DELETION_NOTE,
  };
}

/** Deletes both links of an assessment (instructor id and its token). */
export async function deleteAssessment(id: string, token: string | null): Promise<void> {
  const life = await liveRecord(ASSESSMENT_KIND, id, "assessment");
  const studentId = (life.body as InstructorAssessment).studentId;
  await deleteWithToken(
    [
      { kind: ASSESSMENT_KIND, id },
      { kind: STUDENT_KIND, id: studentId },
    ],
    token,
    "assessment",
  );
}

/** Revokes a student link that leaked (student id and the assessment's token); the instructor link stays. */
export async function revokeStudentLink(studentId: string, token: string | null): Promise<void> {
  await deleteWithToken([{ kind: STUDENT_KIND, id: studentId }], token, "student sheet");
}

export async function getInstructorAssessment(id: string): Promise<InstructorAssessment> {
  const r = await liveRecord(ASSESSMENT_KIND, id, "assessment");
  return r.body as InstructorAssessment;
}

/** Reads only the student record: the key is not in it. */
export async function getStudentAssessment(id: string): Promise<StudentAssessment> {
  const r = await liveRecord(STUDENT_KIND, id, "student sheet");
  return r.body as StudentAssessment;
}

/** The provenance block's fields of an assessment's CSV files (the conditions differ by variant). */
async function assessmentProvenance(a: InstructorAssessment, table: string, permalink: string): Promise<CsvProvenance> {
  return {
    table,
    mechanisms: [await csvMechanism(a.mechanism)],
    condition: [
      ["assessment", a.title],
      ["condition", "one per variant: see the variant sheets (and key.json for the instructor)"],
      ["variants", a.variants.length],
    ],
    engineVersion: a.engineVersion,
    computedAt: a.createdAt,
    permalink,
  };
}

/** Marks the class's answers (the CSV may start with `#` lines); `csv` is the marks file with its provenance block. */
export async function markAssessment(
  id: string,
  csvText: string,
  o: CsvExportOptions,
): Promise<ClassMarks & { csv: string }> {
  const a = await getInstructorAssessment(id);
  const marks = markClass(csvText, a.key, { variants: a.variants.length, questions: a.questions.length });
  const p = await assessmentProvenance(
    a,
    "marks.csv: each student's marks, answers and their status",
    instructorPath(id),
  );
  return { ...marks, csv: csvExport(marksCsv(marks, a.questions.length), p, o) };
}

/** key.csv (instructor) or answers-template.csv (to fill in and upload for marking) with its provenance block; null for another file. */
export async function assessmentCsvExport(
  id: string,
  file: string,
  o: CsvExportOptions,
): Promise<{ csv: string; filename: string } | null> {
  if (file !== "key.csv" && file !== "answers-template.csv") return null;
  const a = await getInstructorAssessment(id);
  if (file === "key.csv") {
    const p = await assessmentProvenance(
      a,
      "key.csv: the computed answer of every question of every variant",
      instructorPath(id),
    );
    return { csv: csvExport(keyCsv(a), p, o), filename: `assessment-${id}-key.csv` };
  }
  const p = await assessmentProvenance(
    a,
    "answers-template.csv: one row per student to fill in (student, variant, q1, …) and upload for marking; the # lines may stay",
    studentPath(a.studentId),
  );
  return {
    csv: csvExport(answerTemplateCsv(a.questions.length, a.variants.length), p, o),
    filename: `assessment-${id}-answers.csv`,
  };
}

/** The assessment as an IMS QTI 2.1 content package: instructor link only, as its items carry the answers for marking. */
export async function assessmentQtiExport(id: string): Promise<{ zip: Uint8Array; filename: string }> {
  const a = await getInstructorAssessment(id);
  return { zip: qtiPackage(a), filename: `assessment-${id}-qti.zip` };
}
