import { describe, expect, it } from "vitest";
import { parseFormula } from "../../lib/mechanism";

// Compositions are those of the formulas as written (common practice: IUPAC element symbols).
describe("parseFormula", () => {
  it("reads two-letter elements and single counts", () => {
    expect(parseFormula("Cl")).toEqual({ Cl: 1 });
    expect(parseFormula("BrO")).toEqual({ Br: 1, O: 1 });
    expect(parseFormula("HBr")).toEqual({ H: 1, Br: 1 });
  });

  it("reads grouped formulas such as ClONO2, HO2NO2, Cl2O2 and CH3O2 by adding repeated elements", () => {
    expect(parseFormula("ClONO2")).toEqual({ Cl: 1, O: 3, N: 1 });
    expect(parseFormula("HO2NO2")).toEqual({ H: 1, O: 4, N: 1 });
    expect(parseFormula("Cl2O2")).toEqual({ Cl: 2, O: 2 });
    expect(parseFormula("CH3O2")).toEqual({ C: 1, H: 3, O: 2 });
    expect(parseFormula("CF2Cl2")).toEqual({ C: 1, F: 2, Cl: 2 });
  });

  it("reads multi-digit counts", () => {
    expect(parseFormula("C10H16")).toEqual({ C: 10, H: 16 });
    expect(parseFormula("C12H22O11")).toEqual({ C: 12, H: 22, O: 11 });
  });

  it("ignores an excited-state tag such as O(1D), N(2D) or O2(1Δ)", () => {
    expect(parseFormula("O(1D)")).toEqual({ O: 1 });
    expect(parseFormula("N(2D)")).toEqual({ N: 1 });
    expect(parseFormula("O2(1Δ)")).toEqual({ O: 2 });
  });

  it("multiplies parenthesised groups by their count", () => {
    expect(parseFormula("(CH3)2CO")).toEqual({ C: 3, H: 6, O: 1 });
    expect(parseFormula("Ca(NO3)2")).toEqual({ Ca: 1, N: 2, O: 6 });
  });

  it("keeps CO (carbon, oxygen) apart from Co (cobalt) by letter case", () => {
    expect(parseFormula("CO")).toEqual({ C: 1, O: 1 });
    expect(parseFormula("Co")).toEqual({ Co: 1 });
  });

  it("throws if a symbol is not an element, naming it", () => {
    expect(() => parseFormula("Xq2")).toThrow(/"X" is not an element symbol/);
    expect(() => parseFormula("hv")).toThrow(/elements start with a capital letter/);
  });

  it("throws if a parenthesis is not closed, a count is 0 or the formula is empty", () => {
    expect(() => parseFormula("(CH3")).toThrow(/not closed/);
    expect(() => parseFormula("CH3)")).toThrow(/unmatched/);
    expect(() => parseFormula("O0")).toThrow(/count of 0/);
    expect(() => parseFormula("")).toThrow(/empty/);
  });
});
