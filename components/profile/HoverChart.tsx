"use client";
/**
 * A profile chart that answers the pointer: a rule at the nearest altitude
 * level with each shown series' value there, and a legend whose keys hide
 * or show their series. Keyboard: the chart takes focus, ↑/↓ move the level,
 * Esc hides the readout; a polite live region reads the values out. Hiding
 * a series leaves the axes as they are. The rule and the readout carry
 * `no-print`, so a printed page shows the plain chart.
 */
import { type KeyboardEvent, type PointerEvent, type ReactNode, useId, useState } from "react";
import type { ChartFrame } from "@/lib/profiles/series/chartFrame";
import {
  type ChartReadout,
  nearestLevel,
  readoutRows,
  readoutSentence,
  stepLevel,
  toggleHidden,
} from "@/lib/profiles/series/chartReadout";
import { ChartAxes } from "./ChartAxes";

export interface LegendEntry {
  key: string;
  label: string;
  /** a small sample of the series' mark */
  swatch: ReactNode;
}

const KEY_STEP: Record<string, number> = { ArrowUp: 1, ArrowDown: -1, PageUp: 5, PageDown: -5 };

export function HoverChart({
  frame,
  title,
  testId,
  readout,
  legend,
  children,
}: {
  frame: ChartFrame;
  title: string;
  testId?: string;
  readout: ChartReadout;
  legend: readonly LegendEntry[];
  /** the chart's own marks, given the keys the legend has hidden */
  children: (hidden: ReadonlySet<string>) => ReactNode;
}) {
  const [index, setIndex] = useState(-1);
  const [hidden, setHidden] = useState<ReadonlySet<string>>(new Set());
  const helpId = useId();
  const { plot } = frame;
  const keys = legend.map((l) => l.key);
  const level = readout.levels[index];
  const rows = level ? readoutRows(readout, index, hidden) : [];
  const swatchOf = new Map(legend.map((l) => [l.key, l.swatch]));

  const onPointerMove = (e: PointerEvent<SVGSVGElement>) => {
    const box = e.currentTarget.getBoundingClientRect();
    if (box.height <= 0) return;
    const y = ((e.clientY - box.top) / box.height) * frame.height;
    const x = ((e.clientX - box.left) / box.width) * frame.width;
    const inside = x >= plot.left && x <= plot.right && y >= plot.top - 6 && y <= plot.bottom + 6;
    setIndex(inside ? nearestLevel(readout.levels, y) : -1);
  };
  const onKeyDown = (e: KeyboardEvent<HTMLDivElement>) => {
    if (e.key === "Escape") {
      setIndex(-1);
      return;
    }
    const delta = KEY_STEP[e.key];
    if (delta === undefined) return;
    e.preventDefault();
    setIndex((i) => stepLevel(readout.levels.length, i, delta));
  };

  // the readout sits above the rule (below it in the top third of the plot), on the side away from the markers
  const below = level ? level.y < plot.top + (plot.bottom - plot.top) / 3 : false;
  const marks = rows.flatMap((r) => (r.x === undefined ? [] : [r.x]));
  const onLeft = marks.length > 0 && marks.reduce((a, b) => a + b, 0) / marks.length > (plot.left + plot.right) / 2;
  const inset = onLeft
    ? { left: `${((plot.left + 6) / frame.width) * 100}%` }
    : { right: `${((frame.width - plot.right + 6) / frame.width) * 100}%` };
  return (
    <figure data-testid={testId}>
      <div className="relative max-w-[520px]">
        <div
          tabIndex={0}
          role="slider"
          aria-orientation="vertical"
          aria-label={`${title}: altitude of the readout`}
          aria-describedby={helpId}
          aria-valuemin={readout.levels[0]?.altitude_km ?? 0}
          aria-valuemax={readout.levels[readout.levels.length - 1]?.altitude_km ?? 0}
          aria-valuenow={level?.altitude_km ?? readout.levels[0]?.altitude_km ?? 0}
          aria-valuetext={level ? `${level.altitude_km} km` : "no level shown; press up or down"}
          onKeyDown={onKeyDown}
          data-chart-focus=""
          className="rounded-sm focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-sky-800"
        >
          <svg
            viewBox={`0 0 ${frame.width} ${frame.height}`}
            width="100%"
            role="img"
            aria-label={title}
            onPointerMove={onPointerMove}
            onPointerLeave={() => setIndex(-1)}
            className="block touch-none"
          >
            <title>{title}</title>
            <ChartAxes frame={frame} />
            {children(hidden)}
            {level ? (
              <g className="no-print" data-hover-layer="" pointerEvents="none">
                <line x1={plot.left} x2={plot.right} y1={level.y} y2={level.y} stroke="#0c4a6e" strokeWidth={1} />
                {rows.map((r) =>
                  r.x === undefined ? null : (
                    <circle key={r.key} cx={r.x} cy={level.y} r={3.2} fill="#fff" stroke="#0c4a6e" strokeWidth={1.4} />
                  ),
                )}
                <rect x={plot.left - 44} y={level.y - 8} width={42} height={16} rx={3} fill="#0c4a6e" />
                <text x={plot.left - 6} y={level.y + 3.5} textAnchor="end" fontSize={10} fontWeight={600} fill="#fff">
                  {level.altitude_km} km
                </text>
              </g>
            ) : null}
          </svg>
        </div>
        {level ? (
          <div
            className="no-print pointer-events-none absolute max-w-[75%] rounded-sm border-l-4 border-sky-900 bg-white/95 px-2 py-1 text-[11px] text-stone-800 shadow-sm"
            style={{
              ...inset,
              top: `${(level.y / frame.height) * 100}%`,
              transform: below ? "translateY(8px)" : "translateY(calc(-100% - 8px))",
            }}
            data-testid="chart-readout"
            data-altitude-km={level.altitude_km}
          >
            <div className="font-semibold tabular-nums">{level.altitude_km} km</div>
            <table className="border-collapse">
              <tbody>
                {rows.map((r) => (
                  <tr key={r.key} data-readout-key={r.key}>
                    <th scope="row" className="pr-2 text-left font-normal">
                      <span className="flex items-center gap-1">
                        {swatchOf.get(r.key)}
                        {r.label}
                      </span>
                    </th>
                    <td className="tabular-nums" data-readout-value="">
                      {r.text}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        ) : null}
      </div>
      <figcaption className="mt-1 flex flex-wrap gap-x-1.5 gap-y-1 text-[11px] text-stone-700">
        {legend.map((l) => {
          const shown = !hidden.has(l.key);
          const last = shown && keys.every((k) => k === l.key || hidden.has(k));
          return (
            <button
              key={l.key}
              type="button"
              aria-pressed={shown}
              disabled={last}
              title={last ? "the last series shown stays" : shown ? `hide ${l.label}` : `show ${l.label}`}
              onClick={() => setHidden((h) => toggleHidden(h, l.key, keys))}
              data-legend-key={l.key}
              className={`flex items-center gap-1 rounded-sm border px-1.5 py-0.5 focus-visible:outline-2 focus-visible:outline-offset-1 focus-visible:outline-sky-800 ${
                shown
                  ? "border-stone-300 bg-white"
                  : "border-dashed border-stone-300 bg-transparent text-stone-600 line-through"
              } ${last ? "cursor-default" : "cursor-pointer hover:border-stone-500"}`}
            >
              <span className={shown ? "" : "opacity-40"}>{l.swatch}</span>
              {l.label}
            </button>
          );
        })}
      </figcaption>
      <p id={helpId} className="no-print mt-0.5 text-[11px] text-stone-600">
        Point at the chart, or focus it and press ↑ / ↓, for the values at a level (Esc hides them). The keys hide or
        show a series; the axes stay as they are.
      </p>
      <p className="sr-only" aria-live="polite">
        {level ? readoutSentence(readout, index, hidden) : ""}
      </p>
    </figure>
  );
}
