import { describe, expect, it } from "vitest";
import { DISPLAY_FAMILY_ORDER, familyOf, familyRank } from "@/lib/analysis/familyOf";

describe("familyOf", () => {
  it("uses the mechanism's group when there is one, in canonical spelling", () => {
    expect(familyOf({ role: "solved", group: "clox", atoms: { Cl: 1 } })).toBe("ClOx");
    expect(familyOf({ role: "solved", group: "organic", atoms: { C: 1 } })).toBe("organic");
  });

  it("falls back to the atoms: halogens first, mixed radicals are reservoirs", () => {
    expect(familyOf({ role: "solved", atoms: { Cl: 1, O: 1 } })).toBe("ClOx");
    expect(familyOf({ role: "solved", atoms: { Br: 1, Cl: 1 } })).toBe("BrOx");
    expect(familyOf({ role: "solved", atoms: { Cl: 1, O: 3, N: 1 } })).toBe("reservoir");
    expect(familyOf({ role: "solved", atoms: { H: 1, N: 1, O: 3 } })).toBe("reservoir");
    expect(familyOf({ role: "solved", atoms: { O: 3 } })).toBe("Ox");
    expect(familyOf({ role: "solved", atoms: { H: 1, O: 2 } })).toBe("HOx");
  });

  it("puts held species without a group among the held", () => {
    expect(familyOf({ role: "held", atoms: { O: 2 } })).toBe("held");
  });
});

describe("familyRank", () => {
  it("ranks the families in display order and every unknown family last, alike", () => {
    expect(DISPLAY_FAMILY_ORDER.slice(0, 5)).toEqual(["Ox", "HOx", "NOx", "ClOx", "BrOx"]);
    expect(familyRank("Ox")).toBeLessThan(familyRank("HOx"));
    expect(familyRank("ClOx")).toBeLessThan(familyRank("BrOx"));
    expect(familyRank("ClOx-HOx")).toBe(DISPLAY_FAMILY_ORDER.length);
    expect(familyRank("anything else")).toBe(DISPLAY_FAMILY_ORDER.length);
  });
});
