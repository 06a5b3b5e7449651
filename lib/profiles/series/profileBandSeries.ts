/**
 * Chart data for the family shares against altitude with their Monte Carlo
 * 5–95 % bands (unstacked, share 0–1 on x, altitude on y): the frame in the
 * profile charts' layout (chartFrame, same margins) and, per family, the
 * band polygons (lib/uncertainty bandPolygons), the median line segments
 * and the family's colours (familyColor). Pure data, snapshot-able.
 *
 * Units: px, share 0–1, km.
 */
import { bandPolygons } from "../../uncertainty/bandPolygons";
import type { ProfileBand } from "../../uncertainty/bandSeries";
import { altitudeAxis, type ChartFrame, FRAME_DEFAULTS, type FrameOptions, pathSegments } from "./chartFrame";
import { type ChartReadout, type ReadoutSeries, readoutLevels } from "./chartReadout";
import { familyColor } from "./familyColor";

export interface ProfileBandSeries {
  frame: ChartFrame;
  families: {
    family: string;
    /** SVG "points" strings of the 5–95 % band polygons */
    polygons: string[];
    /** SVG path data of the median line (gaps kept) */
    medianPaths: string[];
    fill: string;
    stroke: string;
  }[];
}

export function profileBandSeries(bands: readonly ProfileBand[], options: FrameOptions = {}): ProfileBandSeries {
  const width = options.width_px ?? FRAME_DEFAULTS.width_px;
  const height = options.height_px ?? FRAME_DEFAULTS.height_px;
  const m = FRAME_DEFAULTS.margin;
  const plot = { left: m.left, top: m.top, right: width - m.right, bottom: height - m.bottom };
  const altitudes = bands.flatMap((b) => b.points.map((p) => p.altitude_km));
  const { y, ticks: yTicks } = altitudeAxis(altitudes.length ? altitudes : [0, 1], plot.top, plot.bottom);
  const x = (f: number) => Math.round((plot.left + Math.min(1, Math.max(0, f)) * (plot.right - plot.left)) * 10) / 10;
  const xTicks = [0, 0.25, 0.5, 0.75, 1].map((f) => ({ px: x(f), label: `${Math.round(f * 100)} %` }));
  return {
    frame: {
      width,
      height,
      plot,
      xTicks,
      yTicks,
      xLabel: "share of the Ox loss (median, 5–95 %)",
      yLabel: "altitude, km",
    },
    families: bands.map((b) => {
      const c = familyColor(b.family);
      const sorted = [...b.points].sort((p, q) => p.altitude_km - q.altitude_km);
      return {
        family: b.family,
        polygons: bandPolygons(b, x, y).map((poly) => poly.map((p) => p.join(",")).join(" ")),
        medianPaths: pathSegments(
          sorted.map((p) => (p.median === null ? null : { x: x(p.median), y: y(p.altitude_km) })),
        ),
        fill: c.fill,
        stroke: c.stroke,
      };
    }),
  };
}

/** The hover readout of the band chart: each family's median share with its 5–95 % range at every level. */
export function profileBandReadout(bands: readonly ProfileBand[], options: FrameOptions = {}): ChartReadout {
  const width = options.width_px ?? FRAME_DEFAULTS.width_px;
  const height = options.height_px ?? FRAME_DEFAULTS.height_px;
  const m = FRAME_DEFAULTS.margin;
  const altitudes = bands.flatMap((b) => b.points.map((p) => p.altitude_km));
  const { y } = altitudeAxis(altitudes.length ? altitudes : [0, 1], m.top, height - m.bottom);
  const x = (f: number) => Math.round((m.left + Math.min(1, Math.max(0, f)) * (width - m.right - m.left)) * 10) / 10;
  const rs: ReadoutSeries[] = bands.map((b) => ({
    key: b.family,
    label: b.family,
    unit: "",
    format: "percent",
    points: [...b.points]
      .sort((p, q) => p.altitude_km - q.altitude_km)
      .map((p) =>
        p.median === null
          ? { altitude_km: p.altitude_km, value: null }
          : { altitude_km: p.altitude_km, value: p.median, x: x(p.median), range: [p.p05, p.p95] as const },
      ),
  }));
  return { levels: readoutLevels(rs, y), series: rs };
}
