/**
 * The analysis on real solver output: the built-in mechanisms solved by the
 * engine at the default climatology (45° N, 20 March, local noon).
 */
import { describe, expect, it } from "vitest";
import type { CycleReport } from "@/lib/analysis";
import { runAnalysis } from "@/lib/engine/runAnalysis";
import { loadBuiltinMechanism } from "@/lib/mechanism";
import { expectClose } from "../helpers/close";

function analyse(id: "oxygen-chlorine" | "reference", altitude_km: number): CycleReport {
  const mech = loadBuiltinMechanism(id).mechanism;
  const res = runAnalysis(mech, { id, title: mech.title }, { mechanismId: id, condition: { altitude_km } });
  expect(res.steadyState.status).toBe("converged");
  return res.cycles;
}

/** Share of the Ox loss by a family, coupled cycles counted in each family they name. */
function familyShare(r: CycleReport, family: string): number {
  return r.budget.byFamily.filter((f) => f.family.split("-").includes(family)).reduce((s, f) => s + f.fraction, 0);
}

describe("oxygen + chlorine set in the upper stratosphere", () => {
  const r = analyse("oxygen-chlorine", 40);
  const clox = r.cycles.find((c) => c.family === "ClOx" && c.steps.length === 2);

  it("finds the ClOx cycle with net O + O3 -> 2 O2 and ClO + O as its rate-limiting step (Lary 1997; common practice)", () => {
    expect(clox).toBeDefined();
    expect(clox!.netEquation).toBe("O + O3 -> 2 O2");
    const slowest = clox!.steps.find((s) => s.reactionId === clox!.rateLimitingStep)!;
    expect(slowest.equation.replace(/\s+/g, " ")).toMatch(/^ClO \+ O -> Cl \+ O2$/);
  });

  it("gives a ClOx chain length near 40 km of at least a hundred (common practice: hundreds to thousands)", () => {
    expect(clox!.chainLength).not.toBeNull();
    expect(clox!.chainLength!).toBeGreaterThanOrEqual(100);
  });

  it("also reports the operational chain length k[ClO][O] / (ClOx loss to reservoirs) (Lary 1997; docs/references.md, Loss partitioning and chain length), not below the pathway one", () => {
    const slowest = clox!.steps.find((s) => s.reactionId === clox!.rateLimitingStep)!;
    const lossClOx = r.carrierFamilies.find((f) => f.family === "ClOx")!.lossToReservoirs_cm3s;
    expect(clox!.chainCarrier).toBe("ClOx");
    expectClose(clox!.chainLengthRateLimiting!, slowest.rate_cm3s / lossClOx, { rel: 1e-12 });
    expect(clox!.chainLengthRateLimiting!).toBeGreaterThanOrEqual(clox!.chainLength!);
  });

  it("gives the pure-oxygen cycle the loss 2k[O][O3]", () => {
    const ox = r.cycles.find((c) => c.family === "Ox" && c.netEquation === "O + O3 -> 2 O2")!;
    expect(ox.steps).toHaveLength(1);
    expectClose(ox.oxLoss_cm3s, 2 * ox.steps[0].rate_cm3s, { rel: 1e-12 });
  });
});

describe("reference mechanism, 20–60 km", () => {
  const levels = [20, 25, 30, 35, 40, 45, 50, 55, 60];
  const reports = new Map(levels.map((z) => [z, analyse("reference", z)]));

  it("closes the Ox budget at every level (production − loss = reaction tendency; fractions sum to 1)", () => {
    for (const [z, r] of reports) {
      expectClose(
        r.budget.production_cm3s - r.budget.loss_cm3s,
        r.budget.netChange_cm3s,
        {
          abs: 1e-9 * r.budget.loss_cm3s,
        },
        `${z} km`,
      );
      expectClose(
        r.budget.byFamily.reduce((s, f) => s + f.fraction, 0),
        1,
        { abs: 1e-12 },
        `${z} km`,
      );
      // deleted share 7.3 % at 20 km and 3.4 % at 25 km since the two-stream light and NOy
      // climatology (test/analysis/lowAltitude.test.ts says why); under 3 % above
      expect(r.budget.unassignedLoss_cm3s / r.budget.loss_cm3s, `${z} km`).toBeLessThan(
        z <= 20 ? 0.08 : z <= 25 ? 0.04 : 0.03,
      );
    }
  });

  it("agrees with the direct rate-limiting-step formula within 1 % at every level 20–60 km (measured 0.80 % at 20 km)", () => {
    for (const [z, r] of reports) expect(Math.abs(r.budget.directMismatch ?? Number.NaN), `${z} km`).toBeLessThan(0.01);
  });

  it("has NOx cycles largest near 30–35 km, as Jucks et al. (1996, JGR 101) measured for 24–38 km", () => {
    for (const z of [30, 35]) {
      const r = reports.get(z)!;
      const shares = ["Ox", "HOx", "NOx", "ClOx", "BrOx"].map((f) => [f, familyShare(r, f)] as const);
      const top = shares.reduce((a, b) => (b[1] > a[1] ? b : a));
      expect(top[0], `${z} km`).toBe("NOx");
    }
  });

  it("has HOx cycles largest above about 45 km (Brasseur & Solomon 2005, ch. 5; from memory)", () => {
    for (const z of [45, 50, 55, 60]) {
      const r = reports.get(z)!;
      for (const f of ["Ox", "NOx", "ClOx", "BrOx"])
        expect(familyShare(r, "HOx"), `${z} km vs ${f}`).toBeGreaterThan(familyShare(r, f));
    }
  });

  it("has the ClOx share peak near 40 km, at 10–40 % there (from memory: 25–35 % with 1990s chlorine; docs/references.md, Loss partitioning and chain length)", () => {
    const clox = levels.map((z) => [z, familyShare(reports.get(z)!, "ClOx")] as const);
    const peak = clox.reduce((a, b) => (b[1] > a[1] ? b : a));
    expect(peak[0]).toBeGreaterThanOrEqual(35);
    expect(peak[0]).toBeLessThanOrEqual(45);
    const at40 = familyShare(reports.get(40)!, "ClOx");
    expect(at40).toBeGreaterThan(0.1);
    expect(at40).toBeLessThan(0.4);
  });
});
