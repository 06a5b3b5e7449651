/**
 * A standalone SVG picture of the network, drawn from the element data and
 * positions with the same shapes and colours as the canvas (straight edges
 * like the canvas). Pure: string in the end, no DOM.
 */
import { escapeXml } from "./escapeXml";
import { frameBoxes } from "./frameBoxes";
import { NETWORK_FONT } from "./networkStyle";
import type { GraphElement, Point, SpeciesNodeData } from "./types";

export const SVG_DEFAULTS = {
  /** empty border around the drawing, px; default 40 */
  margin_px: 40,
  /** space between a frame and its chips, px; default 26 */
  framePadding_px: 26,
  /** chip height, px; default 30 */
  chipHeight_px: 30,
  /** background colour; default white */
  background: "#ffffff",
};

export interface SvgOptions extends Partial<typeof SVG_DEFAULTS> {
  /** positions that override the elements' own, by element id (e.g. after dragging) */
  positions?: Readonly<Record<string, Point>>;
  /** element ids drawn faint */
  dimmed?: ReadonlySet<string>;
  /** a title written in the top-left corner */
  title?: string;
}

const esc = escapeXml;
const f = (v: number) => (Math.round(v * 10) / 10).toString();

interface Box {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

export function graphSvg(elements: readonly GraphElement[], options: SvgOptions = {}): string {
  const o = { ...SVG_DEFAULTS, ...options };
  const pos = new Map<string, Point>();
  const half = new Map<string, { w: number; h: number }>();
  for (const el of elements) {
    if (el.group !== "nodes" || !el.position || el.data.kind === "frame") continue;
    pos.set(el.data.id, options.positions?.[el.data.id] ?? el.position);
    const d = el.data;
    if (d.kind === "species") half.set(d.id, { w: d.width / 2, h: o.chipHeight_px / 2 });
    if (d.kind === "reaction") half.set(d.id, { w: d.size / 2, h: d.size / 2 });
    if (d.kind === "stub") half.set(d.id, { w: d.width / 2, h: 7.5 });
  }
  // the frames' boxes from the chips where they are drawn (after a drag, too)
  const frames = frameBoxes(
    elements.flatMap((el) =>
      el.data.kind === "species" ? [{ frame: el.data.frame, ...pos.get(el.data.id)!, width: el.data.width }] : [],
    ),
    new Map(elements.flatMap((el) => (el.data.kind === "frame" ? [[el.data.id, el.data.minWidth] as const] : []))),
    { padding_px: o.framePadding_px, chipHeight_px: o.chipHeight_px },
  );
  const all: Box = { x0: Infinity, y0: Infinity, x1: -Infinity, y1: -Infinity };
  for (const b of frames.values()) grow(all, { ...b, y0: b.y0 - 20 });
  for (const [id, p] of pos) {
    const h = half.get(id) ?? { w: 0, h: 0 };
    grow(all, { x0: p.x - h.w, y0: p.y - h.h, x1: p.x + h.w, y1: p.y + h.h });
  }
  if (!Number.isFinite(all.x0)) Object.assign(all, { x0: 0, y0: 0, x1: 100, y1: 100 });
  const m = o.margin_px;
  const top = options.title ? 28 : 0;
  const W = all.x1 - all.x0 + 2 * m;
  const H = all.y1 - all.y0 + 2 * m + top;
  const tx = (x: number) => f(x - all.x0 + m);
  const ty = (y: number) => f(y - all.y0 + m + top);
  const op = (id: string) => (o.dimmed?.has(id) ? ' opacity="0.18"' : "");

  const out: string[] = [];
  out.push(
    `<svg xmlns="http://www.w3.org/2000/svg" width="${f(W)}" height="${f(H)}" viewBox="0 0 ${f(W)} ${f(H)}" font-family="${esc(NETWORK_FONT)}">`,
  );
  out.push(`<rect width="100%" height="100%" fill="${o.background}"/>`);
  if (options.title)
    out.push(
      `<text x="${m}" y="${m - 8 + 14}" font-size="15" font-weight="600" fill="#1f2328">${esc(options.title)}</text>`,
    );

  for (const el of elements) {
    if (el.data.kind !== "frame") continue;
    const b = frames.get(el.data.id);
    if (!b) continue;
    const d = el.data;
    const fo = o.dimmed?.has(d.id) ? ' opacity="0.45"' : "";
    out.push(
      `<g class="frame"${fo}><rect x="${tx(b.x0)}" y="${ty(b.y0)}" width="${f(b.x1 - b.x0)}" height="${f(b.y1 - b.y0)}" rx="10" fill="${d.fill}" stroke="${d.stroke}" stroke-opacity="0.35"/>` +
        `<text x="${tx((b.x0 + b.x1) / 2)}" y="${ty(b.y0 - 7)}" text-anchor="middle" font-size="16" font-weight="600" fill="${d.stroke}">${esc(d.label)}</text></g>`,
    );
  }
  for (const el of elements) {
    if (el.data.kind !== "edge") continue;
    const d = el.data;
    const a = pos.get(d.source);
    const b = pos.get(d.target);
    if (!a || !b) continue;
    const end = clip(a, b, half.get(d.target) ?? { w: 0, h: 0 });
    const dash = el.classes.includes("idle") ? ' stroke-dasharray="3 4"' : "";
    let s = `<g class="edge"${op(d.id)}><line x1="${tx(a.x)}" y1="${ty(a.y)}" x2="${tx(end.x)}" y2="${ty(end.y)}" stroke="${d.color}" stroke-width="${d.width}" stroke-linecap="round"${dash}/>`;
    if (d.direction === "out") {
      const ang = Math.atan2(b.y - a.y, b.x - a.x);
      const len = 7 + d.width;
      const wing = (k: number) => ({
        x: end.x - len * Math.cos(ang + k * 0.5),
        y: end.y - len * Math.sin(ang + k * 0.5),
      });
      const l = wing(1);
      const r = wing(-1);
      s += `<polyline points="${tx(l.x)},${ty(l.y)} ${tx(end.x)},${ty(end.y)} ${tx(r.x)},${ty(r.y)}" fill="none" stroke="${d.color}" stroke-width="${Math.max(1.5, d.width * 0.7)}" stroke-linejoin="round" stroke-linecap="round"/>`;
    }
    out.push(`${s}</g>`);
  }
  for (const el of elements) {
    const d = el.data;
    if (d.kind === "reaction") {
      const p = pos.get(d.id)!;
      const r = d.size / 2;
      const pts = Array.from({ length: 6 }, (_, i) => {
        const a = (Math.PI / 3) * i;
        return `${tx(p.x + r * Math.cos(a))},${ty(p.y + r * Math.sin(a))}`;
      }).join(" ");
      const idle = el.classes.includes("idle");
      out.push(
        `<polygon class="reaction"${op(d.id)} points="${pts}" fill="${idle ? "#ffffff" : d.color}" stroke="${idle ? "#a9a69d" : "#ffffff"}" stroke-width="1.5" stroke-linejoin="round"><title>${esc(d.equation)}</title></polygon>`,
      );
    }
  }
  for (const el of elements) {
    const d = el.data;
    if (d.kind !== "stub") continue;
    const p = pos.get(d.id)!;
    out.push(
      `<g class="stub"${op(d.id)}><rect x="${tx(p.x - d.width / 2)}" y="${ty(p.y - 7.5)}" width="${f(d.width)}" height="15" rx="3" fill="#ffffff" fill-opacity="0.9"/>` +
        `<text x="${tx(p.x)}" y="${ty(p.y + 4)}" text-anchor="middle" font-size="11" fill="#4b5058">${esc(d.label)}</text></g>`,
    );
  }
  for (const el of elements) {
    if (el.data.kind === "species")
      out.push(chip(el.data, pos.get(el.data.id)!, o.chipHeight_px, tx, ty, op(el.data.id)));
  }
  out.push("</svg>");
  return out.join("\n");
}

function chip(
  d: SpeciesNodeData,
  p: Point,
  h: number,
  tx: (x: number) => string,
  ty: (y: number) => string,
  op: string,
): string {
  const w = d.width / 2;
  const c = 6;
  const y = h / 2;
  const pts = [
    [p.x - w + c, p.y - y],
    [p.x + w - c, p.y - y],
    [p.x + w, p.y - y + c],
    [p.x + w, p.y + y - c],
    [p.x + w - c, p.y + y],
    [p.x - w + c, p.y + y],
    [p.x - w, p.y + y - c],
    [p.x - w, p.y - y + c],
  ]
    .map(([x, yy]) => `${tx(x)},${ty(yy)}`)
    .join(" ");
  const dash = d.spectator ? ' stroke-dasharray="4 3"' : "";
  return (
    `<g class="species"${op}><polygon points="${pts}" fill="${d.fill}" stroke="${d.stroke}" stroke-width="1.5"${dash}/>` +
    `<text x="${tx(p.x)}" y="${ty(p.y + 5)}" text-anchor="middle" font-size="15" font-weight="${d.spectator ? 400 : 600}" fill="${d.ink}">${esc(d.label)}</text></g>`
  );
}

/** Where the segment a→b meets the box of half-size h around b. */
function clip(a: Point, b: Point, h: { w: number; h: number }): Point {
  const dx = a.x - b.x;
  const dy = a.y - b.y;
  if (dx === 0 && dy === 0) return b;
  const s = Math.min(
    h.w > 0 ? h.w / Math.abs(dx || 1e-9) : Infinity,
    h.h > 0 ? h.h / Math.abs(dy || 1e-9) : Infinity,
    1,
  );
  return { x: b.x + dx * (Number.isFinite(s) ? s : 0), y: b.y + dy * (Number.isFinite(s) ? s : 0) };
}

function grow(a: Box, b: Box): void {
  a.x0 = Math.min(a.x0, b.x0);
  a.y0 = Math.min(a.y0, b.y0);
  a.x1 = Math.max(a.x1, b.x1);
  a.y1 = Math.max(a.y1, b.y1);
}
