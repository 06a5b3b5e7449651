/** Family-share bands (5–95 %) against altitude, as an SVG overlay layer: polygons from bandPolygons, median as a line. */
import { bandPolygons } from "@/lib/uncertainty/bandPolygons";
import type { ProfileBand } from "@/lib/uncertainty/bandSeries";

export function ProfileBands({
  bands,
  x,
  y,
  colours,
}: {
  bands: ProfileBand[];
  /** share (0–1) → px */
  x: (share: number) => number;
  /** altitude (km) → px */
  y: (altitude_km: number) => number;
  /** fill colour by family */
  colours: Record<string, string>;
}) {
  return (
    <g data-testid="profile-bands">
      {bands.map((b) => (
        <g key={b.family}>
          {bandPolygons(b, x, y).map((poly) => (
            <polygon
              key={`${b.family}-${poly[0].join(",")}`}
              points={poly.map((p) => p.join(",")).join(" ")}
              fill={colours[b.family] ?? "#a8a29e"}
              fillOpacity={0.25}
            />
          ))}
          <polyline
            points={b.points
              .filter((p) => p.median !== null)
              .map((p) => `${x(p.median as number)},${y(p.altitude_km)}`)
              .join(" ")}
            fill="none"
            stroke={colours[b.family] ?? "#57534e"}
            strokeDasharray="3 2"
          />
        </g>
      ))}
    </g>
  );
}
