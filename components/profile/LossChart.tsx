/** The Ox loss rate against altitude, one line per side; failed levels marked on the right edge. */
import { type LossProfileSeries, lossProfileReadout } from "@/lib/profiles/series/lossProfileSeries";
import { formatNumber } from "@/lib/viz/formatNumber";
import { LinePaths, LineSwatch } from "./ChartFigure";
import { HoverChart } from "./HoverChart";

export function LossChart({ series, title, testId }: { series: LossProfileSeries; title: string; testId?: string }) {
  const { frame } = series;
  return (
    <HoverChart
      frame={frame}
      title={title}
      testId={testId}
      readout={lossProfileReadout(series)}
      legend={series.lines.map((l) => ({ key: l.key, label: l.label, swatch: <LineSwatch line={l} width={2} /> }))}
    >
      {(hidden) => {
        const shown = series.lines.filter((l) => !hidden.has(l.key));
        return (
          <>
            {shown.map((l) => (
              <LinePaths key={l.key} line={l} width={2} dataSeries={l.label} />
            ))}
            {shown.map((l) =>
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
          </>
        );
      }}
    </HoverChart>
  );
}
