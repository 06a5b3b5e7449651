import { describe, expect, it } from "vitest";
import { packJson, packJsonText, unpackJson } from "@/lib/store/compress";

describe("packJsonText", () => {
  it("gives the same bytes as packJson of the parsed value", async () => {
    const value = {
      levels: Array.from({ length: 2000 }, (_, i) => ({ z_km: i / 7, n_cm3: 1e12 * Math.exp(-i / 300) })),
    };
    const text = Buffer.from(JSON.stringify(value), "utf8");
    const packed = packJsonText(text);
    expect(Buffer.compare(packed, packJson(value))).toBe(0);
    expect(unpackJson(packed)).toStrictEqual(value);
  });
});
