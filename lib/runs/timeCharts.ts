/**
 * The run charts as plain data (pure; the view only draws them): time on the
 * horizontal axis in days, a mixing ratio on the vertical axis from 0 with
 * "nice" ticks (1, 2, 2.5, 5 × 10ⁿ; common practice); line paths of the
 * hourly series and stacked bars of the daily Ox loss by family, coloured as
 * on every other page (lib/profiles familyColor). Units: px, h, ppbv.
 */
import type { ChartFrame, Tick } from "../profiles/series/chartFrame";
import { familyColor, familyName } from "../profiles/series/familyColor";
import { niceMax } from "../viz/budgetSeries";
import { formatNumber } from "../viz/formatNumber";
import type { RunChartSeries } from "./runSeries";

export const TIME_CHART_DEFAULTS = {
  /** px */
  width_px: 560,
  /** px */
  height_px: 260,
  /** px: left (value labels), right, top, bottom (day labels) */
  margin: { left: 56, right: 16, top: 12, bottom: 40 },
};

const round1 = (v: number) => Math.round(v * 10) / 10;

interface Axes {
  frame: ChartFrame;
  x: (t_h: number) => number;
  y: (v: number) => number;
}

function axes(span_h: number, max: number, xLabel: string, yLabel: string, bar = false): Axes {
  const { width_px: width, height_px: height, margin } = TIME_CHART_DEFAULTS;
  const plot = { left: margin.left, top: margin.top, right: width - margin.right, bottom: height - margin.bottom };
  const span = Math.max(span_h, 1);
  const x = (t: number) => round1(plot.left + (t / span) * (plot.right - plot.left));
  const top = niceMax(max);
  const y = (v: number) => round1(plot.bottom - (Math.max(0, v) / top) * (plot.bottom - plot.top));
  const days = span / 24;
  const step = days > 30 ? 10 : days > 12 ? 5 : days > 5 ? 2 : 1;
  const xTicks: Tick[] = [];
  for (let d = 0; d <= days + 1e-9; d += step) xTicks.push({ px: x(bar ? (d - 0.5) * 24 : d * 24), label: String(d) });
  if (bar) xTicks.shift();
  const yTicks = [0, 0.25, 0.5, 0.75, 1].map((f) => ({ px: y(f * top), label: formatNumber(f * top, 2) }));
  return { frame: { width, height, plot, xTicks, yTicks, xLabel, yLabel }, x, y };
}

export interface TimeLine {
  key: string;
  label: string;
  stroke: string;
  dash: string;
  paths: string[];
}

export interface TimeLineChart {
  frame: ChartFrame;
  lines: TimeLine[];
}

const LINE_STYLES = [
  { stroke: "#b45309", dash: "" },
  { stroke: "#1d4ed8", dash: "6 3" },
  { stroke: "#15803d", dash: "2 2" },
  { stroke: "#7e22ce", dash: "8 2 2 2" },
];

/** Line chart of hourly series (ppbv) against days. */
export function timeLineChart(
  t_h: readonly number[],
  series: readonly { id: string; label: string; values: readonly number[] }[],
  yLabel: string,
): TimeLineChart {
  const max = Math.max(0, ...series.flatMap((s) => s.values.filter(Number.isFinite)));
  const a = axes(t_h[t_h.length - 1] ?? 24, max, "time (days)", yLabel);
  const lines = series.map((s, i) => {
    const d = s.values.map((v, h) => `${h === 0 ? "M" : "L"}${a.x(t_h[h])},${a.y(v)}`).join("");
    return { key: s.id, label: s.label, ...LINE_STYLES[i % LINE_STYLES.length], paths: d ? [d] : [] };
  });
  return { frame: a.frame, lines };
}

export interface StackedBar {
  day: number;
  family: string;
  label: string;
  x: number;
  y: number;
  width: number;
  height: number;
  fill: string;
  stroke: string;
  /** ppbv per day */
  value: number;
}

export interface DailyLossChart {
  frame: ChartFrame;
  bars: StackedBar[];
  legend: { family: string; label: string; fill: string; stroke: string }[];
}

/** The daily Ox loss stacked by family (ppbv per day), one bar per day. */
export function dailyLossChart(s: RunChartSeries): DailyLossChart {
  const totals = s.days.map((_d, i) => s.dailyLoss.reduce((sum, f) => sum + Math.max(0, f.values[i]), 0));
  const a = axes(24 * s.days.length, Math.max(0, ...totals), "day", "Ox loss (ppbv/day)", true);
  const bars: StackedBar[] = [];
  const w = Math.max(1, round1((a.x(24) - a.x(0)) * 0.8));
  s.days.forEach((day, i) => {
    let base = 0;
    for (const f of s.dailyLoss) {
      const v = Math.max(0, f.values[i]);
      if (v === 0) continue;
      const c = familyColor(f.family);
      const yTop = a.y(base + v);
      bars.push({
        day,
        family: f.family,
        label: familyName(f.family),
        x: round1(a.x(24 * (day - 1)) + (a.x(24) - a.x(0) - w) / 2),
        y: yTop,
        width: w,
        height: round1(a.y(base) - yTop),
        fill: c.fill,
        stroke: c.stroke,
        value: v,
      });
      base += v;
    }
  });
  const legend = s.dailyLoss.map((f) => {
    const c = familyColor(f.family);
    return { family: f.family, label: familyName(f.family), fill: c.fill, stroke: c.stroke };
  });
  return { frame: a.frame, bars, legend };
}
