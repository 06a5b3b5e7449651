import { describe, expect, it } from "vitest";
import { dominantFluxPath, reactionNode, speciesNode, speciesReactionGraph } from "@/lib/analysis";
import { InputError } from "@/lib/errors";
import { expectClose } from "../helpers/close";
import { chlorine, rateOf } from "./helpers";

describe("speciesReactionGraph", () => {
  it("has one node per species and reaction and edges whose loss fractions sum to 1 per species", () => {
    const s = chlorine();
    const g = speciesReactionGraph(s.mech, s);
    expect(g.order).toBe(s.mech.species.length + s.mech.reactions.length);
    expect(g.hasEdge(speciesNode("ClO"), reactionNode("C6"))).toBe(true);
    expect(g.hasEdge(reactionNode("C6"), speciesNode("Cl"))).toBe(true);
    for (const id of ["Cl", "ClO", "HCl", "O3"]) {
      let sum = 0;
      g.forEachOutEdge(speciesNode(id), (_e, a) => {
        sum += a.fraction;
      });
      expectClose(sum, 1, { abs: 1e-12 }, `${id} loss fractions`);
    }
  });
});

describe("dominantFluxPath", () => {
  it("follows HCl to ClO through OH + HCl and Cl + O3 with the product of branching fractions", () => {
    const s = chlorine();
    const p = dominantFluxPath(s.mech, s, "HCl", "ClO");
    expect(p).not.toBeNull();
    expect(p!.path).toEqual(["HCl", "Cl", "ClO"]);
    expect(p!.reactions).toEqual(["C9", "C5"]);
    const r5 = rateOf(s.mech, s.rate_cm3s, "C5");
    const r8 = rateOf(s.mech, s.rate_cm3s, "C8");
    expectClose(p!.fraction, r5 / (r5 + r8), { rel: 1e-12 });
  });

  it("returns null when no flux leads from one species to the other", () => {
    const s = chlorine();
    expect(dominantFluxPath(s.mech, s, "CH3", "ClO")).toBeNull();
  });

  it("does not pass through held species", () => {
    const s = chlorine();
    // O2 would connect ClO + O → Cl + O2 to O2 + hv → 2 O; O2 is held, so ClO → O has no path
    expect(dominantFluxPath(s.mech, s, "ClO", "O")).toBeNull();
  });

  it("throws if a species is unknown", () => {
    const s = chlorine();
    expect(() => dominantFluxPath(s.mech, s, "Xe", "ClO")).toThrow(InputError);
    expect(() => dominantFluxPath(s.mech, s, "Cl", "Kr")).toThrow(/toId/);
  });
});
