"use client";
/**
 * The instructor's form: mechanism and base conditions, the ranges each
 * variant draws from, the questions (after a look at the cycles and species
 * at the base conditions), the number of variants and the seed. Submits to
 * POST /api/assessments and opens the instructor page of the result.
 */
import { useId, useState } from "react";
import {
  type BuilderQuestion,
  type BuilderRange,
  builderCondition,
  builderSpec,
  initialBuilderBase,
  toleranceText,
} from "@/lib/assessment/builderRequest";
import type { QuestionKind } from "@/lib/assessment/types";
import type { ConditionInput } from "@/lib/atmosphere/condition";
import { isolateText } from "@/lib/viz/isolateText";
import { ApiError, postJson } from "../ui/apiClient";
import { Field } from "./Field";
import type { MechanismOption, Preview, TemplateOption } from "./types";

interface Props {
  mechanisms: MechanismOption[];
  templates: TemplateOption[];
  maxVariants: number;
  maxQuestions: number;
  /** the condition defaults the base fields start from (CONDITION_DEFAULTS, from the page) */
  defaults: Required<Pick<ConditionInput, "latitude_deg" | "date" | "localSolarTime_h">>;
}

type RangeState = BuilderRange;

interface QuestionState extends BuilderQuestion {
  uid: number;
}

const RANGE_FIELDS = [
  {
    key: "altitude_km",
    label: "Altitude",
    vary: "Vary altitude",
    unit: "km",
    initial: { on: true, min: "25", max: "45" },
  },
  {
    key: "latitude_deg",
    label: "Latitude",
    vary: "Vary latitude",
    unit: "° N",
    initial: { on: false, min: "30", max: "60" },
  },
  {
    key: "localSolarTime_h",
    label: "Local solar time",
    vary: "Vary local solar time",
    unit: "h",
    initial: { on: false, min: "9", max: "15" },
  },
  {
    key: "Cly",
    label: "Total chlorine, Cly",
    vary: "Vary total chlorine (Cly)",
    unit: "ppbv",
    initial: { on: false, min: "2", max: "4" },
  },
] as const;

type RangeKey = (typeof RANGE_FIELDS)[number]["key"];

/** The base altitude a new assessment starts at, km (where the ClOx cycles matter most). */
const INITIAL_ALTITUDE_km = 35;

