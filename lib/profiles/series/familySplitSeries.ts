/**
 * Series of the "fractional split by family" chart: the fraction of the Ox
 * loss in each family stacked left to right (0 to 1) at every altitude, as
 * one filled area per family and contiguous run of converged levels. Each
 * family is labelled at the altitude where its band is widest.
 */
import { altitudeAxis, type ChartFrame, FRAME_DEFAULTS, type FrameOptions } from "./chartFrame";
import { type ChartReadout, type ReadoutSeries, readoutLevels } from "./chartReadout";
import { familyColor, familyName } from "./familyColor";

export interface SplitLevel {
  altitude_km: number;
  /** fraction by family (0–1), null when the level failed */
  fraction: Readonly<Record<string, number>> | null;
}

export interface FamilyArea {
  family: string;
  label: string;
  /** SVG path data of the closed areas */
  paths: string[];
  fill: string;
  stroke: string;
  ink: string;
  /** where to print the label (the widest point), null when the band is never wider than 6 % */
  labelAt: { x: number; y: number } | null;
  /** largest fraction over the altitudes */
  maxFraction: number;
}

export interface FamilySplitSeries {
  frame: ChartFrame;
  areas: FamilyArea[];
  failed: { altitude_km: number; y: number }[];
}

export function familySplitSeries(
  levels: readonly SplitLevel[],
  families: readonly string[],
  options: FrameOptions = {},
): FamilySplitSeries {
  const width = options.width_px ?? FRAME_DEFAULTS.width_px;
  const height = options.height_px ?? FRAME_DEFAULTS.height_px;
  const m = FRAME_DEFAULTS.margin;
  const plot = { left: m.left, top: m.top, right: width - m.right, bottom: height - m.bottom };
  const sorted = [...levels].sort((a, b) => a.altitude_km - b.altitude_km);
  const { y, ticks: yTicks } = altitudeAxis(
    sorted.length ? sorted.map((l) => l.altitude_km) : [0, 1],
    plot.top,
    plot.bottom,
  );
  const x = (f: number) => Math.round((plot.left + Math.min(1, Math.max(0, f)) * (plot.right - plot.left)) * 10) / 10;
  // runs of converged levels
  const runs: SplitLevel[][] = [];
  let cur: SplitLevel[] = [];
  for (const l of sorted) {
    if (l.fraction) cur.push(l);
    else if (cur.length) {
      runs.push(cur);
      cur = [];
    }
  }
  if (cur.length) runs.push(cur);
  const areas: FamilyArea[] = families.map((family, k) => {
    const color = familyColor(family);
    let best = { w: 0, x: 0, y: 0 };
    let maxFraction = 0;
    const paths = runs.map((run) => {
      const lo = run.map((l) => families.slice(0, k).reduce((s, f) => s + (l.fraction?.[f] ?? 0), 0));
      const hi = run.map((l, i) => lo[i] + (l.fraction?.[family] ?? 0));
      run.forEach((l, i) => {
        const w = hi[i] - lo[i];
        maxFraction = Math.max(maxFraction, w);
        // labels stay 10 px inside the plot
        const yl = Math.min(plot.bottom - 10, Math.max(plot.top + 10, y(l.altitude_km)));
        if (w > best.w) best = { w, x: x((lo[i] + hi[i]) / 2), y: yl };
      });
      // a single level is drawn as a thin band of ±0.3 km
      const ys =
        run.length === 1
          ? [y(run[0].altitude_km - 0.3), y(run[0].altitude_km + 0.3)]
          : run.map((l) => y(l.altitude_km));
      const his = run.length === 1 ? [hi[0], hi[0]] : hi;
      const los = run.length === 1 ? [lo[0], lo[0]] : lo;
      const right = ys.map((yy, i) => `${i ? "L" : "M"}${x(his[i])},${yy}`);
      const left = ys.map((yy, i) => `L${x(los[i])},${yy}`).reverse();
      return `${right.join(" ")} ${left.join(" ")} Z`;
    });
    return {
      family,
      label: familyName(family),
      paths,
      fill: color.fill,
      stroke: color.stroke,
      ink: color.ink,
      labelAt: best.w > 0.06 ? { x: best.x, y: best.y } : null,
      maxFraction,
    };
  });
  const xTicks = [0, 0.25, 0.5, 0.75, 1].map((f) => ({ px: x(f), label: `${Math.round(f * 100)} %` }));
  return {
    frame: { width, height, plot, xTicks, yTicks, xLabel: "fraction of the Ox loss", yLabel: "altitude (km)" },
    areas,
    failed: sorted.filter((l) => !l.fraction).map((l) => ({ altitude_km: l.altitude_km, y: y(l.altitude_km) })),
  };
}

/** The hover readout of the split chart: each family's fraction (0–1) at every level, for the families that have any. */
export function familySplitReadout(
  levels: readonly SplitLevel[],
  families: readonly string[],
  options: FrameOptions = {},
): ChartReadout {
  const height = options.height_px ?? FRAME_DEFAULTS.height_px;
  const m = FRAME_DEFAULTS.margin;
  const sorted = [...levels].sort((a, b) => a.altitude_km - b.altitude_km);
  const { y } = altitudeAxis(sorted.length ? sorted.map((l) => l.altitude_km) : [0, 1], m.top, height - m.bottom);
  const rs: ReadoutSeries[] = families
    .filter((f) => sorted.some((l) => (l.fraction?.[f] ?? 0) > 0))
    .map((family) => ({
      key: family,
      label: familyName(family),
      unit: "",
      format: "percent",
      points: sorted.map((l) => ({ altitude_km: l.altitude_km, value: l.fraction ? (l.fraction[family] ?? 0) : null })),
    }));
  return { levels: readoutLevels(rs, y), series: rs };
}
