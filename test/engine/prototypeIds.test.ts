/**
 * Ids that are also names of Object members (`__proto__`, `constructor`,
 * `toString`, `hasOwnProperty`, `valueOf`) are ids like any other: the
 * reference mechanism with five lumped species (and a pool) renamed so gives
 * the same analysis as under the ordinary names. The species renamed are in no
 * table by name (odd-oxygen weights, carrier families), so the results must
 * agree to round-off. The expected values are the engine's own results for
 * the ordinary names, so no outside source applies.
 */
import { describe, expect, it } from "vitest";
import { parseAnalysisRequest } from "@/lib/engine/requestSchema";
import { runAnalysis } from "@/lib/engine/runAnalysis";
import type { AnalysisResult, ConditionInput } from "@/lib/engine/types";
import { ownValue } from "@/lib/idRecord";
import { loadMechanism } from "@/lib/mechanism";
import { RENAMED, referenceYaml, renamedDocument } from "../fixtures/prototypeIds";
import { expectClose } from "../helpers/close";

const ordinary = loadMechanism(referenceYaml).mechanism;

function analyse(text: string, condition: ConditionInput): AnalysisResult {
  const mech = loadMechanism(text).mechanism;
  return runAnalysis(mech, { id: "m", title: mech.title }, { mechanismId: "m", condition });
}

function expectSameAnalysis(a: AnalysisResult, b: AnalysisResult): void {
  expect(b.steadyState.status).toBe(a.steadyState.status);
  expect(a.steadyState.status).toBe("converged");
  // the same arithmetic in the same order: equal to round-off
  a.steadyState.numberDensity_cm3.forEach((x, i) => {
    expectClose(b.steadyState.numberDensity_cm3[i], x, { rel: 1e-12, abs: 1e-300 }, ordinary.species[i].id);
  });
  expectClose(b.cycles.budget.loss_cm3s, a.cycles.budget.loss_cm3s, { rel: 1e-12 }, "Ox loss");
  expect(b.cycles.cycles.map((c) => c.family)).toEqual(a.cycles.cycles.map((c) => c.family));
  a.cycles.cycles.forEach((c, k) => {
    expectClose(b.cycles.cycles[k].rate_cm3s, c.rate_cm3s, { rel: 1e-9 }, c.id);
  });
  for (const s of b.steadyState.species) expect(Number.isFinite(s.numberDensity_cm3), s.id).toBe(true);
}

describe("species named like Object members", () => {
  const all = Object.keys(RENAMED);
  const renamed = renamedDocument(all);

  it("load, and keep their names in the compiled mechanism", () => {
    const mech = loadMechanism(renamed).mechanism;
    for (const [to] of Object.values(RENAMED)) {
      const i = mech.speciesIndex[to];
      expect(typeof i, to).toBe("number");
      expect(mech.species[i].id).toBe(to);
    }
    expect(mech.species.map((s) => s.atoms)).toEqual(ordinary.species.map((s) => s.atoms));
  });

  for (const condition of [
    { altitude_km: 30 },
    { altitude_km: 30, ozone: "solved" },
    { altitude_km: 30, mode: "diurnal" },
  ] satisfies ConditionInput[]) {
    it(`give the same analysis as the ordinary names (${JSON.stringify(condition)})`, () => {
      expectSameAnalysis(analyse(referenceYaml, condition), analyse(renamed, condition));
    });
  }

  for (const one of all) {
    it(`work alone: ${RENAMED[one][0]} for ${one}`, () => {
      const condition = { altitude_km: 30 };
      expectSameAnalysis(analyse(referenceYaml, condition), analyse(renamedDocument([one]), condition));
    });
  }

  it("can be held and given totals by name in a request", () => {
    const renamedPool = renamedDocument(all, "__proto__");
    const body = (pool: string) =>
      JSON.parse(`{"mechanismId":"m","condition":{"altitude_km":25,"ozone":"solved","poolTotals":{"${pool}":3.1e-9}}}`);
    const withProto = parseAnalysisRequest(body("__proto__"));
    expect(Object.keys(withProto.condition.poolTotals ?? {})).toEqual(["__proto__"]);
    const a = analyse(referenceYaml, parseAnalysisRequest(body("Cly")).condition);
    const b = analyse(renamedPool, withProto.condition);
    expectSameAnalysis(a, b);
    expect(ownValue(b.condition.sources, "__proto__")).toBe("given");
  });

  it("are reported as unknown, not read from a prototype, when the mechanism has no such species", () => {
    const req = parseAnalysisRequest(
      JSON.parse('{"mechanismId":"m","condition":{"altitude_km":30,"held":{"constructor":1e-9}}}'),
    );
    expect(() => analyse(referenceYaml, req.condition)).toThrow(/unknown species constructor/);
  });
});
