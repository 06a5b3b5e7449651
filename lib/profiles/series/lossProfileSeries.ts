/**
 * Series of the "Ox loss rate against altitude" chart: one line per side
 * (A solid, B dashed), with a gap at each failed level and a marker listing
 * it. Rates in molecules cm⁻³ s⁻¹; geometry in px.
 */
import {
  altitudeAxis,
  type ChartFrame,
  FRAME_DEFAULTS,
  type FrameOptions,
  pathSegments,
  type RateScale,
  rateAxis,
} from "./chartFrame";
import { type ChartReadout, type ReadoutSeries, readoutLevels } from "./chartReadout";

export interface ProfileSide {
  label: string;
  levels: readonly { altitude_km: number; status: string; message: string; loss_cm3s: number | null }[];
}

export interface ProfileLine {
  key: string;
  label: string;
  /** SVG path data, one per contiguous run of converged levels */
  paths: string[];
  points: { x: number; y: number; altitude_km: number; value: number }[];
  dash: string;
  stroke: string;
}

export interface FailedMark {
  side: string;
  altitude_km: number;
  y: number;
  status: string;
  message: string;
}

export interface LossProfileSeries {
  frame: ChartFrame;
  lines: ProfileLine[];
  failed: FailedMark[];
}

const SIDE_STYLE = [
  { dash: "", stroke: "#1c2430" },
  { dash: "6 4", stroke: "#7a4b12" },
];

export function lossProfileSeries(
  sides: readonly ProfileSide[],
  scale: RateScale,
  options: FrameOptions = {},
): LossProfileSeries {
  const width = options.width_px ?? FRAME_DEFAULTS.width_px;
  const height = options.height_px ?? FRAME_DEFAULTS.height_px;
  const m = FRAME_DEFAULTS.margin;
  const plot = { left: m.left, top: m.top, right: width - m.right, bottom: height - m.bottom };
  const altitudes = sides.flatMap((s) => s.levels.map((l) => l.altitude_km));
  const values = sides.flatMap((s) => s.levels.map((l) => l.loss_cm3s).filter((v): v is number => v !== null));
  const { y, ticks: yTicks } = altitudeAxis(altitudes.length ? altitudes : [0, 1], plot.top, plot.bottom);
  const { x, ticks: xTicks } = rateAxis(values, plot.left, plot.right, scale);
  const failed: FailedMark[] = [];
  const lines = sides.map((s, i) => {
    const pts = s.levels.map((l) => {
      if (l.loss_cm3s === null) {
        failed.push({
          side: s.label,
          altitude_km: l.altitude_km,
          y: y(l.altitude_km),
          status: l.status,
          message: l.message,
        });
        return null;
      }
      return { x: x(l.loss_cm3s), y: y(l.altitude_km), altitude_km: l.altitude_km, value: l.loss_cm3s };
    });
    const style = SIDE_STYLE[i % SIDE_STYLE.length];
    return {
      key: `side-${i}`,
      label: s.label,
      paths: pathSegments(pts),
      points: pts.filter((p): p is NonNullable<typeof p> => p !== null),
      dash: style.dash,
      stroke: style.stroke,
    };
  });
  return {
    frame: {
      width,
      height,
      plot,
      xTicks,
      yTicks,
      xLabel: `Ox loss rate (molecules cm⁻³ s⁻¹, ${scale === "log" ? "log" : "linear"} scale)`,
      yLabel: "altitude (km)",
    },
    lines,
    failed,
  };
}

/** The hover readout of the loss chart: each side's rate at every level (failed levels as null). */
export function lossProfileReadout(series: LossProfileSeries): ChartReadout {
  const rs: ReadoutSeries[] = series.lines.map((l) => ({
    key: l.key,
    label: l.label,
    unit: "molecules cm⁻³ s⁻¹",
    format: "number",
    points: [
      ...l.points.map((p) => ({ altitude_km: p.altitude_km, value: p.value, x: p.x })),
      ...series.failed.filter((f) => f.side === l.label).map((f) => ({ altitude_km: f.altitude_km, value: null })),
    ].sort((a, b) => a.altitude_km - b.altitude_km),
  }));
  const yOf = new Map<number, number>();
  for (const l of series.lines) for (const p of l.points) yOf.set(p.altitude_km, p.y);
  for (const f of series.failed) yOf.set(f.altitude_km, f.y);
  return { levels: readoutLevels(rs, (z) => yOf.get(z) ?? 0), series: rs };
}
