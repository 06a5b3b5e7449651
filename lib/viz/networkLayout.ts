/**
 * Deterministic preset layout of the species–reaction network.
 *
 * Method (this project's): each family is a block of species on a small grid;
 * blocks sit on a fixed 3-column board with odd oxygen in the middle, the
 * radical families at the corners, sources above, reservoirs below, organic
 * radicals at the left and end products at the bottom. Bath gases and O2 get
 * no chip: each reaction that uses them carries a short stub of its own
 * (see stubSpecies). Reaction nodes go to the weighted centroid of the species
 * they touch (held species weigh less), then move along a golden-angle spiral
 * to the first spot where the node, its label and its stubs clear every chip,
 * frame title and reaction placed before; one that finds no room near its
 * species (inside a very large block) goes to an overflow lane below the board.
 * Positions depend on the mechanism only, never on the numbers or on which
 * reactions are drawn, so the picture stays put while the altitude or the
 * detail changes. Every label box is returned, so that tests can check that
 * no two overlap. Units: px.
 */

import { familyOf, familyRank } from "../analysis/familyOf";
import { idRecord, ownValue } from "../idRecord";
import { CHIP_HEIGHT_PX, chipWidth, frameTitleWidth } from "./chipWidth";
import { equationView } from "./equationView";
import { familyLabel } from "./familyLabel";
import {
  grown,
  intersects,
  type LabelBox,
  REACTION_HALF_PX,
  REACTION_LABEL_GAP_PX,
  REACTION_LABEL_HEIGHT_PX,
  type Rect,
  reactionLabelWidth,
  rectAround,
  STUB_HEIGHT_PX,
  stubWidth,
} from "./labelBox";
import { isStubSpecies } from "./stubSpecies";
import type { EquationView, MechanismView, Point } from "./types";

