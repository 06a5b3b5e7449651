import { describe, expect, test } from "vitest";
import { markAnswer, QUESTION_TEMPLATES, type QuestionSpec, templateOf } from "@/lib/assessment";
import { clyMixingRatio } from "@/lib/assessment/templates";
import { expectClose } from "../helpers/close";
import { CLOX_CYCLE, fakeResult, NOX_CYCLE } from "./fakeAnalysis";

// Invented results from fakeAnalysis.ts: these tests check the wording and the extraction, not chemistry.
const at = (altitude_km: number, poolTotals?: Record<string, number>) =>
  fakeResult({ mechanismId: "invented", condition: { altitude_km, poolTotals } });
const ctx = (base: ReturnType<typeof at>, question: QuestionSpec) => ({
  question,
  condition: base.condition as never,
  base,
  families: ["Ox", "NOx", "ClOx"],
});

describe("question templates", () => {
  test("each kind has a template with a title, a unit statement and a default tolerance", () => {
    expect(QUESTION_TEMPLATES.map((t) => t.kind)).toEqual([
      "dominant-family",
      "rate-limiting-step",
      "chain-length",
      "species-ratio",
      "clox-share-change",
      "ozone-per-catalyst",
    ]);
    for (const t of QUESTION_TEMPLATES) expect(t.title.length).toBeGreaterThan(5);
    expect(() => templateOf("essay" as never)).toThrow(/templateOf: unknown question kind essay/);
  });

  test("the rate-limiting step lists the steps in mechanism order and accepts the letter or the equation", () => {
    const base = at(30);
    const built = templateOf("rate-limiting-step").build(ctx(base, { kind: "rate-limiting-step", cycleId: NOX_CYCLE }));
    if (!built.ok) throw new Error(built.problem);
    expect(built.choices?.map((c) => [c.letter, c.value])).toEqual([
      ["a", "R5"],
      ["b", "R6"],
    ]);
    // invented rates: R5 = loss, R6 = 0.6·loss, so R6 is the slower step
    expect(built.value).toBe("R6");
    expect(built.accepted).toEqual(["b", "NO2 + O → NO + O2", "NO2 + O -> NO + O2"]);
  });

  test("the dominant family is accepted as its letter, its name or the text printed beside the letter", () => {
    const base = at(30);
    base.cycles.budget.byFamily.push({ family: "ClOx-NOx", oxLoss_cm3s: 1e12, fraction: 0.99 });
    const built = templateOf("dominant-family").build({
      ...ctx(base, { kind: "dominant-family" }),
      families: ["Ox", "NOx", "ClOx", "ClOx-NOx"],
    });
    if (!built.ok) throw new Error(built.problem);
    expect(built.value).toBe("ClOx-NOx");
    const entry = {
      variant: 1,
      question: 1,
      kind: "dominant-family" as const,
      value: built.value,
      display: "",
      unit: "",
      tolerance: { kind: "exact" as const },
      accepted: built.accepted,
      points: 1,
    };
    for (const g of ["d", "ClOx-NOx", "clox–nox", "ClOx–NOx (coupled)"])
      expect(markAnswer(entry, g).status, g).toBe("correct");
    expect(markAnswer(entry, "ClOx").status).toBe("incorrect");
  });

  test("a cycle question reports a problem when the cycle is absent instead of inventing an answer", () => {
    const base = at(15); // the invented ClOx cycle exists only from 20 km
    for (const kind of ["rate-limiting-step", "chain-length", "ozone-per-catalyst"] as const) {
      const built = templateOf(kind).build(ctx(base, { kind, cycleId: CLOX_CYCLE }));
      expect(built.ok).toBe(false);
      if (!built.ok) expect(built.problem).toContain("not among the significant cycles");
    }
  });

  test("a question on an unconverged steady state reports a problem", () => {
    const base = at(30);
    base.steadyState.status = "max-iterations";
    const built = templateOf("species-ratio").build(
      ctx(base, { kind: "species-ratio", speciesA: "ClO", speciesB: "Cl" }),
    );
    expect(built.ok).toBe(false);
  });

  test("ozone per catalyst atom is the chain length times the odd oxygen per turnover", () => {
    const base = at(30);
    const built = templateOf("ozone-per-catalyst").build(
      ctx(base, { kind: "ozone-per-catalyst", cycleId: CLOX_CYCLE }),
    );
    const cycle = base.cycles.cycles.find((c) => c.id === CLOX_CYCLE);
    if (!built.ok || !cycle) throw new Error("expected an answer");
    expectClose(built.value as number, (cycle.chainLength as number) * cycle.oxPerTurnover, { rel: 1e-12 });
  });

  test("the Cly doubled is the drawn one, or else the one the analysis resolved", () => {
    expect(clyMixingRatio({ altitude_km: 30, poolTotals: { Cly: 2.5e-9 } }, at(30))).toBe(2.5e-9);
    expectClose(clyMixingRatio({ altitude_km: 30 }, at(30)) as number, 3e-9, { rel: 1e-12 });
    const extra = templateOf("clox-share-change").extraCondition?.({ altitude_km: 30 }, at(30));
    expectClose(extra?.poolTotals?.Cly as number, 6e-9, { rel: 1e-12 });
  });
});
