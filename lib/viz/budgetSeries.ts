/**
 * Series of the odd-oxygen budget chart: production, loss, and the loss of
 * each family (largest first, the smallest summed into one row, then the part in
 * pathways below the threshold),
 * as horizontal bars on one linear axis with "nice" ticks (1, 2, 5 × 10ⁿ,
 * common practice). Rates in molecules cm⁻³ s⁻¹; geometry in px.
 */
import type { OxBudget } from "../analysis/types";
import { oklchToHex } from "./colorSpace";
import { DIVERGING_DESTROYED, DIVERGING_PRODUCED } from "./divergingColor";
import { formatNumber } from "./formatNumber";

export const BUDGET_DEFAULTS = {
  /** chart width for the bars, px; default 220 */
  width_px: 220,
  /** row height, px; default 22 */
  rowHeight_px: 22,
  /** families drawn one by one, largest first; the rest are summed into one row; default 6 */
  maxFamilies: 6,
};

export interface BudgetBar {
  key: string;
  label: string;
  kind: "production" | "loss" | "family" | "unassigned";
  /** molecules cm⁻³ s⁻¹ */
  value: number;
  /** share of the total loss, 0–1 (null for production) */
  fraction: number | null;
  /** px */
  y: number;
  width: number;
  color: string;
}

export interface BudgetSeries {
  bars: BudgetBar[];
  ticks: { x: number; label: string }[];
  /** axis maximum, molecules cm⁻³ s⁻¹ */
  max: number;
  width: number;
  height: number;
}

export function niceMax(v: number): number {
  if (!(v > 0) || !Number.isFinite(v)) return 1;
  const e = 10 ** Math.floor(Math.log10(v));
  for (const m of [1, 2, 2.5, 5, 10]) if (m * e >= v) return m * e;
  return 10 * e;
}

export function budgetSeries(budget: OxBudget, options: Partial<typeof BUDGET_DEFAULTS> = {}): BudgetSeries {
  const o = { ...BUDGET_DEFAULTS, ...options };
  const max = niceMax(Math.max(budget.production_cm3s, budget.loss_cm3s));
  const scale = (v: number) => Math.max(0, Math.round((v / max) * o.width_px * 10) / 10);
  const produced = oklchToHex(DIVERGING_PRODUCED);
  const destroyed = oklchToHex(DIVERGING_DESTROYED);
  const lighter = oklchToHex({ ...DIVERGING_DESTROYED, L: 0.68, C: 0.1 });
  const rows: Omit<BudgetBar, "y" | "width">[] = [
    {
      key: "production",
      label: "Ox production",
      kind: "production",
      value: budget.production_cm3s,
      fraction: null,
      color: produced,
    },
    { key: "loss", label: "Ox loss", kind: "loss", value: budget.loss_cm3s, fraction: 1, color: destroyed },
  ];
  const fams = [...budget.byFamily]
    .filter((f) => f.family !== "unassigned")
    .sort((a, b) => b.oxLoss_cm3s - a.oxLoss_cm3s || a.family.localeCompare(b.family));
  const shown = fams.slice(0, o.maxFamilies);
  const rest = fams.slice(o.maxFamilies);
  for (const f of shown) {
    rows.push({
      key: `family:${f.family}`,
      label: f.family,
      kind: "family",
      value: f.oxLoss_cm3s,
      fraction: f.fraction,
      color: lighter,
    });
  }
  if (rest.length) {
    rows.push({
      key: "family:other",
      label: `${rest.length} other famil${rest.length === 1 ? "y" : "ies"}`,
      kind: "family",
      value: rest.reduce((a, f) => a + f.oxLoss_cm3s, 0),
      fraction: rest.reduce((a, f) => a + f.fraction, 0),
      color: lighter,
    });
  }
  // the engine may report the part below the threshold as a family of its own or only as a total
  const unassigned = budget.byFamily.find((f) => f.family === "unassigned")?.oxLoss_cm3s ?? budget.unassignedLoss_cm3s;
  if (unassigned > 0) {
    rows.push({
      key: "unassigned",
      label: "below threshold",
      kind: "unassigned",
      value: unassigned,
      fraction: budget.loss_cm3s > 0 ? unassigned / budget.loss_cm3s : 0,
      color: "#b8b5ad",
    });
  }
  const bars = rows.map((r, i) => ({ ...r, y: i * o.rowHeight_px, width: scale(r.value) }));
  const ticks = [0, 1].map((f) => ({ x: Math.round(f * o.width_px), label: formatNumber(f * max, 2) }));
  return { bars, ticks, max, width: o.width_px, height: rows.length * o.rowHeight_px };
}
