/**
 * The frame every profile chart shares: a figure holding the SVG (title,
 * axes, then the chart's own marks) and a caption below it; plus the line
 * marks and line legend of the two line charts.
 */
import type { ReactNode } from "react";
import type { ChartFrame } from "@/lib/profiles/series/chartFrame";
import { ChartAxes } from "./ChartAxes";

export function ChartFigure({
  frame,
  title,
  testId,
  caption,
  children,
}: {
  frame: ChartFrame;
  title: string;
  testId?: string;
  caption: ReactNode;
  children: ReactNode;
}) {
  return (
    <figure data-testid={testId}>
      <svg
        viewBox={`0 0 ${frame.width} ${frame.height}`}
        width="100%"
        role="img"
        aria-label={title}
        className="max-w-[520px]"
      >
        <title>{title}</title>
        <ChartAxes frame={frame} />
        {children}
      </svg>
      {caption}
    </figure>
  );
}

export interface ChartLine {
  key: string;
  label: string;
  stroke: string;
  dash: string;
  paths: string[];
}

/** One unfilled path per line segment; `dataSeries` names the line in the markup (for tests and styles). */
export function LinePaths({ line, width, dataSeries }: { line: ChartLine; width: number; dataSeries: string }) {
  return line.paths.map((d, i) => (
    <path
      key={`${line.key}-${i}`}
      d={d}
      fill="none"
      stroke={line.stroke}
      strokeWidth={width}
      strokeDasharray={line.dash || undefined}
      data-series={dataSeries}
    />
  ));
}

/** A short sample of a line, for a legend or a readout row. */
export function LineSwatch({ line, width }: { line: ChartLine; width: number }) {
  return (
    <svg width="28" height="8" aria-hidden="true">
      <line
        x1="0"
        x2="28"
        y1="4"
        y2="4"
        stroke={line.stroke}
        strokeWidth={width}
        strokeDasharray={line.dash || undefined}
      />
    </svg>
  );
}

/** A legend entry: a short sample of the line and its label. */
export function LineKey({ line, width }: { line: ChartLine; width: number }) {
  return (
    <span className="flex items-center gap-1.5">
      <LineSwatch line={line} width={width} />
      {line.label}
    </span>
  );
}
