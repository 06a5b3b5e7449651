/** B − A of the Ox loss rate against altitude: total and the largest family changes. */
import type { DifferenceSeries } from "@/lib/profiles/series/differenceSeries";
import { ChartFigure, LineKey, LinePaths } from "./ChartFigure";

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
    <ChartFigure
      frame={frame}
      title={title}
      testId={testId}
      caption={
        <figcaption className="mt-1 flex flex-wrap gap-x-4 gap-y-1 text-[11px] text-stone-700">
          {series.lines.map((l) => (
            <LineKey key={l.key} line={l} width={l.width} />
          ))}
        </figcaption>
      }
    >
      {series.lines.map((l) => (
        <LinePaths key={l.key} line={l} width={l.width} dataSeries={l.key} />
      ))}
    </ChartFigure>
  );
}
