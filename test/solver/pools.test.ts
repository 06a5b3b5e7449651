import { describe, expect, it } from "vitest";
import { solveSteadyState } from "../../lib/solver";
import { expectClose } from "../helpers/close";
import { allNumbers, chlorineMechanism, clOxMechanism, conditions30km } from "./helpers";

const mech = chlorineMechanism();
const idx = mech.speciesIndex;

describe("pool totals", () => {
  it("conserves the pool total to 1e-10 relative", () => {
    const cond = conditions30km();
    const s = solveSteadyState(mech, cond);
    expect(s.status).toBe("converged");
    const x = s.numberDensity_cm3;
    const sum = x[idx.Cl] + x[idx.ClO] + x[idx.HCl];
    expectClose(sum, cond.poolTotals_cm3.Cly, { rel: 1e-10 }, "Cl + ClO + HCl");
  });

  it("replaces the balance of the dominant member and reports it", () => {
    const s = solveSteadyState(mech, conditions30km());
    const x = s.numberDensity_cm3;
    const members = ["Cl", "ClO", "HCl"];
    const dominant = members.reduce((a, b) => (x[idx[a]] >= x[idx[b]] ? a : b));
    expect(s.pools).toHaveLength(1);
    expect(s.pools[0].pool).toBe("Cly");
    expect(s.pools[0].replacedEquation).toBe(dominant);
  });

  it("reports the external source as the net chemical source of the pool (here CFCl3 photolysis, 3 Cl each)", () => {
    const cond = conditions30km();
    const s = solveSteadyState(mech, cond);
    // Identity: the only reaction that changes Cl + ClO + HCl is CFCl3 + hv -> 3 Cl.
    const expected = 3 * cond.J_s.CFCl3 * cond.held_cm3.CFCl3;
    expectClose(s.pools[0].externalSource_cm3s, expected, { rel: 1e-9 }, "external source");
    // The non-replaced members are balanced; the replaced one carries the imbalance.
    for (const sp of s.species.filter((q) => ["Cl", "ClO", "HCl"].includes(q.id))) {
      const net = sp.production_cm3s - sp.loss_cm3s;
      if (sp.id === s.pools[0].replacedEquation) expectClose(net, expected, { rel: 1e-6 }, `${sp.id} net`);
      else expectClose(net, 0, { abs: 1e-9 * (sp.production_cm3s + sp.loss_cm3s) }, `${sp.id} net`);
    }
  });

  it("says which pool needs a total when an exactly conserved pool has none", () => {
    const m = clOxMechanism();
    const cond = { T_K: 230, M_cm3: 1e17, J_s: {}, held_cm3: { O3: 1e12, O: 1e7, O2: 2e16 }, poolTotals_cm3: {} };
    const s = solveSteadyState(m, cond);
    expect(s.status).toBe("no-steady-state");
    expect(s.message).toContain("ClOx");
    expect(allNumbers(s).every(Number.isFinite)).toBe(true);
  });

  it("solves the exactly conserved pool once its total is given (ratio from the two exchange reactions)", () => {
    const m = clOxMechanism();
    const cond = {
      T_K: 230,
      M_cm3: 1e17,
      J_s: {},
      held_cm3: { O3: 1e12, O: 1e7, O2: 2e16 },
      poolTotals_cm3: { ClOx: 1e9 },
    };
    const s = solveSteadyState(m, cond);
    expect(s.status).toBe("converged");
    const [Cl, ClO] = [s.numberDensity_cm3[0], s.numberDensity_cm3[1]];
    expectClose(Cl + ClO, 1e9, { rel: 1e-10 }, "total");
    // [Cl]/[ClO] = k(ClO+O)[O] / (k(Cl+O3)[O3]), from the two balances
    expectClose(Cl / ClO, (s.reactions[1].k * 1e7) / (s.reactions[0].k * 1e12), { rel: 1e-9 }, "Cl/ClO");
  });

  it("counts a member held for this solve in the total: the solved members share what is left", () => {
    const cond = conditions30km();
    const held_cm3 = { ...cond.held_cm3, ClO: 2e8 };
    const s = solveSteadyState(mech, { ...cond, held_cm3 });
    expect(s.status).toBe("converged");
    const x = s.numberDensity_cm3;
    expect(x[idx.ClO]).toBe(2e8);
    // Identity: the pool total is the total of all its members, held or not.
    expectClose(x[idx.Cl] + x[idx.ClO] + x[idx.HCl], cond.poolTotals_cm3.Cly, { rel: 1e-10 }, "Cl + ClO + HCl");
    expect(s.pools[0].total_cm3).toBe(cond.poolTotals_cm3.Cly);
  });

  it("holding a member at its own steady-state amount changes nothing", () => {
    const cond = conditions30km();
    const free = solveSteadyState(mech, cond);
    const held_cm3 = { ...cond.held_cm3, ClO: free.numberDensity_cm3[idx.ClO] };
    const s = solveSteadyState(mech, { ...cond, held_cm3 });
    expectClose(s.numberDensity_cm3[idx.HCl], free.numberDensity_cm3[idx.HCl], { rel: 1e-8 }, "HCl");
    expectClose(s.numberDensity_cm3[idx.Cl], free.numberDensity_cm3[idx.Cl], { rel: 1e-8 }, "Cl");
  });

  it("throws if the held members already hold the whole total", () => {
    const cond = conditions30km();
    const held_cm3 = { ...cond.held_cm3, ClO: 2 * cond.poolTotals_cm3.Cly };
    expect(() => solveSteadyState(mech, { ...cond, held_cm3 })).toThrow(/leaving nothing for the solved members/);
  });

  it("sets every member to zero when the pool total is zero", () => {
    const cond = conditions30km();
    const s = solveSteadyState(mech, { ...cond, poolTotals_cm3: { Cly: 0 }, held_cm3: { ...cond.held_cm3, CFCl3: 0 } });
    expect(s.status).toBe("converged");
    for (const id of ["Cl", "ClO", "HCl"]) expect(s.numberDensity_cm3[idx[id]]).toBe(0);
  });
});
