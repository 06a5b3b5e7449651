import { describe, expect, it } from "vitest";
import { parseEquation } from "../../lib/mechanism";

function ok(text: string) {
  const r = parseEquation(text);
  if (!r.ok) throw new Error(r.message);
  return r.equation;
}

describe("parseEquation", () => {
  it("reads reactants, products and stoichiometric coefficients", () => {
    const e = ok("ClO + O -> Cl + O2");
    expect(e.reactants).toEqual([
      { species: "ClO", coef: 1 },
      { species: "O", coef: 1 },
    ]);
    expect(ok("O + O3 -> 2 O2").products).toEqual([{ species: "O2", coef: 2 }]);
    expect(ok("HO2 + O3 -> OH + 2O2").products).toEqual([
      { species: "OH", coef: 1 },
      { species: "O2", coef: 2 },
    ]);
  });

  it("marks hv as photolysis and leaves it out of the reactants", () => {
    const e = ok("O2 + hv -> 2 O");
    expect(e.photolysis).toBe(true);
    expect(e.reactants).toEqual([{ species: "O2", coef: 1 }]);
  });

  it("merges a species repeated on one side but keeps the text as written", () => {
    const e = ok("ClO  +  ClO + M  ->  Cl2O2 + M");
    expect(e.reactants).toEqual([
      { species: "ClO", coef: 2 },
      { species: "M", coef: 1 },
    ]);
    expect(e.text).toBe("ClO + ClO + M -> Cl2O2 + M");
  });

  it("accepts excited states, decimal yields and the → arrow", () => {
    const e = ok("O(1D) + N2O → 1.2 NO + 0.4 N2 + 0.4 O2");
    expect(e.reactants[0].species).toBe("O(1D)");
    expect(e.products[0]).toEqual({ species: "NO", coef: 1.2 });
  });

  it("throws if the arrow is missing or doubled, naming the problem", () => {
    expect(parseEquation("ClO + O = Cl + O2")).toMatchObject({ ok: false, message: expect.stringMatching(/no arrow/) });
    expect(parseEquation("A -> B -> C")).toMatchObject({
      ok: false,
      message: expect.stringMatching(/more than one arrow/),
    });
  });

  it("rejects empty terms, hv among the products and a missing +", () => {
    expect(parseEquation("ClO + + O -> Cl")).toMatchObject({ ok: false, message: expect.stringMatching(/empty term/) });
    expect(parseEquation("NO2 -> NO + O + hv")).toMatchObject({
      ok: false,
      message: expect.stringMatching(/only be a reactant/),
    });
    expect(parseEquation("ClO O -> Cl + O2")).toMatchObject({
      ok: false,
      message: expect.stringMatching(/missing "\+"/),
    });
    expect(parseEquation("hv -> O")).toMatchObject({ ok: false, message: expect.stringMatching(/no reactant/) });
  });
});
