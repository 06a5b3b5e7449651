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
import { variantSeed } from "../random";
import { DEFAULTS as DRAW_DEFAULTS, drawCondition, SCALAR_FIELDS } from "./drawCondition";
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

export const DEFAULTS = {
  /** draws per variant before generation gives up */
  maxAttempts: 6,
  /** share of the Ox loss (fraction) a family needs on some variant to be offered as a choice */
  minChoiceShare: 0.01,
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

/** Families offered as choices: those with at least `minChoiceShare` of the loss on some variant. */
function familiesOf(results: AnalysisResult[]): string[] {
  return sortFamilies(
    results.flatMap((r) =>
      r.cycles.budget.byFamily.filter((f) => f.fraction >= DEFAULTS.minChoiceShare).map((f) => f.family),
    ),
  );
}

/**
 * The first attempt of each variant: the first whose condition no earlier
 * variant starts from and, for every ranged field whose grid has at least as
 * many values as there are variants, whose value in that field is new too (so
 * that two variants never share an altitude when only their Cly differs);
 * failing that, the first with a new condition; failing that, attempt 0.
 */
export function distinctStarts(spec: AssessmentSpec & { seed: number }): {
  starts: number[];
  repeated: number[];
  /** the fields kept distinct between variants */
  strict: (typeof SCALAR_FIELDS)[number][];
  /** each variant's starting condition */
  conditions: ConditionInput[];
} {
  const ranges = spec.ranges ?? {};
  const strict = SCALAR_FIELDS.filter((f) => {
    const r = ranges[f];
    if (!r) return false;
    const step = r.step ?? DRAW_DEFAULTS.step[f];
    return Math.floor((r.max - r.min) / step + 1e-9) + 1 >= spec.variants;
  });
  const seen = new Set<string>();
  const seenValues = new Map(strict.map((f) => [f, new Set<number>()]));
  const starts: number[] = [];
  const repeated: number[] = [];
  const conditions: ConditionInput[] = [];
  const conditionAt = (n: number, a: number) => drawCondition(spec.base, ranges, variantSeed(spec.seed, n, a));
  for (let n = 1; n <= spec.variants; n++) {
    const tries = Array.from({ length: DEFAULTS.maxDistinctTries }, (_, a) => conditionAt(n, a));
    const isNew = (c: ConditionInput) => !seen.has(JSON.stringify(c));
    let start = tries.findIndex((c) => isNew(c) && strict.every((f) => !seenValues.get(f)?.has(c[f] as number)));
    if (start < 0) start = tries.findIndex(isNew);
    if (start < 0) {
      start = 0;
      repeated.push(n);
    }
    seen.add(JSON.stringify(tries[start]));
    conditions.push(tries[start]);
    for (const f of strict) seenValues.get(f)?.add(tries[start][f] as number);
    starts.push(start);
  }
  return { starts, repeated, strict, conditions };
}

/**
 * The attempts a variant tries in order: its start, then later attempts whose
 * strict fields avoid every other variant's starting values (so a redraw does
 * not land on a neighbour's altitude), topped up with the plain sequence.
 */
function attemptsOf(
  spec: AssessmentSpec & { seed: number },
  n: number,
  d: ReturnType<typeof distinctStarts>,
  count: number,
) {
  const start = d.starts[n - 1];
  const taken = d.strict.map((f) => new Set(d.conditions.filter((_, i) => i !== n - 1).map((c) => c[f] as number)));
  const out = [start];
  for (let a = start + 1; a < start + DEFAULTS.maxDistinctTries && out.length < count; a++) {
    const c = drawCondition(spec.base, spec.ranges ?? {}, variantSeed(spec.seed, n, a));
    if (d.strict.every((f, i) => !taken[i].has(c[f] as number))) out.push(a);
  }
  for (let a = start + 1; out.length < count; a++) if (!out.includes(a)) out.push(a);
  return out;
}

async function drawVariant(
  spec: AssessmentSpec & { seed: number },
  n: number,
  attempts: number[],
  opts: GenerateOptions,
): Promise<Drawn> {
  const maxAttempts = attempts.length;
  const extraTemplate = spec.questions.map((q) => templateOf(q.kind)).find((t) => t.extraCondition);
  const redraws: string[] = [];
  let last = { question: 0, problem: "" };
  for (const [k, attempt] of attempts.entries()) {
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
    redraws.push(`variant ${n}, draw ${k + 1}: question ${failed.i + 1} redrawn because ${last.problem}`);
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
  const d = distinctStarts(spec);
  const repeated = d.repeated;
  const count = opts.maxAttempts ?? DEFAULTS.maxAttempts;
  const drawn = await Promise.all(numbers.map((n) => drawVariant(spec, n, attemptsOf(spec, n, d, count), opts)));
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
