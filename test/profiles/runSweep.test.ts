import { describe, expect, it } from "vitest";
import { columnsAboveLevels, DOBSON_UNIT_cm2, ozoneColumnAbove_cm2 } from "@/lib/atmosphere";
import { runAnalysis } from "@/lib/engine/runAnalysis";
import type { AnalysisResult } from "@/lib/engine/types";
import { EngineError } from "@/lib/errors";
import { loadBuiltinMechanism } from "@/lib/mechanism";
import { analyseLevel } from "@/lib/profiles/analyseLevel";
import { planSweep } from "@/lib/profiles/planSweep";
import { runLevelBatch } from "@/lib/profiles/runLevelBatch";
import { inlineExecutor, runSweep, type SweepExecutor, useParallel } from "@/lib/profiles/runSweep";
import { standardProfile } from "@/lib/profiles/standardProfile";
import type { SweepLevel, SweepRequest, SweepResult } from "@/lib/profiles/types";
import { expectClose } from "../helpers/close";

const META = {
  engineVersion: "test",
  profile: { id: "standard", title: "standard", source: "standard" as const, demo: false, note: "" },
};

function setup(id: string) {
  const mech = loadBuiltinMechanism(id).mechanism;
  const ref = { id, title: mech.title };
  const executor = (workers = 2): SweepExecutor => inlineExecutor((b) => runLevelBatch(mech, ref, b), workers);
  const sweep = (request: Omit<SweepRequest, "mechanismId" | "profile">, workers = 2, options = {}) =>
    runSweep(
      planSweep({ mechanismId: id, profile: { kind: "standard" }, ...request }, standardProfile(), mech),
      executor(workers),
      { ...META, mechanism: ref },
      { parallel: "parallel" as const, ...options },
    );
  return { mech, ref, sweep, executor };
}

/** A level agrees with a full analysis: the same budget, family split, cycles and species (solver tolerance 1e-10). */
function expectLevelEqualsAnalysis(level: SweepLevel, single: AnalysisResult): void {
  const z = `${level.altitude_km} km`;
  expect(level.status, z).toBe(single.steadyState.status);
  expect(level.status, z).toBe("converged");
  const b = level.budget;
  if (!b) throw new Error(`${z}: no budget`);
  expectClose(b.loss_cm3s, single.cycles.budget.loss_cm3s, { rel: 1e-6 }, `${z} Ox loss`);
  expectClose(b.production_cm3s, single.cycles.budget.production_cm3s, { rel: 1e-6 }, `${z} Ox production`);
  const fam = new Map(single.cycles.budget.byFamily.map((f) => [f.family, f]));
  for (const f of b.byFamily) {
    const g = fam.get(f.family);
    expect(g, `${z} family ${f.family}`).toBeDefined();
    expectClose(f.oxLoss_cm3s, g?.oxLoss_cm3s as number, { rel: 1e-5, abs: 1e-12 * b.loss_cm3s }, `${z} ${f.family}`);
  }
  for (const s of single.steadyState.species) {
    const m = level.species.find((x) => x.id === s.id);
    expectClose(m?.numberDensity_cm3 as number, s.numberDensity_cm3, { rel: 1e-6, abs: 1e-6 }, `${z} [${s.id}]`);
  }
  expect(level.condition?.T_K).toBe(single.condition.T_K);
  expectClose(level.condition?.o3ColumnAbove_DU as number, single.condition.o3ColumnAbove_DU, { rel: 1e-12 });
  expect(level.condition?.aerosolSurface_um2cm3).toBe(single.condition.aerosolSurface_um2cm3);
}

