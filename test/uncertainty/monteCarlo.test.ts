import { describe, expect, it } from "vitest";
import { solveConditionsOf } from "@/lib/engine/resolveCondition";
import { runAnalysis } from "@/lib/engine/runAnalysis";
import { InputError } from "@/lib/errors";
import { uncertaintyFactor } from "@/lib/kinetics";
import { loadBuiltinMechanism } from "@/lib/mechanism";
import {
  finishMonteCarlo,
  logFactors,
  monteCarlo,
  monteCarloCsv,
  monteCarloNotes,
  normalDraws,
  planMonteCarlo,
  quantile,
  runSampleBatch,
  sampleMultipliers,
  shareBands,
} from "@/lib/uncertainty";
import { expectClose } from "../helpers/close";

const mech = loadBuiltinMechanism("oxygen-chlorine").mechanism;
const central = runAnalysis(
  mech,
  { id: "oxygen-chlorine", title: mech.title },
  {
    mechanismId: "oxygen-chlorine",
    condition: { altitude_km: 40 },
  },
);
const cond = solveConditionsOf(central.condition);
const cycleOptions = { heldSpecies: Object.keys(central.condition.held_cm3) };
const run = (options: Parameters<typeof monteCarlo>[5]) =>
  monteCarlo(mech, cond, central.steadyState, central.cycles, cycleOptions, options);

describe("Monte Carlo over the rate-constant uncertainties", () => {
  it("gives the same result for the same seed, and a different one for another seed", () => {
    const a = run({ samples: 24, seed: 7 });
    const b = run({ samples: 24, seed: 7 });
    const c = run({ samples: 24, seed: 8 });
    expect(b.summaries).toEqual(a.summaries);
    expect(c.summaries).not.toEqual(a.summaries);
    expect(a.succeeded).toBe(24);
    expect(a.failed).toBe(0);
  });

  it("gives the same samples however they are split into batches", () => {
    const plan = planMonteCarlo(mech, cond, central.steadyState, central.cycles, cycleOptions, {
      samples: 10,
      seed: 3,
      batchSize: 3,
    });
    expect(plan.batches.map((b) => b.count)).toEqual([3, 3, 3, 1]);
    const split = plan.batches.map((b) => runSampleBatch(mech, b)).reverse();
    const whole = runSampleBatch(mech, { ...plan.batches[0], start: 0, count: 10 });
    expect(split.flatMap((b) => b.values).length).toBe(10);
    const merged = finishMonteCarlo(plan, split, 0);
    const single = finishMonteCarlo(plan, [whole], 0);
    expect(merged.summaries).toEqual(single.summaries);
  });

  it("collapses every range to the central value when every uncertainty factor is 1", () => {
    const mc = run({ samples: 8, seed: 1, factorScale: 0 });
    expect(mc.varied).toEqual([]);
    mc.summaries.forEach((s) => {
      if (s.central === null) return;
      for (const v of [s.median, s.p05, s.p95]) expectClose(v as number, s.central, { rel: 1e-8, abs: 1e-12 }, s.key);
    });
  });

  it("spreads the outputs when the factors are as published, keeping the central value inside the 5–95 % range of the Ox loss", () => {
    const mc = run({ samples: 60, seed: 11 });
    const loss = mc.summaries[mc.outputs.findIndex((o) => o.key === "oxLoss")];
    expect((loss.p95 as number) - (loss.p05 as number)).toBeGreaterThan(0);
    expect(loss.central as number).toBeGreaterThan(loss.p05 as number);
    expect(loss.central as number).toBeLessThan(loss.p95 as number);
    expect(mc.varied.length).toBeGreaterThan(0);
    expect(mc.notVaried).toContain("J_O2");
    const bands = shareBands(mc);
    expect(bands.map((b) => b.family).sort()).toEqual(["ClOx", "Ox"]);
    const csv = monteCarloCsv(mc).split("\r\n");
    expect(csv[0]).toBe("key,kind,label,unit,central,median,p05,p95,count,missing");
    expect(csv.length).toBe(mc.outputs.length + 2);
    expect(monteCarloNotes(mc)[0]).toEqual([
      "monte-carlo",
      `${mc.samples} samples, seed ${mc.seed}, ${mc.succeeded} converged, ${mc.failed} failed`,
    ]);
  });

  it("counts and reports a sample that fails instead of hiding it", () => {
    const plan = planMonteCarlo(mech, cond, central.steadyState, central.cycles, cycleOptions, { samples: 4 });
    // a negative held amount makes every solve throw: each sample is a recorded failure
    const broken = { ...plan.batches[0], conditions: { ...cond, held_cm3: { ...cond.held_cm3, O2: -1 } } };
    const res = runSampleBatch(mech, broken);
    expect(res.values).toEqual([null, null, null, null]);
    expect(res.failures.map((f) => f.index)).toEqual([0, 1, 2, 3]);
    expect(res.failures[0].message).toMatch(/held_cm3\.O2/);
    const mc = finishMonteCarlo(plan, [res], 0);
    expect(mc.failed).toBe(4);
    expect(mc.succeeded).toBe(0);
    expect(mc.summaries.every((s) => s.median === null && s.count === 0)).toBe(true);
    expect(mc.warnings.join(" ")).toMatch(/4 of 4 samples did not give a steady state/);
  });

  it("throws if the sample count or the seed is invalid", () => {
    expect(() => run({ samples: 0 })).toThrow(InputError);
    expect(() => run({ samples: 2.5 })).toThrow(/sample count/);
    expect(() => run({ seed: -1 })).toThrow(/seed/);
    expect(() => run({ photolysisFactor: 0.5 })).toThrow(/photolysisFactor/);
  });
});

