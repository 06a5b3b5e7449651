/**
 * Series of the "difference B − A" chart: the change of the total Ox loss
 * rate against altitude (bold), and of the families whose change is largest
 * somewhere (the rest summed as "other families"), on a signed axis with zero
 * in the middle, linear or symmetric-log. Rates in molecules cm⁻³ s⁻¹.
 */
import {
  altitudeAxis,
  type ChartFrame,
  FRAME_DEFAULTS,
  type FrameOptions,
  pathSegments,
  type SignedScale,
  signedAxis,
} from "./chartFrame";
import { type ChartReadout, type ReadoutSeries, readoutLevels } from "./chartReadout";
import { familyColor, familyName } from "./familyColor";

export const DIFFERENCE_DEFAULTS = {
  /** families drawn on their own; default 5 */
  maxFamilies: 5,
};

export interface DifferenceLevel {
  altitude_km: number;
  /** total B − A, null where a side failed */
  total_cm3s: number | null;
  byFamily: Readonly<Record<string, number>>;
}

export interface DifferenceLine {
  key: string;
  label: string;
  paths: string[];
  stroke: string;
  dash: string;
  width: number;
  /** where the line's label goes (its largest |Δ|) */
  labelAt: { x: number; y: number } | null;
}

export interface DifferenceSeries {
  frame: ChartFrame;
  lines: DifferenceLine[];
}

const DASHES = ["", "5 3", "2 3", "8 3 2 3", "1 2", "10 4", "4 2 1 2"];

/** What both the lines and the readout are drawn from: the keys shown, B − A of each at a level, and the axes. */
function differencePlan(
  levels: readonly DifferenceLevel[],
  families: readonly string[],
  scale: SignedScale,
  options: FrameOptions & { maxFamilies?: number },
) {
  const width = options.width_px ?? FRAME_DEFAULTS.width_px;
  const height = options.height_px ?? FRAME_DEFAULTS.height_px;
  const maxFamilies = options.maxFamilies ?? DIFFERENCE_DEFAULTS.maxFamilies;
  const m = FRAME_DEFAULTS.margin;
  const plot = { left: m.left, top: m.top, right: width - m.right, bottom: height - m.bottom };
  const sorted = [...levels].sort((a, b) => a.altitude_km - b.altitude_km);
  const peak = (f: string) =>
    Math.max(0, ...sorted.map((l) => (l.total_cm3s === null ? 0 : Math.abs(l.byFamily[f] ?? 0))));
  const ranked = [...families].filter((f) => peak(f) > 0).sort((a, b) => peak(b) - peak(a) || a.localeCompare(b));
  const shown = ranked.slice(0, maxFamilies);
  const rest = ranked.slice(maxFamilies);
  const deltaOf = (l: DifferenceLevel, key: string): number | null => {
    if (l.total_cm3s === null) return null;
    if (key === "total") return l.total_cm3s;
    if (key === "other") return rest.reduce((s, f) => s + (l.byFamily[f] ?? 0), 0);
    return l.byFamily[key] ?? 0;
  };
  const keys = ["total", ...shown, ...(rest.length ? ["other"] : [])];
  const labelOf = (key: string) =>
    key === "total" ? "total" : key === "other" ? `other families (${rest.length})` : familyName(key);
  const all = sorted.flatMap((l) => keys.map((k) => deltaOf(l, k)).filter((v): v is number => v !== null));
  const { y, ticks: yTicks } = altitudeAxis(
    sorted.length ? sorted.map((l) => l.altitude_km) : [0, 1],
    plot.top,
    plot.bottom,
  );
  const { x, ticks: xTicks, zeroX } = signedAxis(all, plot.left, plot.right, scale);
  return { width, height, plot, sorted, keys, deltaOf, labelOf, x, y, xTicks, yTicks, zeroX };
}

export function differenceSeries(
  levels: readonly DifferenceLevel[],
  families: readonly string[],
  scale: SignedScale,
  options: FrameOptions & { maxFamilies?: number } = {},
): DifferenceSeries {
  const { width, height, plot, sorted, keys, deltaOf, labelOf, x, y, xTicks, yTicks, zeroX } = differencePlan(
    levels,
    families,
    scale,
    options,
  );
  const lines = keys.map((key, i): DifferenceLine => {
    const pts = sorted.map((l) => {
      const v = deltaOf(l, key);
      return v === null ? null : { x: x(v), y: y(l.altitude_km), v };
    });
    const best = pts.reduce<{ x: number; y: number; v: number } | null>(
      (b, p) => (p && (!b || Math.abs(p.v) > Math.abs(b.v)) ? p : b),
      null,
    );
    const color = key === "total" ? "#1c2430" : key === "other" ? "#8f8c84" : familyColor(key).ink;
    return {
      key,
      label: labelOf(key),
      paths: pathSegments(pts),
      stroke: color,
      dash: key === "total" ? "" : DASHES[1 + ((i - 1) % (DASHES.length - 1))],
      width: key === "total" ? 2.5 : 1.5,
      labelAt: best && best.v !== 0 ? { x: best.x, y: best.y } : null,
    };
  });
  return {
    frame: {
      width,
      height,
      plot,
      xTicks,
      yTicks,
      xLabel: `B − A Ox loss rate (molecules cm⁻³ s⁻¹, ${scale === "signed-log" ? "symmetric log" : "linear"} scale)`,
      yLabel: "altitude (km)",
      zeroX,
    },
    lines,
  };
}

/** The hover readout of the difference chart: B − A of each drawn line at every level (null where a side failed). */
export function differenceReadout(
  levels: readonly DifferenceLevel[],
  families: readonly string[],
  scale: SignedScale,
  options: FrameOptions & { maxFamilies?: number } = {},
): ChartReadout {
  const { sorted, keys, deltaOf, labelOf, x, y } = differencePlan(levels, families, scale, options);
  const rs: ReadoutSeries[] = keys.map((key) => ({
    key,
    label: labelOf(key),
    unit: "molecules cm⁻³ s⁻¹",
    format: "number",
    points: sorted.map((l) => {
      const v = deltaOf(l, key);
      return v === null
        ? { altitude_km: l.altitude_km, value: null }
        : { altitude_km: l.altitude_km, value: v, x: x(v) };
    }),
  }));
  return { levels: readoutLevels(rs, y), series: rs };
}
