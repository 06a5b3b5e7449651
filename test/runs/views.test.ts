/**
 * What the run page draws and the explorer opens, as data: the chart series
 * and marks of a small run, an hour of a run as an instant (not a steady
 * state), and a failed segment ending the run with what was done before it.
 */
import { describe, expect, it } from "vitest";
import { loadBuiltinMechanism } from "../../lib/mechanism";
import {
  assembleRun,
  dailyLossChart,
  hourSnapshot,
  poolTotalsOf,
  RUN_DEFAULTS,
  type RunRequest,
  type RunSegment,
  runChartSeries,
  runDailyCsv,
  runInThread,
  timeLineChart,
} from "../../lib/runs";
import { periodicStart } from "../../lib/runs/startState";
import { expectClose } from "../helpers/close";

const mech = loadBuiltinMechanism("oxygen-chlorine").mechanism;
const request: RunRequest = {
  mechanismId: "oxygen-chlorine",
  condition: { altitude_km: 35, latitude_deg: 45, date: "2026-03-20" },
  days: 2,
};
const base = { condition: request.condition, days: 2, options: RUN_DEFAULTS };
const plan = { ...base, initial_cm3: periodicStart(mech, base).state_cm3 };
const run = runInThread(mech, { id: "oxygen-chlorine", title: mech.title }, plan);

describe("the run charts", () => {
  const s = runChartSeries(run);

  it("give O3 and the chlorine groups in ppbv at every hour, the groups and the other chlorine species summing to Cly", () => {
    expect(s.o3?.values).toHaveLength(49);
    const ids = s.chlorine.map((c) => c.id);
    expect(ids).toContain("ClOx");
    const h = 12;
    const sum = s.chlorine.reduce((a, c) => a + c.values[h], 0);
    const x = run.hours.numberDensity_cm3[h];
    const M = run.hours.M_cm3[h];
    const others = ["OClO", "Cl2", "BrCl"].reduce((a, id) => {
      const i = mech.speciesIndex[id];
      return a + (i === undefined ? 0 : (id === "Cl2" ? 2 : 1) * x[i]);
    }, 0);
    const cly = poolTotalsOf(mech, x).Cly;
    expectClose(sum + (1e9 * others) / M, (1e9 * cly) / M, { rel: 1e-6 }, "Cly partition (identity)");
  });

  it("stack each day's bars to the day's Ox loss", () => {
    const chart = dailyLossChart(s);
    for (const d of run.daily) {
      const bars = chart.bars.filter((b) => b.day === d.day);
      const ppbv = bars.reduce((a, b) => a + b.value, 0);
      const M = run.hours.M_cm3[0];
      expectClose(ppbv, (1e9 * d.oxLoss_cm3) / M, { rel: 1e-9 }, `day ${d.day}`);
      // bars touch: each starts where the one below ends
      for (let i = 1; i < bars.length; i++) expectClose(bars[i].y + bars[i].height, bars[i - 1].y, { abs: 0.11 });
    }
    expect(chart.legend.length).toBeGreaterThan(0);
  });

  it("draw one path per line, starting at the left edge of the plot", () => {
    const chart = timeLineChart(s.t_h, s.chlorine, "chlorine (ppbv)");
    expect(chart.lines).toHaveLength(s.chlorine.length);
    for (const l of chart.lines) expect(l.paths[0].startsWith(`M${chart.frame.plot.left},`)).toBe(true);
    expect(chart.frame.xTicks.map((t) => t.label)).toEqual(["0", "1", "2"]);
  });

  it("write one daily.csv row per day with the families as columns", () => {
    const rows = runDailyCsv(run).trim().split("\r\n");
    expect(rows).toHaveLength(3);
    expect(rows[0]).toContain("Ox loss ClOx (cm-3/day)");
  });
});

describe("an hour of a run in the explorer", () => {
  it("is an instant with that hour's rates, and cycles whose budget keeps the net changes as storage", () => {
    const a = hourSnapshot(mech, request, run, 30);
    expect(a.steadyState.status).toBe("instant");
    expect(a.steadyState.rate_cm3s).toEqual(run.hours.rate_cm3s[30]);
    expect(a.condition.localSolarTime_h).toBe(6);
    expect(a.cycles.budget.loss_cm3s).toBeGreaterThan(0);
    expect(() => hourSnapshot(mech, request, run, 49)).toThrow(/hours 0–48/);
  });
});

describe("a failed segment", () => {
  it("ends the run with its status, the time of the failure and what was done before", () => {
    const failed: RunSegment = {
      status: "failed",
      message: "day 2: the integration stopped (step-too-small)",
      failedAt_h: 30.5,
      hours: { t_h: [25], T_K: [1], M_cm3: [1], zenith_deg: [1], numberDensity_cm3: [[]], rate_cm3s: [[]] },
      days: [],
      final_cm3: [],
      jCache: {},
      steps: 1,
    };
    const first: RunSegment = {
      status: "ok",
      message: "ok",
      hours: { ...run.hours, t_h: run.hours.t_h.slice(0, 25) },
      days: run.daily.slice(0, 1),
      final_cm3: [],
      jCache: {},
      steps: 1,
    };
    const r = assembleRun(mech, plan, [first, failed, first], {
      engineVersion: "x",
      mechanism: { id: "oxygen-chlorine", title: "t" },
      title: "t",
      warnings: [],
      elapsed_ms: 0,
    });
    expect(r.status).toBe("failed");
    expect(r.failedAt_h).toBe(30.5);
    expect(r.message).toContain("step-too-small");
    expect(r.daily).toHaveLength(1);
    expect(r.hours.t_h).toEqual([...run.hours.t_h.slice(0, 25), 25]);
  });
});
