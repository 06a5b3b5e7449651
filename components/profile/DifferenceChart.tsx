/** B − A of the Ox loss rate against altitude: total and the largest family changes. */
import type { ChartReadout } from "@/lib/profiles/series/chartReadout";
import type { DifferenceSeries } from "@/lib/profiles/series/differenceSeries";
import { LinePaths, LineSwatch } from "./ChartFigure";
import { HoverChart } from "./HoverChart";

export function DifferenceChart({
  series,
  readout,
  title,
  testId,
}: {
  series: DifferenceSeries;
  readout: ChartReadout;
  title: string;
  testId?: string;
}) {
  return (
    <HoverChart
      frame={series.frame}
      title={title}
      testId={testId}
      readout={readout}
      legend={series.lines.map((l) => ({
        key: l.key,
        label: l.label,
        swatch: <LineSwatch line={l} width={l.width} />,
      }))}
    >
      {(hidden) =>
        series.lines
          .filter((l) => !hidden.has(l.key))
          .map((l) => <LinePaths key={l.key} line={l} width={l.width} dataSeries={l.key} />)
      }
    </HoverChart>
  );
}
