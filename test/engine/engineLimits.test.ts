/**
 * Limits that mean what they say: a request the engine cannot finish within
 * the job time limit is refused at once with code "beyond-limit", and the
 * pathway search of a large network keeps to its work budget. The limits are
 * the engine's own measured figures (lib/engine/engineLimits.ts, DEVELOPERS.md),
 * so no outside source applies.
 */
import { describe, expect, it } from "vitest";
import { openNetwork } from "@/bench/generators/openNetwork";
import { findPathways } from "@/lib/analysis";
import { ENGINE_LIMITS, engineLimitWarnings } from "@/lib/engine/engineLimits";
import { resolveCondition, solveConditionsOf } from "@/lib/engine/resolveCondition";
import { runAnalysis } from "@/lib/engine/runAnalysis";
import { EngineError } from "@/lib/errors";
import { loadBuiltinMechanism, loadMechanism } from "@/lib/mechanism";
import { solveSteadyState } from "@/lib/solver";

const beyond = loadMechanism(
  openNetwork(ENGINE_LIMITS.diurnalMaxSolvedSpecies + 10, 4 * 160, { ozone: true }),
).mechanism;
const ref = { id: "g", title: beyond.title };

describe("the engine's limits", () => {
  it("refuse a 24-hour analysis of more solved species than the 24-hour limit, naming the limit", () => {
    let error: unknown;
    try {
      runAnalysis(beyond, ref, { mechanismId: "g", condition: { altitude_km: 30, mode: "diurnal" } });
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(EngineError);
    expect((error as EngineError).code).toBe("beyond-limit");
    expect((error as EngineError).path).toBe("condition.mode");
    expect((error as EngineError).message).toContain(
      `limited to ${ENGINE_LIMITS.diurnalMaxSolvedSpecies} solved species`,
    );
    expect((error as EngineError).message).toContain("has 162");
  });

  it("let the same mechanism be analysed in the instantaneous mode", () => {
    const r = runAnalysis(beyond, ref, { mechanismId: "g", condition: { altitude_km: 30, zenith_deg: 30 } });
    expect(r.steadyState.status).toBe("converged");
  });

  it("warn at upload about the modes a mechanism is too large for, and not for the built-ins", () => {
    expect(engineLimitWarnings(beyond)).toEqual([expect.stringContaining("only instantaneous analyses")]);
    expect(engineLimitWarnings(loadBuiltinMechanism("reference").mechanism)).toEqual([]);
  });
});

describe("the pathway search's work budget", () => {
  const mech = loadBuiltinMechanism("reference").mechanism;
  const cond = solveConditionsOf(resolveCondition(mech, { altitude_km: 20 }));
  const state = solveSteadyState(mech, cond);

  it("is far above what the reference mechanism needs (no warning, every branching point processed)", () => {
    for (const altitude_km of [15, 20, 30, 45]) {
      const r = runAnalysis(
        mech,
        { id: "reference", title: mech.title },
        { mechanismId: "reference", condition: { altitude_km } },
      );
      expect(
        r.cycles.warnings.filter((w) => /stopped after/.test(w)),
        `${altitude_km} km`,
      ).toEqual([]);
    }
    const fmin_cm3s = 1e-6 * Math.max(...state.rate_cm3s);
    const set = findPathways(mech, state, { fmin_cm3s });
    const limited = findPathways(mech, state, { fmin_cm3s, maxJoins: 1 });
    expect(limited.branchingPoints.length).toBeLessThan(set.branchingPoints.length);
    expect(limited.warnings).toContainEqual(expect.stringMatching(/stopped after \d+ of \d+ branching points/));
  });

  it("still accounts for every species' tendency when it stops early (kept plus deleted pathways)", () => {
    const limited = findPathways(mech, state, { fmin_cm3s: 0, maxJoins: 50 });
    const out = limited.deleted.net_cm3s.slice();
    for (const p of limited.pathways) for (const t of p.net) out[t.species] += p.rate_cm3s * t.coef;
    mech.reactions.forEach((r, j) => {
      for (const t of r.reactants) out[t.species] += t.coef * state.rate_cm3s[j];
      for (const t of r.products) out[t.species] -= t.coef * state.rate_cm3s[j];
    });
    const scale = Math.max(...state.rate_cm3s);
    for (const v of out) expect(Math.abs(v)).toBeLessThan(1e-9 * scale);
  });
});
