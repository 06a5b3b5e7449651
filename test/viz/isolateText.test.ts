/**
 * Direction isolation of canvas and SVG labels (Unicode Standard Annex #9,
 * §2.4–2.6: FIRST STRONG ISOLATE U+2068 … POP DIRECTIONAL ISOLATE U+2069).
 */
import { describe, expect, it } from "vitest";
import { isolateText } from "@/lib/viz/isolateText";

describe("isolateText", () => {
  it("wraps text with a bidi control or right-to-left letters in FSI … PDI", () => {
    expect(isolateText("\u202EClO")).toBe("\u2068\u202EClO\u2069");
    expect(isolateText("אוזון")).toBe("\u2068אוזון\u2069");
    expect(isolateText("O3 \u0623\u0648\u0632\u0648\u0646")).toBe("\u2068O3 \u0623\u0648\u0632\u0648\u0646\u2069");
  });

  it("leaves left-to-right text as it is, so ordinary labels do not change", () => {
    for (const t of ["O(¹D)", "ClONO₂", "HOx · hydrogen radicals", ""]) expect(isolateText(t)).toBe(t);
  });
});
