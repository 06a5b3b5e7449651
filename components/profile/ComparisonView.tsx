"use client";
/**
 * A stored comparison: the Ox loss rate of A and B against altitude, B − A
 * with its largest family changes, the family split of each side, and a
 * table of the cycles whose change explains the difference at each altitude.
 */
import { useMemo, useState } from "react";
import type { RateScale, SignedScale } from "@/lib/profiles/series/chartFrame";
import { differenceReadout, differenceSeries } from "@/lib/profiles/series/differenceSeries";
import { familySplitReadout, familySplitSeries } from "@/lib/profiles/series/familySplitSeries";
import { lossProfileSeries } from "@/lib/profiles/series/lossProfileSeries";
import type { ComparisonResult } from "@/lib/profiles/types";
import { formatNumber, formatPercent } from "@/lib/viz/formatNumber";
import { CopyLink } from "../ui/CopyLink";
import { ProfileUncertaintyRunner } from "../uncertainty";
import { DifferenceChart } from "./DifferenceChart";
import { LossChart } from "./LossChart";
import { ScaleToggle } from "./ScaleToggle";
import { SplitChart } from "./SplitChart";

export function ComparisonView({ id, result, createdAt }: { id: string; result: ComparisonResult; createdAt: string }) {
  const [rateScale, setRateScale] = useState<RateScale>("log");
  const [diffScale, setDiffScale] = useState<SignedScale>("linear");
  const { labels } = result;
  const loss = useMemo(
    () =>
      lossProfileSeries(
        [
          { label: `A: ${labels.a}`, levels: result.levels.map((l) => ({ altitude_km: l.altitude_km, ...l.a })) },
          { label: `B: ${labels.b}`, levels: result.levels.map((l) => ({ altitude_km: l.altitude_km, ...l.b })) },
        ],
        rateScale,
      ),
    [result, rateScale, labels],
  );
  const diff = useMemo(() => {
    const levels = result.levels.map((l) => ({
      altitude_km: l.altitude_km,
      total_cm3s: l.difference?.loss_cm3s ?? null,
      byFamily: l.difference?.oxLoss_cm3s ?? {},
    }));
    return {
      series: differenceSeries(levels, result.families, diffScale),
      readout: differenceReadout(levels, result.families, diffScale),
    };
  }, [result, diffScale]);
  const splitA = useMemo(() => {
    const levels = result.levels.map((l) => ({
      altitude_km: l.altitude_km,
      fraction: l.a.loss_cm3s === null ? null : l.a.fraction,
    }));
    return {
      series: familySplitSeries(levels, result.families, { height_px: 340 }),
      readout: familySplitReadout(levels, result.families, { height_px: 340 }),
    };
  }, [result]);
  const splitB = useMemo(() => {
    const levels = result.levels.map((l) => ({
      altitude_km: l.altitude_km,
      fraction: l.b.loss_cm3s === null ? null : l.b.fraction,
    }));
    return {
      series: familySplitSeries(levels, result.families, { height_px: 340 }),
      readout: familySplitReadout(levels, result.families, { height_px: 340 }),
    };
  }, [result]);
  const side = (k: "a" | "b") => result[k];
  const demo = side("a").profile.demo || side("b").profile.demo;
  const levelsTopDown = [...result.levels].reverse();
  return (
    <div className="space-y-4">
      <header className="space-y-2">
        <h1 className="text-2xl font-semibold tracking-tight">
          Comparison: {labels.a} vs {labels.b}
        </h1>
        <dl className="grid gap-2 text-[13px] md:grid-cols-2">
          {(["a", "b"] as const).map((k) => (
            <div key={k} className="rounded border border-stone-300 bg-white px-3 py-2" data-testid={`side-${k}`}>
              <dt className="font-semibold">
                {k.toUpperCase()}: {labels[k]}
              </dt>
              <dd>
                {side(k).profile.title}
                {side(k).profile.demo ? (
                  <span className="ml-1 rounded bg-amber-100 px-1 text-[11px] text-amber-900">invented demo data</span>
                ) : null}
              </dd>
              <dd className="text-stone-600">
                {side(k).mechanism.title} · {side(k).mode === "diurnal" ? "24-hour mean" : "instantaneous"} ·{" "}
                <a className="underline" href={`/profiles/${side(k).sweepId}`}>
                  the sweep
                </a>
              </dd>
            </div>
          ))}
        </dl>
        {demo ? (
          <p className="rounded bg-amber-50 px-3 py-2 text-[13px] text-amber-900" data-testid="demo-notice">
            At least one side uses invented demo data: the profiles are made up for demonstration and are not
            measurements.
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
          <CopyLink path={`/compare/${id}`} />
          <a className="underline" href={`/api/comparisons/${id}/comparison.csv`} download>
            Download CSV
          </a>
          <a className="underline" href={`/api/comparisons/${id}.json`} download>
            JSON
          </a>
          <span className="text-stone-500">stored {createdAt.slice(0, 16).replace("T", " ")} UTC</span>
        </div>
      </header>

      <div className="flex flex-wrap gap-6 rounded border border-stone-200 bg-white px-3 py-2">
        <ScaleToggle<RateScale>
          name="rate-scale"
          label="Loss-rate axis"
          value={rateScale}
          onChange={setRateScale}
          options={[
            { value: "linear", label: "linear" },
            { value: "log", label: "log" },
          ]}
        />
        <ScaleToggle<SignedScale>
          name="diff-scale"
          label="Difference axis"
          value={diffScale}
          onChange={setDiffScale}
          options={[
            { value: "linear", label: "linear" },
            { value: "signed-log", label: "symmetric log" },
          ]}
        />
      </div>

      <div className="grid gap-4 lg:grid-cols-2">
        <section aria-labelledby="h-loss">
          <h2 id="h-loss" className="text-[14px] font-semibold">
            Ox loss rate, A and B
          </h2>
          <LossChart
            series={loss}
            title={`Ox loss rate against altitude for ${labels.a} and ${labels.b}`}
            testId="chart-loss"
          />
        </section>
        <section aria-labelledby="h-diff">
          <h2 id="h-diff" className="text-[14px] font-semibold">
            Difference B − A, by family
          </h2>
          <DifferenceChart
            series={diff.series}
            readout={diff.readout}
            title={`B − A of the Ox loss rate against altitude`}
            testId="chart-difference"
          />
        </section>
        <section aria-labelledby="h-split-a">
          <h2 id="h-split-a" className="text-[14px] font-semibold">
            A: {labels.a} — fraction of the Ox loss by family
          </h2>
          <SplitChart
            series={splitA.series}
            readout={splitA.readout}
            title={`Family split of the Ox loss against altitude, ${labels.a}`}
            testId="chart-split-a"
          />
          <ProfileUncertaintyRunner profileId={side("a").sweepId} label="A" />
        </section>
        <section aria-labelledby="h-split-b">
          <h2 id="h-split-b" className="text-[14px] font-semibold">
            B: {labels.b} — fraction of the Ox loss by family
          </h2>
          <SplitChart
            series={splitB.series}
            readout={splitB.readout}
            title={`Family split of the Ox loss against altitude, ${labels.b}`}
            testId="chart-split-b"
          />
          <ProfileUncertaintyRunner profileId={side("b").sweepId} label="B" />
        </section>
      </div>

      <section aria-labelledby="h-table">
        <h2 id="h-table" className="text-[14px] font-semibold">
          At each altitude: A, B, B − A and the cycles that explain it
        </h2>
        <div className="overflow-x-auto">
          <table className="mt-1 w-full border-collapse text-[12px]" data-testid="comparison-table">
            <thead>
              <tr className="border-b border-stone-300 text-left">
                <th scope="col" className="py-1 pr-2">
                  altitude (km)
                </th>
                <th scope="col" className="pr-2">
                  A Ox loss (cm⁻³ s⁻¹)
                </th>
                <th scope="col" className="pr-2">
                  B Ox loss (cm⁻³ s⁻¹)
                </th>
                <th scope="col" className="pr-2">
                  B − A
                </th>
                <th scope="col" className="pr-2">
                  (B − A)/A
                </th>
                <th scope="col" className="pr-2">
                  cycles whose change explains most of B − A
                </th>
              </tr>
            </thead>
            <tbody>
              {levelsTopDown.map((l) => (
                <tr key={l.altitude_km} className="border-b border-stone-100 align-top">
                  <th scope="row" className="py-1 pr-2 text-left font-normal tabular-nums">
                    {l.altitude_km}
                  </th>
                  <td className="pr-2 tabular-nums">
                    {l.a.loss_cm3s === null ? <Failed s={l.a} /> : formatNumber(l.a.loss_cm3s)}
                  </td>
                  <td className="pr-2 tabular-nums">
                    {l.b.loss_cm3s === null ? <Failed s={l.b} /> : formatNumber(l.b.loss_cm3s)}
                  </td>
                  <td className="pr-2 tabular-nums">{l.difference ? formatNumber(l.difference.loss_cm3s) : "—"}</td>
                  <td className="pr-2 tabular-nums">
                    {l.difference?.relative !== null && l.difference
                      ? `${(l.difference.relative * 100).toFixed(1)} %`
                      : "—"}
                  </td>
                  <td className="pr-2">
                    {l.difference && l.difference.explaining.length > 0 ? (
                      <ol className="space-y-0.5">
                        {l.difference.explaining.slice(0, 3).map((c) => (
                          <li key={c.cycleId}>
                            <span className="font-medium">{c.family}</span> {c.netEquation}:{" "}
                            {formatNumber(c.delta_cm3s)}
                            {c.shareOfDifference !== null ? ` (${formatPercent(c.shareOfDifference)})` : ""}
                          </li>
                        ))}
                      </ol>
                    ) : l.difference ? (
                      "no change"
                    ) : (
                      "—"
                    )}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>
    </div>
  );
}

function Failed({ s }: { s: { status: string; message: string } }) {
  return (
    <span className="text-red-800" title={s.message}>
      failed ({s.status})
    </span>
  );
}