export const LAYOUT_DEFAULTS = {
  /** smallest horizontal distance between species in a block, px (wider for long labels); default 100 */
  cellWidth_px: 100,
  /** vertical distance between species in a block, px; default 64 */
  cellHeight_px: 64,
  /** free space between blocks for reaction nodes, px; default 150 */
  gap_px: 150,
  /** smallest free margin between a reaction's footprint and a species chip's edge, px; default 10 */
  clearSpecies_px: 10,
  /** smallest free margin between two reactions' footprints (node, label, stubs), px; default 2 */
  clearReaction_px: 2,
  /** weight of a held species, relative to a solved one, in a reaction's centroid; default 0.3 */
  heldPull: 0.3,
  /** padding of a family frame around its chips, px (as networkStyle draws it); default 26 */
  framePadding_px: 26,
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

/** Height of a frame title at 16 px semibold, px, and its gap above the frame. */
const TITLE_HEIGHT_PX = 22;
const TITLE_GAP_PX = 4;

export interface FrameLayout {
  family: string;
  /** centre of the block, px */
  center: Point;
  /** block size, px */
  width: number;
  height: number;
}

/** A per-reaction stub of a bath gas or O2: its label sits at (x, y). */
export interface StubLayout extends Point {
  speciesId: string;
}

export interface NetworkLayout {
  species: Record<string, Point & { family: string }>;
  reactions: Record<string, Point>;
  /** reaction id → its stubs, in the order of the stub species in the mechanism */
  stubs: Record<string, StubLayout[]>;
  frames: FrameLayout[];
  /** every label that can be drawn: chips, frame titles, reaction ids (shown on a selected cycle), stubs */
  labels: LabelBox[];
}

export function networkLayout(
  mech: Pick<MechanismView, "species" | "reactions">,
  options: LayoutOptions = {},
): NetworkLayout {
  const steps = networkLayoutSteps(mech, options);
  let step = steps.next();
  while (!step.done) step = steps.next();
  return step.value;
}

/**
 * The same layout, one reaction at a time: yields the count of reactions
 * placed so far after each one and returns the finished layout, so that a
 * caller can spread a large mechanism's layout over several short slices of
 * work (components/explorer/useNetworkLayout). Same result as networkLayout.
 */
export function* networkLayoutSteps(
  mech: Pick<MechanismView, "species" | "reactions">,
  options: LayoutOptions = {},
): Generator<number, NetworkLayout, void> {
  const o = { ...LAYOUT_DEFAULTS, ...options };
  const stubbed = new Set(mech.species.filter(isStubSpecies).map((s) => s.id));
  const drawn = mech.species.filter((s) => s.role !== "third-body" && !stubbed.has(s.id));
  const label = new Map(mech.species.map((s) => [s.id, s.label || s.id]));
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
  const dims = new Map<string, { cols: number; rows: number; cell: number; w: number; h: number }>();
  for (const f of families) {
    const ids = byFamily.get(f)!;
    const n = ids.length;
    const cols = Math.max(1, Math.ceil(Math.sqrt(n / 1.2)));
    const rows = Math.ceil(n / cols);
    // a long label widens its block's cells so that neighbouring chips never touch
    const cell = Math.max(o.cellWidth_px, ...ids.map((id) => chipWidth(label.get(id)!) + 16));
    // the block is at least as wide as its frame's title (less the frame's padding on both sides)
    const w = Math.max(cols * cell, frameTitleWidth(familyLabel(f)) - 40);
    dims.set(f, { cols, rows, cell, w, h: rows * o.cellHeight_px });
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
  const labels: LabelBox[] = [];
  for (const f of families) {
    const [c, r] = slot.get(f)!;
    const d = dims.get(f)!;
    const center = { x: colX[c], y: rowY[r] };
    frames.push({ family: f, center, width: d.w, height: d.h });
    const ids = byFamily.get(f)!;
    ids.forEach((id, i) => {
      const col = i % d.cols;
      const row = Math.floor(i / d.cols);
      // the last row is centred when it is not full
      const inRow = row === d.rows - 1 ? ids.length - row * d.cols : d.cols;
      species[id] = {
        x: round(center.x + (col - (inRow - 1) / 2) * d.cell),
        y: round(center.y + (row - (d.rows - 1) / 2) * o.cellHeight_px),
        family: f,
      };
      labels.push({
        id: `s:${id}`,
        kind: "species",
        ...rectAround(species[id], chipWidth(label.get(id)!) / 2, CHIP_HEIGHT_PX / 2),
      });
    });
    labels.push({
      id: `f:${f}`,
      kind: "frame",
      ...frameTitleBox(
        ids.map((id) => species[id]),
        f,
        o.framePadding_px,
      ),
    });
  }

  const occupied = new RectIndex();
  for (const b of labels) occupied.add(b.kind === "species" ? grown(b, o.clearSpecies_px) : grown(b, 2));
  yield 0;
  const reactions: NetworkLayout["reactions"] = idRecord();
  const stubs: NetworkLayout["stubs"] = idRecord();
  const solved = new Set(drawn.filter((s) => s.role === "solved").map((s) => s.id));
  const stubOrder = mech.species.filter((s) => stubbed.has(s.id)).map((s) => s.id);
  let lane = 0;
  let placedCount = 0;
  // a large mechanism looks less far for room near its species, so that laying it out stays quick
  const nearTries = mech.reactions.length > LARGE_REACTIONS ? NEAR_TRIES_LARGE : NEAR_TRIES;
  for (const rx of mech.reactions) {
    const eq = equationView(rx.equation);
    const touched = new Set([...eq.reactants, ...eq.products].map((t) => t.species));
    const ids = [...touched].filter((id) => species[id]);
    const net = netCoefficients(eq);
    const rxStubs = stubOrder.filter((id) => touched.has(id) && (net.get(id) ?? 0) !== 0);
    // held partners pull less than solved ones, so that a reaction sits near the radicals it turns over
    const w = (id: string) => (solved.has(id) ? 1 : o.heldPull);
    const total = ids.reduce((a, id) => a + w(id), 0);
    const start = ids.length
      ? {
          x: ids.reduce((a, id) => a + w(id) * species[id].x, 0) / total,
          y: ids.reduce((a, id) => a + w(id) * species[id].y, 0) / total,
        }
      : { x: 0, y: -o.gap_px };
    const parts = footprint(
      rx.id,
      rxStubs.map((id) => label.get(id)!),
    );
    // a reaction deep inside a crowded block goes to the overflow lane below the board instead
    const p =
      freeSpot(start, parts, occupied, o.clearReaction_px, nearTries) ??
      freeSpot(laneStart(lane++, y), parts, occupied, o.clearReaction_px, LANE_TRIES);
    if (!p) throw new RangeError(`networkLayout: no free spot for reaction ${rx.id} (board too crowded to place it)`);
    reactions[rx.id] = p;
    stubs[rx.id] = rxStubs.map((id, k) => ({
      speciesId: id,
      x: round(p.x + parts[2 + k].c.x),
      y: round(p.y + parts[2 + k].c.y),
    }));
    const placed = parts.map((part) => shift(part, p));
    placed.forEach((b, k) => {
      occupied.add(grown(b, o.clearReaction_px));
      if (k === 1) labels.push({ id: `r:${rx.id}`, kind: "reaction", ...b });
      if (k >= 2) labels.push({ id: `t:${rx.id}:${rxStubs[k - 2]}`, kind: "stub", ...b });
    });
    yield ++placedCount;
  }
  return { species, reactions, stubs, frames, labels };
}

/** Net coefficient of every species in a parsed equation (products positive). */
export function netCoefficients(eq: EquationView): Map<string, number> {
  const net = new Map<string, number>();
  for (const t of eq.reactants) net.set(t.species, (net.get(t.species) ?? 0) - t.coef);
  for (const t of eq.products) net.set(t.species, (net.get(t.species) ?? 0) + t.coef);
  return net;
}

/** The title box above a frame drawn around these chips (networkStyle: padding, title on top). */
function frameTitleBox(chips: Point[], family: string, padding: number): Rect {
  const top = Math.min(...chips.map((p) => p.y)) - CHIP_HEIGHT_PX / 2 - padding;
  const cx = (Math.min(...chips.map((p) => p.x)) + Math.max(...chips.map((p) => p.x))) / 2;
  const hw = frameTitleWidth(familyLabel(family)) / 2;
  return { x0: cx - hw, y0: top - TITLE_GAP_PX - TITLE_HEIGHT_PX, x1: cx + hw, y1: top - TITLE_GAP_PX };
}

/** A part of a reaction's footprint: a box around the offset c from the node's centre. */
interface Part {
  c: Point;
  hw: number;
  hh: number;
}

/** Node, label below it, then up to three stubs: above, left, right (further ones stack above). */
function footprint(id: string, stubLabels: string[]): Part[] {
  const parts: Part[] = [
    { c: { x: 0, y: 0 }, hw: REACTION_HALF_PX, hh: REACTION_HALF_PX },
    {
      c: { x: 0, y: REACTION_HALF_PX + REACTION_LABEL_GAP_PX + REACTION_LABEL_HEIGHT_PX / 2 },
      hw: reactionLabelWidth(id) / 2,
      hh: REACTION_LABEL_HEIGHT_PX / 2,
    },
  ];
  const above = REACTION_HALF_PX + 8 + STUB_HEIGHT_PX / 2;
  stubLabels.forEach((l, k) => {
    const hw = stubWidth(l) / 2;
    const side = REACTION_HALF_PX + 10 + hw;
    const c =
      k === 0
        ? { x: 0, y: -above }
        : k === 1
          ? { x: -side, y: 0 }
          : k === 2
            ? { x: side, y: 0 }
            : { x: 0, y: -above - (k - 2) * (STUB_HEIGHT_PX + 2) };
    parts.push({ c, hw, hh: STUB_HEIGHT_PX / 2 });
  });
  return parts;
}

const shift = (part: Part, p: Point): Rect => rectAround({ x: p.x + part.c.x, y: p.y + part.c.y }, part.hw, part.hh);

const GOLDEN_ANGLE = Math.PI * (3 - Math.sqrt(5));

/** Spiral points tried around a reaction's centroid, and around its spot in the overflow lane. */
const NEAR_TRIES = 6000;
const NEAR_TRIES_LARGE = 300;
/** Above this many reactions a mechanism is laid out with NEAR_TRIES_LARGE. */
const LARGE_REACTIONS = 400;
const LANE_TRIES = 20000;
/** Reactions per row of the overflow lane, and the lane's grid, px. */
const LANE_COLUMNS = 40;
const LANE_CELL_PX = 70;

/** Where the k-th reaction of the overflow lane starts looking, below a board whose rows end at boardBottom. */
const laneStart = (k: number, boardBottom: number): Point => ({
  x: (k % LANE_COLUMNS) * LANE_CELL_PX,
  y: boardBottom + LANE_CELL_PX + Math.floor(k / LANE_COLUMNS) * LANE_CELL_PX,
});

function freeSpot(start: Point, parts: Part[], occupied: RectIndex, clear: number, tries: number): Point | null {
  for (let i = 0; i < tries; i++) {
    const rad = 6 * Math.sqrt(i);
    const cand = {
      x: round(start.x + rad * Math.cos(i * GOLDEN_ANGLE)),
      y: round(start.y + rad * Math.sin(i * GOLDEN_ANGLE)),
    };
    if (parts.every((part) => !occupied.hits(grown(shift(part, cand), clear)))) return cand;
  }
  return null;
}

/** Boxes bucketed on a coarse grid, so that a candidate is checked against its neighbours only. */
class RectIndex {
  private readonly cells = new Map<string, Rect[]>();
  private static readonly SIZE = 80;

  add(r: Rect): void {
    for (const key of this.keys(r)) {
      const list = this.cells.get(key);
      if (list) list.push(r);
      else this.cells.set(key, [r]);
    }
  }

  hits(r: Rect): boolean {
    for (const key of this.keys(r)) for (const b of this.cells.get(key) ?? []) if (intersects(r, b)) return true;
    return false;
  }

  private keys(r: Rect): string[] {
    const s = RectIndex.SIZE;
    const out: string[] = [];
    for (let i = Math.floor(r.x0 / s); i <= Math.floor(r.x1 / s); i++)
      for (let j = Math.floor(r.y0 / s); j <= Math.floor(r.y1 / s); j++) out.push(`${i},${j}`);
    return out;
  }
}

const round = (v: number) => Math.round(v * 10) / 10;
