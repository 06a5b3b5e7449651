/**
 * Axis-aligned boxes of the network's labels and keep-out zones, and the text
 * widths they are sized from (about 7.5 px a character at 12 px semibold and
 * 6.5 px at 11 px, common practice for a rough text measure). Units: px.
 */
import type { Point } from "./types";

export interface Rect {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

/** A label drawn on the board and the box its text takes. */
export interface LabelBox extends Rect {
  /** element id of the labelled thing ("s:O3", "r:K3", "f:Ox", "t:K3:O2") */
  id: string;
  kind: "species" | "frame" | "reaction" | "stub";
}

/** Half-size of a reaction hexagon at its largest, px (networkElements sizes them 10–20 px). */
export const REACTION_HALF_PX = 10;
/** Gap between a reaction hexagon and its label below, px. */
export const REACTION_LABEL_GAP_PX = 3;
/** Height of a reaction label at 12 px, px. */
export const REACTION_LABEL_HEIGHT_PX = 15;
/** Height of a stub label at 11 px, px. */
export const STUB_HEIGHT_PX = 15;

export const reactionLabelWidth = (id: string): number => Math.round([...id].length * 7.5 + 4);
export const stubWidth = (label: string): number => Math.round([...label].length * 6.5 + 10);

export const rectAround = (p: Point, hw: number, hh: number): Rect => ({
  x0: p.x - hw,
  y0: p.y - hh,
  x1: p.x + hw,
  y1: p.y + hh,
});

export const grown = (r: Rect, by: number): Rect => ({ x0: r.x0 - by, y0: r.y0 - by, x1: r.x1 + by, y1: r.y1 + by });

/** True when the two boxes share interior area (touching edges do not count). */
export const intersects = (a: Rect, b: Rect): boolean => a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;
