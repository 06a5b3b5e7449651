import { describe, expect, it } from "vitest";
import {
  findConservationRelations,
  leftNullSpace,
  loadBuiltinMechanism,
  loadMechanism,
  poolExpression,
  stoichiometryMatrix,
} from "../../lib/mechanism";
import type { CompiledMechanism, ConservationRelation } from "../../lib/mechanism/types";

const reference = loadBuiltinMechanism("reference").mechanism;

/** Σ w·S over reaction j. */
function change(m: CompiledMechanism, rel: ConservationRelation, j: number): number {
  const S = stoichiometryMatrix(m);
  let s = 0;
  for (const t of S.columns[j]) {
    const w = rel.weights.find((x) => x.species === t.species);
    if (w) s += w.coef * t.coef;
  }
  return s;
}

const names = (m: CompiledMechanism, ids: number[]) => ids.map((j) => m.reactions[j].id);

describe("stoichiometryMatrix", () => {
  it("stores net coefficients per reaction and per species, leaving out M and species that cancel", () => {
    const S = stoichiometryMatrix(reference);
    const j = reference.reactions.findIndex((r) => r.id === "Ox3"); // O(1D) + N2 -> O + N2
    const ids = S.columns[j].map((t) => [reference.species[t.species].id, t.coef]);
    expect(ids).toEqual([
      ["O", 1],
      ["O(1D)", -1],
    ]);
    const o3 = reference.speciesIndex.O3;
    expect(S.rows[o3].every((e) => S.columns[e.reaction].some((t) => t.species === o3 && t.coef === e.coef))).toBe(
      true,
    );
    expect(S.nSpecies).toBe(reference.species.length);
    expect(S.nReactions).toBe(reference.reactions.length);
  });

  it("counts 2 O2 as +2 and ClO + ClO as −2", () => {
    const S = stoichiometryMatrix(reference);
    const j = reference.reactions.findIndex((r) => r.id === "ClOx20");
    expect(S.columns[j]).toContainEqual({ species: reference.speciesIndex.ClO, coef: -2 });
  });
});

describe("conservation relations of the reference mechanism", () => {
  const rel = (el: string) => {
    const r = reference.conservation.find((c) => c.element === el);
    if (!r) throw new Error(`no ${el} relation`);
    return r;
  };

  it("finds the chlorine balance with every chlorine species weighted by its atoms", () => {
    expect(poolExpression(rel("Cl"))).toBe(
      "Cl atoms: Cl + ClO + 2 Cl2O2 + ClOO + OClO + 2 Cl2 + HCl + HOCl + ClONO2 + BrCl",
    );
  });

  it("finds the bromine balance and the nitrogen of NOy (N2 and N2O are held, so not in it)", () => {
    expect(rel("Br").expression).toBe("BrCl + Br + BrO + HBr + HOBr + BrONO2");
    expect(rel("N").expression).toBe("N + NO + NO2 + NO3 + 2 N2O5 + HNO3 + HO2NO2 + ClONO2 + BrONO2");
  });

  it("names the reactions that exchange each pool with held species: source-gas photolysis, N2O + O(1D), N + NO", () => {
    expect(names(reference, rel("Cl").externalReactions)).toEqual(["J_CFCl3", "J_CF2Cl2"]);
    expect(names(reference, rel("Br").externalReactions)).toEqual(["BrOx16"]);
    expect(names(reference, rel("N").externalReactions)).toEqual(["Ox10", "NOx2"]);
  });

  it("keeps each element sum unchanged by every other reaction (wᵀS = 0 off the external reactions)", () => {
    for (const el of ["Cl", "Br", "N"]) {
      const r = rel(el);
      reference.reactions.forEach((_, j) => {
        const d = change(reference, r, j);
        if (r.externalReactions.includes(j)) expect(Math.abs(d)).toBeGreaterThan(0);
        else expect(d).toBe(0);
      });
    }
  });

  it("reports the pools Cly, Bry and NOy of the document with their default totals", () => {
    expect(reference.pools.map((p) => [p.id, p.element, p.total])).toEqual([
      ["Cly", "Cl", { mixingRatio: 3.3e-9 }],
      ["Bry", "Br", { mixingRatio: 2e-11 }],
      ["NOy", "N", { mixingRatio: 1.6e-8 }],
    ]);
    const cly = reference.pools[0];
    expect(cly.expression).toBe(rel("Cl").expression);
    expect(names(reference, cly.externalReactions)).toEqual(["J_CFCl3", "J_CF2Cl2"]);
  });

  it("finds no exact invariant: every pool of the reference set is open to held species", () => {
    expect(reference.conservation.filter((c) => c.exact)).toEqual([]);
  });
});

