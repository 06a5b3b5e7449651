/**
 * Generation of an assessment: draw each variant's condition from its seed,
 * have the engine analyse it (and, for the chlorine question, the same
 * condition with Cly doubled), write every question and its answer from the
 * results. A variant on which some question has no sound answer (the cycle is
 * absent, two families tie, no steady state) is redrawn with the next attempt
 * seed, so the whole assessment still follows from its one seed. Before any
 * analysis, a variant whose first draw repeats an earlier variant's condition
 * moves on to its next attempt seed (in variant order, so deterministically),
 * so that ten variants from a range of twenty altitudes are ten different
 * problems wherever the ranges allow it.
 *
 * The analyses are injected: the service runs them in the engine pool, the
 * tests in-thread; all variants are started at once.
 */
import type { AnalysisRequest, AnalysisResult, ConditionInput } from "../engine/types";
import { InputError } from "../errors";
import { drawCondition } from "./drawCondition";
import { formatAnswer } from "./formatKey";
import { sheetConditions } from "./sheetConditions";
import { sortFamilies } from "./templates/cycleText";
import { templateOf } from "./templates/registry";
import type {
  AssessmentSpec,
  BuiltQuestion,
  KeyEntry,
  QuestionInfo,
  QuestionSpec,
  SheetQuestion,
  StudentSheet,
  Variant,
} from "./types";
import { variantSeed } from "./variantSeed";

export const DEFAULTS = {
  /** draws per variant before generation gives up */
  maxAttempts: 6,
  /** draws tried per variant for a condition no earlier variant has */
  maxDistinctTries: 50,
  /** marks per question */
  points: 1,
  instructions:
    "Use the conditions printed on your sheet. Give each numerical answer in the unit asked for, to three significant figures; for a named answer write the letter or the name.",
};

export interface GenerateOptions {
  /** runs one analysis (service: the engine pool; tests: runAnalysis in-thread) */
  analyse: (request: AnalysisRequest) => Promise<AnalysisResult>;
  /** draws per variant; default 6 */
  maxAttempts?: number;
}

export interface VariantAnalyses {
  variant: number;
  base: AnalysisResult;
  /** the doubled-chlorine analysis, when a question needs one */
  extra?: AnalysisResult;
  /** the request of each, for storage and for checking */
  baseRequest: AnalysisRequest;
  extraRequest?: AnalysisRequest;
}

export interface GeneratedAssessment {
  seed: number;
  instructions: string;
  mechanism: { id: string; title: string };
  variants: Variant[];
  questions: QuestionInfo[];
  key: KeyEntry[];
  sheets: StudentSheet[];
  analyses: VariantAnalyses[];
  warnings: string[];
}

interface Drawn {
  variant: Variant;
  analyses: VariantAnalyses;
  redraws: string[];
}

function pointsOf(q: QuestionSpec): number {
  return q.points ?? DEFAULTS.points;
}

function build(q: QuestionSpec, condition: ConditionInput, a: VariantAnalyses, families: string[]): BuiltQuestion {
  return templateOf(q.kind).build({ question: q, condition, base: a.base, extra: a.extra, families });
}

function familiesOf(results: AnalysisResult[]): string[] {
  return sortFamilies(
    results.flatMap((r) => r.cycles.budget.byFamily.filter((f) => f.fraction > 0).map((f) => f.family)),
  );
}

/** The first attempt of each variant: the first whose condition no earlier variant starts from. */
export function distinctStarts(spec: AssessmentSpec & { seed: number }): { starts: number[]; repeated: number[] } {
  const seen = new Set<string>();
  const starts: number[] = [];
  const repeated: number[] = [];
  for (let n = 1; n <= spec.variants; n++) {
    let start = 0;
    let key = "";
    for (let a = 0; a < DEFAULTS.maxDistinctTries; a++) {
      key = JSON.stringify(drawCondition(spec.base, spec.ranges ?? {}, variantSeed(spec.seed, n, a)));
      if (!seen.has(key)) {
        start = a;
        break;
      }
      if (a === DEFAULTS.maxDistinctTries - 1) {
        repeated.push(n);
        key = JSON.stringify(drawCondition(spec.base, spec.ranges ?? {}, variantSeed(spec.seed, n, 0)));
      }
    }
    seen.add(key);
    starts.push(start);
  }
  return { starts, repeated };
}

