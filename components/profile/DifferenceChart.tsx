/** B − A of the Ox loss rate against altitude: total and the largest family changes. */
import type { DifferenceSeries } from "@/lib/profiles/series/differenceSeries";
import { ChartAxes } from "./ChartAxes";

export function DifferenceChart({
  series,
  title,
  testId,
}: {
  series: DifferenceSeries;
  title: string;
  testId?: string;
}) {
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
              strokeWidth={l.width}
              strokeDasharray={l.dash || undefined}
              data-series={l.key}
            />
          )),
        )}
      </svg>
      <figcaption className="mt-1 flex flex-wrap gap-x-4 gap-y-1 text-[11px] text-stone-700">
        {series.lines.map((l) => (
          <span key={l.key} className="flex items-center gap-1.5">
            <svg width="28" height="8" aria-hidden="true">
              <line
                x1="0"
                x2="28"
                y1="4"
                y2="4"
                stroke={l.stroke}
                strokeWidth={l.width}
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
