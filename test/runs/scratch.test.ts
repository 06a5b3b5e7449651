import { it } from "vitest";
import { loadBuiltinMechanism } from "../../lib/mechanism";
import type { RunPlan } from "../../lib/runs";
import { periodicStart, runInThread } from "../../lib/runs";

it("scratch", () => {
  const mech = loadBuiltinMechanism("reference").mechanism;
  const base = {
    condition: { altitude_km: 20, latitude_deg: 45, date: "2026-03-20" },
    days: 30,
    options: { fminRelative: 1e-4, oxDefinition: "standard" as const, sunFollowsDate: true },
  };
  let t = performance.now();
  const s = periodicStart(mech, base);
  console.log("start", performance.now() - t, s.warnings);
  const plan: RunPlan = { ...base, initial_cm3: s.state_cm3 };
  t = performance.now();
  const r = runInThread(mech, { id: "reference", title: "r" }, plan);
  console.log("run", performance.now() - t, r.status, r.message, r.hours.t_h.length);
  for (const d of r.daily.slice(0, 30))
    console.log(
      d.day,
      d.o3Change_ppbv.toFixed(3),
      d.o3Change_percent.toFixed(4),
      d.closure.toExponential(2),
      d.byFamily.map((f) => `${f.family}:${(f.oxLoss_cm3 / d.oxLoss_cm3).toFixed(3)}`).join(" "),
      JSON.stringify(d.poolTotals_cm3),
    );
  console.log(r.initialPoolTotals_cm3, r.warnings.slice(0, 5));
  console.log(JSON.stringify(r).length);
}, 120000);
