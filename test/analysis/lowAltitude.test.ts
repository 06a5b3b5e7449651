/**
 * Regression fixtures for the low-altitude cost and accuracy problem: the
 * reference mechanism at 10 and 20 km (engine defaults, 45° N, 20 March,
 * local noon, O3 held), where the pathway count grows because the Ox loss is
 * small next to the NOx and HOx null-cycle fluxes. Before the fix the 10 km
 * level took 12–18 s; timing is in bench/cases/analysis.ts, not here.
 */
import { describe, expect, it } from "vitest";
import { analyseCycles, findPathways, oxWeights } from "@/lib/analysis";
import { eliminationWork, isElementary } from "@/lib/analysis/elementaryModes";
import { reactionNet } from "@/lib/analysis/reactionNet";
import { valueAt } from "@/lib/analysis/sparseVector";
import { runAnalysis } from "@/lib/engine/runAnalysis";
import { loadBuiltinMechanism } from "@/lib/mechanism";
import { expectClose } from "../helpers/close";

const mech = loadBuiltinMechanism("reference").mechanism;
function solve(altitude_km: number) {
  const res = runAnalysis(
    mech,
    { id: "reference", title: mech.title },
    { mechanismId: "reference", condition: { altitude_km } },
  );
  expect(res.steadyState.status).toBe("converged");
  return { state: res.steadyState, held: Object.keys(res.condition.held_cm3), report: res.cycles };
}

/** The pathway search exactly as analyseCycles runs it (held species and Ox members never branching points). */
function pathwaysOf(s: ReturnType<typeof solve>) {
  const { weights } = oxWeights(mech, "standard");
  const held = new Set(s.held);
  const notBranching = mech.species
    .filter((sp, i) => sp.role !== "solved" || held.has(sp.id) || weights[i] > 0)
    .map((sp) => sp.id);
  return findPathways(mech, s.state, { fmin_cm3s: s.report.fmin_cm3s, notBranching, track: { Ox: weights } });
}

const deletedShare = (r: ReturnType<typeof analyseCycles>) => r.budget.unassignedLoss_cm3s / r.budget.loss_cm3s;

describe("analysis at 10 km (troposphere-like HOx and NOx cycling)", () => {
  const s = solve(10);
  const r = s.report;

  it("closes the Ox budget exactly: production − loss equals the reaction tendency, family fractions sum to 1", () => {
    expectClose(r.budget.production_cm3s - r.budget.loss_cm3s, r.budget.netChange_cm3s, {
      abs: 1e-9 * r.budget.loss_cm3s,
    });
    expectClose(
      r.budget.byFamily.reduce((a, f) => a + f.fraction, 0),
      1,
      { abs: 1e-12 },
    );
  });

  it("closes every species budget: kept pathways plus deleted flux equal the reaction tendencies", () => {
    const set = pathwaysOf(s);
    const got = set.deleted.net_cm3s.slice();
    for (const p of set.pathways) for (const t of p.net) got[t.species] += p.rate_cm3s * t.coef;
    const want = new Array(mech.species.length).fill(0);
    const rates = s.state.rate_cm3s.map((x) => Math.max(0, x));
    mech.reactions.forEach((rx, j) => {
      for (const t of rx.reactants) want[t.species] -= t.coef * rates[j];
      for (const t of rx.products) want[t.species] += t.coef * rates[j];
    });
    const scale = Math.max(...rates);
    got.forEach((g, i) => {
      expectClose(g, want[i], { abs: 1e-9 * scale }, mech.species[i].id);
    });
  });

  it("keeps the pathway Ox loss within 1 % between f_min 1e-4 and 1e-5 while the deleted share falls (measured 15.4 % → 8.9 %, loss −0.3 %)", () => {
    // The loss barely moves with f_min, so the large direct-formula mismatch at this level is a difference of
    // definition (docs/cycle-analysis.md, "Direct formula"), not an effect of the deleted pathways.
    const fine = analyseCycles(mech, s.state, { heldSpecies: s.held, fminRelative: 1e-5 });
    expectClose(r.budget.loss_cm3s, fine.budget.loss_cm3s, { rel: 0.01 }, "pathway Ox loss");
    expect(deletedShare(fine)).toBeLessThan(deletedShare(r));
    expect(deletedShare(fine)).toBeLessThanOrEqual(0.1);
    expect(deletedShare(r)).toBeLessThan(0.17);
  });
});

describe("analysis at 20 km", () => {
  const s = solve(20);

  it("keeps only elementary pathways at 10 and 20 km: each is alone in the null space of the branching points it balances (rank test)", () => {
    for (const set of [pathwaysOf(s), pathwaysOf(solve(10))]) expectAllElementary(set);
  });

  function expectAllElementary(set: ReturnType<typeof pathwaysOf>) {
    const nets = reactionNet(mech);
    const branching = new Set(set.branchingPoints.map((id) => mech.speciesIndex[id]));
    const work = eliminationWork(mech.species.length);
    expect(set.pathways.length).toBeGreaterThan(20);
    for (const p of set.pathways) {
      const net = { idx: p.net.map((t) => t.species), val: p.net.map((t) => t.coef) };
      const cols = p.steps.map((st) => st.reaction);
      expect(isElementary(cols, nets, (sp) => branching.has(sp) && valueAt(net, sp) === 0, work)).toBe(true);
    }
  }

  // The 20 km share of deleted pathways rose from 2.1 % to 7.3 % when the two-stream light, the
  // JPL HNO3 cross section and the NOy–N2O climatology came in (docs/cycle-analysis.md, "What moved"):
  // HOx and halogen cycles coupled through NOy reservoirs split into many small pathways. It falls
  // slowly with f_min (6.1 % at 1e-5, 4.5 % at 1e-6, 2.7 % at 1e-7, the last at 7 s), so the bound is 8 %.
  it("agrees with the direct formula within 1 % and deletes less than 8 % of the Ox loss (measured 0.80 % and 7.3 %)", () => {
    expect(Math.abs(s.report.budget.directMismatch ?? Number.NaN)).toBeLessThan(0.01);
    expect(deletedShare(s.report)).toBeLessThan(0.08);
  });

  // Measured 0.18 %, 0.80 % and 1.10 % at f_min 1e-3, 1e-4 and 1e-5: as pathways are resolved further,
  // part of the flux that the deleted remainder counted as loss turns out to be balanced by production
  // pathways, so the two sides converge to a small difference, not to zero.
  it("keeps that agreement within 1.5 % for f_min from 1e-3 to 1e-5, so it is not tuned to one threshold", () => {
    for (const fminRelative of [1e-3, 1e-5]) {
      const r = analyseCycles(mech, s.state, { heldSpecies: s.held, fminRelative });
      expect(Math.abs(r.budget.directMismatch ?? Number.NaN), `f_min ${fminRelative}`).toBeLessThan(0.015);
    }
  });
});
