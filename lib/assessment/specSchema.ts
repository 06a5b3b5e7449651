/**
 * Schema of an assessment request (zod): the base condition reuses the
 * analysis condition schema, ranges are checked against the same physical
 * bounds, and each question kind must carry the parameters its template needs.
 */
import { z } from "zod";
import { conditionSchema, parseWith } from "../engine/requestSchema";
import { InputError } from "../errors";
import { QUESTION_TEMPLATES, templateOf } from "./templates/registry";
import type { AssessmentSpec, QuestionKind } from "./types";

export const LIMITS = {
  /** variants per assessment */
  maxVariants: 40,
  /** questions per assessment */
  maxQuestions: 12,
  /** characters of the title */
  maxTitle: 120,
  /** characters of the instructions */
  maxInstructions: 600,
  /** marks per question */
  maxPoints: 100,
};

const finite = z.number().refine(Number.isFinite, "expected a finite number");

/** Physical bounds of each ranged field, as in the analysis request schema. */
const BOUNDS: Record<string, [number, number]> = {
  altitude_km: [0, 86],
  latitude_deg: [-90, 90],
  localSolarTime_h: [0, 24],
  zenith_deg: [0, 180],
  T_K: [150, 350],
  jScale: [0, 100],
  pool: [0, 1],
};

function rangeSchema(field: string) {
  const [lo, hi] = BOUNDS[field];
  return z
    .object({ min: finite, max: finite, step: finite.gt(0, "expected a positive step").optional() })
    .strict()
    .refine((r) => r.min <= r.max, "expected min ≤ max")
    .refine((r) => r.min >= lo && r.max <= hi, `expected a range within ${lo}–${hi}`);
}

const toleranceSchema = z.discriminatedUnion("kind", [
  z
    .object({
      kind: z.literal("relative"),
      rel: finite.gt(0, "expected a fraction in (0, 1]").max(1, "expected a fraction in (0, 1]"),
    })
    .strict(),
  z.object({ kind: z.literal("absolute"), abs: finite.min(0, "expected a non-negative number") }).strict(),
  z.object({ kind: z.literal("exact") }).strict(),
]);

const speciesId = z.string().regex(/^[A-Za-z0-9()_+\-*]{1,40}$/, "expected a species id");

const questionSchema = z
  .object({
    kind: z.enum(QUESTION_TEMPLATES.map((t) => t.kind) as [QuestionKind, ...QuestionKind[]]),
    cycleId: z.string().min(1).max(400).optional(),
    speciesA: speciesId.optional(),
    speciesB: speciesId.optional(),
    tolerance: toleranceSchema.optional(),
    points: finite
      .gt(0, `expected marks between 0 and ${LIMITS.maxPoints}`)
      .max(LIMITS.maxPoints, `expected marks between 0 and ${LIMITS.maxPoints}`)
      .optional(),
  })
  .strict();

export const assessmentSpecSchema = z
  .object({
    title: z
      .string()
      .trim()
      .min(1, "expected a title")
      .max(LIMITS.maxTitle, `expected at most ${LIMITS.maxTitle} characters`),
    mechanismId: z.string().regex(/^[A-Za-z0-9_-]{1,80}$/, "expected a mechanism id"),
    seed: z
      .number()
      .int("expected an integer seed")
      .min(0, "expected a seed between 0 and 4294967295")
      .max(0xffffffff, "expected a seed between 0 and 4294967295")
      .optional(),
    variants: z
      .number()
      .int("expected a whole number of variants")
      .min(1, `expected 1–${LIMITS.maxVariants} variants`)
      .max(LIMITS.maxVariants, `expected 1–${LIMITS.maxVariants} variants`),
    base: conditionSchema,
    ranges: z
      .object({
        altitude_km: rangeSchema("altitude_km").optional(),
        latitude_deg: rangeSchema("latitude_deg").optional(),
        localSolarTime_h: rangeSchema("localSolarTime_h").optional(),
        zenith_deg: rangeSchema("zenith_deg").optional(),
        T_K: rangeSchema("T_K").optional(),
        jScale: rangeSchema("jScale").optional(),
        poolTotals: z
          .record(z.string().regex(/^[A-Za-z0-9_]{1,40}$/, "expected a pool id"), rangeSchema("pool"))
          .optional(),
      })
      .strict()
      .optional(),
    questions: z
      .array(questionSchema)
      .min(1, "expected at least one question")
      .max(LIMITS.maxQuestions, `expected at most ${LIMITS.maxQuestions} questions`),
    instructions: z
      .string()
      .max(LIMITS.maxInstructions, `expected at most ${LIMITS.maxInstructions} characters`)
      .optional(),
  })
  .strict();

