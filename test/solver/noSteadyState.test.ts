import { describe, expect, it } from "vitest";
import { solveSteadyState } from "../../lib/solver";
import { expectClose } from "../helpers/close";
import { allNumbers, chapmanMechanism, chlorineMechanism, conditions30km, makeMechanism } from "./helpers";

const finite = (v: unknown) => allNumbers(v).every(Number.isFinite);

describe("no steady state", () => {
  it("names the species with no source at night (every J = 0) and still returns finite numbers", () => {
    const s = solveSteadyState(chapmanMechanism(), { ...conditions30km(), J_s: {} });
    expect(s.status).toBe("no-steady-state");
    for (const id of ["O", "O(1D)", "O3"]) expect(s.message).toContain(id);
    expect(s.message).toContain("24-hour");
    expect(finite(s)).toBe(true);
  });

  it("solves the rest of a mechanism at night and names what is left undetermined", () => {
    const s = solveSteadyState(chlorineMechanism(), { ...conditions30km(), J_s: {} });
    expect(s.status).toBe("no-steady-state");
    expect(s.message).toContain("O3");
    expect(finite(s)).toBe(true);
  });

  it("names a species that is produced but never lost", () => {
    const m = makeMechanism({
      species: [
        { id: "A", role: "held" },
        { id: "X", role: "solved" },
        { id: "Y", role: "solved" },
      ],
      reactions: [
        { equation: "A + hv -> X", rate: { law: "photolysis-fixed", J_s: 1e-5 } },
        { equation: "A + hv -> Y", rate: { law: "photolysis-fixed", J_s: 1e-5 } },
        { equation: "Y -> A", rate: { law: "arrhenius", A: 1e-3, EoverR_K: 0 } },
      ],
    });
    const s = solveSteadyState(m, { T_K: 250, M_cm3: 1e17, J_s: {}, held_cm3: { A: 1e10 }, poolTotals_cm3: {} });
    expect(s.status).toBe("no-steady-state");
    expect(s.message).toMatch(/\bX\b.*produced but never lost/);
    expect(s.message).not.toMatch(/\bY\b/);
    expect(finite(s)).toBe(true);
  });

  it("names a species that no reaction makes", () => {
    const m = makeMechanism({
      species: [
        { id: "A", role: "held" },
        { id: "X", role: "solved" },
        { id: "Z", role: "solved" },
      ],
      reactions: [
        { equation: "A + hv -> X", rate: { law: "photolysis-fixed", J_s: 1e-5 } },
        { equation: "X -> A", rate: { law: "arrhenius", A: 1e-3, EoverR_K: 0 } },
        { equation: "Z -> A", rate: { law: "arrhenius", A: 1e-3, EoverR_K: 0 } },
      ],
    });
    const s = solveSteadyState(m, { T_K: 250, M_cm3: 1e17, J_s: {}, held_cm3: { A: 1e10 }, poolTotals_cm3: {} });
    expect(s.status).toBe("no-steady-state");
    expect(s.message).toContain("Z");
    // X is still solved: [X] = J[A]/k (exact), to the solver's relative residual tolerance 1e-10
    expectClose(s.numberDensity_cm3[1], (1e-5 * 1e10) / 1e-3, { rel: 1e-10 }, "[X]");
  });
});
