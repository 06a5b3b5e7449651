import { describe, expect, it } from "vitest";
import { InputError } from "@/lib/errors";
import { loadBuiltinMechanism } from "@/lib/mechanism";
import { compareSweeps, explainDifference } from "@/lib/profiles/compareSweeps";
import { comparisonCsv, sweepLevelsCsv } from "@/lib/profiles/csvTables";
import { planSweep } from "@/lib/profiles/planSweep";
import { runLevelBatch } from "@/lib/profiles/runLevelBatch";
import { inlineExecutor, runSweep } from "@/lib/profiles/runSweep";
import { standardProfile } from "@/lib/profiles/standardProfile";
import type { SweepRequest, SweepResult } from "@/lib/profiles/types";
import { expectClose } from "../helpers/close";

const mech = loadBuiltinMechanism("oxygen-chlorine").mechanism;
const ref = { id: "oxygen-chlorine", title: mech.title };
const META = {
  engineVersion: "test",
  mechanism: ref,
  profile: { id: "standard", title: "standard", source: "standard" as const, demo: false, note: "" },
};

function sweep(extra: Partial<SweepRequest> = {}): Promise<SweepResult> {
  const request: SweepRequest = {
    mechanismId: "oxygen-chlorine",
    profile: { kind: "standard" },
    grid: { from_km: 25, to_km: 45, step_km: 5 },
    ...extra,
  };
  return runSweep(
    planSweep(request, standardProfile(), mech),
    inlineExecutor((b) => runLevelBatch(mech, ref, b), 2),
    META,
  );
}

describe("compareSweeps", () => {
  it("gives zero difference for a profile compared with itself", async () => {
    const a = await sweep();
    const c = compareSweeps(a, a);
    expect(c.levels.length).toBe(5);
    for (const l of c.levels) {
      expect(l.difference?.loss_cm3s).toBe(0);
      expect(l.difference?.relative).toBe(0);
      expect(Object.values(l.difference?.oxLoss_cm3s ?? { x: 1 }).every((v) => v === 0)).toBe(true);
      expect(Object.values(l.difference?.fraction ?? { x: 1 }).every((v) => v === 0)).toBe(true);
      expect(l.difference?.explaining).toEqual([]);
      expect(l.difference?.explainedFraction).toBeNull();
    }
  });

  it("explains a change of Cly by the chlorine cycles, and the family differences add up to the total", async () => {
    const a = await sweep({ condition: { poolTotals: { Cly: 2e-9 } } });
    const b = await sweep({ condition: { poolTotals: { Cly: 4e-9 } } });
    const c = compareSweeps(a, b, { labels: { a: "Cly 2 ppbv", b: "Cly 4 ppbv" }, topCycles: 3 });
    expect(c.labels).toEqual({ a: "Cly 2 ppbv", b: "Cly 4 ppbv" });
    for (const l of c.levels) {
      const d = l.difference;
      if (!d) throw new Error("no difference");
      // more Cly destroys more Ox (common practice: ClOx catalysis is first order in active chlorine)
      expect(d.loss_cm3s).toBeGreaterThan(0);
      const sum = Object.values(d.oxLoss_cm3s).reduce((s, v) => s + v, 0);
      expectClose(sum, d.loss_cm3s, { rel: 1e-9, abs: 1e-9 * (l.a.loss_cm3s ?? 0) }, `${l.altitude_km} km Σ families`);
      const fr = Object.values(d.fraction).reduce((s, v) => s + v, 0);
      expectClose(fr, 0, { abs: 1e-9 }, `${l.altitude_km} km Σ fraction changes`);
      expect(d.explaining.length).toBeGreaterThan(0);
      expect(d.explaining.length).toBeLessThanOrEqual(3);
      expect(d.explaining[0].family).toMatch(/ClOx/);
      for (let i = 1; i < d.explaining.length; i++)
        expect(Math.abs(d.explaining[i - 1].delta_cm3s)).toBeGreaterThanOrEqual(Math.abs(d.explaining[i].delta_cm3s));
      const e = d.explaining[0];
      expectClose(e.delta_cm3s, e.b_cm3s - e.a_cm3s, { rel: 1e-12 });
      expectClose(e.shareOfDifference as number, e.delta_cm3s / d.loss_cm3s, { rel: 1e-12 });
    }
    const csv = comparisonCsv(c).split("\r\n");
    expect(csv[0]).toContain("Cly 2 ppbv Ox loss (molecules cm-3 s-1)");
    expect(csv.length).toBe(c.levels.length + 2);
  });

  it("compares only the altitudes both sweeps have, and throws when they share none", async () => {
    const a = await sweep();
    const b = { ...a, levels: a.levels.slice(1, 3) };
    const c = compareSweeps(a, b);
    expect(c.levels.map((l) => l.altitude_km)).toEqual([30, 35]);
    expect(c.warnings[0]).toContain("only the 2 altitudes");
    const none = { ...a, levels: [] };
    expect(() => compareSweeps(a, none)).toThrow(InputError);
    expect(() => compareSweeps(a, a, { topCycles: 0 })).toThrow(/topCycles/);
  });

  it("leaves no difference where one side failed, and says where", async () => {
    const a = await sweep();
    const b = structuredClone(a);
    b.levels[2] = { ...b.levels[2], status: "max-iterations", message: "did not converge", budget: null, cycles: [] };
    const c = compareSweeps(a, b);
    expect(c.levels[2].difference).toBeNull();
    expect(c.levels[2].b.loss_cm3s).toBeNull();
    expect(c.warnings.join(" ")).toContain("35 km");
    expect(sweepLevelsCsv(b).split("\r\n")[3]).toContain("max-iterations,did not converge");
  });
});

describe("explainDifference", () => {
  it("matches the same cycle under two mechanisms whose reaction ids differ, by its steps", async () => {
    const a = await sweep();
    const b = structuredClone(a);
    const level = b.levels[2];
    level.cycles = level.cycles.map((c) => ({ ...c, id: `other-${c.id}`, oxLoss_cm3s: 2 * c.oxLoss_cm3s }));
    const changes = explainDifference(a.levels[2], level, 1, 50);
    expect(changes.length).toBe(a.levels[2].cycles.filter((c) => c.oxLoss_cm3s !== 0).length);
    for (const c of changes) expectClose(c.b_cm3s, 2 * c.a_cm3s, { rel: 1e-12 }, c.netEquation);
    expect(a.levels[2].cycles[0].stepsKey).toContain("->");
  });
});