describe("runSweep", () => {
  it("gives at every level the values of a single-level analysis at the same condition (instantaneous)", async () => {
    const { mech, ref, sweep } = setup("oxygen-chlorine");
    const r = await sweep({ grid: { from_km: 20, to_km: 50, step_km: 5 } });
    expect(r.levels.map((l) => l.altitude_km)).toEqual([20, 25, 30, 35, 40, 45, 50]);
    expect(r.timing.chains).toBe(2);
    expect(r.levels.filter((l) => l.warmStarted).length).toBe(5);
    for (const level of r.levels) expectLevelEqualsAnalysis(level, runAnalysis(mech, ref, level.request));
  });

  it("gives at every level the values of a single-level analysis in the 24-hour mode, warm-started from midnight", async () => {
    const { mech, ref, sweep } = setup("oxygen-chlorine");
    const r = await sweep({ grid: { from_km: 36, to_km: 40, step_km: 2 }, condition: { mode: "diurnal" } }, 1);
    expect(r.mode).toBe("diurnal");
    expect(r.levels[1].warmStarted).toBe(true);
    for (const level of r.levels) {
      const single = runAnalysis(mech, ref, level.request);
      // 24-hour means agree to the periodicity tolerance of the shooting solver (1e-4)
      expectClose(
        level.budget?.loss_cm3s as number,
        single.cycles.budget.loss_cm3s,
        { rel: 1e-3 },
        `${level.altitude_km} km`,
      );
    }
  });

  it("splits the Ox loss into fractions that sum to 1 at every level", async () => {
    const { sweep } = setup("reference");
    const r = await sweep({ grid: { from_km: 38, to_km: 42, step_km: 2 } });
    expect(r.families.length).toBeGreaterThan(3);
    for (const l of r.levels) {
      const sum = (l.budget?.byFamily ?? []).reduce((s, f) => s + f.fraction, 0);
      expectClose(sum, 1, { abs: 1e-9 }, `${l.altitude_km} km`);
      const lossSum = (l.budget?.byFamily ?? []).reduce((s, f) => s + f.oxLoss_cm3s, 0);
      expectClose(lossSum, l.budget?.loss_cm3s as number, { rel: 1e-9 }, `${l.altitude_km} km loss by family`);
    }
  });

  it("is the same with one chunk, two chunks and no warm start", async () => {
    const { sweep } = setup("oxygen-chlorine");
    const grid = { from_km: 25, to_km: 45, step_km: 5 };
    const one = await sweep({ grid }, 1);
    const two = await sweep({ grid }, 2);
    const cold = await sweep({ grid }, 5);
    expect(one.timing.chains).toBe(1);
    expect(cold.levels.every((l) => !l.warmStarted)).toBe(true);
    one.levels.forEach((l, i) => {
      expectClose(two.levels[i].budget?.loss_cm3s as number, l.budget?.loss_cm3s as number, { rel: 1e-6 });
      expectClose(cold.levels[i].budget?.loss_cm3s as number, l.budget?.loss_cm3s as number, { rel: 1e-6 });
    });
  });

  it("reports a level the executor could not run with its reason and still returns the others", async () => {
    const { mech, ref } = setup("oxygen-chlorine");
    const plan = planSweep(
      { mechanismId: "oxygen-chlorine", profile: { kind: "standard" }, grid: { from_km: 30, to_km: 40, step_km: 5 } },
      standardProfile(),
      mech,
    );
    const flaky: SweepExecutor = {
      workers: 1,
      run: async (b) => {
        if (b.tasks[0].request.condition.altitude_km === 35)
          throw new EngineError("timeout", "the computation took longer than 30 s and was stopped");
        return runLevelBatch(mech, ref, b);
      },
    };
    const r = await runSweep(plan, flaky, { ...META, mechanism: ref });
    expect(r.levels.map((l) => l.status)).toEqual(["converged", "error", "converged"]);
    expect(r.levels[1].message).toContain("longer than 30 s");
    expect(r.levels[1].budget).toBeNull();
    expect(r.warnings.join(" ")).toContain("1 of 3 levels did not converge: 35 km (error)");
  });

  it("reports the progress of every level and stops when cancelled", async () => {
    const { sweep } = setup("oxygen");
    const seen: number[] = [];
    const r = await sweep({ grid: { from_km: 30, to_km: 40, step_km: 2 } }, 2, {
      onProgress: (p: { done: number }) => seen.push(p.done),
    });
    expect(r.levels.length).toBe(6);
    expect(seen[0]).toBe(0);
    expect(seen[seen.length - 1]).toBe(6);
    const controller = new AbortController();
    controller.abort(new EngineError("cancelled", "the job was cancelled"));
    await expect(
      sweep({ grid: { from_km: 30, to_km: 40, step_km: 2 } }, 2, { signal: controller.signal }),
    ).rejects.toThrow("the job was cancelled");
  });

  it("with O3 solved takes each level's overhead column from the solved O3 of the levels above", async () => {
    const { sweep } = setup("oxygen-chlorine");
    const r: SweepResult = await sweep(
      { grid: { from_km: 30, to_km: 50, step_km: 2 }, condition: { ozone: "solved" } },
      2,
      { maxColumnPasses: 5, columnTolerance: 1e-3 },
    );
    expect(r.columnSource).toBe("solved");
    expect(r.levels.every((l) => l.status === "converged")).toBe(true);
    expect(r.timing.passes).toBeGreaterThan(1);
    // the iteration has settled: the columns used agree with the columns of the solved O3 (identity, tolerance 1e-3)
    const z = r.levels.map((l) => l.altitude_km);
    const n = r.levels.map((l) => l.species.find((s) => s.id === "O3")?.numberDensity_cm3 as number);
    const col = columnsAboveLevels(z, n, { columnAboveTop_cm2: ozoneColumnAbove_cm2(50) });
    r.levels.forEach((l, i) => {
      expectClose(
        l.condition?.o3ColumnAbove_DU as number,
        col[i] / DOBSON_UNIT_cm2,
        { rel: 2e-3 },
        `${l.altitude_km} km`,
      );
    });
    // columns grow downwards
    for (let i = 1; i < z.length; i++) expect(col[i - 1]).toBeGreaterThan(col[i]);
  });
});

