/** Odd-oxygen production and loss, the loss split by family: bars drawn from budgetSeries, numbers beside. */
import type { OxBudget } from "@/lib/analysis/types";
import { budgetSeries } from "@/lib/viz/budgetSeries";
import { formatNumber, formatPercent } from "@/lib/viz/formatNumber";
import { Panel } from "./Panel";

const BAR_W = 92;
const ROW_H = 18;
const MAX_FAMILIES = 5;
/** production, loss, the families, "other families" and "below threshold": the most rows there can be */
const MAX_ROWS = 2 + MAX_FAMILIES + 2;

export function BudgetPanel({ budget }: { budget: OxBudget | null }) {
  return (
    <Panel
      title="Odd-oxygen budget"
      id="budget-title"
      right={<span className="text-[11px] text-stone-500">molecules cm⁻³ s⁻¹</span>}
    >
      {!budget ? (
        <p className="px-3 py-4 text-sm text-stone-500">Waiting for the first analysis…</p>
      ) : (
        <BudgetChart budget={budget} />
      )}
    </Panel>
  );
}

function BudgetChart({ budget }: { budget: OxBudget }) {
  const s = budgetSeries(budget, { width_px: BAR_W, rowHeight_px: ROW_H, maxFamilies: MAX_FAMILIES });
  return (
    <div data-testid="budget" className="px-3 py-2 text-[11px]">
      {/* the chart keeps its largest height so that new numbers never move what is below or above */}
      <div style={{ minHeight: MAX_ROWS * ROW_H + 16 + 34 }}>
        <table className="w-full border-collapse">
          <caption className="sr-only">Odd-oxygen production, loss and loss by family, molecules cm⁻³ s⁻¹</caption>
          <thead className="sr-only">
            <tr>
              <th>term</th>
              <th>bar</th>
              <th>rate</th>
              <th>share of loss</th>
            </tr>
          </thead>
          <tbody>
            {s.bars.map((b) => {
              const sub = b.kind === "family" || b.kind === "unassigned";
              return (
                <tr key={b.key} className="h-[18px]">
                  <th
                    scope="row"
                    className={`max-w-[112px] truncate pr-1.5 text-right ${sub ? "font-normal text-stone-600" : "font-semibold text-stone-900"}`}
                    title={b.label}
                  >
                    {sub ? "└ " : ""}
                    <bdi>{b.label}</bdi>
                  </th>
                  <td className="w-[92px] p-0 align-middle">
                    <svg width={BAR_W} height={12} aria-hidden className="block">
                      <rect width={BAR_W} height={12} fill="#f5f4f1" />
                      <rect width={Math.max(b.value > 0 ? 1 : 0, b.width)} height={12} rx={1.5} fill={b.color} />
                    </svg>
                  </td>
                  <td className="whitespace-nowrap pl-1.5 text-right tabular-nums text-stone-900">
                    {formatNumber(b.value)}
                  </td>
                  <td className="whitespace-nowrap pl-1.5 text-right tabular-nums text-stone-500">
                    {b.fraction !== null && b.kind !== "loss" ? formatPercent(b.fraction) : ""}
                  </td>
                </tr>
              );
            })}
            <tr aria-hidden>
              <td />
              <td className="p-0">
                <div className="relative h-3.5 text-[10px] text-stone-500">
                  {s.ticks.map((t, i) => (
                    <span
                      key={t.x}
                      className={`absolute whitespace-nowrap ${i === 0 ? "" : "-translate-x-full"}`}
                      style={{ left: t.x }}
                    >
                      {t.label}
                    </span>
                  ))}
                </div>
              </td>
              <td />
              <td />
            </tr>
          </tbody>
        </table>
        <p className="mt-1 min-h-[2.6em] text-stone-500">
          {budget.definition.length ? `Ox = ${budget.definition.join(" + ")}. ` : ""}Loss ÷ production ={" "}
          {formatNumber(budget.production_cm3s > 0 ? budget.loss_cm3s / budget.production_cm3s : null)}; loss by the
          rate-limiting-step formula {formatNumber(budget.directLoss_cm3s)}.
        </p>
      </div>
    </div>
  );
}
