import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { DeletionTokenNote } from "@/components/DeletionTokenNote";
import { RunView } from "@/components/runs/RunView";
import { dailyLossChart, runChartSeries, timeLineChart } from "@/lib/runs";
import { recordForPage } from "@/lib/service/pageRecord";
import { getRunRecord } from "@/lib/service/runs";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Run · Ozone Loss Cycles" };

export default async function RunPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const record = await recordForPage(getRunRecord(id));
  if (!record) notFound();
  const r = record.body.result;
  const s = runChartSeries(r);
  return (
    <div className="mx-auto max-w-6xl px-4 py-8">
      <DeletionTokenNote
        what="this run (the analyses opened at its hours stay: each is a record of its own)"
        deleteUrl={`/api/runs/${id}`}
      />
      <RunView
        id={id}
        title={r.title}
        status={r.status}
        message={r.message}
        warnings={r.warnings}
        hours={r.hours.t_h.length}
        o3={timeLineChart(s.t_h, s.o3 ? [s.o3] : [], "O3 (ppbv)")}
        chlorine={timeLineChart(s.t_h, s.chlorine, "chlorine (ppbv)")}
        loss={dailyLossChart(s)}
        daily={r.daily.map((d) => ({
          day: d.day,
          o3Change_ppbv: d.o3Change_ppbv,
          o3Change_percent: d.o3Change_percent,
          oxLoss_cm3: d.oxLoss_cm3,
          closure: d.closure,
        }))}
        topFamilies={r.daily.map((d) => d.byFamily.slice(0, 3).map((f) => f.family))}
      />
    </div>
  );
}
