"use client";
/**
 * The cytoscape canvas. Elements, positions and the stylesheet come from
 * lib/viz; this component only keeps one cytoscape instance per mechanism in
 * step with them (data updated in place, so the view does not jump when the
 * numbers change) and reports clicks.
 */
import type { Core, ElementDefinition, SingularElementReturnValue, StylesheetJson } from "cytoscape";
import { forwardRef, useEffect, useImperativeHandle, useRef, useState } from "react";
import type { Highlight } from "@/lib/viz/cycleHighlight";
import { formatNumber } from "@/lib/viz/formatNumber";
import { frameBoxes } from "@/lib/viz/frameBoxes";
import type { StyleRule } from "@/lib/viz/networkStyle";
import type { GraphElement, Point } from "@/lib/viz/types";
import { nextTask } from "./nextTask";

export interface NetworkHandle {
  /** PNG of the whole graph as a Blob */
  png(): Promise<Blob | null>;
  /** current node positions by id, px */
  positions(): Record<string, Point>;
  fit(): void;
  /** multiplies the zoom around the centre of the view */
  zoomBy(factor: number): void;
}

interface Props {
  layoutKey: string;
  elements: GraphElement[];
  stylesheet: StyleRule[];
  highlight: Highlight;
  selected: string | null;
  onSelect(id: string | null): void;
}

declare global {
  interface Window {
    /** read-only view of the canvas for the browser tests */
    __ozoneNetwork?: {
      edges(): { id: string; color: string; width: number; classes: string[] }[];
      /** positions in model px; `w` and `h` are the node's width and height */
      nodes(): { id: string; classes: string[]; x: number; y: number; w: number; h: number }[];
      /** position of a node on screen relative to the canvas, px */
      rendered(id: string): { x: number; y: number } | null;
    };
  }
}

/**
 * Starts loading the canvas library, so that its download and evaluation (a task of its own) happen
 * while the layout is computed rather than in front of the first drawing.
 */
export function preloadNetworkView(): void {
  void import("cytoscape");
}

