/** The fractional split of the Ox loss by family against altitude, stacked areas labelled in place. */
import type { ChartReadout } from "@/lib/profiles/series/chartReadout";
import type { FamilyArea, FamilySplitSeries } from "@/lib/profiles/series/familySplitSeries";
import { formatPercent } from "@/lib/viz/formatNumber";
import { HoverChart } from "./HoverChart";

function AreaSwatch({ area }: { area: FamilyArea }) {
  return (
    <span
      aria-hidden="true"
      className="inline-block h-3 w-3 border"
      style={{ background: area.fill, borderColor: area.stroke }}
    />
  );
}

/** A hidden family leaves its band empty: the others keep their place in the stack. */
export function SplitChart({
  series,
  readout,
  title,
  testId,
}: {
  series: FamilySplitSeries;
  readout: ChartReadout;
  title: string;
  testId?: string;
}) {
  const { frame } = series;
  const drawn = series.areas.filter((a) => a.maxFraction > 0);
  return (
    <HoverChart
      frame={frame}
      title={title}
      testId={testId}
      readout={readout}
      legend={drawn.map((a) => ({ key: a.family, label: a.label, swatch: <AreaSwatch area={a} /> }))}
    >
      {(hidden) => {
        const shown = series.areas.filter((a) => !hidden.has(a.family));
        return (
          <>
            {shown.map((a) =>
              a.paths.map((d, i) => (
                <path
                  key={`${a.family}-${i}`}
                  d={d}
                  fill={a.fill}
                  stroke={a.stroke}
                  strokeWidth={0.8}
                  data-family={a.family}
                >
                  <title>{`${a.label}: up to ${formatPercent(a.maxFraction)} of the Ox loss`}</title>
                </path>
              )),
            )}
            {shown.map((a) =>
              a.labelAt ? (
                <text
                  key={`label-${a.family}`}
                  x={a.labelAt.x}
                  y={a.labelAt.y + 3}
                  textAnchor="middle"
                  fontSize={10}
                  fontWeight={600}
                  fill={a.ink}
                  pointerEvents="none"
                >
                  {a.label}
                </text>
              ) : null,
            )}
            {series.failed.map((f) => (
              <text key={f.altitude_km} x={frame.plot.left + 4} y={f.y + 3} fontSize={10} fill="#b42318">
                ✕ {f.altitude_km} km failed
              </text>
            ))}
          </>
        );
      }}
    </HoverChart>
  );
}
