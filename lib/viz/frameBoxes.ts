/**
 * The box of each family frame: the extent of its species chips plus a
 * padding, widened evenly on both sides when the frame's title needs more
 * room. The canvas draws each frame as a plain node with this box (a compound
 * node would make cytoscape re-derive every parent on each change) and the
 * SVG export draws the same rectangles.
 */
import { CHIP_HEIGHT_PX } from "./chipWidth";

export const FRAME_DEFAULTS = {
  /** space between a frame's edge and its chips, px; default 26 */
  padding_px: 26,
  /** chip height, px; default 30 (CHIP_HEIGHT_PX) */
  chipHeight_px: CHIP_HEIGHT_PX,
};

export type FrameOptions = Partial<typeof FRAME_DEFAULTS>;

/** A box on the canvas, px; y grows downwards. */
export interface FrameBox {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

/** A species chip as the frames see it: which frame it sits in, its centre and width, px. */
export interface FrameChip {
  frame: string;
  x: number;
  y: number;
  width: number;
}

/**
 * Boxes by frame id, for the frames that hold at least one chip. `minWidths`
 * gives the width each frame's title needs, px (frames not listed have none).
 */
export function frameBoxes(
  chips: Iterable<FrameChip>,
  minWidths: ReadonlyMap<string, number> = new Map(),
  options: FrameOptions = {},
): Map<string, FrameBox> {
  const o = { ...FRAME_DEFAULTS, ...options };
  const boxes = new Map<string, FrameBox>();
  for (const c of chips) {
    const hw = c.width / 2 + o.padding_px;
    const hh = o.chipHeight_px / 2 + o.padding_px;
    const b = boxes.get(c.frame);
    if (!b) boxes.set(c.frame, { x0: c.x - hw, y0: c.y - hh, x1: c.x + hw, y1: c.y + hh });
    else {
      b.x0 = Math.min(b.x0, c.x - hw);
      b.y0 = Math.min(b.y0, c.y - hh);
      b.x1 = Math.max(b.x1, c.x + hw);
      b.y1 = Math.max(b.y1, c.y + hh);
    }
  }
  for (const [id, b] of boxes) {
    const min = minWidths.get(id) ?? 0;
    if (b.x1 - b.x0 < min) {
      const grow = (min - (b.x1 - b.x0)) / 2;
      b.x0 -= grow;
      b.x1 += grow;
    }
  }
  return boxes;
}
