import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { findPathways } from "@/lib/analysis";
import { InputError } from "@/lib/errors";
import { expectClose } from "../helpers/close";
import { chapman, chlorine, rateOf } from "./helpers";

/** Σ kept rate × net + deleted net, by species index. */
function accounted(set: ReturnType<typeof findPathways>, nSpecies: number): number[] {
  const out = set.deleted.net_cm3s.slice();
  for (const p of set.pathways) for (const t of p.net) out[t.species] += p.rate_cm3s * t.coef;
  expect(out.length).toBe(nSpecies);
  return out;
}

/** Σ_j r_j S_ij straight from the reactions. */
function reactionTendency(mech: ReturnType<typeof chlorine>["mech"], rates: number[]): number[] {
  const out = new Array(mech.species.length).fill(0);
  mech.reactions.forEach((r, j) => {
    for (const t of r.reactants) out[t.species] -= t.coef * rates[j];
    for (const t of r.products) out[t.species] += t.coef * rates[j];
  });
  return out;
}

describe("findPathways (Lehmann 2004)", () => {
  it("keeps every reaction as its own pathway when there is no branching point", () => {
    const c = chapman();
    const set = findPathways(c.mech, c, { notBranching: ["O", "O3"] });
    expect(set.branchingPoints).toEqual([]);
    expect(set.pathways.length).toBe(4);
    expectClose(
      set.pathways.reduce((s, p) => s + p.rate_cm3s, 0),
      c.rate_cm3s.reduce((a, b) => a + b, 0),
      {
        rel: 1e-12,
      },
    );
  });

  it("takes branching points in order of increasing lifetime", () => {
    const s = chlorine();
    const set = findPathways(s.mech, s, { notBranching: ["O", "O3"] });
    // τ(Cl) ≈ 1/(k5[O3]) < τ(ClO) ≈ 1/(k6[O] + k7[NO]) < τ(HCl) = 1/(k9[OH]) for the hand-made numbers
    expect(set.branchingPoints).toEqual(["Cl", "ClO", "HCl"]);
  });

  it("finds the ClOx cycle at exactly the rate of ClO + O when nothing is deleted (hand-solved steady state)", () => {
    const s = chlorine();
    const set = findPathways(s.mech, s, { notBranching: ["O", "O3"] });
    const c5 = s.mech.reactions.findIndex((r) => r.id === "C5");
    const c6 = s.mech.reactions.findIndex((r) => r.id === "C6");
    const cycle = set.pathways.find(
      (p) =>
        p.steps.length === 2 &&
        p.steps.every((st) => (st.reaction === c5 || st.reaction === c6) && st.multiplicity === 1),
    );
    expect(cycle).toBeDefined();
    expectClose(cycle!.rate_cm3s, rateOf(s.mech, s.rate_cm3s, "C6"), { rel: 1e-9 }, "ClOx cycle rate = k6[ClO][O]");
  });

  it("splits combined pathways that contain a sub-pathway into elementary ones", () => {
    // (OH + HCl → Cl; Cl + O3 → ClO) joined with (ClO + O → Cl; Cl + CH4 → HCl) at ClO contains the ClOx cycle
    // and the HCl null-loop OH + CH4 → H2O + CH3; after splitting no pathway holds both C6 and C8.
    const s = chlorine();
    const set = findPathways(s.mech, s, { notBranching: ["O", "O3"] });
    const idx = (id: string) => s.mech.reactions.findIndex((r) => r.id === id);
    for (const p of set.pathways) {
      const rx = p.steps.map((st) => st.reaction);
      expect(rx.includes(idx("C6")) && rx.includes(idx("C8"))).toBe(false);
    }
  });

  it("closes every species budget: kept pathways plus deleted flux equal the reaction tendencies", () => {
    const s = chlorine();
    const want = reactionTendency(s.mech, s.rate_cm3s);
    for (const fmin of [0, 10, 1e3, 1e5]) {
      const set = findPathways(s.mech, s, { notBranching: ["O", "O3"], fmin_cm3s: fmin });
      const got = accounted(set, s.mech.species.length);
      const scale = Math.max(...s.rate_cm3s);
      got.forEach((g, i) => {
        expectClose(g, want[i], { abs: 1e-9 * scale }, `species ${s.mech.species[i].id} at f_min ${fmin}`);
      });
    }
  });

  it("closes the budgets for any positive rates, balanced or not (property)", () => {
    const s = chlorine();
    fc.assert(
      fc.property(fc.array(fc.double({ min: 1, max: 1e7, noNaN: true }), { minLength: 9, maxLength: 9 }), (r) => {
        const state = { numberDensity_cm3: s.numberDensity_cm3, rate_cm3s: r };
        const set = findPathways(s.mech, state, { notBranching: ["O", "O3"], fmin_cm3s: 100 });
        const want = reactionTendency(s.mech, r);
        const got = accounted(set, s.mech.species.length);
        const scale = Math.max(...r);
        return got.every((g, i) => Math.abs(g - want[i]) <= 1e-8 * scale);
      }),
      { numRuns: 60 },
    );
  });

  it("keeps the imbalance of a branching point as storage", () => {
    const s = chlorine();
    const r = s.rate_cm3s.slice();
    r[s.mech.reactions.findIndex((x) => x.id === "C8")] *= 2; // HCl now produced faster than it is lost
    const set = findPathways(
      s.mech,
      { numberDensity_cm3: s.numberDensity_cm3, rate_cm3s: r },
      { notBranching: ["O", "O3"] },
    );
    const hcl = set.storage.find((x) => x.species === "HCl");
    expectClose(hcl!.rate_cm3s, rateOf(s.mech, s.rate_cm3s, "C8"), { rel: 1e-9 }, "HCl storage = added production");
  });

  it("throws if the state does not match the mechanism or an option is invalid", () => {
    const s = chlorine();
    expect(() => findPathways(s.mech, { numberDensity_cm3: s.numberDensity_cm3, rate_cm3s: [1, 2] })).toThrow(
      InputError,
    );
    expect(() => findPathways(s.mech, { numberDensity_cm3: [1], rate_cm3s: s.rate_cm3s })).toThrow(/numberDensity_cm3/);
    const bad = s.rate_cm3s.slice();
    bad[0] = Number.NaN;
    expect(() => findPathways(s.mech, { numberDensity_cm3: s.numberDensity_cm3, rate_cm3s: bad })).toThrow(/J1/);
    bad[0] = -1e6;
    expect(() => findPathways(s.mech, { numberDensity_cm3: s.numberDensity_cm3, rate_cm3s: bad })).toThrow(/negative/);
    expect(() => findPathways(s.mech, s, { fmin_cm3s: -1 })).toThrow(/fmin_cm3s/);
    expect(() => findPathways(s.mech, s, { lifetimeLimit_s: 0 })).toThrow(/lifetimeLimit_s/);
    expect(() => findPathways(s.mech, s, { notBranching: ["Xe"] })).toThrow(/Xe/);
  });
});
