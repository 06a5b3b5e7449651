import { describe, expect, test } from "vitest";
import {
  type AssessmentSpec,
  distinctStarts,
  drawCondition,
  generateAssessment,
  parseAssessmentSpec,
  variantSeed,
} from "@/lib/assessment";
import type { AnalysisRequest } from "@/lib/engine/types";
import { expectClose } from "../helpers/close";
import { CLOX_CYCLE, fakeAnalyse, fakeResult, NOX_CYCLE } from "./fakeAnalysis";

// The engine here is the invented stand-in of fakeAnalysis.ts; agreement with the real engine is in engineAgreement.test.ts.

const spec = (over: Partial<AssessmentSpec> = {}): AssessmentSpec & { seed: number } => ({
  ...parseAssessmentSpec({
    title: "Invented test assessment",
    mechanismId: "invented",
    variants: 10,
    base: { altitude_km: 30, latitude_deg: 45 },
    ranges: { altitude_km: { min: 20, max: 48 }, poolTotals: { Cly: { min: 2e-9, max: 4e-9 } } },
    questions: [
      { kind: "dominant-family" },
      { kind: "rate-limiting-step", cycleId: NOX_CYCLE },
      { kind: "chain-length", cycleId: CLOX_CYCLE },
      { kind: "species-ratio", speciesA: "ClO", speciesB: "Cl" },
      { kind: "clox-share-change", points: 2 },
      { kind: "ozone-per-catalyst", cycleId: CLOX_CYCLE },
    ],
    ...over,
  }),
  seed: 20260320,
});

describe("generateAssessment", () => {
  test("gives the same variants, sheets and key for the same seed", async () => {
    const a = await generateAssessment(spec(), { analyse: fakeAnalyse });
    const b = await generateAssessment(spec(), { analyse: fakeAnalyse });
    expect(b.variants).toEqual(a.variants);
    expect(b.key).toEqual(a.key);
    expect(b.sheets).toEqual(a.sheets);
  });

  test("gives other variants for another seed", async () => {
    const a = await generateAssessment(spec(), { analyse: fakeAnalyse });
    const b = await generateAssessment({ ...spec(), seed: 7 }, { analyse: fakeAnalyse });
    expect(b.variants.map((v) => v.condition)).not.toEqual(a.variants.map((v) => v.condition));
  });

  test("writes one key entry per variant and question, numbered, with the template's unit and tolerance", async () => {
    const g = await generateAssessment(spec(), { analyse: fakeAnalyse });
    expect(g.variants.map((v) => v.number)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
    expect(g.key).toHaveLength(60);
    const q5 = g.key.filter((k) => k.question === 5);
    expect(q5.every((k) => k.unit === "percentage points" && k.tolerance.kind === "absolute" && k.points === 2)).toBe(
      true,
    );
    expect(g.key.filter((k) => k.question === 1).every((k) => k.tolerance.kind === "exact")).toBe(true);
    expect(g.questions.map((q) => q.points)).toEqual([1, 1, 1, 1, 2, 1]);
  });

  test("computes every answer from the analysis at the variant's own condition", async () => {
    const g = await generateAssessment(spec(), { analyse: fakeAnalyse });
    for (const v of g.variants) {
      const r = fakeResult({ mechanismId: "invented", condition: v.condition });
      const k = (q: number) => g.key.find((e) => e.variant === v.number && e.question === q)?.value;
      const top = [...r.cycles.budget.byFamily].sort((a, b) => b.fraction - a.fraction)[0].family;
      expect(k(1)).toBe(top);
      const clox = r.cycles.cycles.find((c) => c.id === CLOX_CYCLE);
      expectClose(k(3) as number, clox?.chainLength as number, { rel: 1e-12 }, `variant ${v.number} chain length`);
      const n = (id: string) => r.steadyState.species.find((s) => s.id === id)?.numberDensity_cm3 as number;
      expectClose(k(4) as number, n("ClO") / n("Cl"), { rel: 1e-12 });
      const doubled = fakeResult({
        mechanismId: "invented",
        condition: { ...v.condition, poolTotals: { Cly: 2 * (v.condition.poolTotals?.Cly as number) } },
      });
      const share = (x: typeof r) => x.cycles.budget.byFamily.find((f) => f.family === "ClOx")?.fraction ?? 0;
      expectClose(k(5) as number, (share(doubled) - share(r)) * 100, { rel: 1e-12 });
      expectClose(k(6) as number, (clox?.chainLength as number) * 2, { rel: 1e-12 });
    }
  });

  test("redraws a variant where a question has no answer, and records why", async () => {
    // The invented ClOx cycle is absent below 20 km: with a range down to 5 km some first draws miss it.
    const g = await generateAssessment(spec({ ranges: { altitude_km: { min: 5, max: 48 } }, variants: 20 }), {
      analyse: fakeAnalyse,
    });
    expect(g.variants.every((v) => v.condition.altitude_km >= 20)).toBe(true);
    expect(g.variants.some((v) => v.attempt > 0)).toBe(true);
    expect(g.warnings.some((w) => /redrawn because the cycle R3\+R4 is not among the significant cycles/.test(w))).toBe(
      true,
    );
  });

  test("redraws a variant where the two largest families are too close to call", async () => {
    // In the invented model NOx and ClOx shares cross near 40 km.
    const g = await generateAssessment(spec({ ranges: { altitude_km: { min: 39, max: 41 } }, variants: 6 }), {
      analyse: fakeAnalyse,
      maxAttempts: 20,
    });
    for (const v of g.variants) {
      const r = fakeResult({ mechanismId: "invented", condition: v.condition });
      const [a, b] = [...r.cycles.budget.byFamily].sort((x, y) => y.fraction - x.fraction);
      expect(b.fraction).toBeLessThan(0.95 * a.fraction);
    }
  });

  test("throws if no draw gives an answer, naming the question", async () => {
    const s = spec({
      base: { altitude_km: 10 },
      ranges: { altitude_km: { min: 5, max: 15 } },
      questions: [
        { kind: "species-ratio", speciesA: "ClO", speciesB: "Cl" },
        { kind: "chain-length", cycleId: CLOX_CYCLE },
      ],
    });
    await expect(generateAssessment(s, { analyse: fakeAnalyse })).rejects.toThrow(
      /questions\[1\]: variant 1 found no conditions in 6 draws where question 2 has a sound answer/,
    );
  });

  test("runs the doubled-chlorine analysis with twice the variant's Cly and only when a question needs it", async () => {
    const seen: AnalysisRequest[] = [];
    const analyse = async (r: AnalysisRequest) => {
      seen.push(r);
      return fakeResult(r);
    };
    const draws = (g: { variants: { attempt: number }[] }) => g.variants.reduce((s, v) => s + v.attempt + 1, 0);
    const g = await generateAssessment(spec({ variants: 3 }), { analyse });
    expect(seen).toHaveLength(2 * draws(g));
    for (const a of g.analyses)
      expect(a.extraRequest?.condition.poolTotals?.Cly).toBe(2 * (a.baseRequest.condition.poolTotals?.Cly as number));
    seen.length = 0;
    const h = await generateAssessment(spec({ variants: 3, questions: [{ kind: "dominant-family" }] }), { analyse });
    expect(seen).toHaveLength(draws(h));
    expect(seen.every((r) => r.condition.poolTotals?.Cly !== undefined && r.condition.poolTotals.Cly <= 4e-9)).toBe(
      true,
    );
  });

  test("prints the same family choices on every sheet and states each question's unit", async () => {
    const g = await generateAssessment(spec(), { analyse: fakeAnalyse });
    const choices = g.sheets.map((s) => JSON.stringify(s.questions[0].choices));
    expect(new Set(choices).size).toBe(1);
    expect(g.sheets[0].questions[0].choices?.map((c) => c.value)).toEqual(["Ox", "NOx", "ClOx"]);
    for (const s of g.sheets) {
      expect(s.questions[2].text).toContain("turnovers");
      expect(s.questions[3].text).toContain("dimensionless");
      expect(s.questions[4].text).toContain("percentage points");
      expect(s.questions[4].text).toMatch(/Cly\) is \d\.\d+ ppbv/);
      expect(s.conditions.find((c) => c.label === "Altitude")?.value).toMatch(/^\d+\.?\d* km$/);
    }
  });
});

