/** The cloud fields in the explorer's address (docs/heterogeneous.md, "Clouds in the conditions"). */
import { describe, expect, it } from "vitest";
import { explorerQueryString, parseExplorerQuery } from "@/lib/viz/explorerQuery";

describe("cloud fields in the explorer address", () => {
  it("round-trips the cloud type and surface area", () => {
    const q = parseExplorerQuery({ m: "reference", z: "19", T: "190", cloud: "NAT", csad: "3" });
    expect(q.condition.cloud).toBe("NAT");
    expect(q.condition.cloudSurface_um2cm3).toBe(3);
    const back = parseExplorerQuery(new URLSearchParams(explorerQueryString(q)));
    expect(back.condition).toEqual(q.condition);
  });

  it("ignores an unknown cloud type with a warning, and a surface out of range", () => {
    const q = parseExplorerQuery({ m: "reference", z: "19", cloud: "cirrus", csad: "-1" });
    expect(q.condition.cloud).toBeUndefined();
    expect(q.condition.cloudSurface_um2cm3).toBeUndefined();
    expect(q.warnings.some((w) => /cloud=cirrus/.test(w))).toBe(true);
    expect(q.warnings.some((w) => /csad=-1/.test(w))).toBe(true);
  });
});