export const NetworkView = forwardRef<NetworkHandle, Props>(function NetworkView(
  { layoutKey, elements, stylesheet, highlight, selected, onSelect },
  ref,
) {
  const box = useRef<HTMLDivElement>(null);
  const cyRef = useRef<Core | null>(null);
  /** a chip has been dragged by hand since the graph was built: the frames then follow the chips, not the layout */
  const moved = useRef(false);
  /** the highlighted ids last brought into view, joined by spaces */
  const lastKey = useRef("");
  const [tip, setTip] = useState<{ x: number; y: number; title: string; detail: string } | null>(null);
  const latest = useRef({ elements, highlight, selected, onSelect });
  /** true until the first change of the elements' data after the set-up */
  const firstChange = useRef(false);
  latest.current = { elements, highlight, selected, onSelect };

  useImperativeHandle(ref, () => ({
    async png() {
      const cy = cyRef.current;
      if (!cy) return null;
      return cy.png({ output: "blob-promise", full: true, scale: 2, bg: "#ffffff" });
    },
    positions() {
      const out: Record<string, Point> = {};
      cyRef.current?.nodes().forEach((n) => {
        if (n.data("kind") !== "frame") out[n.id()] = { ...n.position() };
      });
      return out;
    },
    fit() {
      cyRef.current?.fit(undefined, 24);
    },
    zoomBy(factor: number) {
      const cy = cyRef.current;
      if (!cy) return;
      cy.zoom({ level: cy.zoom() * factor, renderedPosition: { x: cy.width() / 2, y: cy.height() / 2 } });
    },
  }));

  // one instance per mechanism layout, set up over several tasks (see nextTask) so that none of them
  // holds the page for long: the module's evaluation, the instance with its stylesheet, the elements
  // in slices, their styles and label sizes in slices (cytoscape would otherwise compute them all in
  // the first frame it draws), then the fit
  useEffect(() => {
    let cancelled = false;
    let cy: Core | null = null;
    const gone = () => cancelled || !box.current;
    const setUp = async () => {
      const { default: cytoscape } = await import("cytoscape");
      await nextTask();
      if (gone()) return;
      cy = cytoscape({
        container: box.current,
        style: stylesheet as unknown as StylesheetJson,
        layout: { name: "preset" },
        minZoom: 0.15,
        maxZoom: 4,
        boxSelectionEnabled: false,
        autoungrabify: false,
        selectionType: "single",
      });
      drawWithoutCaches(cy);
      const c = cy;
      // the listeners first: a chip can be grabbed as soon as anything is drawn
      c.on("tap", "node.species, node.reaction", (ev) => latest.current.onSelect(ev.target.id()));
      c.on("tap", (ev) => {
        if (ev.target === c) latest.current.onSelect(null);
      });
      // a short read-out under the pointer: the equation and rate of a reaction, the amount of a species
      c.on("mouseover", "node.species, node.reaction", (ev) => {
        const d = ev.target.data();
        const p = ev.renderedPosition ?? ev.target.renderedPosition();
        setTip({
          x: p.x,
          y: p.y,
          title: d.kind === "reaction" ? d.equation : d.label,
          detail:
            d.kind === "reaction"
              ? `${d.reactionId} · rate ${formatNumber(d.rate_cm3s)} cm⁻³ s⁻¹`
              : `${formatNumber(d.numberDensity_cm3)} cm⁻³`,
        });
      });
      c.on("mouseout", "node", () => setTip(null));
      c.on("viewport", () => setTip(null));
      // a chip dragged by hand takes its frame along
      c.on("drag", "node.species", () => {
        moved.current = true;
        fitFrames(c);
      });
      // nothing is drawn until the elements are complete and styled: cytoscape draws nothing in a batch
      c.startBatch();
      await nextTask();
      if (gone() || !(await addInSlices(c, () => latest.current, gone))) return;
      await nextTask();
      if (gone()) return;
      // the end of the batch marks every element's style out of date (and queues them for the renderer);
      // a second batch holds the drawing while they are computed
      c.endBatch();
      c.startBatch();
      await nextTask();
      if (gone() || !(await styleInSlices(c, gone))) return;
      c.endBatch();
      // from here on the element effect below keeps the canvas in step
      moved.current = false;
      cyRef.current = c;
      // The elements were added with the data of when the set-up began. An analysis that came since (the
      // usual case: the answer is quicker than the set-up) is restyled in slices here; one that was there
      // from the start (a permalink) needs nothing more. Either way, the next change is a step and is
      // applied at once. Only while no analysis has been drawn is the first one left to be sliced.
      firstChange.current = false;
      c.startBatch();
      const changed = apply(c, latest.current.elements, latest.current.highlight, latest.current.selected);
      c.endBatch();
      if (changed > 0) {
        c.startBatch();
        await nextTask();
        if (gone() || !(await styleInSlices(c, gone))) return;
        c.endBatch();
      } else if (!analysed(latest.current.elements)) firstChange.current = true;
      await nextTask();
      if (gone()) return;
      c.fit(undefined, 24);
      // a cycle chosen before the canvas was ready (or given in the address) is brought into view now
      lastKey.current = latest.current.highlight.on.join(" ");
      if (lastKey.current) bringIntoView(c, lastKey.current);
      window.__ozoneNetwork = {
        edges: () =>
          (cyRef.current?.edges().map((e) => ({
            id: e.id(),
            color: e.data("color"),
            width: e.data("width"),
            classes: e.classes(),
          })) ?? []) as { id: string; color: string; width: number; classes: string[] }[],
        rendered: (id: string) => {
          const n = cyRef.current?.getElementById(id);
          return n?.nonempty() ? { ...n.renderedPosition() } : null;
        },
        nodes: () =>
          cyRef.current?.nodes().map((n) => ({
            id: n.id(),
            classes: n.classes(),
            x: n.position("x"),
            y: n.position("y"),
            w: n.width(),
            h: n.height(),
          })) ?? [],
      };
      box.current!.dataset.ready = "true";
    };
    void setUp();
    return () => {
      cancelled = true;
      cy?.destroy();
      cyRef.current = null;
      if (box.current) box.current.dataset.ready = "false";
    };
  }, [layoutKey]);

  useEffect(() => {
    const cy = cyRef.current;
    if (!cy) return;
    if (!firstChange.current) {
      apply(cy, elements, highlight, selected);
      // a frame follows its dragged chips, not the layout's box
      if (moved.current) fitFrames(cy);
      return;
    }
    // the first change of the data after the set-up (the first analysis, which recolours and resizes
    // nearly everything) is restyled in slices like the set-up; later ones (a key step) at once, since
    // their repaint should come as soon as it can
    cy.startBatch();
    const changed = apply(cy, elements, highlight, selected);
    if (moved.current) fitFrames(cy);
    if (changed === 0) {
      cy.endBatch();
      return;
    }
    firstChange.current = false;
    cy.endBatch();
    cy.startBatch();
    void nextTask()
      .then(() => (cy.destroyed() ? false : styleInSlices(cy, () => cy.destroyed())))
      .then((done) => {
        if (done) cy.endBatch();
      });
  }, [elements, highlight, selected]);

  // a newly chosen cycle is brought into view; clearing it returns to the whole network
  const hlKey = highlight.on.join(" ");
  useEffect(() => {
    const cy = cyRef.current;
    if (!cy || hlKey === lastKey.current) return;
    lastKey.current = hlKey;
    bringIntoView(cy, hlKey);
  }, [hlKey]);

  return (
    <div className="absolute inset-0">
      {tip ? (
        <div
          role="tooltip"
          className="pointer-events-none absolute z-10 max-w-[280px] -translate-x-1/2 translate-y-3 rounded border border-stone-300 bg-white/95 px-2 py-1 text-[11px] shadow"
          style={{ left: tip.x, top: tip.y }}
        >
          <div className="font-semibold text-stone-900">
            <bdi>{tip.title}</bdi>
          </div>
          <div className="tabular-nums text-stone-600">{tip.detail}</div>
        </div>
      ) : null}
      <div
        ref={box}
        data-testid="network"
        className="h-full w-full"
        role="img"
        aria-label="Reaction network: species chips grouped by family, reaction hexagons between them; click one to inspect it"
      />
    </div>
  );
});

