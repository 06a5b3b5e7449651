/** Axes, grid lines and labels of a profile chart (altitude vertical). */
import type { ChartFrame } from "@/lib/profiles/series/chartFrame";

export function ChartAxes({ frame }: { frame: ChartFrame }) {
  const { plot } = frame;
  return (
    <g className="text-[10px]" fill="#52525b">
      <rect
        x={plot.left}
        y={plot.top}
        width={plot.right - plot.left}
        height={plot.bottom - plot.top}
        fill="#fff"
        stroke="#d6d3d1"
      />
      {frame.yTicks.map((t) => (
        <g key={`y${t.label}`}>
          <line x1={plot.left} x2={plot.right} y1={t.px} y2={t.px} stroke="#eeece8" />
          <text x={plot.left - 6} y={t.px + 3} textAnchor="end">
            {t.label}
          </text>
        </g>
      ))}
      {frame.xTicks.map((t, i) => (
        <g key={`x${t.label}${t.px}`}>
          <line x1={t.px} x2={t.px} y1={plot.top} y2={plot.bottom} stroke="#eeece8" />
          <text x={t.px} y={plot.bottom + 13} textAnchor={i === frame.xTicks.length - 1 && i > 0 ? "end" : "middle"}>
            {t.label}
          </text>
        </g>
      ))}
      {frame.zeroX !== undefined ? (
        <line x1={frame.zeroX} x2={frame.zeroX} y1={plot.top} y2={plot.bottom} stroke="#57534e" strokeWidth={1} />
      ) : null}
      <text x={(plot.left + plot.right) / 2} y={frame.height - 6} textAnchor="middle" fill="#3f3f46">
        {frame.xLabel}
      </text>
      <text transform={`translate(12 ${(plot.top + plot.bottom) / 2}) rotate(-90)`} textAnchor="middle" fill="#3f3f46">
        {frame.yLabel}
      </text>
    </g>
  );
}
