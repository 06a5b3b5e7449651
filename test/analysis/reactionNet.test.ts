import { describe, expect, it } from "vitest";
import { reactionNet } from "@/lib/analysis/reactionNet";
import { chlorine, handMechanism } from "./helpers";

describe("reactionNet", () => {
  it("gives products − reactants per reaction, sorted, with M, hv and exact cancellations left out", () => {
    const mech = handMechanism(
      "nets",
      { O: "solved", O2: "held", O3: "solved", OH: "solved", HO2: "solved", H2O2: "solved" },
      {
        r1: "O + O2 + M -> O3 + M",
        r2: "O3 + hv -> O + O2",
        r3: "HO2 + HO2 -> H2O2 + O2",
        r4: "OH + O3 -> HO2 + O2",
        r5: "O3 + O -> O3 + O", // a null reaction: every entry cancels
      },
    );
    const idx = (id: string) => mech.speciesIndex[id];
    const nets = reactionNet(mech);
    const asPairs = (j: number) => nets[j].idx.map((s, t) => [mech.species[s].id, nets[j].val[t]]);
    expect(asPairs(0)).toEqual([
      ["O", -1],
      ["O2", -1],
      ["O3", 1],
    ]);
    expect(asPairs(1)).toEqual([
      ["O", 1],
      ["O2", 1],
      ["O3", -1],
    ]);
    expect(nets[2].idx).toEqual([idx("O2"), idx("HO2"), idx("H2O2")].sort((a, b) => a - b));
    expect(nets[2].val[nets[2].idx.indexOf(idx("HO2"))]).toBe(-2);
    expect(nets[3].idx).toEqual([...nets[3].idx].sort((a, b) => a - b));
    expect(nets[4].idx).toEqual([]);
  });

  it("is computed once per reactions array and shared, and afresh when the array is grown in place", () => {
    const { mech } = chlorine();
    const first = reactionNet(mech);
    expect(reactionNet(mech)).toBe(first);
    expect(reactionNet({ reactions: mech.reactions })).toBe(first);
    // a copy of the reactions is another key: equal columns, not the same array
    const copy = reactionNet({ reactions: [...mech.reactions] });
    expect(copy).not.toBe(first);
    expect(copy).toEqual(first);
    const grown = { reactions: [...mech.reactions] };
    reactionNet(grown);
    grown.reactions.push(mech.reactions[0]);
    const after = reactionNet(grown);
    expect(after).toHaveLength(mech.reactions.length + 1);
    expect(after[mech.reactions.length]).toEqual(first[0]);
  });
});
