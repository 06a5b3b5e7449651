/**
 * The invented cold-vortex parcel (lib/runs/demoRuns.ts): sunlit activated
 * chlorine destroys ozone at the order of the loss rates inferred in the
 * Arctic vortex, roughly 10–60 ppbv per day near 18–20 km (order of magnitude;
 * e.g. −46 ± 6 ppbv/day near 450 K in winter 1999–2000, Geophys. Res. Lett.
 * 2001; docs/references.md, Polar chemistry), and the chlorine goes back to
 * its reservoirs after the warming.
 */
import { describe, expect, it } from "vitest";
import { loadBuiltinMechanism } from "../../lib/mechanism";
import { DEMO_RUNS, planRun, poolTotalsOf, runChartSeries, runInThread } from "../../lib/runs";
import { periodicStart } from "../../lib/runs/startState";
import { expectClose } from "../helpers/close";

describe("the invented cold-vortex parcel", () => {
  const mech = loadBuiltinMechanism("reference").mechanism;
  const demo = DEMO_RUNS.find((d) => d.id === "invented-vortex-parcel");
  if (!demo) throw new Error("demo missing");
  const { plan } = planRun(mech, demo.request);
  const start = demo.request.start;
  const mixingRatios = start?.kind === "amounts" ? start.mixingRatios : {};
  const run = runInThread(
    mech,
    { id: "reference", title: mech.title },
    {
      ...plan,
      initial_cm3: periodicStart(mech, plan, mixingRatios).state_cm3,
    },
  );
  const series = runChartSeries(run);

  it("is labelled invented", () => {
    expect(demo.title.toLowerCase()).toContain("invented");
    expect(demo.request.trajectory?.csv).toContain("# demo: invented");
  });

  it("loses ozone at 10–60 ppbv per day (≥ 0.5 % per day) while cold and activated", () => {
    const cold = run.daily.slice(1, 8);
    const mean = cold.reduce((s, d) => s + d.o3Change_ppbv, 0) / cold.length;
    expect(-mean).toBeGreaterThan(10);
    expect(-mean).toBeLessThan(60);
    for (const d of cold) expect(d.o3Change_percent, `day ${d.day}`).toBeLessThan(-0.5);
    expect(run.daily[2].byFamily[0].family).toMatch(/ClOx/);
  });

  // After the warming (days 10–12) the chlorine goes back to its reservoirs, slowly: NOx for
  // ClONO2 comes from HNO3 photolysis under a low late-winter sun, and the cold-sulfate γ that kept
  // it active fall by about four orders of magnitude from 192 to 212 K (docs/heterogeneous.md).
  // Measured with the surface chemistry of the reference mechanism 1.2.0: ClOx at noon 2.02 ppbv on
  // day 10 and 1.73 ppbv on day 19; HCl + ClONO2 0.81 → 1.03 ppbv.
  it("moves the active chlorine back to HCl and ClONO2 after the warming", () => {
    const noon = (id: string, day: number) =>
      series.chlorine.find((c) => c.id === id)?.values[24 * day + 12] ?? Number.NaN;
    expect(noon("ClOx", 19)).toBeLessThan(0.9 * noon("ClOx", 10));
    const reservoirs = (day: number) => noon("HCl", day) + noon("ClONO2", day);
    expect(reservoirs(19) - reservoirs(10)).toBeGreaterThan(0.15);
    for (const day of [13, 15, 17, 19]) expect(noon("ClOx", day), `day ${day}`).toBeLessThan(noon("ClOx", day - 3));
  });

  it("keeps Cly as a mixing ratio along the trajectory to 1e-3 (the CFC source adds less than that in 20 days)", () => {
    const last = run.hours.t_h.length - 1;
    const cly0 = run.initialPoolTotals_cm3.Cly / run.hours.M_cm3[0];
    const cly1 = poolTotalsOf(mech, run.hours.numberDensity_cm3[last]).Cly / run.hours.M_cm3[last];
    expectClose(cly1, cly0, { rel: 1e-3 }, "Cly / [M]");
  });

  it("closes each day's Ox budget to 1 %", () => {
    for (const d of run.daily) expect(d.closure, `day ${d.day}`).toBeLessThan(0.01);
  });
});
