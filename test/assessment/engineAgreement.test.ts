import { describe, expect, test } from "vitest";
import { type AssessmentSpec, generateAssessment, parseAssessmentSpec } from "@/lib/assessment";
import { compileSource } from "@/lib/engine/mechanismSource";
import { runAnalysis } from "@/lib/engine/runAnalysis";
import type { AnalysisRequest, AnalysisResult } from "@/lib/engine/types";
import { expectClose } from "../helpers/close";

// Identity checks against the project's own engine: every answer in the key must equal what a direct,
// independent analysis at the variant's printed condition gives. No outside reference values.

const direct = (req: AnalysisRequest): AnalysisResult => {
  const mech = compileSource({ id: req.mechanismId, title: req.mechanismId });
  return runAnalysis(mech, { id: req.mechanismId, title: req.mechanismId }, req);
};
const analyse = async (req: AnalysisRequest) => direct(req);

// Cycle ids are the sorted reaction ids of the built-in document (lib/mechanisms/oxygen-chlorine.yaml).
const CL_CYCLE = "Cl1+Cl2";

const teachingSpec = (): AssessmentSpec & { seed: number } => ({
  ...parseAssessmentSpec({
    title: "Engine agreement",
    mechanismId: "oxygen-chlorine",
    variants: 10,
    base: { altitude_km: 35, latitude_deg: 45, date: "2026-03-20", localSolarTime_h: 12 },
    ranges: {
      altitude_km: { min: 25, max: 48 },
      localSolarTime_h: { min: 9, max: 15 },
      poolTotals: { Cly: { min: 1.5e-9, max: 3.5e-9 } },
    },
    questions: [
      { kind: "dominant-family" },
      { kind: "rate-limiting-step", cycleId: CL_CYCLE },
      { kind: "chain-length", cycleId: CL_CYCLE },
      { kind: "species-ratio", speciesA: "ClO", speciesB: "Cl" },
      { kind: "clox-share-change" },
      { kind: "ozone-per-catalyst", cycleId: CL_CYCLE },
    ],
  }),
  seed: 314159,
});

const share = (r: AnalysisResult, family: string) =>
  r.cycles.budget.byFamily.find((f) => f.family === family)?.fraction ?? 0;

describe("an assessment on the teaching mechanism", () => {
  test("is the same, variants and answers, when generated twice from the same seed", async () => {
    const a = await generateAssessment(teachingSpec(), { analyse });
    const b = await generateAssessment(teachingSpec(), { analyse });
    expect(b.variants).toEqual(a.variants);
    expect(b.key).toEqual(a.key);
    expect(b.sheets).toEqual(a.sheets);
  });

  test("has every answer equal to a direct analysis at the variant's conditions", async () => {
    const g = await generateAssessment(teachingSpec(), { analyse });
    expect(g.key).toHaveLength(60);
    for (const v of g.variants) {
      const r = direct({ mechanismId: "oxygen-chlorine", condition: v.condition });
      expect(r.steadyState.status).toBe("converged");
      const k = (q: number) => g.key.find((e) => e.variant === v.number && e.question === q)?.value;
      const what = (q: number) => `variant ${v.number} (${v.condition.altitude_km} km), question ${q}`;

      const families = r.cycles.budget.byFamily.filter((f) => f.family !== "unassigned");
      expect(k(1), what(1)).toBe(families.reduce((a, b) => (b.fraction > a.fraction ? b : a)).family);
      const cycle = r.cycles.cycles.find((c) => c.id === CL_CYCLE);
      if (!cycle) throw new Error(`${what(2)}: the chlorine cycle is missing from the direct analysis`);
      expect(k(2), what(2)).toBe(cycle.rateLimitingStep);
      expectClose(k(3) as number, cycle.chainLength as number, { rel: 1e-9 }, what(3));
      const n = (id: string) => r.steadyState.species.find((s) => s.id === id)?.numberDensity_cm3 as number;
      expectClose(k(4) as number, n("ClO") / n("Cl"), { rel: 1e-9 }, what(4));
      const cly = v.condition.poolTotals?.Cly as number;
      const doubled = direct({
        mechanismId: "oxygen-chlorine",
        condition: { ...v.condition, poolTotals: { ...v.condition.poolTotals, Cly: 2 * cly } },
      });
      expectClose(k(5) as number, (share(doubled, "ClOx") - share(r, "ClOx")) * 100, { rel: 1e-9, abs: 1e-9 }, what(5));
      expectClose(k(6) as number, (cycle.chainLength as number) * cycle.oxPerTurnover, { rel: 1e-9 }, what(6));
    }
  });

  test("prints conditions that give back the same analysis when typed in", async () => {
    const g = await generateAssessment(teachingSpec(), { analyse });
    for (const [i, s] of g.sheets.entries()) {
      const v = g.variants[i];
      const row = (label: string) => s.conditions.find((c) => c.label === label)?.value;
      expect(Number(row("Altitude")?.replace(/ km$/, ""))).toBe(v.condition.altitude_km);
      expect(row("Latitude")).toBe("45° N");
      const [hh, mm] = (row("Local solar time") as string).split(":").map(Number);
      expect(hh + mm / 60).toBe(v.condition.localSolarTime_h);
      expectClose(Number(row("Total Cly")?.replace(/ ppbv$/, "")) * 1e-9, v.condition.poolTotals?.Cly as number, {
        rel: 1e-12,
      });
    }
  });
});

describe("an assessment on the reference mechanism", () => {
  test("agrees with a direct analysis for the dominant family and the NOx cycle's chain length", async () => {
    const spec = {
      ...parseAssessmentSpec({
        title: "Reference agreement",
        mechanismId: "reference",
        variants: 3,
        base: { altitude_km: 35 },
        ranges: { altitude_km: { min: 28, max: 45 } },
        questions: [{ kind: "dominant-family" }, { kind: "chain-length", cycleId: "NOx3+NOx4" }],
      }),
      seed: 2718,
    };
    const g = await generateAssessment(spec, { analyse });
    for (const v of g.variants) {
      const r = direct({ mechanismId: "reference", condition: v.condition });
      const top = r.cycles.budget.byFamily
        .filter((f) => f.family !== "unassigned")
        .sort((a, b) => b.fraction - a.fraction)[0];
      expect(g.key.find((e) => e.variant === v.number && e.question === 1)?.value).toBe(top.family);
      const nox = r.cycles.cycles.find((c) => c.id === "NOx3+NOx4");
      expectClose(
        g.key.find((e) => e.variant === v.number && e.question === 2)?.value as number,
        nox?.chainLength as number,
        { rel: 1e-9 },
        `variant ${v.number}`,
      );
    }
  });
});
