/**
 * Chart series of a run, as plain data for the view: O3 against time, the
 * chlorine partition (active Cl + ClO + 2 Cl2O2, HCl, ClONO2, HOCl) against
 * time, and each day's Ox loss stacked by family. Mixing ratios in ppbv
 * (number density / [M] at the hour; the daily loss over the day's mean [M]).
 */
import { runFamilies } from "./runCsv";
import type { RunResult } from "./types";

export interface RunLine {
  id: string;
  label: string;
  /** ppbv, one per hour */
  values: number[];
}

export interface RunChartSeries {
  t_h: number[];
  o3: RunLine | null;
  chlorine: RunLine[];
  days: number[];
  /** Ox loss per day by family, ppbv per day, in stacking order */
  dailyLoss: { family: string; values: number[] }[];
}

/** Chlorine groups: label and species weights (only the species the mechanism has are counted). */
const CHLORINE: { id: string; label: string; weights: Record<string, number> }[] = [
  { id: "ClOx", label: "Cl + ClO + 2 Cl2O2", weights: { Cl: 1, ClO: 1, Cl2O2: 2 } },
  { id: "HCl", label: "HCl", weights: { HCl: 1 } },
  { id: "ClONO2", label: "ClONO2", weights: { ClONO2: 1 } },
  { id: "HOCl", label: "HOCl", weights: { HOCl: 1 } },
];

export function runChartSeries(r: RunResult): RunChartSeries {
  const index = new Map(r.species.map((id, s) => [id, s]));
  const ppbv = (weights: Record<string, number>): number[] | null => {
    const terms = Object.entries(weights)
      .map(([id, w]) => [index.get(id), w] as const)
      .filter((t): t is readonly [number, number] => t[0] !== undefined);
    if (terms.length === 0) return null;
    return r.hours.t_h.map((_t, h) => {
      const x = r.hours.numberDensity_cm3[h];
      let s = 0;
      for (const [i, w] of terms) s += w * x[i];
      return (1e9 * s) / r.hours.M_cm3[h];
    });
  };
  const o3 = ppbv({ O3: 1 });
  const chlorine: RunLine[] = [];
  for (const g of CHLORINE) {
    const v = ppbv(g.weights);
    if (v) chlorine.push({ id: g.id, label: g.label, values: v });
  }
  const meanM = r.daily.map((d) => {
    const a = r.hours.t_h.indexOf(24 * (d.day - 1));
    const b = r.hours.t_h.indexOf(24 * d.day);
    const Ma = r.hours.M_cm3[a] ?? r.hours.M_cm3[0];
    const Mb = r.hours.M_cm3[b] ?? Ma;
    return 0.5 * (Ma + Mb);
  });
  const dailyLoss = runFamilies(r).map((family) => ({
    family,
    values: r.daily.map((d, i) => (1e9 * (d.byFamily.find((f) => f.family === family)?.oxLoss_cm3 ?? 0)) / meanM[i]),
  }));
  return {
    t_h: r.hours.t_h,
    o3: o3 ? { id: "O3", label: "O3", values: o3 } : null,
    chlorine,
    days: r.daily.map((d) => d.day),
    dailyLoss,
  };
}
