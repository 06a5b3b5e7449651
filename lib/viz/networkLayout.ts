/**
 * Deterministic preset layout of the species–reaction network.
 *
 * Method (this project's): each family is a block of species on a small grid;
 * blocks sit on a fixed 3-column board with odd oxygen in the middle, the
 * radical families at the corners, sources above, reservoirs below, organic
 * radicals at the left, bath gases at the right and end products at the
 * bottom. Reaction nodes go to the weighted centroid of the species they
 * touch (held species weigh less), then move along a golden-angle spiral to
 * the first free spot.
 * Positions depend on the mechanism only, never on the numbers, so the
 * picture stays put while the altitude changes. Units: px.
 */

import { idRecord, ownValue } from "../idRecord";
import { CHIP_HEIGHT_PX, chipWidth, frameTitleWidth } from "./chipWidth";
import { familyLabel } from "./familyLabel";
import { familyOf, familyRank } from "./familyOf";
import { parseEquation } from "./parseEquation";
import type { MechanismView, Point } from "./types";

export const LAYOUT_DEFAULTS = {
  /** horizontal distance between species in a block, px; default 100 */
  cellWidth_px: 100,
  /** vertical distance between species in a block, px; default 64 */
  cellHeight_px: 64,
  /** free space between blocks for reaction nodes, px; default 150 */
  gap_px: 150,
  /** smallest free margin between a reaction node's centre and a species chip's edge, px; default 14 */
  clearSpecies_px: 14,
  /** smallest distance between two reaction node centres, px; default 24 */
  clearReaction_px: 24,
  /** weight of a held species, relative to a solved one, in a reaction's centroid; default 0.3 */
  heldPull: 0.3,
};

export type LayoutOptions = Partial<typeof LAYOUT_DEFAULTS>;

/** Board slot (column, row) of each known family. */
const SLOTS: Record<string, [number, number]> = {
  HOx: [0, 0],
  source: [1, 0],
  NOx: [2, 0],
  organic: [0, 1],
  Ox: [1, 1],
  bath: [2, 1],
  ClOx: [0, 2],
  reservoir: [1, 2],
  BrOx: [2, 2],
  held: [0, 3],
  product: [1, 3],
};
const SPARE_SLOTS: [number, number][] = [
  [2, 3],
  [3, 0],
  [3, 1],
  [3, 2],
  [3, 3],
];

export interface FrameLayout {
  family: string;
  /** centre of the block, px */
  center: Point;
  /** block size, px */
  width: number;
  height: number;
}

export interface NetworkLayout {
  species: Record<string, Point & { family: string }>;
  reactions: Record<string, Point>;
  frames: FrameLayout[];
}

