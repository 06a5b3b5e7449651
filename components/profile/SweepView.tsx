"use client";
/**
 * A stored sweep: the Ox loss rate against altitude, its split by family,
 * and a table of every level (a failed level with its status and reason),
 * each linked to the explorer at that level's condition.
 */
import { useMemo, useState } from "react";
import type { RateScale } from "@/lib/profiles/series/chartFrame";
import { familySplitReadout, familySplitSeries } from "@/lib/profiles/series/familySplitSeries";
import { lossProfileSeries } from "@/lib/profiles/series/lossProfileSeries";
import type { SweepResult } from "@/lib/profiles/types";
import { formatNumber, formatPercent } from "@/lib/viz/formatNumber";
import { CopyLink } from "../ui/CopyLink";
import { ProfileUncertaintyRunner } from "../uncertainty";
import { LossChart } from "./LossChart";
import { ScaleToggle } from "./ScaleToggle";
import { SplitChart } from "./SplitChart";

export function SweepView({
  id,
  result,
  createdAt,
  explorerLinks,
}: {
  id: string;
  result: SweepResult;
  createdAt: string;
  /** explorer URL by level index */
  explorerLinks: string[];
}) {
  const [scale, setScale] = useState<RateScale>("log");
  const loss = useMemo(
    () =>
      lossProfileSeries(
        [
          {
            label: "Ox loss",
            levels: result.levels.map((l) => ({
              altitude_km: l.altitude_km,
              status: l.status,
              message: l.message,
              loss_cm3s: l.budget ? l.budget.loss_cm3s : null,
            })),
          },
        ],
        scale,
      ),
    [result, scale],
  );
  const split = useMemo(() => {
    const levels = result.levels.map((l) => ({
      altitude_km: l.altitude_km,
      fraction: l.budget ? Object.fromEntries(l.budget.byFamily.map((f) => [f.family, f.fraction])) : null,
    }));
    return {
      series: familySplitSeries(levels, result.families),
      readout: familySplitReadout(levels, result.families),
    };
  }, [result]);
  const p = result.profile;
  const failed = result.levels.filter((l) => l.status !== "converged").length;
  const rows = result.levels.map((l, i) => ({ l, link: explorerLinks[i] })).reverse();
  return (
    <div className="space-y-4">
      <header className="space-y-2">
        <h1 className="text-2xl font-semibold tracking-tight">
          Profile sweep: <bdi>{p.title}</bdi>
        </h1>
        <p className="text-[13px] text-stone-700">
          <bdi>{result.mechanism.title}</bdi> · {result.mode === "diurnal" ? "24-hour mean" : "instantaneous"} · O3{" "}
          {result.ozone}
          {result.ozone === "solved"
            ? `, overhead column from the solved levels above (${result.timing.passes} passes)`
            : ""}
          {result.columnSource === "profile" ? ", overhead O3 column from the profile" : ""} · {result.levels.length}{" "}
          levels
          {failed ? `, ${failed} failed` : ""} · {(result.timing.wall_ms / 1000).toFixed(1)} s on {result.timing.chains}{" "}
          warm-started {result.timing.chains === 1 ? "chain" : "chains"}
        </p>
        {p.demo ? (
          <p className="rounded bg-amber-50 px-3 py-2 text-[13px] text-amber-900" data-testid="demo-notice">
            <strong>Invented demo data, not a measurement:</strong> {p.note.replace(/^invented demo data:\s*/i, "")}
          </p>
        ) : null}
        {result.warnings.length ? (
          <ul className="list-disc pl-5 text-[12px] text-amber-900">
            {result.warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        ) : null}
        <div className="flex flex-wrap items-center gap-4 text-[12px]">
          <CopyLink path={`/profiles/${id}`} />
          <a className="underline" href={`/api/profiles/${id}/levels.csv`} download>
            Levels CSV
          </a>
          <a className="underline" href={`/api/profiles/${id}/cycles.csv`} download>
            Cycles CSV
          </a>
          <a className="underline" href={`/api/profiles/${id}/profile.csv`} download>
            Profile CSV
          </a>
          <a className="underline" href={`/api/profiles/${id}.json`} download>
            JSON
          </a>
          <a className="font-medium underline" href={`/compare?a=${id}`}>
            Compare with another sweep…
          </a>
          <span className="text-stone-500">stored {createdAt.slice(0, 16).replace("T", " ")} UTC</span>
        </div>
      </header>
      <ScaleToggle<RateScale>
        name="rate-scale"
        label="Loss-rate axis"
        value={scale}
        onChange={setScale}
        options={[
          { value: "linear", label: "linear" },
          { value: "log", label: "log" },
        ]}
      />
      <div className="grid gap-4 lg:grid-cols-2">
        <section aria-labelledby="h-loss">
          <h2 id="h-loss" className="text-[14px] font-semibold">
            Ox loss rate
          </h2>
          <LossChart series={loss} title="Ox loss rate against altitude" testId="chart-loss" />
        </section>
        <section aria-labelledby="h-split">
          <h2 id="h-split" className="text-[14px] font-semibold">
            Fraction of the Ox loss by family
          </h2>
          <SplitChart
            series={split.series}
            readout={split.readout}
            title="Family split of the Ox loss against altitude"
            testId="chart-split"
          />
          <ProfileUncertaintyRunner profileId={id} />
        </section>
      </div>
      <section aria-labelledby="h-levels">
        <h2 id="h-levels" className="text-[14px] font-semibold">
          Levels
        </h2>
        {result.columnSource !== "climatology" ? (
          <p className="text-[12px] text-stone-600">
            The explorer links open a level with the default climatology's overhead O3 column; this sweep took it from{" "}
            {result.columnSource === "solved" ? "the O3 solved at the levels above" : "the profile's O3"}, so the
            numbers there can differ slightly.
          </p>
        ) : null}
        <div className="overflow-x-auto">
          <table className="mt-1 w-full border-collapse text-[12px]" data-testid="levels-table">
            <thead>
              <tr className="border-b border-stone-300 text-left">
                <th scope="col" className="py-1 pr-2">
                  altitude (km)
                </th>
                <th scope="col" className="pr-2">
                  status
                </th>
                <th scope="col" className="pr-2">
                  T (K)
                </th>
                <th scope="col" className="pr-2">
                  p (hPa)
                </th>
                <th scope="col" className="pr-2">
                  O3 column above (DU)
                </th>
                <th scope="col" className="pr-2">
                  Ox production (cm⁻³ s⁻¹)
                </th>
                <th scope="col" className="pr-2">
                  Ox loss (cm⁻³ s⁻¹)
                </th>
                <th scope="col" className="pr-2">
                  largest family
                </th>
                <th scope="col" className="pr-2">
                  largest cycle
                </th>
                <th scope="col" className="pr-2">
                  open
                </th>
              </tr>
            </thead>
            <tbody>
              {rows.map(({ l, link }) => {
                const top = [...(l.budget?.byFamily ?? [])].sort((a, b) => b.fraction - a.fraction)[0];
                const cycle = [...l.cycles].sort((a, b) => b.oxLoss_cm3s - a.oxLoss_cm3s)[0];
                return (
                  <tr key={l.altitude_km} className="border-b border-stone-100 align-top">
                    <th scope="row" className="py-1 pr-2 text-left font-normal tabular-nums">
                      {l.altitude_km}
                    </th>
                    <td className={`pr-2 ${l.status === "converged" ? "" : "text-red-800"}`}>
                      {l.status}
                      {l.message ? <div className="max-w-64 text-[11px]">{l.message}</div> : null}
                    </td>
                    <td className="pr-2 tabular-nums">{l.condition ? l.condition.T_K.toFixed(1) : "—"}</td>
                    <td className="pr-2 tabular-nums">{l.condition ? formatNumber(l.condition.p_hPa) : "—"}</td>
                    <td className="pr-2 tabular-nums">{l.condition ? l.condition.o3ColumnAbove_DU.toFixed(1) : "—"}</td>
                    <td className="pr-2 tabular-nums">{l.budget ? formatNumber(l.budget.production_cm3s) : "—"}</td>
                    <td className="pr-2 tabular-nums">{l.budget ? formatNumber(l.budget.loss_cm3s) : "—"}</td>
                    <td className="pr-2">{top ? `${top.family} ${formatPercent(top.fraction)}` : "—"}</td>
                    <td className="pr-2">
                      {cycle ? `${cycle.netEquation} (${cycle.family}, ${formatPercent(cycle.share)})` : "—"}
                    </td>
                    <td className="pr-2">
                      <a className="underline" href={link}>
                        explorer
                      </a>
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      </section>
    </div>
  );
}
