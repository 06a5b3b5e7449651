/**
 * The family-level cycle map: the families (Ox, HOx, NOx, ClOx, BrOx,
 * reservoirs) are round nodes at fixed places, odd oxygen in the middle;
 * each catalytic cycle is a closed loop that leaves Ox, passes through the
 * families its steps touch and comes back, drawn as a petal whose width is in
 * proportion to the cycle's Ox loss and which is labelled with its share.
 * Loops that share a leg nest, larger loss innermost; a cycle of
 * odd oxygen alone is a teardrop above the Ox node. The look is this
 * project's own. Pure: positions depend on nothing but the family, so a
 * change of altitude changes widths and labels only. Units: px.
 */

import { familyOf } from "../analysis/familyOf";
import type { CatalyticCycle, CycleReport } from "../analysis/types";
import { oklchToHex } from "./colorSpace";
import { equationView } from "./equationView";
import { formatPercent } from "./formatNumber";
import { intersects, type Rect, rectAround } from "./labelBox";
import type { MechanismView, Point } from "./types";

export const CYCLE_MAP_DEFAULTS = {
  /** most loops drawn; the smaller cycles are summed into "other"; default 8 */
  maxLoops: 8,
  /** smallest share of the Ox loss a loop is drawn for, 0–1; default 0.005 */
  minShare: 0.005,
  /** width of the loop of the largest loss, px; default 12 */
  maxWidth_px: 12,
  /** thinnest loop drawn, px (below it the width is no longer in proportion); default 1 */
  minWidth_px: 1,
};

export type CycleMapOptions = Partial<typeof CYCLE_MAP_DEFAULTS>;

/** Families in the order a loop visits them, clockwise from the top left, and their places. */
const PLACES: Record<string, Point> = {
  Ox: { x: 170, y: 166 },
  HOx: { x: 62, y: 88 },
  NOx: { x: 278, y: 88 },
  BrOx: { x: 278, y: 244 },
  reservoir: { x: 170, y: 272 },
  ClOx: { x: 62, y: 244 },
};
const VISIT_ORDER = ["HOx", "NOx", "BrOx", "reservoir", "ClOx"];
const SHORT: Record<string, string> = { reservoir: "Reserv." };
const HUES: Record<string, number> = { Ox: 300, HOx: 200, NOx: 130, ClOx: 60, BrOx: 20, reservoir: 250 };

/** Least distance between the middles of two nested loops, px. */
const NEST_STEP_PX = 28;

/** Canvas, px: room above and at the sides for the loops that bulge out of the ring of families. */
export const CYCLE_MAP_SIZE = { width: 340, height: 316 };
export const CYCLE_MAP_NODE_RADIUS_PX = 25;

export interface CycleMapNode extends Point {
  family: string;
  label: string;
  /** px */
  r: number;
  fill: string;
  stroke: string;
}

export interface CycleMapLoop {
  cycleId: string;
  netEquation: string;
  /** the cycle's own family name, e.g. "ClOx-BrOx" */
  family: string;
  /** the map's families the loop passes, Ox first */
  through: string[];
  /** 0–1 of the Ox loss */
  share: number;
  /** molecules cm⁻³ s⁻¹ */
  oxLoss_cm3s: number;
  /** px */
  width: number;
  /** hex */
  color: string;
  /** SVG path data */
  path: string;
  label: Point & { text: string };
}

export interface CycleMap {
  width: number;
  height: number;
  nodes: CycleMapNode[];
  loops: CycleMapLoop[];
  /** the cycles not drawn as loops */
  other: { count: number; share: number };
}

