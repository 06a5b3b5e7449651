"use client";
/**
 * The family-level cycle map beside the network: one loop per catalytic
 * cycle through the families it visits. A loop is a button: pressing it (or
 * Enter/Space on it) opens that cycle in the species network. The geometry
 * comes from lib/viz (cycleMap); the export draws the same data as SVG.
 */
import { useMemo, useState } from "react";
import type { CycleReport } from "@/lib/analysis/types";
import { cycleMap } from "@/lib/viz/cycleMap";
import { cycleMapSvg } from "@/lib/viz/cycleMapSvg";
import { formatPercent } from "@/lib/viz/formatNumber";
import type { MechanismView } from "@/lib/viz/types";
import { download, svgToPng } from "./download";
import { Panel } from "./Panel";

interface Props {
  report: CycleReport | null;
  mechanism: MechanismView | null;
  selected: string | null;
  onSelect(id: string | null): void;
  /** file name without extension */
  fileStem: string;
  title: string;
}

const button =
  "rounded border border-stone-300 bg-white px-1.5 py-0.5 text-[11px] hover:border-stone-500 focus:outline-2 focus:outline-stone-800 disabled:opacity-50";

export function CycleMapCard({ report, mechanism, selected, onSelect, fileStem, title }: Props) {
  const map = useMemo(() => (mechanism ? cycleMap(report, mechanism) : null), [report, mechanism]);
  const [focused, setFocused] = useState<string | null>(null);
  const svg = () => cycleMapSvg(map!, { title, selected });
  const H = (map?.height ?? 0) + (map?.other.count ? 18 : 0) + 26;
  return (
    <Panel
      title="Cycles by family"
      id="cycle-map-title"
      right={
        <span className="flex gap-1">
          <button
            type="button"
            className={button}
            disabled={!map?.loops.length}
            aria-label="Save the cycle map as SVG"
            onClick={() => download(new Blob([svg()], { type: "image/svg+xml" }), `${fileStem}-cycles.svg`)}
          >
            SVG
          </button>
          <button
            type="button"
            className={button}
            disabled={!map?.loops.length}
            aria-label="Save the cycle map as PNG"
            onClick={async () => {
              const png = await svgToPng(svg(), map!.width, H);
              if (png) download(png, `${fileStem}-cycles.png`);
            }}
          >
            PNG
          </button>
        </span>
      }
    >
      {!map || !report ? (
        <p className="px-3 py-4 text-sm text-stone-500">Waiting for the first analysis…</p>
      ) : (
        <figure className="px-1 pb-1">
          <svg
            data-testid="cycle-map"
            viewBox={`0 0 ${map.width} ${map.height}`}
            className="h-auto w-full lg:max-h-[210px]"
          >
            <title>
              Catalytic cycles as loops through the families they pass; width in proportion to the odd oxygen each
              destroys
            </title>
            {map.loops.map((l) => {
              const dim = selected !== null && selected !== l.cycleId;
              const ring = focused === l.cycleId || selected === l.cycleId;
              return (
                // biome-ignore lint/a11y/useSemanticElements: an SVG loop cannot be a <button>; role, tabIndex and keys make it one
                <g
                  key={l.cycleId}
                  data-testid="cycle-loop"
                  data-cycle={l.cycleId}
                  data-share={l.share}
                  role="button"
                  tabIndex={0}
                  aria-pressed={selected === l.cycleId}
                  aria-label={`${l.netEquation}, ${l.family}, ${formatPercent(l.share)} of the odd-oxygen loss`}
                  className="cursor-pointer outline-none"
                  opacity={dim ? 0.3 : 1}
                  onClick={() => onSelect(selected === l.cycleId ? null : l.cycleId)}
                  onKeyDown={(e) => {
                    if (e.key === "Enter" || e.key === " ") {
                      e.preventDefault();
                      onSelect(selected === l.cycleId ? null : l.cycleId);
                    }
                  }}
                  onFocus={() => setFocused(l.cycleId)}
                  onBlur={() => setFocused(null)}
                >
                  <title>{`${l.netEquation} (${l.family}): ${formatPercent(l.share)}`}</title>
                  {ring ? (
                    <path
                      data-focus-ring
                      d={l.path}
                      fill="none"
                      stroke="#1f2328"
                      strokeWidth={l.width + 5}
                      strokeLinejoin="round"
                    />
                  ) : null}
                  <path
                    d={l.path}
                    fill="none"
                    stroke={l.color}
                    strokeWidth={l.width}
                    strokeLinejoin="round"
                    strokeLinecap="round"
                  />
                  {/* a wider invisible stroke so that thin loops are easy to hit */}
                  <path d={l.path} fill="none" stroke="transparent" strokeWidth={Math.max(l.width, 9)} />
                </g>
              );
            })}
            {map.nodes.map((n) => (
              <g key={n.family} aria-hidden>
                <circle cx={n.x} cy={n.y} r={n.r} fill={n.fill} stroke={n.stroke} strokeWidth={1.5} />
                <text x={n.x} y={n.y + 4.5} textAnchor="middle" fontSize={13} fontWeight={600} fill={n.stroke}>
                  {n.label}
                </text>
              </g>
            ))}
            {map.loops.map((l) => (
              <text
                key={l.cycleId}
                aria-hidden
                x={l.label.x}
                y={l.label.y + 4}
                textAnchor="middle"
                fontSize={11}
                fontWeight={600}
                fill="#1f2328"
                stroke="#ffffff"
                strokeWidth={3}
                paintOrder="stroke"
                pointerEvents="none"
              >
                {l.label.text}
              </text>
            ))}
          </svg>
          <figcaption className="px-2 text-[11px] text-stone-500">
            Width ∝ odd oxygen destroyed. Press a loop to open the cycle in the network.
            {map.other.count ? (
              <span data-testid="cycle-map-other" data-share={map.other.share} data-count={map.other.count}>
                {" "}
                {map.other.count} smaller cycle{map.other.count === 1 ? "" : "s"} not drawn:{" "}
                {formatPercent(map.other.share)}.
              </span>
            ) : null}
          </figcaption>
        </figure>
      )}
    </Panel>
  );
}