describe("distinct variants", () => {
  test("ten variants from a range of 29 altitudes all get different conditions", async () => {
    const g = await generateAssessment(spec({ ranges: { altitude_km: { min: 20, max: 48 } } }), {
      analyse: fakeAnalyse,
    });
    expect(new Set(g.variants.map((v) => v.condition.altitude_km)).size).toBe(10);
  });

  test("a variant whose first draw repeats an earlier one starts from its next attempt seed", () => {
    const s = spec({ ranges: { altitude_km: { min: 20, max: 23 } }, variants: 4 });
    const { starts, repeated } = distinctStarts(s);
    expect(repeated).toEqual([]);
    const alts = starts.map((a, i) => drawCondition(s.base, s.ranges ?? {}, variantSeed(s.seed, i + 1, a)).altitude_km);
    expect(new Set(alts).size).toBe(4);
  });

  test("warns when the ranges allow fewer distinct conditions than variants", async () => {
    const g = await generateAssessment(spec({ ranges: { altitude_km: { min: 30, max: 31 } }, variants: 4 }), {
      analyse: fakeAnalyse,
    });
    expect(g.warnings[0]).toMatch(/^the ranges allow too few distinct conditions: variants 3, 4 repeat/);
  });
});

test("variants that also draw Cly still get different altitudes when the altitude range allows it", async () => {
  for (const seed of [1, 2, 3, 2026]) {
    const g = await generateAssessment(
      {
        ...spec({ ranges: { altitude_km: { min: 25, max: 45 }, poolTotals: { Cly: { min: 2e-9, max: 4e-9 } } } }),
        seed,
      },
      { analyse: fakeAnalyse },
    );
    expect(new Set(g.variants.map((v) => v.condition.altitude_km)).size, `seed ${seed}`).toBe(10);
  }
});

test("a family below 1 % of the loss on every variant is not offered as a choice", async () => {
  const analyse = async (r: AnalysisRequest) => {
    const out = fakeResult(r);
    out.cycles.budget.byFamily.push(
      { family: "BrOx", oxLoss_cm3s: 1, fraction: 0.001 },
      { family: "unassigned", oxLoss_cm3s: 1, fraction: 0.2 },
    );
    return out;
  };
  const g = await generateAssessment(spec({ questions: [{ kind: "dominant-family" }] }), { analyse });
  expect(g.sheets[0].questions[0].choices?.map((c) => c.value)).toEqual(["Ox", "NOx", "ClOx"]);
});
