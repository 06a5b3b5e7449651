"use client";
/** One output's sensitivity coefficients against altitude for the rate constants that rank highest at any level (rankAgainstAltitude). */
import { useState } from "react";
import { rankAgainstAltitude } from "@/lib/uncertainty/rankSensitivities";
import type { SensitivityReport } from "@/lib/uncertainty/types";

const tint = (s: number | null) => {
  if (s === null) return "#f5f5f4";
  const a = Math.min(1, Math.abs(s));
  return s < 0 ? `rgba(30, 64, 175, ${0.08 + 0.5 * a})` : `rgba(194, 65, 12, ${0.08 + 0.5 * a})`;
};

export function SensitivityAltitudeTable({
  levels,
  top = 5,
}: {
  levels: { altitude_km: number; sensitivity: SensitivityReport | null }[];
  top?: number;
}) {
  const keys = [...new Set(levels.flatMap((l) => l.sensitivity?.outputs.map((o) => o.key) ?? []))];
  const [key, setKey] = useState(keys[0] ?? "");
  if (keys.length === 0) return <p className="text-[11px] text-stone-600">No sensitivities at any level.</p>;
  const t = rankAgainstAltitude(
    levels.map((l) => ({ altitude_km: l.altitude_km, report: l.sensitivity })),
    key,
    { top },
  );
  return (
    <div data-testid="sensitivity-altitude" className="overflow-x-auto text-[10px]">
      <label className="mb-1 flex items-center gap-2 text-[11px] text-stone-700">
        <span>∂ln y/∂ln k of</span>
        <select className="rounded border border-stone-300 px-1" value={key} onChange={(e) => setKey(e.target.value)}>
          {keys.map((k) => (
            <option key={k} value={k}>
              {k}
            </option>
          ))}
        </select>
      </label>
      <table className="border-collapse">
        <caption className="sr-only">
          Sensitivity coefficients of {key} by rate constant (rows) and altitude (columns, km)
        </caption>
        <thead>
          <tr>
            <th className="pr-2 text-left font-normal text-stone-500">km</th>
            {t.altitude_km.map((z) => (
              <th key={z} className="w-7 font-normal text-stone-500">
                {z}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {t.parameters.map((p, r) => (
            <tr key={p.id}>
              <th scope="row" className="pr-2 text-left font-medium" title={p.label}>
                {p.id}
              </th>
              {t.coefficients[r].map((s, c) => (
                <td
                  key={t.altitude_km[c]}
                  className="h-4 w-7 text-center tabular-nums"
                  style={{ background: tint(s) }}
                  title={s === null ? "—" : s.toFixed(3)}
                >
                  {s === null ? "" : s.toFixed(1)}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
