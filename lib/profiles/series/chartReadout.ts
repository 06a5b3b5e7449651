/**
 * What a profile chart reads out under the pointer: the altitude levels of
 * the chart (with their y in px), each series' value at a level formatted
 * with its unit, the nearest level to a pointer position, and the set of
 * series a legend has hidden (one always stays shown). Pure data; the hover
 * layer in components/profile only draws it.
 */
import { formatNumber, formatPercent } from "../../viz/formatNumber";

export interface ReadoutPoint {
  altitude_km: number;
  /** null where the level failed */
  value: number | null;
  /** x of the value on the chart, px; absent for marks without a single x (stacked areas) */
  x?: number;
  /** a range printed after the value, e.g. the 5–95 % of a Monte Carlo band (same unit) */
  range?: readonly [number | null, number | null];
}

export interface ReadoutSeries {
  key: string;
  label: string;
  /** unit printed after each value, e.g. "molecules cm⁻³ s⁻¹"; "" for fractions */
  unit: string;
  /** "number" (formatNumber, 3 digits) or "percent" (formatPercent) */
  format: "number" | "percent";
  points: readonly ReadoutPoint[];
}

export interface ReadoutLevel {
  altitude_km: number;
  /** y of the level on the chart, px */
  y: number;
}

export interface ChartReadout {
  /** the chart's levels, lowest altitude first */
  levels: ReadoutLevel[];
  series: ReadoutSeries[];
}

export interface ReadoutRow {
  key: string;
  label: string;
  /** the formatted value with its unit, or "failed" */
  text: string;
  /** x of the value, px, for a marker on the rule */
  x?: number;
}

/** The levels of a chart: every altitude of any series, once, lowest first, with its y. */
export function readoutLevels(series: readonly ReadoutSeries[], y: (altitude_km: number) => number): ReadoutLevel[] {
  const km = [...new Set(series.flatMap((s) => s.points.map((p) => p.altitude_km)))].sort((a, b) => a - b);
  return km.map((altitude_km) => ({ altitude_km, y: y(altitude_km) }));
}

/** Index of the level nearest to y (px); on a tie the higher altitude. -1 when there are no levels. */
export function nearestLevel(levels: readonly ReadoutLevel[], y_px: number): number {
  if (!Number.isFinite(y_px)) throw new RangeError(`nearestLevel: y must be a finite number of px, got ${y_px}`);
  let best = -1;
  let bestDistance = Number.POSITIVE_INFINITY;
  levels.forEach((l, i) => {
    const d = Math.abs(l.y - y_px);
    if (d < bestDistance || (d === bestDistance && best >= 0 && l.altitude_km > levels[best].altitude_km)) {
      best = i;
      bestDistance = d;
    }
  });
  return best;
}

/** The level index after a step of `delta` levels (Up = +1, higher altitude), kept within the levels. */
export function stepLevel(count: number, index: number, delta: number): number {
  if (count <= 0) return -1;
  if (index < 0) return delta >= 0 ? 0 : count - 1;
  return Math.min(count - 1, Math.max(0, index + delta));
}

function formatValue(s: ReadoutSeries, p: ReadoutPoint): string {
  if (p.value === null) return "failed";
  const f = (v: number | null) => (v === null ? "—" : s.format === "percent" ? formatPercent(v) : formatNumber(v));
  const text = p.range ? `${f(p.value)} (${f(p.range[0])} – ${f(p.range[1])})` : f(p.value);
  return s.unit ? `${text} ${s.unit}` : text;
}

/** One row per shown series at a level: its label and its formatted value ("—" where it has no point there). */
export function readoutRows(
  readout: ChartReadout,
  index: number,
  hidden: ReadonlySet<string> = new Set(),
): ReadoutRow[] {
  const level = readout.levels[index];
  if (!level) return [];
  return readout.series
    .filter((s) => !hidden.has(s.key))
    .map((s) => {
      const p = s.points.find((q) => q.altitude_km === level.altitude_km);
      const row: ReadoutRow = { key: s.key, label: s.label, text: p ? formatValue(s, p) : "—" };
      if (p?.x !== undefined && p.value !== null) row.x = p.x;
      return row;
    });
}

/** The readout as one sentence, for a live region: "30 km: A 3.2 × 10⁶ molecules cm⁻³ s⁻¹; B …". */
export function readoutSentence(readout: ChartReadout, index: number, hidden: ReadonlySet<string> = new Set()): string {
  const level = readout.levels[index];
  if (!level) return "";
  return `${level.altitude_km} km: ${readoutRows(readout, index, hidden)
    .map((r) => `${r.label} ${r.text}`)
    .join("; ")}`;
}

/** The hidden set after a legend click on `key`; hiding the last shown series is refused (the set is returned as it was). */
export function toggleHidden(hidden: ReadonlySet<string>, key: string, keys: readonly string[]): ReadonlySet<string> {
  if (!keys.includes(key)) throw new RangeError(`toggleHidden: no series "${key}" (series: ${keys.join(", ")})`);
  const next = new Set(hidden);
  if (next.has(key)) next.delete(key);
  else {
    if (keys.every((k) => k === key || next.has(k))) return hidden;
    next.add(key);
  }
  return next;
}