describe("useParallel", () => {
  it("runs chains side by side for the 24-hour mode and when asked, one chain otherwise", () => {
    expect(useParallel("auto", "diurnal")).toBe(true);
    expect(useParallel("auto", "instantaneous")).toBe(false);
    expect(useParallel("parallel", "instantaneous")).toBe(true);
    expect(useParallel("sequential", "diurnal")).toBe(false);
  });
});

describe("analyseLevel", () => {
  it("equals runAnalysis when given the climatology's own overhead column", () => {
    const { mech, ref } = setup("oxygen-chlorine");
    const request = { mechanismId: "oxygen-chlorine", condition: { altitude_km: 32 } };
    const single = runAnalysis(mech, ref, request);
    const level = analyseLevel(mech, ref, request, { o3ColumnAbove_cm2: ozoneColumnAbove_cm2(32) });
    expect(level.result.condition.J_s).toEqual(single.condition.J_s);
    expectClose(level.result.cycles.budget.loss_cm3s, single.cycles.budget.loss_cm3s, { rel: 1e-9 });
    expect(level.nextState?.length).toBe(mech.species.length);
  });

  it("raises J(O3 → O(1D)) when the overhead column is thinner", () => {
    const { mech, ref } = setup("oxygen-chlorine");
    const request = { mechanismId: "oxygen-chlorine", condition: { altitude_km: 25 } };
    const thick = analyseLevel(mech, ref, request);
    const thin = analyseLevel(mech, ref, request, { o3ColumnAbove_cm2: ozoneColumnAbove_cm2(25) / 2 });
    // less overhead O3 lets more UV below 310 nm through (common practice; docs/references.md, Photolysis, reading notes)
    expect(thin.result.condition.J_s.O3_O1D).toBeGreaterThan(thick.result.condition.J_s.O3_O1D);
    expectClose(thin.result.condition.o3ColumnAbove_DU, thick.result.condition.o3ColumnAbove_DU / 2, { rel: 1e-12 });
  });
});
