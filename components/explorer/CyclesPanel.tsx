/**
 * The catalytic cycles of the analysis, largest ozone loss first. A cycle is a
 * toggle button: pressing it highlights its steps in the network.
 */

import { useState } from "react";
import type { CatalyticCycle, CycleReport } from "@/lib/analysis/types";
import { formatNumber, formatPercent } from "@/lib/viz/formatNumber";
import { Panel } from "./Panel";

interface Props {
  report: CycleReport | null;
  selected: string | null;
  onSelect(id: string | null): void;
  onInspectReaction(id: string): void;
}

export function CyclesPanel({ report, selected, onSelect, onInspectReaction }: Props) {
  const cycles = report
    ? [...report.cycles].sort((a, b) => b.oxLoss_cm3s - a.oxLoss_cm3s || a.id.localeCompare(b.id))
    : [];
  return (
    <Panel
      title="Catalytic cycles"
      id="cycles-title"
      right={
        report ? (
          <span className="text-[11px] text-stone-500">
            {cycles.length} cycles · {report.pathwayCount} pathways
          </span>
        ) : null
      }
      className="flex max-h-[520px] min-h-0 flex-col lg:max-h-none lg:min-h-[200px] lg:flex-1"
    >
      <p className="px-3 pt-1.5 text-[11px] text-stone-500">
        Sorted by odd oxygen destroyed (molecules cm⁻³ s⁻¹). Press a cycle to light its steps in the network.
      </p>
      {!report ? (
        <p className="px-3 py-4 text-sm text-stone-500">Waiting for the first analysis…</p>
      ) : cycles.length === 0 ? (
        <p className="px-3 py-4 text-sm text-stone-500">No catalytic cycle above the threshold at these conditions.</p>
      ) : (
        <ol data-testid="cycles" className="min-h-0 flex-1 space-y-1 overflow-y-auto px-2 py-1.5">
          {cycles.map((c, i) => (
            <CycleRow
              key={c.id}
              rank={i + 1}
              cycle={c}
              active={selected === c.id}
              onToggle={() => onSelect(selected === c.id ? null : c.id)}
              onInspectReaction={onInspectReaction}
            />
          ))}
        </ol>
      )}
      {report && (report.otherLossPathways?.length ?? 0) > 0 ? (
        <details className="border-t border-stone-200 px-3 py-1 text-[11px] text-stone-600">
          <summary className="cursor-pointer select-none">
            {report.otherLossPathways.length} other Ox-loss pathway{report.otherLossPathways.length === 1 ? "" : "s"},{" "}
            {formatPercent(report.otherLossPathways.reduce((a, c) => a + c.share, 0))} of the loss (chains that start or
            end in reservoirs)
          </summary>
          <ul className="mt-1 max-h-32 space-y-0.5 overflow-y-auto">
            {report.otherLossPathways.map((c) => (
              <li key={c.id} className="flex justify-between gap-2">
                <span className="truncate" title={c.netEquation}>
                  {c.netEquation}
                </span>
                <span className="shrink-0 tabular-nums">
                  {formatNumber(c.oxLoss_cm3s)} ({formatPercent(c.share)})
                </span>
              </li>
            ))}
          </ul>
        </details>
      ) : null}
      {report && report.warnings.length > 0 ? <Warnings warnings={report.warnings} /> : null}
    </Panel>
  );
}

/** Warnings shown at once; the rest behind a button (a large network can have over a thousand). */
const WARNINGS_SHOWN = 5;

/**
 * The analysis's warnings, the first WARNINGS_SHOWN at once and the others when asked for: a list of
 * 1,500 (one per species a search left unsplit, 2,000-species network) was a React render and a
 * layout of its own on the first result.
 */
function Warnings({ warnings }: { warnings: string[] }) {
  const [all, setAll] = useState(false);
  const shown = all ? warnings : warnings.slice(0, WARNINGS_SHOWN);
  return (
    <div className="border-t border-stone-200 px-3 py-1 text-[11px] text-amber-800">
      <ul data-testid="cycle-warnings">
        {shown.map((w) => (
          <li key={w}>⚠ {w}</li>
        ))}
      </ul>
      {warnings.length > shown.length ? (
        <button type="button" className="underline hover:text-amber-950" onClick={() => setAll(true)}>
          Show all {warnings.length} warnings
        </button>
      ) : null}
    </div>
  );
}

