import { describe, expect, it } from "vitest";
import { loadMechanism } from "@/lib/mechanism";
import { networkLayout, networkLayoutSteps } from "@/lib/viz/networkLayout";
import { reactionDetail } from "@/lib/viz/reactionDetail";
import type { MechanismView } from "@/lib/viz/types";
import { openNetwork } from "../../bench/generators/openNetwork";
import { fixtureMechanism, fixtureResult } from "./fixture";

// the generated network is invented (bench/generators/openNetwork.ts); the fixture too (test/viz/fixture.ts)
const { mechanism } = loadMechanism(openNetwork(300, 1200, { ozone: true }));
const large: Pick<MechanismView, "species" | "reactions"> = {
  species: mechanism.species.map((s) => ({ id: s.id, label: s.label, role: s.role, group: s.group, atoms: s.atoms })),
  reactions: mechanism.reactions.map((r) => ({ id: r.id, equation: r.equation, rate: r.rate })),
};

describe("networkLayoutSteps", () => {
  it("gives the same layout as networkLayout, one yield per reaction after the species are placed", () => {
    const steps = networkLayoutSteps(large);
    const yields: number[] = [];
    let step = steps.next();
    while (!step.done) {
      yields.push(step.value);
      step = steps.next();
    }
    expect(step.value).toEqual(networkLayout(large));
    expect(yields[0]).toBe(0);
    expect(yields.at(-1)).toBe(large.reactions.length);
    expect(yields.length).toBe(large.reactions.length + 1);
  });
});

describe("reactionDetail cap", () => {
  it("draws at most `cap` reactions, whatever the limit, but still every kept one", () => {
    const all = reactionDetail(fixtureMechanism, fixtureResult, { limit: Infinity });
    const capped = reactionDetail(fixtureMechanism, fixtureResult, { limit: Infinity, cap: 3 });
    expect(capped.shown).toEqual(all.shown.filter((id) => ["K1", "J2", "J3"].includes(id)));
    expect(capped.hidden).toBe(fixtureMechanism.reactions.length - 3);
    const kept = reactionDetail(fixtureMechanism, fixtureResult, { limit: 40, cap: 2, keep: ["C5"] });
    expect(kept.shown).toContain("C5");
    expect(kept.shown.length).toBe(3);
  });

  it("with a cap, before any analysis draws the first min(cap, limit) reactions in mechanism order", () => {
    const d = reactionDetail(large, null, { cap: 120 });
    expect(d.shown).toEqual(large.reactions.slice(0, 40).map((r) => r.id));
    expect(d.hidden).toBe(large.reactions.length - 40);
    expect(reactionDetail(large, null, { cap: 120, limit: Infinity }).shown.length).toBe(120);
    expect(d.covered).toBeNull();
    // without a cap, every reaction, as before
    expect(reactionDetail(large, null).shown.length).toBe(large.reactions.length);
  });

  it("refuses a cap that is not a positive count", () => {
    expect(() => reactionDetail(fixtureMechanism, null, { cap: 0 })).toThrow(/invalid cap: 0/);
  });
});
