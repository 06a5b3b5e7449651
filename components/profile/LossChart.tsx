/** The Ox loss rate against altitude, one line per side; failed levels marked on the right edge. */
import type { LossProfileSeries } from "@/lib/profiles/series/lossProfileSeries";
import { formatNumber } from "@/lib/viz/formatNumber";
import { ChartAxes } from "./ChartAxes";

export function LossChart({ series, title, testId }: { series: LossProfileSeries; title: string; testId?: string }) {
  const { frame } = series;
  return (
    <figure data-testid={testId}>
      <svg
        viewBox={`0 0 ${frame.width} ${frame.height}`}
        width="100%"
        role="img"
        aria-label={title}
        className="max-w-[520px]"
      >
        <title>{title}</title>
        <ChartAxes frame={frame} />
        {series.lines.map((l) =>
          l.paths.map((d, i) => (
            <path
              key={`${l.key}-${i}`}
              d={d}
              fill="none"
              stroke={l.stroke}
              strokeWidth={2}
              strokeDasharray={l.dash || undefined}
              data-series={l.label}
            />
          )),
        )}
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
      </svg>
      <figcaption className="mt-1 flex flex-wrap gap-4 text-[12px] text-stone-700">
        {series.lines.map((l) => (
          <span key={l.key} className="flex items-center gap-1.5">
            <svg width="28" height="8" aria-hidden="true">
              <line
                x1="0"
                x2="28"
                y1="4"
                y2="4"
                stroke={l.stroke}
                strokeWidth={2}
                strokeDasharray={l.dash || undefined}
              />
            </svg>
            {l.label}
          </span>
        ))}
      </figcaption>
    </figure>
  );
}
