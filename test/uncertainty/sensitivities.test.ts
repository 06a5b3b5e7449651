import { describe, expect, it } from "vitest";
import { analyseCycles } from "@/lib/analysis";
import { solveConditionsOf } from "@/lib/engine/resolveCondition";
import { runAnalysis } from "@/lib/engine/runAnalysis";
import type { ConditionInput } from "@/lib/engine/types";
import { InputError } from "@/lib/errors";
import { loadBuiltinMechanism } from "@/lib/mechanism";
import { solveSteadyState } from "@/lib/solver";
import { evaluateOutputs, rankSensitivities, sensitivities } from "@/lib/uncertainty";
import { expectClose } from "../helpers/close";

function setUp(id: string, condition: ConditionInput) {
  const mech = loadBuiltinMechanism(id).mechanism;
  const r = runAnalysis(mech, { id, title: mech.title }, { mechanismId: id, condition });
  const cond = solveConditionsOf(r.condition);
  const cycleOptions = { heldSpecies: Object.keys(r.condition.held_cm3) };
  return { mech, r, cond, cycleOptions };
}

describe("sensitivity coefficients", () => {
  it("match central finite differences of whole solves on the oxygen + chlorine set to 1e-4 relative", () => {
    const { mech, r, cond, cycleOptions } = setUp("oxygen-chlorine", { altitude_km: 40 });
    const rep = sensitivities(mech, cond, r.steadyState, r.cycles, cycleOptions, { cycleDifference: "forward" });
    expect(rep.status).toBe("ok");
    expect(rep.outputs.map((o) => o.kind)).toEqual(
      expect.arrayContaining(["ox-loss", "family-share", "cycle-rate", "chain-length", "number-density"]),
    );
    const h = 1e-4; // identity check: implicit-function derivative against re-solved perturbed steady states
    let checked = 0;
    mech.reactions.forEach((rx, j) => {
      const [plus, minus] = [h, -h].map((e) => {
        const rateMultipliers = mech.reactions.map((_x, q) => (q === j ? Math.exp(e) : 1));
        const s = solveSteadyState(mech, cond, {
          initialState: r.steadyState.numberDensity_cm3,
          rateMultipliers,
          residualTolerance: 1e-14,
          stepTolerance: 1e-13,
        });
        expect(s.status).toBe("converged");
        return evaluateOutputs(rep.outputs, s, analyseCycles(mech, s, cycleOptions));
      });
      rep.outputs.forEach((o, i) => {
        const p = plus[i];
        const m = minus[i];
        if (p === null || m === null || !(p > 0 && m > 0)) return;
        const fd = (Math.log(p) - Math.log(m)) / (2 * h);
        const s = rep.coefficients[i][j];
        expect(s, `${o.key} / ${rx.id}`).not.toBeNull();
        // 1e-4 relative; coefficients below 1e-3 in size are compared to 1e-7 absolute (solver tolerance / 2h)
        expectClose(s as number, fd, { rel: 1e-4, abs: 1e-7 }, `${o.key} / ${rx.id}`);
        checked++;
      });
    });
    expect(checked).toBeGreaterThan(100);
  });

  it("give the Chapman exponents +½ and −½ for the pure-oxygen [O3] with respect to k(O + O2 + M) and k(O + O3)", () => {
    // Chapman scheme: with O(1D) + O3 removed, the built-in oxygen set loses odd oxygen only by O + O3.
    // Ox balance 2 J_O2[O2] = 2 k4[O][O3] and O3 balance k2[O2][M][O] = J_O3[O3] + k4[O][O3] give
    // J_O3 x² + B x − C = 0 (x = [O3], B = J_O2[O2], C ∝ k2/k4), so ∂ln x/∂ln k2 = (J_O3 x + B)/(2 J_O3 x + B),
    // which is the textbook ½ of [O3] = [O2](J_O2 k2 [M]/(J_O3 k4))^½ up to B/(J_O3 x) (Chapman 1930; e.g.
    // Brasseur & Solomon, Aeronomy of the Middle Atmosphere, 3rd ed., 2005, Ch. 5, from memory).
    const full = loadBuiltinMechanism("oxygen").mechanism;
    const reactions = full.reactions
      .filter((r) => r.id !== "Ox5" && r.id !== "Ox6")
      .map((r, index) => ({ ...r, index }));
    const mech = { ...full, reactions };
    const r = runAnalysis(
      mech,
      { id: "oxygen", title: mech.title },
      { mechanismId: "oxygen", condition: { altitude_km: 30, ozone: "solved" } },
    );
    const cond = solveConditionsOf(r.condition);
    const rep = sensitivities(mech, cond, r.steadyState, r.cycles, { heldSpecies: Object.keys(r.condition.held_cm3) });
    const i = rep.outputs.findIndex((o) => o.key === "density:O3");
    expect(i).toBeGreaterThanOrEqual(0);
    const at = (id: string) => rep.coefficients[i][rep.parameters.findIndex((p) => p.id === id)] as number;
    const x = r.steadyState.numberDensity_cm3[mech.speciesIndex.O3];
    const B = cond.J_s.O2 * cond.held_cm3.O2;
    const J3 = cond.J_s.O3_O + cond.J_s.O3_O1D;
    const exact = (J3 * x + B) / (2 * J3 * x + B);
    expectClose(at("Ox1"), exact, { rel: 1e-6 }, "O + O2 + M, exact");
    expectClose(at("Ox2"), -exact, { rel: 1e-6 }, "O + O3, exact");
    expectClose(at("Ox1"), 0.5, { abs: B / (J3 * x) }, "O + O2 + M, textbook ½");
    expectClose(at("Ox2"), -0.5, { abs: B / (J3 * x) }, "O + O3, textbook −½");
    // the two O3 channels both end as O (O(1D) is quenched): together they act as one J_O3 with exponent −½
    expectClose(at("J:O3_O") + at("J:O3_O1D"), -0.5, { abs: B / (J3 * x) }, "J(O3)");
  });

  it("sum a photolysis channel's coefficient over the reactions that use it", () => {
    const { mech, r, cond, cycleOptions } = setUp("oxygen-chlorine", { altitude_km: 35 });
    const rep = sensitivities(mech, cond, r.steadyState, r.cycles, cycleOptions);
    for (const p of rep.parameters.filter((q) => q.kind === "photolysis-channel")) {
      const q = rep.parameters.indexOf(p);
      rep.outputs.forEach((_o, i) => {
        const sum = p.reactions.reduce((s, j) => s + (rep.coefficients[i][j] as number), 0);
        expectClose(rep.coefficients[i][q] as number, sum, { rel: 1e-12, abs: 1e-15 });
      });
    }
  });

  it("rank the reactions by the size of their coefficient, largest first", () => {
    const { mech, r, cond, cycleOptions } = setUp("oxygen-chlorine", { altitude_km: 40 });
    const rep = sensitivities(mech, cond, r.steadyState, r.cycles, cycleOptions);
    const rows = rankSensitivities(rep, "density:ClO", { top: 5 });
    expect(rows.length).toBeGreaterThan(0);
    for (let q = 1; q < rows.length; q++)
      expect(Math.abs(rows[q].coefficient)).toBeLessThanOrEqual(Math.abs(rows[q - 1].coefficient));
    expect(rows[0].rank).toBe(1);
    expect(() => rankSensitivities(rep, "density:Xx")).toThrow(InputError);
  });

  it("give the number densities' coefficients from the Jacobian and leave the held O3 out of the outputs", () => {
    const { mech, r, cond, cycleOptions } = setUp("oxygen-chlorine", { altitude_km: 40 });
    const rep = sensitivities(mech, cond, r.steadyState, r.cycles, cycleOptions, { cycleDifference: "none" });
    expect(rep.cycleMethod).toBe("none");
    expect(rep.outputs.some((o) => o.key === "density:O3")).toBe(false);
    expect(rep.warnings.join(" ")).toMatch(/O3 is held/);
    const i = rep.outputs.findIndex((o) => o.key === "density:ClO");
    // Cly is held as a pool: scaling every rate constant of the Cl/ClO exchange leaves the total fixed
    expect(rep.coefficients[i].some((s) => s !== null && Math.abs(s) > 1e-3)).toBe(true);
  });

  it("report a status instead of coefficients for a state that did not converge", () => {
    const { mech, r, cond, cycleOptions } = setUp("oxygen-chlorine", { altitude_km: 40 });
    const bad = { ...r.steadyState, status: "max-iterations" as const, message: "stopped" };
    const rep = sensitivities(mech, cond, bad, r.cycles, cycleOptions);
    expect(rep.status).toBe("not-converged");
    expect(rep.coefficients.every((row) => row.every((s) => s === null))).toBe(true);
  });

  it("throws if the difference method or the step is invalid", () => {
    const { mech, r, cond, cycleOptions } = setUp("oxygen", { altitude_km: 30 });
    expect(() =>
      sensitivities(mech, cond, r.steadyState, r.cycles, cycleOptions, {
        cycleDifference: "sideways" as "forward",
      }),
    ).toThrow(/invalid cycleDifference/);
    expect(() => sensitivities(mech, cond, r.steadyState, r.cycles, cycleOptions, { step: 0 })).toThrow(InputError);
    expect(() => sensitivities(mech, cond, r.steadyState, r.cycles, cycleOptions, { majorCycleShare: 2 })).toThrow(
      /majorCycleShare/,
    );
  });
});
