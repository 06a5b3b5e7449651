import { describe, expect, it } from "vitest";
import { reactionDetail } from "@/lib/viz/reactionDetail";
import { expectClose } from "../helpers/close";
import { fixtureMechanism, fixtureResult } from "./fixture";

// the fixture is invented (test/viz/fixture.ts); its rates are round values chosen for these tests
const withZero = {
  ...fixtureResult,
  steadyState: {
    ...fixtureResult.steadyState,
    reactions: fixtureResult.steadyState.reactions.map((r) => (r.id === "C5" ? { ...r, rate_cm3s: 0 } : r)),
  },
};

describe("reactionDetail", () => {
  it("draws the fastest reactions first, at most `limit` of them, and counts the rest as hidden", () => {
    const d = reactionDetail(fixtureMechanism, fixtureResult, { limit: 3 });
    // fixture rates: K1 3.0e7, J2 2.4e7, J3 = K2 5.0e6 (tie broken by mechanism order: J3 first)
    expect(d.shown).toEqual(["K1", "J2", "J3"]);
    expect(d.hidden).toBe(fixtureMechanism.reactions.length - 3);
    expect(d.zeroFlux).toBe(0);
  });

  it("states the share of the total flux the drawn reactions carry", () => {
    const d = reactionDetail(fixtureMechanism, fixtureResult, { limit: 2 });
    const total = fixtureResult.steadyState.reactions.reduce((a, r) => a + r.rate_cm3s, 0);
    expectClose(d.covered as number, (3.0e7 + 2.4e7) / total, { rel: 1e-12 }, "covered share");
  });

  it("ranks by the odd oxygen destroyed in the Ox colour mode", () => {
    const d = reactionDetail(fixtureMechanism, fixtureResult, { limit: 3, colorMode: "ox" });
    // fixture perReaction: C1 1.7e6, C2 1.6e6, K3 1.2e6 destroyed
    expect(d.shown).toEqual(["K3", "C1", "C2"]);
  });

  it("never draws a reaction with zero flux, even when every reaction is asked for", () => {
    const d = reactionDetail(fixtureMechanism, withZero, { limit: Infinity });
    expect(d.shown).not.toContain("C5");
    expect(d.hidden).toBe(1);
    expect(d.zeroFlux).toBe(1);
  });

  it("always draws the reactions it is told to keep", () => {
    const d = reactionDetail(fixtureMechanism, fixtureResult, { limit: 1, keep: ["C3", "C4", "nope"] });
    expect(d.shown).toEqual(["K1", "C3", "C4"]);
    expect(d.hidden).toBe(fixtureMechanism.reactions.length - 3);
  });

  it("draws every reaction before any analysis", () => {
    const d = reactionDetail(fixtureMechanism, null, { limit: 2 });
    expect(d.shown).toHaveLength(fixtureMechanism.reactions.length);
    expect(d.covered).toBeNull();
  });

  it("throws if the limit is not a positive count", () => {
    expect(() => reactionDetail(fixtureMechanism, fixtureResult, { limit: 0 })).toThrow(
      /reactionDetail: invalid limit/,
    );
  });
});
