import { describe, expect, test } from "vitest";
import { checkAgainstMechanism, parseAssessmentSpec } from "@/lib/assessment";

const ok = {
  title: "Week 6 lab",
  mechanismId: "oxygen-chlorine",
  variants: 10,
  base: { altitude_km: 35 },
  ranges: { altitude_km: { min: 25, max: 45 } },
  questions: [{ kind: "dominant-family" }, { kind: "species-ratio", speciesA: "ClO", speciesB: "Cl" }],
};

function pathOf(body: unknown): string | undefined {
  try {
    parseAssessmentSpec(body);
  } catch (e) {
    return (e as { path?: string }).path;
  }
  return undefined;
}

describe("parseAssessmentSpec", () => {
  test("accepts a well-formed request", () => {
    expect(parseAssessmentSpec(ok).questions).toHaveLength(2);
  });

  test("throws if a field is bad, naming the field", () => {
    const cases: [unknown, string][] = [
      [{ ...ok, title: "" }, "title"],
      [{ ...ok, variants: 0 }, "variants"],
      [{ ...ok, variants: 41 }, "variants"],
      [{ ...ok, variants: 2.5 }, "variants"],
      [{ ...ok, seed: -3 }, "seed"],
      [{ ...ok, seed: 2 ** 32 }, "seed"],
      [{ ...ok, base: { altitude_km: 120 } }, "base.altitude_km"],
      [{ ...ok, ranges: { altitude_km: { min: 40, max: 30 } } }, "ranges.altitude_km"],
      [{ ...ok, ranges: { altitude_km: { min: 0, max: 100 } } }, "ranges.altitude_km"],
      [{ ...ok, ranges: { poolTotals: { Cly: { min: 0, max: 2 } } } }, "ranges.poolTotals.Cly"],
      [{ ...ok, ranges: { pressure: { min: 1, max: 2 } } }, "ranges"],
      [{ ...ok, questions: [] }, "questions"],
      [{ ...ok, questions: [{ kind: "essay" }] }, "questions[0].kind"],
      [{ ...ok, questions: [{ kind: "chain-length" }] }, "questions[0].cycleId"],
      [{ ...ok, questions: [{ kind: "species-ratio", speciesA: "ClO" }] }, "questions[0].speciesB"],
      [{ ...ok, questions: [{ kind: "species-ratio", speciesA: "Cl", speciesB: "Cl" }] }, "questions[0].speciesB"],
      [
        { ...ok, questions: [{ kind: "dominant-family", tolerance: { kind: "relative", rel: 0.1 } }] },
        "questions[0].tolerance",
      ],
      [
        { ...ok, questions: [{ kind: "chain-length", cycleId: "x", tolerance: { kind: "exact" } }] },
        "questions[0].tolerance",
      ],
      [
        { ...ok, questions: [{ kind: "chain-length", cycleId: "x", tolerance: { kind: "relative", rel: 0 } }] },
        "questions[0].tolerance.rel",
      ],
    ];
    for (const [body, path] of cases) expect(pathOf(body), path).toBe(path);
  });
});

describe("checkAgainstMechanism", () => {
  const offer = { solvedSpecies: ["O", "Cl", "ClO"], pools: ["Cly"] };

  test("accepts questions the mechanism can answer", () => {
    expect(() => checkAgainstMechanism(parseAssessmentSpec(ok), offer)).not.toThrow();
  });

  test("throws if a species, the pool to double or a ranged pool is missing, naming the input", () => {
    const ratio = parseAssessmentSpec({
      ...ok,
      questions: [{ kind: "species-ratio", speciesA: "BrO", speciesB: "Cl" }],
    });
    expect(() => checkAgainstMechanism(ratio, offer)).toThrow(/questions\[0\]\.speciesA: BrO is not a solved species/);
    const clox = parseAssessmentSpec({ ...ok, questions: [{ kind: "clox-share-change" }] });
    expect(() => checkAgainstMechanism(clox, { solvedSpecies: [], pools: [] })).toThrow(
      /questions\[0\]\.kind: .* has no Cly pool/,
    );
    const pool = parseAssessmentSpec({ ...ok, ranges: { poolTotals: { Bry: { min: 1e-11, max: 2e-11 } } } });
    expect(() => checkAgainstMechanism(pool, offer)).toThrow(/ranges\.poolTotals\.Bry: unknown pool Bry/);
  });
});