async function drawVariant(
  spec: AssessmentSpec & { seed: number },
  n: number,
  start: number,
  opts: GenerateOptions,
): Promise<Drawn> {
  const maxAttempts = opts.maxAttempts ?? DEFAULTS.maxAttempts;
  const extraTemplate = spec.questions.map((q) => templateOf(q.kind)).find((t) => t.extraCondition);
  const redraws: string[] = [];
  let last = { question: 0, problem: "" };
  for (let attempt = start; attempt < start + maxAttempts; attempt++) {
    const seed = variantSeed(spec.seed, n, attempt);
    const condition = drawCondition(spec.base, spec.ranges ?? {}, seed);
    const baseRequest: AnalysisRequest = { mechanismId: spec.mechanismId, condition };
    const base = await opts.analyse(baseRequest);
    const analyses: VariantAnalyses = { variant: n, base, baseRequest };
    if (extraTemplate?.extraCondition) {
      analyses.extraRequest = {
        mechanismId: spec.mechanismId,
        condition: extraTemplate.extraCondition(condition, base),
      };
      analyses.extra = await opts.analyse(analyses.extraRequest);
    }
    const families = familiesOf([base]);
    const failed = spec.questions
      .map((q, i) => ({ i, built: build(q, condition, analyses, families) }))
      .find((x) => !x.built.ok);
    if (!failed) return { variant: { number: n, seed, attempt, condition }, analyses, redraws };
    last = { question: failed.i, problem: (failed.built as { problem: string }).problem };
    redraws.push(`variant ${n}, draw ${attempt + 1 - start}: question ${failed.i + 1} redrawn because ${last.problem}`);
  }
  throw new InputError(
    `questions[${last.question}]`,
    `variant ${n} found no conditions in ${maxAttempts} draws where question ${last.question + 1} has a sound answer (last: ${last.problem}); widen or move the ranges, or choose another cycle`,
    "invalid-request",
  );
}

export function questionInfo(spec: AssessmentSpec): QuestionInfo[] {
  return spec.questions.map((q, i) => {
    const t = templateOf(q.kind);
    const detail =
      q.kind === "species-ratio" ? `[${q.speciesA}]/[${q.speciesB}]` : t.needs.cycle ? `cycle ${q.cycleId}` : "";
    return {
      number: i + 1,
      kind: q.kind,
      title: t.title,
      detail,
      unit: t.unit,
      tolerance: q.tolerance ?? t.defaultTolerance,
      points: pointsOf(q),
    };
  });
}

export async function generateAssessment(
  spec: AssessmentSpec & { seed: number },
  opts: GenerateOptions,
): Promise<GeneratedAssessment> {
  const numbers = Array.from({ length: spec.variants }, (_, i) => i + 1);
  const { starts, repeated } = distinctStarts(spec);
  const drawn = await Promise.all(numbers.map((n) => drawVariant(spec, n, starts[n - 1], opts)));
  // One list of families on every sheet, so the choices give nothing away.
  const families = familiesOf(drawn.map((d) => d.analyses.base));
  const info = questionInfo(spec);
  const key: KeyEntry[] = [];
  const sheets: StudentSheet[] = drawn.map(({ variant, analyses }) => {
    const questions: SheetQuestion[] = spec.questions.map((q, i) => {
      const built = build(q, variant.condition, analyses, families);
      if (!built.ok)
        throw new Error(`generateAssessment: question ${i + 1} of variant ${variant.number} lost its answer`);
      key.push({
        variant: variant.number,
        question: i + 1,
        kind: q.kind,
        value: built.value,
        display: formatAnswer(built.value, info[i].unit, built.choices),
        unit: info[i].unit,
        tolerance: info[i].tolerance,
        accepted: built.accepted,
        points: info[i].points,
      });
      return {
        number: i + 1,
        kind: q.kind,
        text: built.text,
        unit: info[i].unit,
        choices: built.choices,
        points: info[i].points,
      };
    });
    return {
      variant: variant.number,
      conditions: sheetConditions(variant.condition, analyses.base.condition),
      questions,
    };
  });
  return {
    seed: spec.seed,
    instructions: spec.instructions?.trim() || DEFAULTS.instructions,
    mechanism: drawn[0].analyses.base.mechanism,
    variants: drawn.map((d) => d.variant),
    questions: info,
    key,
    sheets,
    analyses: drawn.map((d) => d.analyses),
    warnings: [
      ...(repeated.length > 0
        ? [
            `the ranges allow too few distinct conditions: variant${repeated.length > 1 ? "s" : ""} ${repeated.join(", ")} repeat${repeated.length > 1 ? "" : "s"} an earlier variant's conditions; widen the ranges or vary more quantities`,
          ]
        : []),
      ...drawn.flatMap((d) => d.redraws),
    ],
  };
}
