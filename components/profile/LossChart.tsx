/** The Ox loss rate against altitude, one line per side; failed levels marked on the right edge. */
import type { LossProfileSeries } from "@/lib/profiles/series/lossProfileSeries";
import { formatNumber } from "@/lib/viz/formatNumber";
import { ChartFigure, LineKey, LinePaths } from "./ChartFigure";

export function LossChart({ series, title, testId }: { series: LossProfileSeries; title: string; testId?: string }) {
  const { frame } = series;
  return (
    <ChartFigure
      frame={frame}
      title={title}
      testId={testId}
      caption={
        <figcaption className="mt-1 flex flex-wrap gap-4 text-[12px] text-stone-700">
          {series.lines.map((l) => (
            <LineKey key={l.key} line={l} width={2} />
          ))}
        </figcaption>
      }
    >
      {series.lines.map((l) => (
        <LinePaths key={l.key} line={l} width={2} dataSeries={l.label} />
      ))}
      {series.lines.map((l) =>
        l.points.map((p) => (
          <circle key={`${l.key}-${p.altitude_km}`} cx={p.x} cy={p.y} r={1.8} fill={l.stroke}>
            <title>{`${l.label}, ${p.altitude_km} km: ${formatNumber(p.value)} molecules cm⁻³ s⁻¹`}</title>
          </circle>
        )),
      )}
      {series.failed.map((f) => (
        <g key={`${f.side}-${f.altitude_km}`}>
          <text x={frame.plot.right - 4} y={f.y + 3} textAnchor="end" fontSize={10} fill="#b42318">
            ✕ {f.side} {f.altitude_km} km
          </text>
          <title>{`${f.side} at ${f.altitude_km} km: ${f.status} — ${f.message}`}</title>
        </g>
      ))}
    </ChartFigure>
  );
}
