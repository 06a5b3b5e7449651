/** Monte Carlo medians and 5–95 % ranges of every output, with the failed-sample count in view. */
import type { MonteCarloResult } from "@/lib/uncertainty/types";

const fmt = (v: number | null) =>
  v === null ? "—" : Math.abs(v) >= 1e4 || (Math.abs(v) < 1e-2 && v !== 0) ? v.toExponential(2) : v.toPrecision(3);

export function RangeTable({ mc }: { mc: MonteCarloResult }) {
  return (
    <div data-testid="range-table" className="px-3 py-2 text-[11px]">
      <p className="mb-1 text-stone-600">
        {mc.samples} samples (seed {mc.seed}): {mc.succeeded} converged
        {mc.failed > 0 ? <strong className="text-red-800">, {mc.failed} failed</strong> : ", none failed"}
      </p>
      <table className="w-full border-collapse">
        <caption className="sr-only">Central value, median and 5–95 % range of each output over the samples</caption>
        <thead>
          <tr className="text-left text-stone-500">
            <th className="font-normal">output</th>
            <th className="text-right font-normal">central</th>
            <th className="text-right font-normal">median</th>
            <th className="text-right font-normal">5–95 %</th>
          </tr>
        </thead>
        <tbody>
          {mc.outputs.map((o, i) => {
            const s = mc.summaries[i];
            return (
              <tr key={o.key} className="border-t border-stone-100">
                <td className="truncate" title={`${o.label} (${o.unit})`}>
                  {o.label}
                </td>
                <td className="text-right tabular-nums">{fmt(s.central)}</td>
                <td className="text-right tabular-nums">{fmt(s.median)}</td>
                <td className="text-right tabular-nums">
                  {fmt(s.p05)} – {fmt(s.p95)}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
