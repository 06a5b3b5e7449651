/**
 * Types of the assessment builder: what an instructor asks for, the variants
 * drawn from it, the answer key, the student-facing sheets (which never carry
 * an answer) and the marks of a class.
 */
import type { AnalysisResult, ConditionInput } from "../engine/types";

/** The question kinds the builder offers (one template file each in ./templates). */
export type QuestionKind =
  | "dominant-family"
  | "rate-limiting-step"
  | "chain-length"
  | "species-ratio"
  | "clox-share-change"
  | "ozone-per-catalyst";

/** How close a student's answer must be to the key. */
export type Tolerance =
  /** |given − key| ≤ rel·|key| (rel a fraction, e.g. 0.05 for 5 %) */
  | { kind: "relative"; rel: number }
  /** |given − key| ≤ abs, in the question's unit */
  | { kind: "absolute"; abs: number }
  /** a named answer (family, reaction step) that must match after normalisation */
  | { kind: "exact" };

/** A closed interval a variant draws a value from, uniformly, then rounds to `step`. */
export interface Range {
  /** lower end, in the unit of the field */
  min: number;
  /** upper end, in the unit of the field */
  max: number;
  /** rounding grain in the unit of the field; default per field (see drawCondition DEFAULTS) */
  step?: number;
}

/** The condition fields a variant may draw; pool totals as mixing ratios of atoms (mol/mol). */
export interface ConditionRanges {
  /** km */
  altitude_km?: Range;
  /** degrees north */
  latitude_deg?: Range;
  /** h */
  localSolarTime_h?: Range;
  /** degrees */
  zenith_deg?: Range;
  /** K */
  T_K?: Range;
  /** factor on every J, dimensionless */
  jScale?: Range;
  /** mixing ratio of the pool's atoms by pool id (e.g. Cly), mol/mol */
  poolTotals?: Record<string, Range>;
}

/** One question as the instructor asks for it. Parameters depend on the kind. */
export interface QuestionSpec {
  kind: QuestionKind;
  /** stable cycle id (CatalyticCycle.id), for the cycle questions */
  cycleId?: string;
  /** numerator species id, for species-ratio */
  speciesA?: string;
  /** denominator species id, for species-ratio */
  speciesB?: string;
  /** tolerance; default the template's */
  tolerance?: Tolerance;
  /** marks for a correct answer; default 1 */
  points?: number;
}

/** What POST /api/assessments takes. */
export interface AssessmentSpec {
  title: string;
  mechanismId: string;
  /** unsigned 32-bit seed; default: drawn at random and recorded */
  seed?: number;
  /** number of variants, 1–40 */
  variants: number;
  /** the base condition every variant starts from */
  base: ConditionInput;
  /** the fields each variant draws */
  ranges?: ConditionRanges;
  questions: QuestionSpec[];
  /** line of instructions printed at the top of each sheet; default a short standard text */
  instructions?: string;
}

/** One variant's conditions, reproducible from its seed. */
export interface Variant {
  /** 1-based */
  number: number;
  /** unsigned 32-bit seed derived from the assessment seed, the number and the attempt */
  seed: number;
  /** redraws needed before every question had an answer (0 = first draw) */
  attempt: number;
  condition: ConditionInput;
}

/** A choice printed on a sheet: (a) ClOx … */
export interface Choice {
  /** "a", "b", … */
  letter: string;
  /** the value a student may also write instead of the letter */
  value: string;
  /** text printed on the sheet */
  text: string;
}

/** A question as printed for one variant: no answer in it. */
export interface SheetQuestion {
  /** 1-based */
  number: number;
  kind: QuestionKind;
  text: string;
  /** unit the answer is asked in; "" for a named answer */
  unit: string;
  choices?: Choice[];
  points: number;
}

/** The printed conditions of a variant. */
export interface SheetCondition {
  label: string;
  value: string;
}

export interface StudentSheet {
  variant: number;
  conditions: SheetCondition[];
  questions: SheetQuestion[];
}

