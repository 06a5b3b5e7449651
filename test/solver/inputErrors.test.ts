import { describe, expect, it } from "vitest";
import { InputError } from "../../lib/errors";
import { integrate, solveDiurnal, solveSteadyState } from "../../lib/solver";
import { chapmanMechanism, conditions30km, makeMechanism } from "./helpers";

const mech = chapmanMechanism();
const cond = conditions30km();

function thrown(f: () => unknown): InputError {
  try {
    f();
  } catch (e) {
    expect(e).toBeInstanceOf(InputError);
    return e as InputError;
  }
  throw new Error("did not throw");
}

describe("malformed input", () => {
  it("throws if a held species has no amount and no default", () => {
    const e = thrown(() => solveSteadyState(mech, { ...cond, held_cm3: { N2: 1e17 } }));
    expect(e.path).toBe("conditions.held_cm3.O2");
  });

  it("throws if T, [M] or a J value is not a finite positive number", () => {
    expect(thrown(() => solveSteadyState(mech, { ...cond, T_K: -5 })).path).toBe("conditions.T_K");
    expect(thrown(() => solveSteadyState(mech, { ...cond, M_cm3: Number.NaN })).path).toBe("conditions.M_cm3");
    expect(thrown(() => solveSteadyState(mech, { ...cond, J_s: { O2: Number.POSITIVE_INFINITY } })).path).toBe(
      "conditions.J_s.O2",
    );
    expect(thrown(() => solveSteadyState(mech, { ...cond, held_cm3: { ...cond.held_cm3, O2: -1 } })).path).toBe(
      "conditions.held_cm3.O2",
    );
  });

  it("throws if the warm start or the rate-constant override has the wrong length", () => {
    expect(thrown(() => solveSteadyState(mech, cond, { initialState: [1, 2] })).path).toBe("options.initialState");
    expect(thrown(() => solveSteadyState(mech, cond, { rateConstants: [1] })).path).toBe("options.rateConstants");
    expect(thrown(() => solveSteadyState(mech, cond, { residualTolerance: 2 })).path).toBe("options.residualTolerance");
    expect(thrown(() => solveSteadyState(mech, cond, { maxIterations: 0 })).path).toBe("options.maxIterations");
  });

  it("throws if a rate constant comes out negative", () => {
    const m = makeMechanism({
      species: [
        { id: "A", role: "held" },
        { id: "X", role: "solved" },
      ],
      reactions: [{ equation: "A + hv -> X", rate: { law: "photolysis-fixed", J_s: -1 } }],
    });
    expect(
      thrown(() => solveSteadyState(m, { T_K: 250, M_cm3: 1e17, J_s: {}, held_cm3: { A: 1 }, poolTotals_cm3: {} }))
        .path,
    ).toBe("reactions[0]");
  });

  it("throws if the integration length or the diurnal input is malformed", () => {
    expect(thrown(() => integrate(mech, cond, { duration_s: 0 })).path).toBe("input.duration_s");
    expect(thrown(() => solveDiurnal(mech, { conditionsAt: () => cond, reportAt_h: 25 })).path).toBe(
      "input.reportAt_h",
    );
    // biome-ignore lint/suspicious/noExplicitAny: a deliberately wrong input
    expect(thrown(() => solveDiurnal(mech, { conditionsAt: 3 as any })).path).toBe("input.conditionsAt");
  });

  it("ignores entries for species or pools the mechanism does not have, with a warning", () => {
    const s = solveSteadyState(mech, { ...cond, held_cm3: { ...cond.held_cm3, CH4: 1e12 } });
    expect(s.status).toBe("converged");
    expect(s.warnings?.some((w) => w.includes("CH4"))).toBe(true);
  });
});
