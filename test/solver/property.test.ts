/**
 * Property tests (fast-check, used only in tests) on random small mechanisms:
 * the solver either converges with a residual below its tolerance or returns
 * a failure status with a message — never an exception, NaN or Infinity.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { solveSteadyState } from "../../lib/solver";
import type { SolveConditions } from "../../lib/solver/types";
import { allNumbers, makeMechanism, type ReactionSpec } from "./helpers";

const SOLVED = ["S0", "S1", "S2", "S3"];
const HELD = ["H0", "H1", "Sink"];

const speciesPick = (nSolved: number) => fc.constantFrom(...SOLVED.slice(0, nSolved), ...HELD);

const reaction = (nSolved: number) =>
  fc
    .record({
      reactants: fc.array(speciesPick(nSolved), { minLength: 1, maxLength: 2 }),
      products: fc.array(speciesPick(nSolved), { minLength: 1, maxLength: 3 }),
      logK: fc.double({ min: -16, max: 0, noNaN: true }),
    })
    .map(
      (r): ReactionSpec => ({
        equation: `${r.reactants.join(" + ")} -> ${r.products.join(" + ")}`,
        rate: { law: "arrhenius", A: 10 ** (r.reactants.length === 1 ? r.logK / 4 : r.logK - 0), EoverR_K: 0 },
      }),
    );

const problem = fc.integer({ min: 1, max: 4 }).chain((nSolved) =>
  fc.record({
    nSolved: fc.constant(nSolved),
    reactions: fc.array(reaction(nSolved), { minLength: 1, maxLength: 8 }),
    held: fc.tuple(fc.double({ min: 8, max: 14, noNaN: true }), fc.double({ min: 8, max: 14, noNaN: true })),
    pool: fc.option(
      fc.record({
        members: fc.subarray(SOLVED.slice(0, nSolved), { minLength: 1 }),
        logTotal: fc.double({ min: 6, max: 12, noNaN: true }),
      }),
    ),
  }),
);

describe("random small mechanisms", () => {
  it("converge with a small residual or fail with a status, never throwing or producing NaN", () => {
    fc.assert(
      fc.property(problem, (p) => {
        const mech = makeMechanism({
          species: [
            ...SOLVED.slice(0, p.nSolved).map((id) => ({ id, role: "solved" as const })),
            ...HELD.map((id) => ({ id, role: "held" as const })),
          ],
          reactions: p.reactions,
          pools: p.pool ? [{ id: "P", weights: Object.fromEntries(p.pool.members.map((m) => [m, 1])) }] : [],
        });
        const cond: SolveConditions = {
          T_K: 250,
          M_cm3: 1e17,
          J_s: {},
          held_cm3: { H0: 10 ** p.held[0], H1: 10 ** p.held[1], Sink: 0 },
          poolTotals_cm3: p.pool ? { P: 10 ** p.pool.logTotal } : {},
        };
        const s = solveSteadyState(mech, cond);
        expect(["converged", "no-steady-state", "diverged", "max-iterations"]).toContain(s.status);
        expect(allNumbers(s).every(Number.isFinite)).toBe(true);
        expect(s.message.length).toBeGreaterThan(0);
        if (s.status === "converged") {
          expect(s.residualNorm).toBeLessThanOrEqual(1e-10);
          const replaced = new Set(s.pools.map((q) => q.replacedEquation));
          for (const sp of s.species) {
            if (sp.role !== "solved" || replaced.has(sp.id)) continue;
            expect(Math.abs(sp.production_cm3s - sp.loss_cm3s)).toBeLessThanOrEqual(
              1e-9 * (sp.production_cm3s + sp.loss_cm3s),
            );
          }
          if (p.pool && s.pools.length > 0) {
            const sum = p.pool.members.reduce((a, m) => a + s.numberDensity_cm3[mech.speciesIndex[m]], 0);
            expect(Math.abs(sum - 10 ** p.pool.logTotal)).toBeLessThanOrEqual(1e-9 * 10 ** p.pool.logTotal);
          }
        }
      }),
      { numRuns: 300, seed: 20261201 },
    );
  });
});
