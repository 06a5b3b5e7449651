import { describe, expect, it } from "vitest";
import { recentCache } from "@/lib/viz/recentCache";

describe("recentCache", () => {
  it("returns what was stored under a key and nothing for an unknown key", () => {
    const c = recentCache<number>();
    c.set("a", 1);
    expect(c.get("a")).toBe(1);
    expect(c.get("b")).toBeUndefined();
  });

  it("drops the least recently used entry beyond its capacity", () => {
    const c = recentCache<number>({ capacity: 2 });
    c.set("a", 1);
    c.set("b", 2);
    c.get("a"); // a is now the newest
    c.set("c", 3);
    expect(c.keys()).toEqual(["a", "c"]);
    expect(c.get("b")).toBeUndefined();
  });

  it("replaces the value of a key set again and makes it the newest", () => {
    const c = recentCache<number>({ capacity: 2 });
    c.set("a", 1);
    c.set("b", 2);
    c.set("a", 9);
    expect(c.keys()).toEqual(["b", "a"]);
    expect(c.get("a")).toBe(9);
  });

  it("throws if the capacity is not a whole number of at least 1", () => {
    expect(() => recentCache({ capacity: 0 })).toThrow(/recentCache: invalid capacity/);
    expect(() => recentCache({ capacity: 2.5 })).toThrow(/recentCache: invalid capacity/);
  });
});
