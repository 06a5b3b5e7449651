/**
 * Polygons of a profile band for an SVG chart: the 5 % curve up the levels
 * and the 95 % curve back down, split where a level has no range so that a
 * gap stays a gap. The caller's scales map share (0–1) and altitude (km) to
 * pixels. Pure data, no drawing.
 */
import type { ProfileBand } from "./bandSeries";

export function bandPolygons(
  band: ProfileBand,
  x: (share: number) => number,
  y: (altitude_km: number) => number,
): [number, number][][] {
  const runs: ProfileBand["points"][] = [];
  let run: ProfileBand["points"] = [];
  for (const p of [...band.points].sort((a, b) => a.altitude_km - b.altitude_km)) {
    if (p.p05 === null || p.p95 === null) {
      if (run.length > 0) runs.push(run);
      run = [];
    } else run.push(p);
  }
  if (run.length > 0) runs.push(run);
  return runs.map((r) => [
    ...r.map((p): [number, number] => [x(p.p05 as number), y(p.altitude_km)]),
    ...[...r].reverse().map((p): [number, number] => [x(p.p95 as number), y(p.altitude_km)]),
  ]);
}
