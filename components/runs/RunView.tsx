/** A stored run: O3 and the chlorine partition against time, the daily Ox loss stacked by family, exports. */
import { ChartFigure, LineKey, LinePaths } from "@/components/profile/ChartFigure";
import { CopyLink } from "@/components/ui/CopyLink";
import type { DailyLossChart, TimeLineChart } from "@/lib/runs/timeCharts";
import type { RunDay } from "@/lib/runs/types";
import { formatNumber } from "@/lib/viz/formatNumber";
import { HourLink } from "./HourLink";

export interface RunViewProps {
  id: string;
  title: string;
  status: string;
  message: string;
  warnings: string[];
  hours: number;
  o3: TimeLineChart;
  chlorine: TimeLineChart;
  loss: DailyLossChart;
  daily: Pick<RunDay, "day" | "o3Change_ppbv" | "o3Change_percent" | "oxLoss_cm3" | "closure">[];
  topFamilies: string[][];
}

export function RunView(p: RunViewProps) {
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-2xl font-semibold tracking-tight">{p.title}</h1>
        <CopyLink path={`/runs/${p.id}`} />
      </div>
      <p data-testid="run-status" className={`text-[13px] ${p.status === "ok" ? "text-stone-700" : "text-red-800"}`}>
        {p.status === "ok" ? p.message : `The integration failed: ${p.message}`}
      </p>
      {p.warnings.length ? (
        <details className="text-[12px] text-amber-900">
          <summary>{p.warnings.length} notes</summary>
          <ul className="list-disc pl-5">
            {p.warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        </details>
      ) : null}
      <HourLink runId={p.id} hours={p.hours} />
      <div className="grid gap-4 lg:grid-cols-2">
        <TimeChart chart={p.o3} title="O3 against time" testId="o3-chart" />
        <TimeChart chart={p.chlorine} title="Chlorine partition against time" testId="chlorine-chart" />
      </div>
      <ChartFigure
        frame={p.loss.frame}
        title="Daily Ox loss by family"
        testId="daily-loss-chart"
        caption={
          <figcaption className="mt-1 flex flex-wrap gap-3 text-[12px]">
            {p.loss.legend.map((l) => (
              <span key={l.family} className="flex items-center gap-1">
                <svg width="12" height="12" aria-hidden="true">
                  <rect width="12" height="12" fill={l.fill} stroke={l.stroke} />
                </svg>
                {l.label}
              </span>
            ))}
          </figcaption>
        }
      >
        {p.loss.bars.map((b) => (
          <rect
            key={`${b.day}-${b.family}`}
            x={b.x}
            y={b.y}
            width={b.width}
            height={b.height}
            fill={b.fill}
            stroke={b.stroke}
            data-family={b.family}
          >
            <title>{`day ${b.day}, ${b.label}: ${formatNumber(b.value, 3)} ppbv`}</title>
          </rect>
        ))}
      </ChartFigure>
      <table className="w-full max-w-3xl text-[12px]" data-testid="daily-table">
        <thead>
          <tr className="text-left text-stone-600">
            <th className="py-1">day</th>
            <th>O3 change (ppbv/day)</th>
            <th>O3 change (%/day)</th>
            <th>Ox loss (cm⁻³/day)</th>
            <th>largest families</th>
            <th>budget closure</th>
          </tr>
        </thead>
        <tbody className="tabular-nums">
          {p.daily.map((d, i) => (
            <tr key={d.day} className="border-t border-stone-200">
              <td className="py-0.5">{d.day}</td>
              <td>{formatNumber(d.o3Change_ppbv, 3)}</td>
              <td>{formatNumber(d.o3Change_percent, 3)}</td>
              <td>{formatNumber(d.oxLoss_cm3, 3)}</td>
              <td>{p.topFamilies[i].join(", ")}</td>
              <td>{formatNumber(100 * d.closure, 2)} %</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="flex flex-wrap gap-3 text-[13px]">
        <a className="underline" href={`/api/runs/${p.id}/hours.csv`}>
          hours.csv
        </a>
        <a className="underline" href={`/api/runs/${p.id}/rates.csv`}>
          rates.csv
        </a>
        <a className="underline" href={`/api/runs/${p.id}/daily.csv`}>
          daily.csv
        </a>
        <a className="underline" href={`/api/runs/${p.id}.json`}>
          JSON
        </a>
      </p>
    </div>
  );
}

function TimeChart({ chart, title, testId }: { chart: TimeLineChart; title: string; testId: string }) {
  return (
    <ChartFigure
      frame={chart.frame}
      title={title}
      testId={testId}
      caption={
        <figcaption className="mt-1 flex flex-wrap gap-3 text-[12px]">
          {chart.lines.map((l) => (
            <LineKey key={l.key} line={l} width={1.5} />
          ))}
        </figcaption>
      }
    >
      {chart.lines.map((l) => (
        <LinePaths key={l.key} line={l} width={1.5} dataSeries={l.key} />
      ))}
    </ChartFigure>
  );
}
