/**
 * The assessment builder's form (text fields, as typed) shaped into the
 * request of POST /api/assessments and of its preview. Blank fields are left
 * out, so the server's defaults apply; text that is not a number becomes NaN,
 * so the server's schema refuses it and names the field. Cly is typed in ppbv
 * and sent as a mixing ratio (mol/mol).
 */
import type { ConditionInput } from "../atmosphere/condition";
import type { QuestionKind, Tolerance } from "./types";

/** The base-condition fields of the form, as typed. */
export interface BuilderBase {
  /** km */
  altitude_km: string;
  /** degrees north */
  latitude_deg: string;
  /** YYYY-MM-DD */
  date: string;
  /** h */
  localSolarTime_h: string;
}

/** The quantities a variant may draw from a range. */
export type BuilderRangeKey = "altitude_km" | "latitude_deg" | "localSolarTime_h" | "Cly";

/** One range of the form: drawn when `on`, between `min` and `max` (Cly in ppbv). */
export interface BuilderRange {
  on: boolean;
  min: string;
  max: string;
}

/** One question of the form. */
export interface BuilderQuestion {
  kind: QuestionKind;
  cycleId: string;
  speciesA: string;
  speciesB: string;
  /** % for a relative tolerance, the answer's unit for an absolute one */
  tolerance: string;
  points: string;
}

export interface BuilderForm {
  title: string;
  mechanismId: string;
  variants: string;
  /** blank: the server draws a seed */
  seed: string;
  base: BuilderBase;
  ranges: Record<BuilderRangeKey, BuilderRange>;
  instructions: string;
  questions: BuilderQuestion[];
}

/** What the form needs to know of a question template. */
export interface BuilderTemplate {
  kind: QuestionKind;
  defaultTolerance: Tolerance;
  needs: { cycle?: boolean; species?: boolean };
}

/** A range as sent: a blank limit is left out (the schema asks for it). */
type Range = { min: number | undefined; max: number | undefined };

/** The request body the form sends; the server's schema checks every value. */
export interface BuilderSpec {
  title: string;
  mechanismId: string;
  variants: number | undefined;
  seed: number | undefined;
  base: Partial<ConditionInput>;
  ranges: Partial<Record<Exclude<BuilderRangeKey, "Cly">, Range>> & { poolTotals?: { Cly: Range } };
  instructions: string | undefined;
  questions: {
    kind: QuestionKind;
    cycleId: string | undefined;
    speciesA: string | undefined;
    speciesB: string | undefined;
    tolerance: Tolerance | undefined;
    points: number | undefined;
  }[];
}

/** ppbv → mol/mol */
const PPBV = 1e-9;

/** A typed number: undefined when blank, NaN when not a number. */
export function formNumber(text: string): number | undefined {
  if (text.trim() === "") return undefined;
  const v = Number(text);
  return Number.isFinite(v) ? v : Number.NaN;
}

/** The form's text for a template's default tolerance (% for a relative one). */
export function toleranceText(t: Tolerance): string {
  if (t.kind === "relative") return String(t.rel * 100);
  if (t.kind === "absolute") return String(t.abs);
  return "";
}

/** The base fields a new form starts with: the given altitude and the condition defaults. */
export function initialBuilderBase(
  altitude_km: number,
  defaults: Required<Pick<ConditionInput, "latitude_deg" | "date" | "localSolarTime_h">>,
): BuilderBase {
  return {
    altitude_km: String(altitude_km),
    latitude_deg: String(defaults.latitude_deg),
    date: defaults.date,
    localSolarTime_h: String(defaults.localSolarTime_h),
  };
}

/** The base condition of the form (also the preview's condition). */
export function builderCondition(base: BuilderBase): Partial<ConditionInput> {
  return {
    altitude_km: formNumber(base.altitude_km),
    latitude_deg: formNumber(base.latitude_deg),
    date: base.date || undefined,
    localSolarTime_h: formNumber(base.localSolarTime_h),
  };
}

function builderTolerance(t: BuilderTemplate, text: string): Tolerance | undefined {
  const v = formNumber(text);
  if (v === undefined) return undefined;
  if (t.defaultTolerance.kind === "relative") return { kind: "relative", rel: v / 100 };
  if (t.defaultTolerance.kind === "absolute") return { kind: "absolute", abs: v };
  return undefined;
}

/** The request body of POST /api/assessments for the form. */
export function builderSpec(form: BuilderForm, templates: readonly BuilderTemplate[]): BuilderSpec {
  const templateOf = (kind: QuestionKind): BuilderTemplate => {
    const t = templates.find((x) => x.kind === kind);
    if (!t) throw new RangeError(`builderSpec: no template of kind ${kind}`);
    return t;
  };
  const ranges: BuilderSpec["ranges"] = {};
  for (const [key, r] of Object.entries(form.ranges) as [BuilderRangeKey, BuilderRange][]) {
    if (!r.on) continue;
    const v = { min: formNumber(r.min), max: formNumber(r.max) };
    if (key === "Cly")
      ranges.poolTotals = { Cly: { min: (v.min ?? Number.NaN) * PPBV, max: (v.max ?? Number.NaN) * PPBV } };
    else ranges[key] = v;
  }
  return {
    title: form.title,
    mechanismId: form.mechanismId,
    variants: formNumber(form.variants),
    seed: formNumber(form.seed),
    base: builderCondition(form.base),
    ranges,
    instructions: form.instructions.trim() || undefined,
    questions: form.questions.map((q) => {
      const t = templateOf(q.kind);
      return {
        kind: q.kind,
        cycleId: t.needs.cycle ? q.cycleId : undefined,
        speciesA: t.needs.species ? q.speciesA : undefined,
        speciesB: t.needs.species ? q.speciesB : undefined,
        tolerance: builderTolerance(t, q.tolerance),
        points: formNumber(q.points),
      };
    }),
  };
}
