/** The colour legend of the network: ramp, decade ticks, unit, example widths, and the shapes. */
import type { Legend } from "@/lib/viz/types";

const CHIP = "4,1 22,1 25,4 25,10 22,13 4,13 1,10 1,4";
const HEX = "13,7 10,12.2 4,12.2 1,7 4,1.8 10,1.8";

export function LegendCard({ legend, empty }: { legend: Legend; empty: boolean }) {
  const gradient = `linear-gradient(to right, ${legend.stops.map((s) => `${s.color} ${(s.offset * 100).toFixed(1)}%`).join(", ")})`;
  return (
    <div
      data-testid="legend"
      className="flex flex-wrap items-start gap-x-4 gap-y-1 rounded-md border border-stone-300 bg-white px-3 py-1 text-[10.5px] leading-tight text-stone-700"
    >
      <div className="w-[290px] max-w-full">
        <div className="flex items-baseline justify-between gap-2">
          <span className="font-semibold text-stone-900">{legend.title}</span>
          <span className="text-stone-500">{legend.unit}</span>
        </div>
        <div className="mt-0.5 h-2.5 rounded-sm border border-stone-300" style={{ background: gradient }} aria-hidden />
        <div className="relative h-3.5">
          {(empty ? [] : legend.ticks).map((t) => (
            <span
              key={`${t.offset}-${t.label}`}
              className="absolute -translate-x-1/2 whitespace-nowrap tabular-nums"
              style={{ left: `${t.offset * 100}%` }}
            >
              {t.label}
            </span>
          ))}
        </div>
        <div className="flex justify-between text-stone-500">
          <span>← {legend.lowLabel}</span>
          <span>{legend.highLabel} →</span>
        </div>
      </div>
      <div className="grid grid-cols-[auto_auto] items-center gap-x-3 gap-y-0.5 pt-0.5 text-stone-600">
        <span className="text-stone-500">width = rate</span>
        <span className="flex items-center gap-2">
          {(empty ? [] : legend.widths).map((w) => (
            <span key={w.label} className="flex items-center gap-0.5">
              <svg width="18" height="10" aria-hidden>
                <line x1="1" y1="5" x2="17" y2="5" stroke="#4a5560" strokeWidth={w.width} strokeLinecap="round" />
              </svg>
              {w.label}
            </span>
          ))}
        </span>
        <span className="flex items-center gap-1">
          <svg width="26" height="14" aria-hidden>
            <polygon points={CHIP} fill="#eeeaf4" stroke="#7a6a90" strokeWidth="1.2" />
          </svg>
          species
        </span>
        <span className="flex items-center gap-1">
          <svg width="26" height="14" aria-hidden>
            <polygon points={CHIP} fill="#fff" stroke="#7a7a7a" strokeWidth="1.2" strokeDasharray="3 2" />
          </svg>
          held
        </span>
        <span className="flex items-center gap-1">
          <svg width="14" height="14" aria-hidden>
            <polygon points={HEX} fill="#5b8fa8" />
          </svg>
          reaction
        </span>
        <span className="flex items-center gap-1">
          <svg width="14" height="14" aria-hidden>
            <polygon points={HEX} fill="#fff" stroke="#a9a69d" />
          </svg>
          no flux · chevron = product
        </span>
      </div>
    </div>
  );
}
