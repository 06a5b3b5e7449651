/** Records keyed by user ids (lib/idRecord.ts): no id reads or replaces an Object member. */
import { describe, expect, it } from "vitest";
import { hasId, idRecord, ownValue } from "@/lib/idRecord";

describe("id records", () => {
  it("store every id as a key, __proto__ included", () => {
    const r = idRecord<number>();
    const [proto, ctor]: string[] = ["__proto__", "constructor"];
    r[proto] = 1;
    r[ctor] = 2;
    expect(Object.keys(r)).toEqual(["__proto__", "constructor"]);
    expect(Object.getPrototypeOf(r)).toBeNull();
    expect(JSON.parse(JSON.stringify(r))).toEqual(JSON.parse('{"__proto__":1,"constructor":2}'));
  });

  it("copy the own entries of a parsed object or of [id, value] pairs", () => {
    const parsed = JSON.parse('{"__proto__":3,"O3":4}');
    expect(Object.entries(idRecord(parsed))).toEqual([
      ["__proto__", 3],
      ["O3", 4],
    ]);
    expect(Object.entries(idRecord([["toString", 5]]))).toEqual([["toString", 5]]);
  });

  it("read own values only, also from a record that has a prototype again", () => {
    const plain: Record<string, number> = { O3: 1 };
    for (const id of ["constructor", "toString", "hasOwnProperty", "valueOf", "__proto__"]) {
      expect(ownValue(plain, id), id).toBeUndefined();
      expect(hasId(plain, id), id).toBe(false);
    }
    expect(ownValue(plain, "O3")).toBe(1);
    expect(ownValue(JSON.parse('{"__proto__":7}'), "__proto__")).toBe(7);
    expect(ownValue(undefined, "O3")).toBeUndefined();
  });
});