export function networkLayout(
  mech: Pick<MechanismView, "species" | "reactions">,
  options: LayoutOptions = {},
): NetworkLayout {
  const o = { ...LAYOUT_DEFAULTS, ...options };
  const drawn = mech.species.filter((s) => s.role !== "third-body");
  const byFamily = new Map<string, string[]>();
  for (const s of drawn) {
    const f = familyOf(s);
    if (!byFamily.has(f)) byFamily.set(f, []);
    byFamily.get(f)!.push(s.id);
  }
  const families = [...byFamily.keys()].sort((a, b) => familyRank(a) - familyRank(b) || a.localeCompare(b));

  // slot of every family
  const slot = new Map<string, [number, number]>();
  let spare = 0;
  for (const f of families) {
    const s = ownValue(SLOTS, f) ?? SPARE_SLOTS[spare++] ?? [4 + spare, 1];
    slot.set(f, s);
  }

  // block sizes; columns and rows as wide as their widest block
  const dims = new Map<string, { cols: number; rows: number; w: number; h: number }>();
  for (const f of families) {
    const n = byFamily.get(f)!.length;
    const cols = Math.max(1, Math.ceil(Math.sqrt(n / 1.2)));
    const rows = Math.ceil(n / cols);
    // the block is at least as wide as its frame's title (less the frame's padding on both sides)
    const w = Math.max(cols * o.cellWidth_px, frameTitleWidth(familyLabel(f)) - 40);
    dims.set(f, { cols, rows, w, h: rows * o.cellHeight_px });
  }
  const colW = new Map<number, number>();
  const rowH = new Map<number, number>();
  for (const f of families) {
    const [c, r] = slot.get(f)!;
    colW.set(c, Math.max(colW.get(c) ?? 0, dims.get(f)!.w));
    rowH.set(r, Math.max(rowH.get(r) ?? 0, dims.get(f)!.h));
  }
  const maxCol = Math.max(...[...slot.values()].map(([c]) => c), 0);
  const maxRow = Math.max(...[...slot.values()].map(([, r]) => r), 0);
  const colX: number[] = [];
  const rowY: number[] = [];
  let x = 0;
  for (let c = 0; c <= maxCol; c++) {
    const w = colW.get(c) ?? o.cellWidth_px;
    colX[c] = x + w / 2;
    x += w + o.gap_px;
  }
  let y = 0;
  for (let r = 0; r <= maxRow; r++) {
    const h = rowH.get(r) ?? o.cellHeight_px;
    rowY[r] = y + h / 2;
    y += h + o.gap_px * 0.8;
  }

  const species: NetworkLayout["species"] = idRecord();
  const frames: FrameLayout[] = [];
  for (const f of families) {
    const [c, r] = slot.get(f)!;
    const d = dims.get(f)!;
    const center = { x: colX[c], y: rowY[r] };
    frames.push({ family: f, center, width: d.w, height: d.h });
    byFamily.get(f)!.forEach((id, i) => {
      const col = i % d.cols;
      const row = Math.floor(i / d.cols);
      // the last row is centred when it is not full
      const inRow = row === d.rows - 1 ? byFamily.get(f)!.length - row * d.cols : d.cols;
      species[id] = {
        x: round(center.x + (col - (inRow - 1) / 2) * o.cellWidth_px),
        y: round(center.y + (row - (d.rows - 1) / 2) * o.cellHeight_px),
        family: f,
      };
    });
  }

  const reactions: NetworkLayout["reactions"] = idRecord();
  const occupied: Box[] = drawn.map((s) => ({
    p: species[s.id],
    hw: chipWidth(s.label || s.id) / 2 + o.clearSpecies_px,
    hh: CHIP_HEIGHT_PX / 2 + o.clearSpecies_px,
  }));
  const solved = new Set(drawn.filter((s) => s.role === "solved").map((s) => s.id));
  for (const rx of mech.reactions) {
    const eq = parseEquation(rx.equation);
    const ids = [...new Set([...eq.reactants, ...eq.products].map((t) => t.species))].filter((id) => species[id]);
    // held partners pull less than solved ones, so that a reaction sits near the radicals it turns over
    const w = (id: string) => (solved.has(id) ? 1 : o.heldPull);
    const total = ids.reduce((a, id) => a + w(id), 0);
    const start = ids.length
      ? {
          x: ids.reduce((a, id) => a + w(id) * species[id].x, 0) / total,
          y: ids.reduce((a, id) => a + w(id) * species[id].y, 0) / total,
        }
      : { x: 0, y: -o.gap_px };
    const p = freeSpot(start, occupied);
    reactions[rx.id] = p;
    occupied.push({ p, hw: o.clearReaction_px, hh: o.clearReaction_px, round: true });
  }
  return { species, reactions, frames };
}

const GOLDEN_ANGLE = Math.PI * (3 - Math.sqrt(5));

/** A keep-out zone: a box of half-sizes hw × hh around p, or a disc of radius hw when round. */
interface Box {
  p: Point;
  hw: number;
  hh: number;
  round?: boolean;
}

const blocked = (b: Box, c: Point) =>
  b.round ? Math.hypot(b.p.x - c.x, b.p.y - c.y) < b.hw : Math.abs(b.p.x - c.x) < b.hw && Math.abs(b.p.y - c.y) < b.hh;

function freeSpot(start: Point, occupied: Box[]): Point {
  for (let i = 0; i < 4000; i++) {
    const rad = 9 * Math.sqrt(i);
    const cand = {
      x: round(start.x + rad * Math.cos(i * GOLDEN_ANGLE)),
      y: round(start.y + rad * Math.sin(i * GOLDEN_ANGLE)),
    };
    if (!occupied.some((b) => blocked(b, cand))) return cand;
  }
  return { x: round(start.x), y: round(start.y) };
}

const round = (v: number) => Math.round(v * 10) / 10;
