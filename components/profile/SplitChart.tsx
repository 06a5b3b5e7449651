/** The fractional split of the Ox loss by family against altitude, stacked areas labelled in place. */
import type { FamilySplitSeries } from "@/lib/profiles/series/familySplitSeries";
import { formatPercent } from "@/lib/viz/formatNumber";
import { ChartFigure } from "./ChartFigure";

export function SplitChart({ series, title, testId }: { series: FamilySplitSeries; title: string; testId?: string }) {
  const { frame } = series;
  return (
    <ChartFigure
      frame={frame}
      title={title}
      testId={testId}
      caption={
        <figcaption className="mt-1 flex flex-wrap gap-x-3 gap-y-1 text-[11px] text-stone-700">
          {series.areas
            .filter((a) => a.maxFraction > 0)
            .map((a) => (
              <span key={a.family} className="flex items-center gap-1">
                <span
                  aria-hidden="true"
                  className="inline-block h-3 w-3 border"
                  style={{ background: a.fill, borderColor: a.stroke }}
                />
                {a.label}
              </span>
            ))}
        </figcaption>
      }
    >
      {series.areas.map((a) =>
        a.paths.map((d, i) => (
          <path key={`${a.family}-${i}`} d={d} fill={a.fill} stroke={a.stroke} strokeWidth={0.8} data-family={a.family}>
            <title>{`${a.label}: up to ${formatPercent(a.maxFraction)} of the Ox loss`}</title>
          </path>
        )),
      )}
      {series.areas.map((a) =>
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
    </ChartFigure>
  );
}
