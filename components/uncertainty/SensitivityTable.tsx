"use client";
/** Ranked table of the rate constants that matter most for one output (rankSensitivities), with an output picker. */
import { useState } from "react";
import { rankSensitivities } from "@/lib/uncertainty/rankSensitivities";
import type { SensitivityReport } from "@/lib/uncertainty/types";

export function SensitivityTable({ report, top = 10 }: { report: SensitivityReport; top?: number }) {
  const [key, setKey] = useState(report.outputs[0]?.key ?? "");
  if (report.status !== "ok")
    return <p className="px-3 py-2 text-[11px] text-stone-600">No sensitivities: {report.message}</p>;
  const rows = key ? rankSensitivities(report, key, { top }) : [];
  return (
    <div data-testid="sensitivity-table" className="px-3 py-2 text-[11px]">
      <label className="mb-1 flex items-center gap-2 text-stone-700">
        <span>∂ln y/∂ln k of</span>
        <select
          className="rounded border border-stone-300 px-1 py-0.5"
          value={key}
          onChange={(e) => setKey(e.target.value)}
        >
          {report.outputs.map((o) => (
            <option key={o.key} value={o.key}>
              {o.label}
            </option>
          ))}
        </select>
      </label>
      <table className="w-full border-collapse">
        <caption className="sr-only">
          Rate constants ranked by the size of their normalised sensitivity coefficient
        </caption>
        <thead>
          <tr className="text-left text-stone-500">
            <th className="w-6 font-normal">#</th>
            <th className="font-normal">rate constant</th>
            <th className="text-right font-normal">S</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.parameter} className="border-t border-stone-100">
              <td className="text-stone-500">{r.rank}</td>
              <td className="truncate" title={r.label}>
                <span className="font-medium">{r.parameter}</span> <bdi className="text-stone-500">{r.label}</bdi>
              </td>
              <td className={`text-right tabular-nums ${r.coefficient < 0 ? "text-blue-800" : "text-orange-800"}`}>
                {r.coefficient.toFixed(3)}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      {report.warnings.length > 0 && (
        <p className="mt-1 text-stone-500">
          {report.warnings.length} note(s): {report.warnings[0]}
        </p>
      )}
    </div>
  );
}