/** The record behind the student link: questions and conditions only. */
export interface StudentAssessment {
  studentId: string;
  title: string;
  mechanism: { id: string; title: string };
  instructions: string;
  createdAt: string;
  sheets: StudentSheet[];
}

/** A question of the assessment as the instructor sees it, independent of the variant. */
export interface QuestionInfo {
  /** 1-based */
  number: number;
  kind: QuestionKind;
  title: string;
  /** the parameters: cycle, species */
  detail: string;
  unit: string;
  tolerance: Tolerance;
  points: number;
}

/** One entry of the answer key. */
export interface KeyEntry {
  variant: number;
  question: number;
  kind: QuestionKind;
  /** the number, or the canonical name (family id, reaction id) */
  value: number | string;
  /** as printed on the key: significant figures, or "(b) ClO + O -> Cl + O2" */
  display: string;
  unit: string;
  tolerance: Tolerance;
  /** other spellings accepted for a named answer (the letter, the equation) */
  accepted: string[];
  points: number;
}

/** The record behind the instructor link: everything, the key included. */
export interface InstructorAssessment {
  instructorId: string;
  studentId: string;
  title: string;
  instructions: string;
  spec: AssessmentSpec & { seed: number };
  mechanism: { id: string; title: string };
  engineVersion: string;
  createdAt: string;
  variants: Variant[];
  questions: QuestionInfo[];
  key: KeyEntry[];
  /** stored analyses behind the key, by variant: base and (if any) doubled-chlorine */
  analyses: { variant: number; role: "base" | "doubled-Cly"; analysisId: string }[];
  /** the student sheets as the student link shows them */
  sheets: StudentSheet[];
  warnings: string[];
}

export type MarkStatus = "correct" | "incorrect" | "blank" | "unreadable";

export interface MarkCell {
  question: number;
  given: string;
  status: MarkStatus;
  mark: number;
  /** why unreadable or incorrect, for the instructor */
  note?: string;
}

export interface StudentMarks {
  /** 1-based row of the uploaded file (the header is row 1) */
  row: number;
  student: string;
  variant: number;
  cells: MarkCell[];
  total: number;
  outOf: number;
}

export interface QuestionSummary {
  question: number;
  correct: number;
  answered: number;
  students: number;
  /** mean mark, in marks */
  meanMark: number;
}

export interface ClassMarks {
  students: StudentMarks[];
  questions: QuestionSummary[];
  warnings: string[];
}

/** What a template sees when it writes a question for one variant. */
export interface TemplateContext {
  question: QuestionSpec;
  /** the variant's condition as drawn */
  condition: ConditionInput;
  /** the analysis at the variant's condition */
  base: AnalysisResult;
  /** the second analysis the template asked for (e.g. doubled chlorine), if any */
  extra?: AnalysisResult;
  /** families offered as choices, the same list on every variant */
  families: string[];
}

/** A question written for one variant, with its answer: split into the sheet and the key. */
export type BuiltQuestion =
  | {
      ok: true;
      text: string;
      choices?: Choice[];
      value: number | string;
      /** other spellings accepted for a named answer */
      accepted: string[];
    }
  /** the question has no sound answer at this variant (cycle absent, tie, no steady state): redraw */
  | { ok: false; problem: string };

export interface QuestionTemplate {
  kind: QuestionKind;
  /** short name in the builder */
  title: string;
  /** one line of help in the builder */
  summary: string;
  /** unit of the answer; "" for a named answer */
  unit: string;
  defaultTolerance: Tolerance;
  /** which parameters the instructor must give */
  needs: { cycle?: boolean; species?: boolean; pool?: string };
  /** the condition of a second analysis the answer needs, from the variant's and its base result */
  extraCondition?: (condition: ConditionInput, base: AnalysisResult) => ConditionInput;
  build: (ctx: TemplateContext) => BuiltQuestion;
}
