/**
 * Runs over days (lib/runs): a 30-day run of the reference mechanism at one
 * place (20 km, 45° N, from the spring equinox) with hourly output and the
 * daily pathway analysis, in the calling thread; the daily pathway analysis
 * alone (one day's integrated rates); the 24-hour periodic start. The start
 * state is computed in setup; the note gives the size of a stored 60-day run
 * (hours rounded to 6 digits, as the service stores it).
 */
import { loadBuiltinMechanism } from "../../lib/mechanism";
import { compactRun, dayBudget, periodicStart, RUN_DEFAULTS, type RunPlan, runInThread } from "../../lib/runs";
import type { BenchCase } from "../types";

export async function setup(): Promise<BenchCase[]> {
  const mech = loadBuiltinMechanism("reference").mechanism;
  const ref = { id: "reference", title: mech.title };
  const base = {
    condition: { altitude_km: 20, latitude_deg: 45, date: "2026-03-20" },
    days: 30,
    options: RUN_DEFAULTS,
  };
  const start = periodicStart(mech, base);
  const plan: RunPlan = { ...base, initial_cm3: start.state_cm3 };
  const once = runInThread(mech, ref, plan);
  const day = once.daily[9];
  const heldSpecies = mech.species.filter((s) => s.role !== "solved").map((s) => s.id);
  const budget = () =>
    dayBudget(mech, {
      day: 10,
      duration_s: 86_400,
      start_cm3: once.hours.numberDensity_cm3[24 * 9],
      end_cm3: once.hours.numberDensity_cm3[24 * 10],
      startM_cm3: once.hours.M_cm3[0],
      endM_cm3: once.hours.M_cm3[0],
      meanState_cm3: day.meanState_cm3,
      meanRates_cm3s: day.meanRates_cm3s,
      heldSpecies,
      options: RUN_DEFAULTS,
    });
  const sixty = compactRun(runInThread(mech, ref, { ...plan, days: 60 }));
  const stored_MB = JSON.stringify({ request: base, result: sixty }).length / 1e6;
  return [
    {
      name: "runs: reference, 30 days at 20 km, hourly output and daily pathway analysis",
      run: () => runInThread(mech, ref, plan),
      iterations: 5,
      note: `${once.status}, ${once.hours.t_h.length} hours; largest daily closure ${Math.max(...once.daily.map((d) => d.closure)).toExponential(1)}; a stored 60-day run is ${stored_MB.toFixed(2)} MB; aim < 2 s`,
    },
    {
      name: "runs: the daily pathway analysis of one day (20 km)",
      run: budget,
      note: `${budget().cycles.length} cycles kept; aim < 50 ms`,
    },
    {
      name: "runs: the 24-hour periodic start (20 km)",
      run: () => periodicStart(mech, base),
      iterations: 5,
      note: start.warnings.join("; ") || "converged",
    },
  ];
}
