/** The colour legend of the network: ramp, decade ticks, unit, example widths, and the shapes. */
import type { Legend } from "@/lib/viz/types";

export function LegendCard({ legend }: { legend: Legend }) {
  const gradient = `linear-gradient(to right, ${legend.stops.map((s) => `${s.color} ${(s.offset * 100).toFixed(1)}%`).join(", ")})`;
  return (
    <div
      data-testid="legend"
      className="pointer-events-auto w-[300px] rounded-md border border-stone-300 bg-white/95 px-3 py-2 text-[11px] leading-tight text-stone-700 shadow-sm"
    >
      <div className="flex items-baseline justify-between gap-2">
        <span className="font-semibold text-stone-900">{legend.title}</span>
        <span className="text-stone-500">{legend.unit}</span>
      </div>
      <div className="mt-1.5 h-3 rounded-sm border border-stone-300" style={{ background: gradient }} aria-hidden />
      <div className="relative mt-0.5 h-3.5">
        {legend.ticks.map((t) => (
          <span
            key={`${t.offset}-${t.label}`}
            className="absolute -translate-x-1/2 tabular-nums"
            style={{ left: `${t.offset * 100}%` }}
          >
            {t.label}
          </span>
        ))}
      </div>
      <div className="mt-0.5 flex justify-between text-stone-500">
        <span>← {legend.lowLabel}</span>
        <span>{legend.highLabel} →</span>
      </div>
      <div className="mt-1.5 flex items-center gap-3 border-t border-stone-200 pt-1.5">
        <span className="text-stone-500">edge width = rate</span>
        {legend.widths.map((w) => (
          <span key={w.label} className="flex items-center gap-1">
            <svg width="22" height="12" aria-hidden>
              <line x1="1" y1="6" x2="21" y2="6" stroke="#4a5560" strokeWidth={w.width} strokeLinecap="round" />
            </svg>
            {w.label}
          </span>
        ))}
      </div>
      <div className="mt-1.5 flex flex-wrap items-center gap-x-3 gap-y-1 border-t border-stone-200 pt-1.5 text-stone-600">
        <span className="flex items-center gap-1">
          <svg width="26" height="14" aria-hidden>
            <polygon
              points="4,1 22,1 25,4 25,10 22,13 4,13 1,10 1,4"
              fill="#eeeaf4"
              stroke="#7a6a90"
              strokeWidth="1.2"
            />
          </svg>
          species
        </span>
        <span className="flex items-center gap-1">
          <svg width="26" height="14" aria-hidden>
            <polygon
              points="4,1 22,1 25,4 25,10 22,13 4,13 1,10 1,4"
              fill="#fff"
              stroke="#7a7a7a"
              strokeWidth="1.2"
              strokeDasharray="3 2"
            />
          </svg>
          held
        </span>
        <span className="flex items-center gap-1">
          <svg width="14" height="14" aria-hidden>
            <polygon points="13,7 10,12.2 4,12.2 1,7 4,1.8 10,1.8" fill="#5b8fa8" />
          </svg>
          reaction
        </span>
        <span className="flex items-center gap-1">
          <svg width="14" height="14" aria-hidden>
            <polygon points="13,7 10,12.2 4,12.2 1,7 4,1.8 10,1.8" fill="#fff" stroke="#a9a69d" />
          </svg>
          no flux
        </span>
        <span>chevron → product</span>
      </div>
    </div>
  );
}
