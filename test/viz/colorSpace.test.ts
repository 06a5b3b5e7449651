import { describe, expect, it } from "vitest";
import { deltaE, hexToOklab, inGamut, oklabToHex, oklchToHex, oklchToOklab } from "@/lib/viz/colorSpace";
import { expectClose } from "../helpers/close";

describe("OKLab conversions", () => {
  it("map white to L = 1 with no chroma (Ottosson 2020 normalises white so)", () => {
    const w = hexToOklab("#ffffff");
    expectClose(w.L, 1, { abs: 1e-4 }, "L");
    expectClose(w.a, 0, { abs: 1e-4 }, "a");
    expectClose(w.b, 0, { abs: 1e-4 }, "b");
  });

  it("map black to L = 0", () => {
    expectClose(hexToOklab("#000000").L, 0, { abs: 1e-9 });
  });

  it("give back the same hex after a round trip (identity)", () => {
    for (const hex of ["#123456", "#ff8800", "#00ffcc", "#7f7f7f", "#c9c7c0", "#010203"]) {
      expect(oklabToHex(hexToOklab(hex))).toBe(hex);
    }
  });

  it("order greys by lightness", () => {
    expect(hexToOklab("#404040").L).toBeLessThan(hexToOklab("#808080").L);
    expect(hexToOklab("#808080").L).toBeLessThan(hexToOklab("#c0c0c0").L);
  });

  it("reduce chroma, not lightness, to fit a colour into sRGB", () => {
    const wild = { L: 0.5, C: 0.4, h: 140 };
    expect(inGamut(oklchToOklab(wild))).toBe(false);
    const hex = oklchToHex(wild);
    expectClose(hexToOklab(hex).L, 0.5, { abs: 0.01 }, "lightness kept");
  });

  it("measure zero distance between a colour and itself", () => {
    const c = hexToOklab("#336699");
    expect(deltaE(c, c)).toBe(0);
  });

  it("throws if the hex string is malformed", () => {
    expect(() => hexToOklab("red")).toThrow(/invalid hex colour/);
    expect(() => hexToOklab("#12345")).toThrow(RangeError);
  });
});