/** The body of POST /api/assessments/preview: a mechanism and a base condition. */
export const assessmentPreviewSchema = z
  .object({
    mechanismId: z.string().regex(/^[A-Za-z0-9_-]{1,80}$/, "expected a mechanism id"),
    condition: conditionSchema,
  })
  .strict();

/** Parses an assessment request or throws an InputError naming the first bad field. */
export function parseAssessmentSpec(body: unknown): AssessmentSpec {
  const spec = parseWith(assessmentSpecSchema, body) as AssessmentSpec;
  spec.questions.forEach((q, i) => {
    const t = templateOf(q.kind);
    if (t.needs.cycle && !q.cycleId)
      throw new InputError(`questions[${i}].cycleId`, `a ${q.kind} question needs a cycle id`, "invalid-request");
    if (t.needs.species) {
      if (!q.speciesA)
        throw new InputError(
          `questions[${i}].speciesA`,
          "a species-ratio question needs the numerator species",
          "invalid-request",
        );
      if (!q.speciesB)
        throw new InputError(
          `questions[${i}].speciesB`,
          "a species-ratio question needs the denominator species",
          "invalid-request",
        );
      if (q.speciesA === q.speciesB)
        throw new InputError(`questions[${i}].speciesB`, "the two species must differ", "invalid-request");
    }
    if (t.defaultTolerance.kind === "exact" && q.tolerance && q.tolerance.kind !== "exact")
      throw new InputError(
        `questions[${i}].tolerance`,
        `a ${q.kind} question has a named answer: its tolerance is exact`,
        "invalid-request",
      );
    if (t.defaultTolerance.kind !== "exact" && q.tolerance?.kind === "exact")
      throw new InputError(
        `questions[${i}].tolerance`,
        `a ${q.kind} answer is a number: give a relative or absolute tolerance`,
        "invalid-request",
      );
  });
  return spec;
}

/** What the mechanism offers, for the checks that need it. */
export interface MechanismOffer {
  /** ids of species the solver solves for */
  solvedSpecies: string[];
  /** pool ids (Cly, Bry, NOy) */
  pools: string[];
}

/** Throws an InputError naming the question or range that the mechanism cannot answer. */
export function checkAgainstMechanism(spec: AssessmentSpec, offer: MechanismOffer): void {
  spec.questions.forEach((q, i) => {
    const t = templateOf(q.kind);
    for (const field of ["speciesA", "speciesB"] as const) {
      const id = q[field];
      if (t.needs.species && id && !offer.solvedSpecies.includes(id))
        throw new InputError(
          `questions[${i}].${field}`,
          `${id} is not a solved species of ${spec.mechanismId}`,
          "invalid-request",
        );
    }
    if (t.needs.pool && !offer.pools.includes(t.needs.pool))
      throw new InputError(
        `questions[${i}].kind`,
        `${spec.mechanismId} has no ${t.needs.pool} pool to double`,
        "invalid-request",
      );
  });
  for (const id of Object.keys(spec.ranges?.poolTotals ?? {}))
    if (!offer.pools.includes(id))
      throw new InputError(
        `ranges.poolTotals.${id}`,
        `unknown pool ${id}; ${spec.mechanismId} has ${offer.pools.join(", ") || "no pools"}`,
        "invalid-request",
      );
}