function CycleRow({
  rank,
  cycle: c,
  active,
  onToggle,
  onInspectReaction,
}: {
  rank: number;
  cycle: CatalyticCycle;
  active: boolean;
  onToggle(): void;
  onInspectReaction(id: string): void;
}) {
  return (
    <li data-testid="cycle" data-cycle-id={c.id}>
      <button
        type="button"
        aria-pressed={active}
        onClick={onToggle}
        className={`w-full rounded border px-2 py-1.5 text-left text-[12px] leading-snug focus:outline-2 focus:outline-offset-1 focus:outline-stone-800 ${
          active ? "border-stone-800 bg-stone-100" : "border-stone-200 bg-white hover:border-stone-400"
        }`}
      >
        <span className="flex items-baseline justify-between gap-2">
          <span className="font-medium text-stone-900">
            <span className="mr-1 text-stone-500">{rank}.</span>
            <span className="mr-1.5 rounded bg-stone-200 px-1 py-px text-[10px] font-semibold text-stone-700">
              {c.family}
            </span>
            {c.netEquation}
          </span>
          <span className="shrink-0 tabular-nums font-semibold text-stone-900">{formatPercent(c.share)}</span>
        </span>
        <span className="mt-1 block h-1 rounded bg-stone-100" aria-hidden>
          <span
            className="block h-1 rounded bg-[#a5541d]"
            style={{ width: `${Math.max(1, Math.min(100, c.share * 100))}%` }}
          />
        </span>
        <span className="mt-1 grid grid-cols-2 gap-x-3 text-[11px] text-stone-600">
          <span>
            Ox loss <b className="tabular-nums text-stone-800">{formatNumber(c.oxLoss_cm3s)}</b>
          </span>
          <span>
            rate <b className="tabular-nums text-stone-800">{formatNumber(c.rate_cm3s)}</b>
          </span>
          <span>
            chain length{" "}
            <b className="tabular-nums text-stone-800">{c.chainLength === null ? "—" : formatNumber(c.chainLength)}</b>
          </span>
          <span>
            efficiency <b className="tabular-nums text-stone-800">{formatPercent(c.efficiency)}</b>
          </span>
          <span className="col-span-2 truncate" title={slowestEquation(c)}>
            slowest step <b className="text-stone-800">{slowestEquation(c)}</b>
          </span>
        </span>
      </button>
      {active ? (
        <div className="mx-1 rounded-b border-x border-b border-stone-300 bg-stone-50 px-2 py-1.5 text-[11px] text-stone-700">
          <table className="w-full">
            <caption className="sr-only">Steps of the cycle</caption>
            <thead>
              <tr className="text-left text-stone-500">
                <th className="font-normal">×</th>
                <th className="font-normal">step</th>
                <th className="text-right font-normal">rate</th>
              </tr>
            </thead>
            <tbody>
              {c.steps.map((s) => (
                <tr key={s.reactionId} className={s.reactionId === c.rateLimitingStep ? "font-semibold" : ""}>
                  <td className="pr-1 tabular-nums">{s.multiplicity}</td>
                  <td>
                    <button
                      type="button"
                      className="text-left underline decoration-stone-300 underline-offset-2 hover:decoration-stone-700"
                      onClick={() => onInspectReaction(s.reactionId)}
                    >
                      {s.equation}
                    </button>
                    {s.reactionId === c.rateLimitingStep ? (
                      <span className="ml-1 text-stone-500">(rate-limiting)</span>
                    ) : null}
                  </td>
                  <td className="text-right tabular-nums">{formatNumber(s.rate_cm3s)}</td>
                </tr>
              ))}
            </tbody>
          </table>
          {c.chainLengthRateLimiting !== null ? (
            <p className="mt-1 text-stone-600">
              chain length from the rate-limiting step{" "}
              <b className="tabular-nums text-stone-800">{formatNumber(c.chainLengthRateLimiting)}</b>
              {c.chainCarrier ? ` (${c.chainCarrier} carrier)` : ""}
            </p>
          ) : null}
          <p className="mt-1 text-stone-500">
            {c.oxPerTurnover} Ox per turnover · efficiency {formatPercent(c.efficiency)}
            {c.catalysts.length ? ` · catalysts ${c.catalysts.join(", ")}` : ""}
          </p>
        </div>
      ) : null}
    </li>
  );
}

/** The rate-limiting step as an equation a chemist reads, with its id when the equation is not known. */
function slowestEquation(c: CatalyticCycle): string {
  const step = c.steps.find((s) => s.reactionId === c.rateLimitingStep);
  return step ? `${step.equation} (${step.reactionId})` : c.rateLimitingStep;
}
