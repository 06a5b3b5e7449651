/** Odd-oxygen production and loss, the loss split by family: bars drawn from budgetSeries, numbers beside. */
import type { OxBudget } from "@/lib/analysis/types";
import { budgetSeries } from "@/lib/viz/budgetSeries";
import { formatNumber, formatPercent } from "@/lib/viz/formatNumber";
import { Panel } from "./Panel";

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
  const s = budgetSeries(budget, { width_px: 130, rowHeight_px: 20 });
  const labelW = 92;
  const top = 4;
  return (
    <div data-testid="budget" className="px-3 py-2">
      <svg
        width={labelW + s.width + 96}
        height={s.height + top + 18}
        role="img"
        aria-label={`Ox production ${formatNumber(budget.production_cm3s)}, loss ${formatNumber(budget.loss_cm3s)} molecules per cubic centimetre per second`}
        className="max-w-full text-[11px]"
      >
        {s.ticks.map((t) => (
          <g key={t.x}>
            <line x1={labelW + t.x} x2={labelW + t.x} y1={top} y2={top + s.height} stroke="#e7e5e0" />
            <text x={labelW + t.x} y={top + s.height + 12} textAnchor="middle" fill="#78716c" fontSize="10">
              {t.label}
            </text>
          </g>
        ))}
        {s.bars.map((b) => (
          <g key={b.key} transform={`translate(0 ${top + b.y})`}>
            <text
              x={b.kind === "family" || b.kind === "unassigned" ? labelW - 6 : labelW - 6}
              y={13}
              textAnchor="end"
              fill={b.kind === "family" || b.kind === "unassigned" ? "#57534e" : "#1c1917"}
              fontWeight={b.kind === "family" || b.kind === "unassigned" ? 400 : 600}
            >
              {b.kind === "family" || b.kind === "unassigned" ? `└ ${b.label}` : b.label}
            </text>
            <rect x={labelW} y={3} width={Math.max(b.value > 0 ? 1 : 0, b.width)} height={13} rx={2} fill={b.color} />
            <text x={labelW + s.width + 6} y={13} fill="#1c1917" className="tabular-nums">
              {formatNumber(b.value)}
              {b.fraction !== null && b.kind !== "loss" ? ` (${formatPercent(b.fraction)})` : ""}
            </text>
          </g>
        ))}
      </svg>
      <p className="mt-1 text-[11px] text-stone-500">
        Ox = {budget.definition.join(" + ")}. Loss/production ={" "}
        {formatNumber(budget.production_cm3s > 0 ? budget.loss_cm3s / budget.production_cm3s : null)}; by rate-limiting
        steps {formatNumber(budget.directLoss_cm3s)}.
      </p>
    </div>
  );
}
