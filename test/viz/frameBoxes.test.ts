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
import type { FrameNodeData, GraphNode, SpeciesNodeData } from "@/lib/viz/types";
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

type FrameNode = GraphNode & { data: FrameNodeData };
type ChipNode = GraphNode & { data: SpeciesNodeData };

describe.each(BUILTIN_MECHANISMS.map((m) => m.id))("the frames of the %s network", (id) => {
  const mech = builtinView(id);
  const layout = networkLayout(mech);
  const nodes = networkElements(mech, layout, null).filter((e): e is GraphNode => e.group === "nodes");

  it("wrap their family's chips with the padding, widened evenly to the title's width, and sit under their title", () => {
    const frames = nodes.filter((n): n is FrameNode => n.data.kind === "frame");
    expect(frames.length).toBeGreaterThan(0);
    const pad = FRAME_DEFAULTS.padding_px;
    for (const f of frames) {
      const { x, y } = f.position!;
      const chips = nodes.filter((n): n is ChipNode => n.data.kind === "species" && n.data.frame === f.data.id);
      expect(chips.length, f.data.id).toBeGreaterThan(0);
      const left = Math.min(...chips.map((c) => c.position!.x - c.data.width / 2)) - pad;
      const right = Math.max(...chips.map((c) => c.position!.x + c.data.width / 2)) + pad;
      const top = Math.min(...chips.map((c) => c.position!.y)) - CHIP_HEIGHT_PX / 2 - pad;
      const bottom = Math.max(...chips.map((c) => c.position!.y)) + CHIP_HEIGHT_PX / 2 + pad;
      // rounded to 0.01 px in the element data
      expect(f.data.width, f.data.id).toBeCloseTo(Math.max(right - left, f.data.minWidth), 1);
      expect(f.data.height, f.data.id).toBeCloseTo(bottom - top, 1);
      expect(x, f.data.id).toBeCloseTo((left + right) / 2, 1);
      expect(y, f.data.id).toBeCloseTo((top + bottom) / 2, 1);
      // every frame of the built-ins has its title, above its top edge
      const title = layout.labels.find((b) => b.kind === "frame" && b.id === f.data.id);
      expect(title, `${f.data.id}'s title`).toBeDefined();
      expect(title!.y1, `${f.data.id}'s title`).toBeLessThanOrEqual(top + 0.01);
    }
  });
});
