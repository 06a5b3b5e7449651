/**
 * The CSV tables of a run: the hourly series (every species' number density
 * and O3 as a mixing ratio), the hourly reaction rates, and the daily
 * budget (O3 change, Ox production, loss and closure, the loss by family
 * and the pool totals). Units in the headers.
 */
import { csvTable } from "../csv";
import type { RunResult } from "./types";

export function runHoursCsv(r: RunResult): string {
  const species = r.species.map((id, s) => ({ id, s })).filter((x) => x.id !== "M");
  const o3 = r.species.indexOf("O3");
  const header = ["t (h)", "T (K)", "M (cm-3)", "zenith (deg)", ...(o3 >= 0 ? ["O3 (ppbv)"] : [])];
  header.push(...species.map((x) => `${x.id} (cm-3)`));
  const rows = r.hours.t_h.map((t, h) => {
    const x = r.hours.numberDensity_cm3[h];
    const M = r.hours.M_cm3[h];
    return [
      t,
      r.hours.T_K[h],
      M,
      r.hours.zenith_deg[h],
      ...(o3 >= 0 ? [Number(((1e9 * x[o3]) / M).toPrecision(6))] : []),
      ...species.map(({ s }) => x[s]),
    ];
  });
  return csvTable(header, rows);
}

export function runRatesCsv(r: RunResult): string {
  const header = ["t (h)", ...r.reactions.map((x) => `${x.id} (molecules cm-3 s-1)`)];
  return csvTable(
    header,
    r.hours.t_h.map((t, h) => [t, ...r.hours.rate_cm3s[h]]),
  );
}

/** Families in order of their largest daily loss. */
export function runFamilies(r: RunResult): string[] {
  const top = new Map<string, number>();
  for (const d of r.daily)
    for (const f of d.byFamily) top.set(f.family, Math.max(top.get(f.family) ?? 0, f.oxLoss_cm3));
  return [...top.entries()].sort((a, b) => b[1] - a[1]).map(([f]) => f);
}

export function runDailyCsv(r: RunResult): string {
  const families = runFamilies(r);
  const pools = Object.keys(r.initialPoolTotals_cm3);
  const header = [
    "day",
    "O3 start (cm-3)",
    "O3 end (cm-3)",
    "O3 change (ppbv/day)",
    "O3 change (%/day)",
    "Ox production (cm-3/day)",
    "Ox loss (cm-3/day)",
    "Ox change (cm-3/day)",
    "budget closure (fraction of loss)",
    ...families.map((f) => `Ox loss ${f} (cm-3/day)`),
    ...pools.map((p) => `${p} at end (cm-3)`),
  ];
  const rows = r.daily.map((d) => [
    d.day,
    d.o3Start_cm3,
    d.o3End_cm3,
    d.o3Change_ppbv,
    d.o3Change_percent,
    d.oxProduction_cm3,
    d.oxLoss_cm3,
    d.oxChange_cm3,
    d.closure,
    ...families.map((f) => d.byFamily.find((x) => x.family === f)?.oxLoss_cm3 ?? 0),
    ...pools.map((p) => d.poolTotals_cm3[p]),
  ]);
  return csvTable(header, rows);
}

/** The hourly numbers to 6 significant digits (what is stored: a 60-day run stays a few MB). */
export function compactRun(r: RunResult): RunResult {
  const round = (v: number) => (v === 0 || !Number.isFinite(v) ? v : Number(v.toPrecision(6)));
  const h = r.hours;
  return {
    ...r,
    daily: r.daily.map((d) => ({
      ...d,
      meanState_cm3: d.meanState_cm3.map(round),
      meanRates_cm3s: d.meanRates_cm3s.map(round),
    })),
    hours: {
      t_h: h.t_h.map(round),
      T_K: h.T_K.map(round),
      M_cm3: h.M_cm3.map(round),
      zenith_deg: h.zenith_deg.map(round),
      numberDensity_cm3: h.numberDensity_cm3.map((row) => row.map(round)),
      rate_cm3s: h.rate_cm3s.map((row) => row.map(round)),
    },
  };
}