export function cycleMap(
  report: Pick<CycleReport, "cycles"> | null,
  mech: Pick<MechanismView, "species">,
  options: CycleMapOptions = {},
): CycleMap {
  const o = { ...CYCLE_MAP_DEFAULTS, ...options };
  if (!(o.maxLoops >= 0)) throw new RangeError(`cycleMap: invalid maxLoops: ${o.maxLoops}`);
  const famOf = new Map(mech.species.map((s) => [s.id, familyOf(s)]));
  const cycles = [...(report?.cycles ?? [])].sort((a, b) => b.oxLoss_cm3s - a.oxLoss_cm3s || a.id.localeCompare(b.id));
  const drawn = cycles.filter((c, i) => i < o.maxLoops && c.share >= o.minShare && c.oxLoss_cm3s > 0);
  const rest = cycles.filter((c) => !drawn.includes(c));
  const maxLoss = Math.max(...drawn.map((c) => c.oxLoss_cm3s), 0);

  const nested = new Map<string, number>();
  // family nodes (all of them, so that a label never moves onto a node that appears later) and placed labels
  const taken: Rect[] = Object.values(PLACES).map((p) =>
    rectAround(p, CYCLE_MAP_NODE_RADIUS_PX, CYCLE_MAP_NODE_RADIUS_PX),
  );
  const loops = drawn.map((c): CycleMapLoop => {
    const through = loopFamilies(c, famOf);
    // legs of the loop, Ox → … → Ox (a loop of Ox alone has the one leg Ox → Ox)
    const ring = [...through, through[0]];
    const legs = through.length === 1 ? ["Ox>Ox"] : through.map((f, i) => `${f}>${ring[i + 1]}`);
    const width = round(Math.max(o.minWidth_px, (o.maxWidth_px * c.oxLoss_cm3s) / maxLoss));
    // a loop lies outside every loop drawn before it on any of its legs, clear of their strokes and labels
    const offset = Math.max(0, ...legs.map((l) => nested.get(l) ?? 0));
    for (const l of legs) nested.set(l, offset + Math.max(width + 18, NEST_STEP_PX));
    const { path, spots } = loopGeometry(through, offset, width);
    const text = formatPercent(c.share);
    const label = placeLabel(spots, text, taken);
    taken.push(shareLabelBox(label, text));
    const main = c.family.split("-")[0];
    return {
      cycleId: c.id,
      netEquation: c.netEquation,
      family: c.family,
      through,
      share: c.share,
      oxLoss_cm3s: c.oxLoss_cm3s,
      width,
      color: loopColor(main),
      path,
      label: { ...label, text },
    };
  });

  const used = new Set(["Ox", ...loops.flatMap((l) => l.through)]);
  const nodes = Object.entries(PLACES)
    .filter(([f]) => used.has(f))
    .map(([family, p]): CycleMapNode => {
      const h = HUES[family];
      return {
        family,
        label: SHORT[family] ?? family,
        x: p.x,
        y: p.y,
        r: CYCLE_MAP_NODE_RADIUS_PX,
        fill: oklchToHex({ L: 0.95, C: 0.03, h }),
        stroke: oklchToHex({ L: 0.45, C: 0.08, h }),
      };
    });
  return {
    ...CYCLE_MAP_SIZE,
    nodes,
    loops,
    other: { count: rest.length, share: rest.reduce((a, c) => a + c.share, 0) },
  };
}

/** Ox, then the map's families touched by the cycle's steps in visiting order. */
export function loopFamilies(cycle: Pick<CatalyticCycle, "steps">, famOf: ReadonlyMap<string, string>): string[] {
  const touched = new Set<string>();
  for (const s of cycle.steps) {
    const eq = equationView(s.equation);
    for (const t of [...eq.reactants, ...eq.products]) {
      const f = famOf.get(t.species);
      if (f && f in PLACES) touched.add(f);
    }
  }
  return ["Ox", ...VISIT_ORDER.filter((f) => touched.has(f))];
}

/** Loop colour: the family's hue, darker and more saturated than the node tints. */
const loopColor = (family: string): string => {
  const h = HUES[family];
  return h === undefined ? "#6b6b66" : oklchToHex({ L: 0.55, C: 0.13, h });
};

