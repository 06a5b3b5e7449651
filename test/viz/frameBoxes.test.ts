/**
 * Family frames are plain nodes whose box is worked out from their chips
 * (frameBoxes), the same box on the canvas and in the SVG export.
 */
import { describe, expect, it } from "vitest";
import { BUILTIN_MECHANISMS } from "@/lib/mechanisms";
import { CHIP_HEIGHT_PX } from "@/lib/viz/chipWidth";
import { FRAME_DEFAULTS, frameBoxes } from "@/lib/viz/frameBoxes";
import { networkElements } from "@/lib/viz/networkElements";
import { networkLayout } from "@/lib/viz/networkLayout";
import type { GraphNode } from "@/lib/viz/types";
import { builtinView } from "./builtinView";

describe("frameBoxes", () => {
  it("wraps the chips of each frame with the padding on every side", () => {
    const boxes = frameBoxes([
      { frame: "f:a", x: 100, y: 50, width: 60 },
      { frame: "f:a", x: 200, y: 120, width: 40 },
      { frame: "f:b", x: 0, y: 0, width: 44 },
    ]);
    const pad = FRAME_DEFAULTS.padding_px;
    const half = CHIP_HEIGHT_PX / 2;
    expect(boxes.get("f:a")).toEqual({ x0: 70 - pad, y0: 50 - half - pad, x1: 220 + pad, y1: 120 + half + pad });
    expect(boxes.get("f:b")).toEqual({ x0: -22 - pad, y0: -half - pad, x1: 22 + pad, y1: half + pad });
    expect(boxes.size).toBe(2);
  });

  it("widens a frame evenly on both sides to the width its title needs, and never narrows one", () => {
    const chips = [{ frame: "f:a", x: 100, y: 0, width: 44 }];
    const wide = frameBoxes(chips, new Map([["f:a", 300]]));
    expect(wide.get("f:a")!.x1 - wide.get("f:a")!.x0).toBe(300);
    expect((wide.get("f:a")!.x0 + wide.get("f:a")!.x1) / 2).toBe(100);
    const narrow = frameBoxes(chips, new Map([["f:a", 10]]));
    expect(narrow.get("f:a")!.x1 - narrow.get("f:a")!.x0).toBe(44 + 2 * FRAME_DEFAULTS.padding_px);
  });
});

const view = builtinView;

describe.each(BUILTIN_MECHANISMS.map((m) => m.id))("the frames of the %s network", (id) => {
  const mech = view(id);
  const layout = networkLayout(mech);
  const nodes = networkElements(mech, layout, null).filter((e): e is GraphNode => e.group === "nodes");

  it("hold every chip of their family inside the padding, touch the outermost ones' padding, and sit under their title", () => {
    const frames = nodes.filter((n) => n.data.kind === "frame");
    expect(frames.length).toBeGreaterThan(0);
    const pad = FRAME_DEFAULTS.padding_px;
    for (const f of frames) {
      if (f.data.kind !== "frame") continue;
      const { x, y } = f.position!;
      const box = {
        x0: x - f.data.width / 2,
        x1: x + f.data.width / 2,
        y0: y - f.data.height / 2,
        y1: y + f.data.height / 2,
      };
      const chips = nodes.filter((n) => n.data.kind === "species" && n.data.frame === f.data.id);
      expect(chips.length, f.data.id).toBeGreaterThan(0);
      const edges = { left: Infinity, right: -Infinity, top: Infinity, bottom: -Infinity };
      for (const c of chips) {
        if (c.data.kind !== "species") continue;
        const p = c.position!;
        edges.left = Math.min(edges.left, p.x - c.data.width / 2);
        edges.right = Math.max(edges.right, p.x + c.data.width / 2);
        edges.top = Math.min(edges.top, p.y - CHIP_HEIGHT_PX / 2);
        edges.bottom = Math.max(edges.bottom, p.y + CHIP_HEIGHT_PX / 2);
      }
      // rounded to 0.01 px in the element data
      expect(box.y0, f.data.id).toBeCloseTo(edges.top - pad, 1);
      expect(box.y1, f.data.id).toBeCloseTo(edges.bottom + pad, 1);
      expect(box.x0, f.data.id).toBeLessThanOrEqual(edges.left - pad + 0.01);
      expect(box.x1, f.data.id).toBeGreaterThanOrEqual(edges.right + pad - 0.01);
      expect(box.x1 - box.x0 + 0.01, f.data.id).toBeGreaterThanOrEqual(f.data.minWidth);
      const title = layout.labels.find((b) => b.kind === "frame" && b.id === f.data.id);
      if (title) expect(title.y1, `${f.data.id}'s title`).toBeLessThanOrEqual(box.y0 + 0.01);
    }
  });
});