describe("the draws", () => {
  it("use the JPL factor f(T) = f(298)·exp|g(1/T − 1/298)| as one standard deviation of ln k", () => {
    // O + O3: f(298) = 1.15, g = 200 K (JPL 19-5, from memory; docs/references.md, Kinetics)
    const sigma = logFactors(mech, 220);
    const j = mech.reactions.findIndex((r) => r.equation === "O + O3 -> 2 O2");
    expect(j).toBeGreaterThanOrEqual(0);
    expectClose(Math.exp(sigma[j]), 1.15 * Math.exp(200 * (1 / 220 - 1 / 298)), { rel: 1e-12 });
    expectClose(Math.exp(sigma[j]), uncertaintyFactor({ f298: 1.15, g: 200 }, 220), { rel: 1e-12 });
    // ln of the sampled factors over many samples: mean 0, standard deviation ln f (log-normal k)
    const logs = Array.from({ length: 4000 }, (_x, i) => Math.log(sampleMultipliers(sigma, 5, i)[j]) / sigma[j]);
    const mean = logs.reduce((s, v) => s + v, 0) / logs.length;
    const sd = Math.sqrt(logs.reduce((s, v) => s + (v - mean) ** 2, 0) / (logs.length - 1));
    expectClose(mean, 0, { abs: 0.05 }, "mean of z"); // 3.2 standard errors of 1/√4000
    expectClose(sd, 1, { abs: 0.04 }, "sd of z");
  });

  it("are standard normal with the 5 % and 95 % points at ∓1.645 (standard normal table)", () => {
    const z = Array.from({ length: 2000 }, (_x, i) => Array.from(normalDraws(9, i, 10)))
      .flat()
      .sort((a, b) => a - b);
    expectClose(quantile(z, 0.05), -1.645, { abs: 0.05 });
    expectClose(quantile(z, 0.95), 1.645, { abs: 0.05 });
    expect(normalDraws(9, 3, 5)).toEqual(normalDraws(9, 3, 5));
    expect(() => normalDraws(9, -1, 2)).toThrow(RangeError);
  });

  it("take percentiles by linear interpolation between order statistics (NumPy's default, e.g. percentile(1..20, 5) = 1.95)", () => {
    const x = Array.from({ length: 20 }, (_v, i) => i + 1);
    expectClose(quantile(x, 0.05), 1.95, { rel: 1e-12 });
    expectClose(quantile(x, 0.95), 19.05, { rel: 1e-12 });
    expectClose(quantile([1, 2, 3, 4], 0.5), 2.5, { rel: 1e-12 });
    expect(quantile([4], 0.95)).toBe(4);
    expect(() => quantile([], 0.5)).toThrow(RangeError);
  });
});

describe("reverse rates from an equilibrium constant", () => {
  it("follow their forward reaction's draw, with their own factor that of K (k_rev = k_fwd / K)", () => {
    const ref = loadBuiltinMechanism("reference").mechanism;
    const reverse = ref.reactions.filter((r) => r.forwardReaction !== undefined);
    // NO2 + NO3 ⇌ N2O5, HO2 + NO2 ⇌ HO2NO2 and ClO + ClO ⇌ Cl2O2 in the reference set (JPL Table 3 pairs)
    expect(reverse.length).toBeGreaterThanOrEqual(3);
    const sigma = logFactors(ref, 220);
    for (let i = 0; i < 20; i++) {
      const coupled = sampleMultipliers(sigma, 11, i, ref);
      const own = sampleMultipliers(sigma, 11, i);
      for (const r of reverse) {
        const f = r.forwardReaction as number;
        expectClose(coupled[r.index], own[r.index] * own[f], { rel: 1e-12 }, r.id);
        expect(coupled[f]).toBe(own[f]);
      }
    }
  });
});