/**
 * A closed petal through the families' places: every leg bulges to its left,
 * so the way out and the way back part and the loop encloses an area; the
 * k-th loop over the same families bulges further. The label sits just
 * outside the middle of the first leg. `offset`: px beyond the innermost loop.
 */
function loopGeometry(
  through: string[],
  offset: number,
  width: number,
): { path: string; label: Point; spots: Point[] } {
  const pts = through.map((f) => PLACES[f]);
  if (pts.length === 1) {
    const p = pts[0];
    const s = 30 + offset;
    const top = p.y - CYCLE_MAP_NODE_RADIUS_PX - 0.75 * s;
    const label = { x: p.x, y: round(top - s * 0.2 - width / 2 - 4) };
    return {
      path: `M ${f(p.x - 8)} ${f(p.y - 20)} C ${f(p.x - s)} ${f(top - s * 0.5)} ${f(p.x + s)} ${f(top - s * 0.5)} ${f(p.x + 8)} ${f(p.y - 20)}`,
      label,
      spots: [
        label,
        { x: round(p.x - s * 0.75 - 14), y: round(top) },
        { x: round(p.x + s * 0.75 + 14), y: round(top) },
      ],
    };
  }
  const bulge = 16 + offset + width / 2;
  const ring = [...pts, pts[0]];
  let path = `M ${f(ring[0].x)} ${f(ring[0].y)}`;
  let label: Point = ring[0];
  const spots: Point[] = [];
  for (let i = 0; i + 1 < ring.length; i++) {
    const a = ring[i];
    const b = ring[i + 1];
    const len = Math.hypot(b.x - a.x, b.y - a.y) || 1;
    // left normal in screen coordinates (y down)
    const n = { x: (b.y - a.y) / len, y: -(b.x - a.x) / len };
    const c1 = { x: a.x + (b.x - a.x) / 3 + n.x * bulge * 1.33, y: a.y + (b.y - a.y) / 3 + n.y * bulge * 1.33 };
    const c2 = {
      x: a.x + (2 * (b.x - a.x)) / 3 + n.x * bulge * 1.33,
      y: a.y + (2 * (b.y - a.y)) / 3 + n.y * bulge * 1.33,
    };
    path += ` C ${f(c1.x)} ${f(c1.y)} ${f(c2.x)} ${f(c2.y)} ${f(b.x)} ${f(b.y)}`;
    const out = width / 2 + 9;
    for (const t of [0.5, 0.35, 0.65, 0.25, 0.75]) {
      const q = cubicAt(a, c1, c2, b, t);
      spots.push({ x: round(q.x + n.x * out), y: round(q.y + n.y * out) });
    }
    if (i === 0) label = spots[0];
  }
  // the middle of every leg first, then the points either side of it
  spots.sort((p, q) => spotRank(spots, p) - spotRank(spots, q));
  return { path: `${path} Z`, label, spots };
}

const spotRank = (all: Point[], p: Point) => (all.indexOf(p) % 5) * 100 + Math.floor(all.indexOf(p) / 5);

function cubicAt(a: Point, b: Point, c: Point, d: Point, t: number): Point {
  const u = 1 - t;
  return {
    x: u * u * u * a.x + 3 * u * u * t * b.x + 3 * u * t * t * c.x + t * t * t * d.x,
    y: u * u * u * a.y + 3 * u * u * t * b.y + 3 * u * t * t * c.y + t * t * t * d.y,
  };
}

/** Box of a share label ("52 %") centred at p, px. */
export const shareLabelBox = (p: Point, text: string): Rect => rectAround(p, ([...text].length * 6.5 + 4) / 2, 7.5);

/** The first spot whose label box clears every label placed before and every family node. */
function placeLabel(spots: Point[], text: string, taken: Rect[]): Point {
  for (const p of spots) {
    const box = shareLabelBox(p, text);
    if (!taken.some((t) => intersects(t, box))) return p;
  }
  return spots[0];
}

const round = (v: number) => Math.round(v * 10) / 10;
const f = (v: number) => round(v).toString();
