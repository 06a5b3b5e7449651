/** An instructor record of an invented assessment, built on the fake analyses of ./fakeAnalysis.ts (fast, no engine). */
import { generateAssessment, type InstructorAssessment, parseAssessmentSpec } from "@/lib/assessment";
import { CLOX_CYCLE, fakeAnalyse, NOX_CYCLE } from "./fakeAnalysis";

export async function instructorRecord(): Promise<InstructorAssessment> {
  const spec = {
    ...parseAssessmentSpec({
      title: "Invented test assessment",
      mechanismId: "invented",
      variants: 10,
      base: { altitude_km: 30 },
      ranges: { altitude_km: { min: 20, max: 48 }, poolTotals: { Cly: { min: 2e-9, max: 4e-9 } } },
      questions: [
        { kind: "dominant-family" },
        { kind: "rate-limiting-step", cycleId: NOX_CYCLE },
        { kind: "chain-length", cycleId: CLOX_CYCLE },
        { kind: "species-ratio", speciesA: "ClO", speciesB: "Cl" },
        { kind: "clox-share-change" },
        { kind: "ozone-per-catalyst", cycleId: CLOX_CYCLE },
      ],
    }),
    seed: 4242,
  };
  const g = await generateAssessment(spec, { analyse: fakeAnalyse });
  return {
    instructorId: "INSTRUCTORxxxxxx",
    studentId: "STUDENTyyyyyyyyy",
    title: spec.title,
    instructions: g.instructions,
    spec,
    mechanism: g.mechanism,
    engineVersion: "test",
    createdAt: "2026-03-20T00:00:00.000Z",
    variants: g.variants,
    questions: g.questions,
    key: g.key,
    analyses: [{ variant: 1, role: "base", analysisId: "ANALYSISzzzzzzzz" }],
    sheets: g.sheets,
    warnings: g.warnings,
  };
}