export function AssessmentBuilder({ mechanisms, templates, maxVariants, maxQuestions, defaults }: Props) {
  const uid = useId();
  const [title, setTitle] = useState("Catalytic ozone loss — problem set");
  const [mechanismId, setMechanismId] = useState(
    mechanisms.find((m) => m.id === "oxygen-chlorine")?.id ?? mechanisms[0]?.id ?? "",
  );
  const [base, setBase] = useState(() => initialBuilderBase(INITIAL_ALTITUDE_km, defaults));
  const [ranges, setRanges] = useState<Record<RangeKey, RangeState>>(
    Object.fromEntries(RANGE_FIELDS.map((f) => [f.key, { ...f.initial }])) as Record<RangeKey, RangeState>,
  );
  const [variants, setVariants] = useState("10");
  const [seed, setSeed] = useState("");
  const [instructions, setInstructions] = useState("");
  const [preview, setPreview] = useState<Preview | null>(null);
  const [previewing, setPreviewing] = useState(false);
  // A new assessment starts with the one question that needs no choice of cycle or species.
  const [questions, setQuestions] = useState<QuestionState[]>(
    templates.some((t) => t.kind === "dominant-family")
      ? [{ uid: 0, kind: "dominant-family", cycleId: "", speciesA: "", speciesB: "", tolerance: "", points: "1" }]
      : [],
  );
  const [nextUid, setNextUid] = useState(1);
  const [addKind, setAddKind] = useState<QuestionKind>(templates[0]?.kind ?? "dominant-family");
  const [building, setBuilding] = useState(false);
  const [error, setError] = useState<{ message: string; path?: string; during: "preview" | "build" } | null>(null);
  const failed = (e: unknown, during: "preview" | "build") =>
    setError({
      message: e instanceof Error ? e.message : String(e),
      path: e instanceof ApiError ? e.path : undefined,
      during,
    });

  const templateOf = (k: QuestionKind) => templates.find((t) => t.kind === k) as TemplateOption;

  async function runPreview() {
    setPreviewing(true);
    setError(null);
    try {
      setPreview(
        await postJson<Preview>("/api/assessments/preview", { mechanismId, condition: builderCondition(base) }),
      );
    } catch (e) {
      setPreview(null);
      failed(e, "preview");
    } finally {
      setPreviewing(false);
    }
  }

  function addQuestion() {
    const t = templateOf(addKind);
    setQuestions((qs) => [
      ...qs,
      {
        uid: nextUid,
        kind: addKind,
        cycleId: t.needs.cycle
          ? (preview?.cycles.find((c) => (addKind === "rate-limiting-step" ? c.stepCount > 1 : c.hasChainLength))?.id ??
            "")
          : "",
        speciesA: t.needs.species ? (preview?.solvedSpecies[0] ?? "") : "",
        speciesB: t.needs.species ? (preview?.solvedSpecies[1] ?? "") : "",
        tolerance: toleranceText(t.defaultTolerance),
        points: "1",
      },
    ]);
    setNextUid((n) => n + 1);
  }

  const update = (u: number, patch: Partial<QuestionState>) =>
    setQuestions((qs) => qs.map((q) => (q.uid === u ? { ...q, ...patch } : q)));

  async function build() {
    setBuilding(true);
    setError(null);
    try {
      const spec = builderSpec(
        { title, mechanismId, variants, seed, base, ranges, instructions, questions },
        templates,
      );
      const out = await postJson<{ instructorUrl: string; deletionToken: string }>("/api/assessments", spec);
      // the token rides in the fragment, which no server and no Referer sees; the page shows it once
      window.location.assign(`${out.instructorUrl}#deletion-token=${out.deletionToken}`);
    } catch (e) {
      failed(e, "build");
      setBuilding(false);
    }
  }

  const missing = questions.some((q) => {
    const t = templateOf(q.kind);
    return (t.needs.cycle && !q.cycleId) || (t.needs.species && (!q.speciesA || !q.speciesB));
  });
  const nVariants = Number(variants);
  const analyses = questions.some((q) => templateOf(q.kind).needs.pool) ? 2 * nVariants : nVariants;

  return (
    <form
      className="space-y-6"
      onSubmit={(e) => {
        e.preventDefault();
        void build();
      }}
      aria-labelledby={`${uid}-title`}
    >
      <h1 id={`${uid}-title`} className="text-2xl font-semibold tracking-tight">
        Build an assessment
      </h1>
      <p className="max-w-3xl text-[14px] leading-relaxed text-stone-700">
        Choose a mechanism and base conditions, let each variant draw some conditions from ranges, and pick the
        questions. The engine computes every answer; you get a link with the key for yourself and a separate link with
        the printable sheets for students.
      </p>

      <section className="rounded border border-stone-300 bg-white p-4" aria-labelledby={`${uid}-s1`}>
        <h2 id={`${uid}-s1`} className="text-[15px] font-semibold">
          1. Mechanism and base conditions
        </h2>
        <div className="mt-3 flex flex-wrap gap-4">
          <Field id={`${uid}-atitle`} label="Title" type="text" value={title} onChange={setTitle} width="w-80" />
          <div>
            <label htmlFor={`${uid}-mech`} className="block text-[12px] font-medium text-stone-700">
              Mechanism
            </label>
            <select
              id={`${uid}-mech`}
              value={mechanismId}
              onChange={(e) => {
                setMechanismId(e.target.value);
                setPreview(null);
                // cycles and species belong to the mechanism: choose them again
                setQuestions((qs) => qs.map((q) => ({ ...q, cycleId: "", speciesA: "", speciesB: "" })));
              }}
              className="mt-0.5 rounded border border-stone-300 bg-white px-2 py-1 text-[13px] focus:outline-2 focus:outline-stone-800"
            >
              {mechanisms.map((m) => (
                <option key={m.id} value={m.id}>
                  {isolateText(m.title)}
                </option>
              ))}
            </select>
          </div>
        </div>
        <div className="mt-3 flex flex-wrap gap-4">
          <Field
            id={`${uid}-alt`}
            label="Altitude"
            unit="km"
            value={base.altitude_km}
            min={0}
            max={86}
            onChange={(v) => setBase({ ...base, altitude_km: v })}
          />
          <Field
            id={`${uid}-lat`}
            label="Latitude"
            unit="° N"
            value={base.latitude_deg}
            min={-90}
            max={90}
            onChange={(v) => setBase({ ...base, latitude_deg: v })}
          />
          <Field
            id={`${uid}-date`}
            label="Date"
            type="date"
            width="w-40"
            value={base.date}
            onChange={(v) => setBase({ ...base, date: v })}
          />
          <Field
            id={`${uid}-lst`}
            label="Local solar time"
            unit="h"
            value={base.localSolarTime_h}
            min={0}
            max={24}
            onChange={(v) => setBase({ ...base, localSolarTime_h: v })}
          />
        </div>
        <div className="mt-4 flex items-center gap-3">
          <button
            type="button"
            onClick={() => void runPreview()}
            disabled={previewing}
            className="rounded border border-stone-800 px-3 py-1.5 text-[13px] font-medium hover:bg-stone-100 focus:outline-2 focus:outline-offset-2 disabled:opacity-50"
          >
            {previewing ? "Analysing…" : "Find the cycles and species at these conditions"}
          </button>
          {preview && (
            <span className="text-[12px] text-stone-600" aria-live="polite">
              {preview.cycles.length} cycles, {preview.solvedSpecies.length} solved species
              {preview.status !== "converged" ? ` — steady state ${preview.status}` : ""}
            </span>
          )}
        </div>
      </section>

      <section className="rounded border border-stone-300 bg-white p-4" aria-labelledby={`${uid}-s2`}>
        <h2 id={`${uid}-s2`} className="text-[15px] font-semibold">
          2. What each variant draws
        </h2>
        <p className="mt-1 text-[12px] text-stone-600">
          Each ticked quantity is drawn uniformly between its limits (altitude to the whole km, latitude to the degree,
          time to the half hour, Cly to two significant figures) from the variant's seed; the others keep the base
          value.
        </p>
        <div className="mt-3 grid gap-3 sm:grid-cols-2">
          {RANGE_FIELDS.map((f) => {
            const s = ranges[f.key];
            const set = (patch: Partial<RangeState>) => setRanges({ ...ranges, [f.key]: { ...s, ...patch } });
            return (
              <fieldset key={f.key} className="flex flex-wrap items-end gap-3">
                <legend className="sr-only">{f.label} range</legend>
                <label className="flex w-44 items-center gap-2 self-center text-[13px]">
                  <input
                    type="checkbox"
                    checked={s.on}
                    onChange={(e) => set({ on: e.target.checked })}
                    className="accent-stone-800"
                  />
                  {f.vary}
                </label>
                <Field
                  id={`${uid}-${f.key}-min`}
                  label="from"
                  unit={f.unit}
                  value={s.min}
                  disabled={!s.on}
                  onChange={(v) => set({ min: v })}
                  width="w-20"
                />
                <Field
                  id={`${uid}-${f.key}-max`}
                  label="to"
                  unit={f.unit}
                  value={s.max}
                  disabled={!s.on}
                  onChange={(v) => set({ max: v })}
                  width="w-20"
                />
              </fieldset>
            );
          })}
        </div>
        <div className="mt-4 flex flex-wrap gap-4">
          <Field
            id={`${uid}-n`}
            label="Number of variants"
            value={variants}
            min={1}
            max={maxVariants}
            step="1"
            onChange={setVariants}
            hint={`1–${maxVariants}`}
          />
          <Field
            id={`${uid}-seed`}
            label="Seed (optional)"
            value={seed}
            min={0}
            step="1"
            onChange={setSeed}
            width="w-36"
            hint="blank: a random seed, shown with the key"
          />
        </div>
      </section>

      <section className="rounded border border-stone-300 bg-white p-4" aria-labelledby={`${uid}-s3`}>
        <h2 id={`${uid}-s3`} className="text-[15px] font-semibold">
          3. Questions
        </h2>
        {!preview && (
          <p className="mt-1 text-[12px] text-amber-800">
            Questions on a cycle or on species need the list of cycles and species: press “Find the cycles and species”
            first.
          </p>
        )}
        <ol className="mt-3 space-y-3">
          {questions.map((q, i) => {
            const t = templateOf(q.kind);
            const cycles =
              preview?.cycles.filter((c) => (q.kind === "rate-limiting-step" ? c.stepCount > 1 : c.hasChainLength)) ??
              [];
            return (
              <li
                key={q.uid}
                className="rounded border border-stone-200 p-3"
                aria-label={`Question ${i + 1}: ${t.title}`}
              >
                <div className="flex items-start justify-between gap-3">
                  <div>
                    <p className="text-[13px] font-semibold">
                      Q{i + 1}. {t.title}
                    </p>
                    <p className="text-[12px] text-stone-600">{t.summary}</p>
                  </div>
                  <button
                    type="button"
                    onClick={() => setQuestions((qs) => qs.filter((x) => x.uid !== q.uid))}
                    className="text-[12px] text-red-800 underline focus:outline-2"
                    aria-label={`Remove question ${i + 1}`}
                  >
                    Remove
                  </button>
                </div>
                <div className="mt-2 flex flex-wrap items-end gap-4">
                  {t.needs.cycle && (
                    <div>
                      <label
                        htmlFor={`${uid}-q${q.uid}-cycle`}
                        className="block text-[12px] font-medium text-stone-700"
                      >
                        Cycle
                      </label>
                      <select
                        id={`${uid}-q${q.uid}-cycle`}
                        value={q.cycleId}
                        onChange={(e) => update(q.uid, { cycleId: e.target.value })}
                        className="mt-0.5 max-w-xl rounded border border-stone-300 bg-white px-2 py-1 text-[13px] focus:outline-2 focus:outline-stone-800"
                      >
                        <option value="">— choose a cycle —</option>
                        {cycles.map((c) => (
                          <option key={c.id} value={c.id}>
                            {c.family}: {c.steps.join("; ")} ({(c.share * 100).toPrecision(2)} % of Ox loss)
                          </option>
                        ))}
                      </select>
                    </div>
                  )}
                  {t.needs.species &&
                    (["speciesA", "speciesB"] as const).map((k) => (
                      <div key={k}>
                        <label
                          htmlFor={`${uid}-q${q.uid}-${k}`}
                          className="block text-[12px] font-medium text-stone-700"
                        >
                          {k === "speciesA" ? "Numerator [A]" : "Denominator [B]"}
                        </label>
                        <select
                          id={`${uid}-q${q.uid}-${k}`}
                          value={q[k]}
                          onChange={(e) => update(q.uid, { [k]: e.target.value })}
                          className="mt-0.5 rounded border border-stone-300 bg-white px-2 py-1 text-[13px] focus:outline-2 focus:outline-stone-800"
                        >
                          <option value="">—</option>
                          {(preview?.solvedSpecies ?? []).map((s) => (
                            <option key={s} value={s}>
                              {s}
                            </option>
                          ))}
                        </select>
                      </div>
                    ))}
                  {t.defaultTolerance.kind === "exact" ? (
                    <p className="text-[12px] text-stone-600">Marked exactly (letter or name).</p>
                  ) : (
                    <Field
                      id={`${uid}-q${q.uid}-tol`}
                      label={t.defaultTolerance.kind === "relative" ? "Tolerance (relative)" : "Tolerance (absolute)"}
                      unit={t.defaultTolerance.kind === "relative" ? "± %" : `± ${t.unit}`}
                      value={q.tolerance}
                      onChange={(v) => update(q.uid, { tolerance: v })}
                      width="w-20"
                    />
                  )}
                  <Field
                    id={`${uid}-q${q.uid}-pts`}
                    label="Marks"
                    value={q.points}
                    min={0}
                    onChange={(v) => update(q.uid, { points: v })}
                    width="w-16"
                  />
                </div>
              </li>
            );
          })}
        </ol>
        <div className="mt-3 flex flex-wrap items-end gap-2">
          <div>
            <label htmlFor={`${uid}-add`} className="block text-[12px] font-medium text-stone-700">
              Question kind
            </label>
            <select
              id={`${uid}-add`}
              value={addKind}
              onChange={(e) => setAddKind(e.target.value as QuestionKind)}
              className="mt-0.5 rounded border border-stone-300 bg-white px-2 py-1 text-[13px] focus:outline-2 focus:outline-stone-800"
            >
              {templates.map((t) => (
                <option key={t.kind} value={t.kind}>
                  {t.title}
                </option>
              ))}
            </select>
          </div>
          <button
            type="button"
            onClick={addQuestion}
            disabled={questions.length >= maxQuestions}
            className="rounded border border-stone-800 px-3 py-1.5 text-[13px] font-medium hover:bg-stone-100 focus:outline-2 focus:outline-offset-2 disabled:opacity-50"
          >
            Add question
          </button>
        </div>
        <div className="mt-4">
          <label htmlFor={`${uid}-instr`} className="block text-[12px] font-medium text-stone-700">
            Instructions printed on each sheet (optional)
          </label>
          <textarea
            id={`${uid}-instr`}
            value={instructions}
            onChange={(e) => setInstructions(e.target.value)}
            rows={2}
            className="mt-0.5 w-full max-w-3xl rounded border border-stone-300 bg-white px-2 py-1 text-[13px] focus:outline-2 focus:outline-stone-800"
            placeholder="Use the conditions printed on your sheet. Give each numerical answer in the unit asked for, to three significant figures; for a named answer write the letter or the name."
          />
        </div>
      </section>

      {error && (
        <div role="alert" className="rounded border border-red-300 bg-red-50 p-3 text-[13px] text-red-900">
          <p className="font-semibold">
            {error.during === "build" ? "The assessment was not built" : "The conditions could not be analysed"}
            {error.path ? ` (${error.path})` : ""}
          </p>
          <p>{error.message}</p>
        </div>
      )}

      <div className="flex items-center gap-4">
        <button
          type="submit"
          disabled={building || questions.length === 0 || missing || !mechanismId}
          className="rounded bg-stone-900 px-5 py-2.5 font-medium text-white hover:bg-stone-700 focus:outline-2 focus:outline-offset-2 disabled:opacity-40"
        >
          {building ? "Building…" : "Build the assessment"}
        </button>
        <p className="text-[12px] text-stone-600" aria-live="polite">
          {building
            ? `Computing about ${analyses} analyses in the engine; this can take a minute.`
            : questions.length === 0
              ? "Add at least one question."
              : missing
                ? "Every cycle and species question needs its cycle or species."
                : `${Number.isFinite(nVariants) ? nVariants : "?"} variants × ${questions.length} questions.`}
        </p>
      </div>
    </form>
  );
}