/**
 * Brings the canvas in step with the element data. Only what changed is
 * touched: every data() or classes() call makes cytoscape restyle that
 * element, which is most of the cost of a repaint. Returns how many elements'
 * data changed.
 */
function apply(cy: Core, elements: GraphElement[], hl: Highlight, selected: string | null): number {
  let changedData = 0;
  cy.batch(() => {
    const want = new Set(elements.map((e) => e.data.id));
    const all = cy.elements();
    const gone = all.filter((el) => !want.has(el.id()));
    if (gone.nonempty()) cy.remove(gone);
    // one lookup table instead of a getElementById (a new collection) per element
    const have = new Map<string, SingularElementReturnValue>();
    all.forEach((el) => {
      if (want.has(el.id())) have.set(el.id(), el);
    });
    const on = new Set(hl.on);
    const lit = (id: string) => (on.size === 0 ? "" : on.has(id) ? " hl" : " dim");
    for (const el of elements) {
      const classes = `${el.classes}${lit(el.data.id)}`;
      const ex = have.get(el.data.id);
      if (!ex) {
        cy.add({ ...(el as unknown as ElementDefinition), classes });
        continue;
      }
      // id and edge ends are fixed for a given layout; cytoscape refuses to change them through data()
      const changed: Record<string, unknown> = {};
      let any = false;
      for (const [k, v] of Object.entries(el.data)) {
        if (k === "id" || k === "parent" || k === "source" || k === "target") continue;
        if (ex.data(k) !== v) {
          changed[k] = v;
          any = true;
        }
      }
      if (any) {
        ex.data(changed);
        changedData++;
      }
      if (!sameClasses(ex.classes(), classes)) ex.classes(classes);
      // a frame's box follows the chips that are drawn (the detail control changes them)
      if (el.group === "nodes" && el.data.kind === "frame" && el.position) {
        const p = ex.position();
        const want = el.position;
        if (p.x !== want.x || p.y !== want.y) ex.position(want);
      }
    }
    const sel = cy.$(":selected");
    if (selected === null) {
      if (sel.nonempty()) sel.unselect();
    } else if (sel.length !== 1 || sel[0].id() !== selected) {
      sel.unselect();
      cy.getElementById(selected).select();
    }
  });
  return changedData;
}

/**
 * Cytoscape's canvas renderer keeps the whole graph in a few layer textures,
 * and each element in textures of its own. Any change to any element
 * invalidates every layer (its source says so), and a changed colour or width
 * invalidates that element's textures too, so a slider step, which changes
 * nearly every element, redrew the board into new textures and then copied
 * them, all in software. Drawing each element straight onto the canvas skips
 * both caches: from a data change of every element to the second frame after
 * it, a median of 57–70 ms against 147–160 ms through the caches (24 changes,
 * alternating, headless Chromium at load average 6); a pan costs the same
 * either way (33 ms, two frames), since the renderer pans its buffered canvas.
 * Private API: if a cytoscape release renames these methods, nothing changes.
 */
function drawWithoutCaches(cy: Core): void {
  const r = (cy as unknown as { renderer?: () => Record<string, unknown> }).renderer?.();
  if (!r || typeof r.drawElement !== "function" || typeof r.drawLayeredElements !== "function") return;
  const drawElement = r.drawElement as (context: CanvasRenderingContext2D, ele: unknown) => void;
  r.drawLayeredElements = function drawDirect(context: CanvasRenderingContext2D, eles: ArrayLike<unknown>) {
    for (let i = 0; i < eles.length; i++) drawElement.call(r, context, eles[i]);
  };
}

