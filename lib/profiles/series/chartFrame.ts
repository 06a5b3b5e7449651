/**
 * The frame shared by the profile charts: altitude on the vertical axis
 * (increasing upwards, the trade's convention for profiles), a rate or a
 * fraction on the horizontal axis, margins and ticks in px. Scales: linear
 * with "nice" ticks (1, 2, 2.5, 5 × 10ⁿ; common practice), log10 over whole
 * decades (lib/viz logScale), or symmetric log for signed differences
 * (lib/viz signedLogScale).
 */
import { niceMax } from "../../viz/budgetSeries";
import { formatNumber } from "../../viz/formatNumber";
import { logScale } from "../../viz/logScale";
import { signedLogScale } from "../../viz/signedLogScale";

export const FRAME_DEFAULTS = {
  /** whole chart width, px; default 420 */
  width_px: 420,
  /** whole chart height, px; default 380 */
  height_px: 380,
  /** px; default 56 left (altitude labels), 16 right, 12 top, 40 bottom (rate labels) */
  margin: { left: 56, right: 16, top: 12, bottom: 40 },
};

export type RateScale = "linear" | "log";
export type SignedScale = "linear" | "signed-log";

export interface Tick {
  /** px along the axis */
  px: number;
  label: string;
}

export interface ChartFrame {
  width: number;
  height: number;
  plot: { left: number; top: number; right: number; bottom: number };
  xTicks: Tick[];
  yTicks: Tick[];
  xLabel: string;
  yLabel: string;
  /** x of the zero line, px, for signed axes */
  zeroX?: number;
}

export interface FrameOptions {
  width_px?: number;
  height_px?: number;
}

/** y (px) of an altitude, and the altitude ticks (every 5 or 10 km). */
export function altitudeAxis(altitudes_km: readonly number[], top: number, bottom: number) {
  const lo = Math.min(...altitudes_km);
  const hi = Math.max(...altitudes_km);
  const span = hi > lo ? hi - lo : 1;
  const y = (z: number) => Math.round((bottom - ((z - lo) / span) * (bottom - top)) * 10) / 10;
  const step = span > 30 ? 10 : span > 8 ? 5 : span > 3 ? 1 : 0.5;
  const ticks: Tick[] = [];
  for (let z = Math.ceil(lo / step - 1e-9) * step; z <= hi + 1e-9; z += step) {
    ticks.push({ px: y(z), label: String(Math.round(z * 10) / 10) });
  }
  return { y, ticks };
}

/** x (px) of a positive rate; non-positive values (and values below the log floor) sit on the left edge. */
export function rateAxis(values: readonly number[], left: number, right: number, scale: RateScale) {
  if (scale === "log") {
    const s = logScale(values, { decades: 6 });
    const x = (v: number) => Math.round((left + s.normalize(v) * (right - left)) * 10) / 10;
    const ticks = s
      .ticks(5)
      .map((t) => ({ px: Math.round((left + t.offset * (right - left)) * 10) / 10, label: t.label }));
    return { x, ticks };
  }
  const max = niceMax(Math.max(0, ...values.filter(Number.isFinite)));
  const x = (v: number) => Math.round((left + (Math.max(0, v) / max) * (right - left)) * 10) / 10;
  const ticks = [0, 0.25, 0.5, 0.75, 1].map((f) => ({
    px: Math.round((left + f * (right - left)) * 10) / 10,
    label: formatNumber(f * max, 2),
  }));
  return { x, ticks };
}

/** x (px) of a signed value, zero in the middle. */
export function signedAxis(values: readonly number[], left: number, right: number, scale: SignedScale) {
  const mid = (left + right) / 2;
  const half = (right - left) / 2;
  if (scale === "signed-log") {
    const s = signedLogScale(values, { decades: 4 });
    const x = (v: number) => Math.round((mid + s.normalize(v) * half) * 10) / 10;
    const ticks = s
      .ticks()
      .filter((_, i, all) => all.length <= 7 || i % 2 === (all.length % 4 === 1 ? 0 : 1) || all[i].value === 0)
      .map((t) => ({ px: Math.round((left + t.offset * (right - left)) * 10) / 10, label: t.label }));
    return { x, ticks, zeroX: mid };
  }
  const max = niceMax(Math.max(0, ...values.filter(Number.isFinite).map(Math.abs)));
  const x = (v: number) => Math.round((mid + (Math.max(-max, Math.min(max, v)) / max) * half) * 10) / 10;
  const ticks = [-1, -0.5, 0, 0.5, 1].map((f) => ({
    px: Math.round((mid + f * half) * 10) / 10,
    label: formatNumber(f * max, 2),
  }));
  return { x, ticks, zeroX: mid };
}

/** SVG path data of a polyline through points, split where a point is null (a failed level). */
export function pathSegments(points: readonly ({ x: number; y: number } | null)[]): string[] {
  const out: string[] = [];
  let cur: string[] = [];
  for (const p of points) {
    if (!p) {
      if (cur.length) out.push(cur.join(" "));
      cur = [];
      continue;
    }
    cur.push(`${cur.length ? "L" : "M"}${p.x},${p.y}`);
  }
  if (cur.length) out.push(cur.join(" "));
  return out;
}