describe("left null space", () => {
  const doc = (reactions: string[], species: string) =>
    loadMechanism(
      [
        "title: invented test network",
        'version: "1"',
        "species:",
        species,
        "reactions:",
        ...reactions.map(
          (eq, i) =>
            `  - { id: R${i}, equation: "${eq}", rate: { law: arrhenius, A: 1.0e-12 }, uncertainty: { f298: 2 }, source: invented }`,
        ),
      ].join("\n"),
    ).mechanism;

  it("finds a closed chlorine family as an exact element balance", () => {
    const m = doc(
      ["Cl + O3 -> ClO + O2", "ClO + O -> Cl + O2", "ClO + ClO -> Cl2O2", "Cl2O2 + O -> ClO + ClO + O"],
      [
        "  - { id: O2, role: held, mixingRatio: 0.2 }",
        "  - { id: O3, role: held, mixingRatio: 1e-6 }",
        "  - { id: O, role: held, mixingRatio: 1e-10 }",
        "  - { id: Cl, role: solved }",
        "  - { id: ClO, role: solved }",
        "  - { id: Cl2O2, role: solved }",
      ].join("\n"),
    );
    const cl = findConservationRelations(m).find((c) => c.element === "Cl");
    expect(cl).toMatchObject({ exact: true, expression: "Cl + ClO + 2 Cl2O2", externalReactions: [] });
    // no further invariant: the element balance spans the null space
    expect(findConservationRelations(m).filter((c) => !c.element)).toEqual([]);
  });

  it("finds an invariant that no element balance gives (a lumped family with explicit atoms)", () => {
    const m = doc(
      ["RO2 + NO -> RO + NO2", "RO + O2 -> RO2 + O", "NO2 + O -> NO + O2"],
      [
        "  - { id: O2, role: held, mixingRatio: 0.2 }",
        "  - { id: O, role: held, mixingRatio: 1e-10 }",
        "  - { id: RO2, role: solved, atoms: { X: 1, O: 2 } }",
        "  - { id: RO, role: solved, atoms: { X: 1, O: 1 } }",
        "  - { id: NO, role: solved }",
        "  - { id: NO2, role: solved }",
      ].join("\n"),
    );
    const rels = findConservationRelations(m);
    expect(rels.find((c) => c.element === "X")?.expression).toBe("RO2 + RO");
    expect(rels.find((c) => c.element === "N")?.expression).toBe("NO + NO2");
    // O is exchanged with held O2 and O, so it is not exact
    expect(rels.find((c) => c.element === "O")?.exact).toBe(false);
  });

  it("returns basis vectors w with wᵀS = 0 on an invented isomer network (A ⇌ B, B + C -> A + C)", () => {
    const m = doc(
      ["X1 -> X2", "X2 -> X1", "X2 + X3 -> X1 + X3", "X4 -> X5"],
      [
        "  - { id: X1, role: solved, atoms: { C: 1 } }",
        "  - { id: X2, role: solved, atoms: { C: 1 } }",
        "  - { id: X3, role: solved, atoms: { N: 1 } }",
        "  - { id: X4, role: solved, atoms: { C: 1 } }",
        "  - { id: X5, role: solved, atoms: { C: 1 } }",
      ].join("\n"),
    );
    const S = stoichiometryMatrix(m);
    const { basis, complete } = leftNullSpace(S, [0, 1, 2, 3, 4]);
    expect(complete).toBe(true);
    // rank 2 (X1−X2 and X4−X5 directions) → null space of dimension 3
    expect(basis).toHaveLength(3);
    for (const w of basis) {
      for (const col of S.columns) {
        const s = col.reduce((acc, t) => acc + (w.get(t.species) ?? 0) * t.coef, 0);
        expect(Math.abs(s)).toBeLessThan(1e-12);
      }
    }
    // reported: the C balance and the N balance (both exact), and one further invariant, since
    // X1 + X2 and X4 + X5 are conserved separately (either one completes the basis)
    const rels = findConservationRelations(m);
    expect(rels.map((r) => [r.id, r.exact])).toEqual([
      ["C", true],
      ["N", true],
      ["invariant-1", true],
    ]);
    expect(["X1 + X2", "X4 + X5"]).toContain(rels[2].expression);
  });
});
