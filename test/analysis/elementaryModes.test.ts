import { describe, expect, it } from "vitest";
import { decomposeElementary, eliminationWork, isElementary } from "@/lib/analysis/elementaryModes";
import type { SparseVector } from "@/lib/analysis/sparseVector";
import { expectClose } from "../helpers/close";

/**
 * Hand-made columns on species 0 (the only balanced row) and 1, 2 (unbalanced):
 * R0: → X, R1: X → Y, R2: X → Z, R3: Y → X, R4: Z → X (nets on X, Y, Z).
 */
const nets: SparseVector[] = [
  { idx: [0], val: [1] },
  { idx: [0, 1], val: [-1, 1] },
  { idx: [0, 2], val: [-1, 1] },
  { idx: [0, 1], val: [1, -1] },
  { idx: [0, 2], val: [1, -1] },
];
const onlyX = (s: number) => s === 0;

describe("elementary pathways (rank test and conformal splitting)", () => {
  it("calls a two-reaction chain through X elementary and a fork of three reactions not (null-space dimension 1 vs 2)", () => {
    const work = eliminationWork(3);
    expect(isElementary([0, 1], nets, onlyX, work)).toBe(true);
    expect(isElementary([0, 1, 2], nets, onlyX, work)).toBe(false);
  });

  it("splits a planar fork into its two boundary pathways, unique and giving back the flux (hand solution)", () => {
    // flux (3, 1, 2) through R0, R1, R2 balanced on X = 1·(R0 + R1) + 2·(R0 + R2)
    const parts = decomposeElementary([3, 1, 2], [0, 1, 2], nets, onlyX, eliminationWork(3));
    expect(parts).not.toBeNull();
    const byShape = new Map(parts!.map((p) => [p.multiplicity.join(","), p.rate]));
    expect([...byShape.keys()].sort()).toEqual(["1,0,1", "1,1,0"]);
    expectClose(byShape.get("1,1,0")!, 1, { rel: 1e-12 }, "R0 + R1");
    expectClose(byShape.get("1,0,1")!, 2, { rel: 1e-12 }, "R0 + R2");
  });

  it("splits a vector with a three-dimensional null space into elementary parts that sum to it (identity)", () => {
    // X and Y balanced, Z open: v = 3·(R1 + R3) + (R0 + R2) + (R2 + R4) = (1, 3, 2, 3, 1)
    const rows = (s: number) => s === 0 || s === 1;
    const v = [1, 3, 2, 3, 1];
    const work = eliminationWork(3);
    const parts = decomposeElementary(v, [0, 1, 2, 3, 4], nets, rows, work);
    expect(parts).not.toBeNull();
    const back = [0, 0, 0, 0, 0];
    for (const p of parts!) {
      const cols = [0, 1, 2, 3, 4].filter((i) => p.multiplicity[i] > 0);
      expect(isElementary(cols, nets, rows, work)).toBe(true);
      p.multiplicity.forEach((m, i) => {
        back[i] += m * p.rate;
      });
    }
    back.forEach((b, i) => {
      expectClose(b, v[i], { rel: 1e-12 }, `reaction R${i}`);
    });
  });
});