/** Work per slice of the canvas's set-up, ms. */
const SLICE_MS = 30;

/**
 * Adds the elements in slices of at most SLICE_MS, yielding between them; false when the view went
 * away meanwhile.
 */
async function addInSlices(
  cy: Core,
  now: () => { elements: GraphElement[]; highlight: Highlight },
  gone: () => boolean,
): Promise<boolean> {
  const sorted = now().elements;
  const on = new Set(now().highlight.on);
  let i = 0;
  while (i < sorted.length) {
    const end = performance.now() + SLICE_MS;
    const slice: ElementDefinition[] = [];
    // a few elements at a time, so that the clock is read often enough
    while (i < sorted.length && performance.now() < end) {
      for (const el of sorted.slice(i, i + 16)) {
        const lit = on.size === 0 ? "" : on.has(el.data.id) ? " hl" : " dim";
        slice.push({ ...(el as unknown as ElementDefinition), classes: `${el.classes}${lit}` });
      }
      cy.add(slice.splice(0));
      i += 16;
    }
    if (i < sorted.length) {
      await nextTask();
      if (gone()) return false;
    }
  }
  return true;
}

/**
 * Computes every element's style and rendered style (label sizes, edge paths) in slices of at most
 * SLICE_MS: the nodes, then the edges between them. Cytoscape
 * computes these lazily, all of them in the first frame it draws after a change (over half a second
 * for the reference mechanism on this machine); done here, that frame finds them clean and only draws.
 * The caller holds a batch meanwhile, which keeps cytoscape's render loop from drawing.
 * `cleanStyle` and `recalculateRenderedStyle` are cytoscape's own (untyped) collection methods that
 * its renderer uses the same way; should a release drop them, the first frame simply does the work
 * again. The frame still recomputes the edges' paths (a node's edges are queued once its style changed).
 */
async function styleInSlices(cy: Core, gone: () => boolean): Promise<boolean> {
  type Inner = {
    cleanStyle?: () => void;
    recalculateRenderedStyle?: (useCache: boolean) => void;
  };
  const order = [...cy.nodes().toArray(), ...cy.edges().toArray()];
  let i = 0;
  while (i < order.length) {
    const end = performance.now() + SLICE_MS;
    while (i < order.length && performance.now() < end) {
      const el = order[i++];
      const inner = el as unknown as Inner;
      inner.cleanStyle?.();
      // false: recompute even where cytoscape's flags say clean (a data change does not clear them)
      inner.recalculateRenderedStyle?.(false);
    }
    if (i < order.length) {
      await nextTask();
      if (gone()) return false;
    }
  }
  return true;
}

/** Animates the view to the elements of `key` (ids joined by spaces), or to the whole network when it is empty. */
function bringIntoView(cy: Core, key: string): void {
  let target = cy.collection();
  if (key) for (const id of key.split(" ")) target = target.union(cy.getElementById(id));
  else target = cy.elements();
  cy.stop();
  cy.animate({ fit: { eles: target, padding: key ? 70 : 24 } }, { duration: 350 });
}

/** Whether the elements carry an analysis: some reaction is drawn with a flux. */
const analysed = (elements: GraphElement[]): boolean =>
  elements.some((e) => e.data.kind === "reaction" && !e.classes.split(" ").includes("idle"));

function sameClasses(have: string[], want: string): boolean {
  const w = want.split(" ").filter(Boolean);
  return have.length === w.length && w.every((c) => have.includes(c));
}

/**
 * Frames are plain nodes (a compound parent would make cytoscape re-derive
 * every ancestor on each change), so a chip dragged by hand takes its frame
 * along here: the boxes of the frames are worked out again from where the
 * chips now are, as the SVG export does.
 */
function fitFrames(cy: Core): void {
  const chips = cy.nodes("node.species").map((n) => ({
    frame: n.data("frame") as string,
    ...n.position(),
    width: n.data("width") as number,
  }));
  const frames = cy.nodes("node.frame");
  const boxes = frameBoxes(chips, new Map(frames.map((f) => [f.id(), f.data("minWidth") as number])));
  cy.batch(() => {
    frames.forEach((f) => {
      const b = boxes.get(f.id());
      if (!b) return;
      const width = b.x1 - b.x0;
      const height = b.y1 - b.y0;
      if (f.data("width") !== width || f.data("height") !== height) f.data({ width, height });
      const p = f.position();
      const x = (b.x0 + b.x1) / 2;
      const y = (b.y0 + b.y1) / 2;
      if (p.x !== x || p.y !== y) f.position({ x, y });
    });
  });
}
