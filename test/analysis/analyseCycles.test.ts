import { describe, expect, it } from "vitest";
import { analyseCycles, directOxLoss, oxBudget } from "@/lib/analysis";
import { InputError } from "@/lib/errors";
import { expectClose } from "../helpers/close";
import { chapman, chlorine, handMechanism, rateOf } from "./helpers";

describe("analyseCycles on hand-solved systems", () => {
  it("gives the pure-oxygen loss 2k[O][O3] and production 2J[O2] for Chapman chemistry (Chapman 1930)", () => {
    const c = chapman();
    const r = analyseCycles(c.mech, c);
    const lossExpected = 2 * c.k.K4 * c.n.O * c.n.O3;
    expectClose(r.budget.loss_cm3s, lossExpected, { rel: 1e-12 }, "Ox loss");
    expectClose(r.budget.production_cm3s, 2 * c.k.J1 * c.n.O2, { rel: 1e-9 }, "Ox production");
    expectClose(r.budget.directLoss_cm3s, lossExpected, { rel: 1e-12 }, "direct formula");
    expect(r.cycles).toHaveLength(1);
    expect(r.cycles[0]).toMatchObject({ family: "Ox", netEquation: "O + O3 -> 2 O2", oxPerTurnover: 2, catalysts: [] });
    expect(r.budget.byFamily.find((f) => f.family === "Ox")!.fraction).toBe(1);
  });

  it("finds the ClOx cycle with net O + O3 -> 2 O2, its rate-limiting step, efficiency and chain length (hand solution)", () => {
    const s = chlorine();
    const r = analyseCycles(s.mech, s, { heldSpecies: ["O", "O3"], fminRelative: 0 });
    const clox = r.cycles.find((c) => c.family === "ClOx");
    expect(clox).toBeDefined();
    expect(clox!.netEquation).toBe("O + O3 -> 2 O2");
    expect(clox!.catalysts).toEqual(["Cl", "ClO"]);
    expect(clox!.rateLimitingStep).toBe("C6");
    expect(clox!.entryStep).toBe("C5");
    const r6 = rateOf(s.mech, s.rate_cm3s, "C6");
    const r7 = rateOf(s.mech, s.rate_cm3s, "C7");
    const r8 = rateOf(s.mech, s.rate_cm3s, "C8");
    expectClose(clox!.rate_cm3s, r6, { rel: 1e-9 }, "cycle rate = k6[ClO][O]");
    // of the ClO made by Cl + O3, the fraction that meets O rather than NO
    expectClose(clox!.efficiency, (s.k.C6 * s.n.O) / (s.k.C6 * s.n.O + s.k.C7 * s.n.NO), { rel: 1e-9 }, "efficiency");
    expect(r7).toBeGreaterThan(0);
    // the only termination is Cl + CH4 → HCl (Lary 1997 definition: cycle rate / carrier loss to reservoirs)
    expectClose(clox!.chainLength!, r6 / r8, { rel: 1e-9 }, "chain length");
    expect(clox!.chainCarrier).toBe("ClOx");
  });

  it("makes the family fractions, unassigned included, sum to 1", () => {
    const s = chlorine();
    for (const fminRelative of [0, 1e-4, 1e-2]) {
      const r = analyseCycles(s.mech, s, { heldSpecies: ["O", "O3"], fminRelative });
      expectClose(
        r.budget.byFamily.reduce((a, f) => a + f.fraction, 0),
        1,
        { abs: 1e-12 },
        `Σ fractions at f_min ${fminRelative}`,
      );
      expectClose(
        r.budget.byFamily.reduce((a, f) => a + f.oxLoss_cm3s, 0),
        r.budget.loss_cm3s,
        { rel: 1e-12 },
        "Σ family losses = total",
      );
    }
  });

  it("closes the Ox budget: production − loss equals the reaction tendency of Ox at any f_min", () => {
    const s = chlorine();
    for (const fminRelative of [0, 1e-4, 1e-2, 0.2]) {
      const r = analyseCycles(s.mech, s, { heldSpecies: ["O", "O3"], fminRelative });
      const scale = r.budget.loss_cm3s;
      expectClose(r.budget.production_cm3s - r.budget.loss_cm3s, r.budget.netChange_cm3s, { abs: 1e-9 * scale });
    }
  });

  it("reports the tendency of a species held for the solve", () => {
    const s = chlorine();
    const r = analyseCycles(s.mech, s, { heldSpecies: ["O", "O3"] });
    const o3 = r.heldTendencies.find((h) => h.species === "O3")!;
    const rate = (id: string) => rateOf(s.mech, s.rate_cm3s, id);
    expectClose(o3.tendency_cm3s, rate("K2") - rate("J3") - rate("K4") - rate("C5"), { rel: 1e-12 });
  });

  it("attributes to each reaction the Ox loss of the cycles it takes part in", () => {
    const s = chlorine();
    const r = analyseCycles(s.mech, s, { heldSpecies: ["O", "O3"], fminRelative: 0 });
    const c6 = r.perReaction.find((x) => x.reactionId === "C6")!;
    const clox = r.cycles.find((c) => c.family === "ClOx")!;
    expectClose(c6.oxDestroyed_cm3s, clox.oxLoss_cm3s, { rel: 1e-12 }, "C6 takes part only in the ClOx cycle");
    const j1 = r.perReaction.find((x) => x.reactionId === "J1")!;
    expect(j1.oxDestroyed_cm3s).toBe(0);
    expectClose(j1.netOxChange_cm3s, 2 * rateOf(s.mech, s.rate_cm3s, "J1"), { rel: 1e-12 });
  });

  it("counts ClO as odd oxygen under the extended definition", () => {
    const s = chlorine();
    const r = analyseCycles(s.mech, s, { heldSpecies: ["O", "O3"], oxDefinition: "extended", fminRelative: 0 });
    expect(r.budget.definition).toContain("ClO");
    // Cl + O3 → ClO + O2 no longer changes Ox; ClO + O → Cl + O2 destroys two
    const c5 = r.perReaction.find((x) => x.reactionId === "C5")!;
    expect(c5.netOxChange_cm3s).toBe(0);
    const clox = r.cycles.find((c) => c.family === "ClOx")!;
    expect(clox.netEquation).toBe("O + O3 -> 2 O2");
  });

  it("returns the same budget from oxBudget as from analyseCycles", () => {
    const s = chlorine();
    expect(oxBudget(s.mech, s, { heldSpecies: ["O", "O3"] })).toEqual(
      analyseCycles(s.mech, s, { heldSpecies: ["O", "O3"] }).budget,
    );
  });

  it("writes the direct formula from the rate-limiting steps only", () => {
    const s = chlorine();
    const d = directOxLoss(s.mech, s);
    const ids = d.terms.map((t) => t.reactionId).sort();
    // Cl + O3, ClO + NO, the HCl reactions and O3 photolysis weigh 0 with the extended weights
    expect(ids).toEqual(["C6", "K4"]);
    expectClose(d.loss_cm3s, 2 * rateOf(s.mech, s.rate_cm3s, "K4") + 2 * rateOf(s.mech, s.rate_cm3s, "C6"), {
      rel: 1e-12,
    });
  });

  it("counts an Ox-destroying step that takes back Ox created upstream only once (carried balance, hand-solved)", () => {
    // Half of the OH comes from X (no Ox history), half from HO2 + NO, which created an Ox (NO2) that OH + O then
    // takes back: OH + O counts with weight 1 − 1/2, HO2 + NO with 0 (its HO2 owes nothing). L_direct = 2·½ = 1.
    const mech = handMechanism(
      "carried balance (test, invented)",
      {
        X: "held",
        Y: "held",
        Z: "held",
        O2: "held",
        HO2: "solved",
        OH: "solved",
        H: "solved",
        NO: "solved",
        NO2: "solved",
        O: "solved",
      },
      {
        R1: "X -> HO2",
        R2: "X -> OH",
        R3: "HO2 + NO -> OH + NO2",
        R4: "OH + O -> H + O2",
        R5: "H + Y -> Z",
        R6: "NO2 + hv -> NO + O",
        R7: "O2 + hv -> 2 O",
      },
    );
    const state = { numberDensity_cm3: mech.species.map(() => 1), rate_cm3s: [1, 1, 1, 2, 2, 1, 0.5] };
    const d = directOxLoss(mech, state);
    expectClose(d.loss_cm3s, 1, { rel: 1e-12 }, "direct");
    expect(d.terms.map((t) => [t.reactionId, t.weight])).toEqual([["R4", 0.5]]);
    // the pathways agree: X -> HO2 -> OH -> H is Ox-neutral once NO2 + hv is joined, X -> OH -> H destroys one O
    const r = analyseCycles(mech, state);
    expectClose(r.budget.loss_cm3s, 1, { rel: 1e-12 }, "pathway loss");
    expect(Math.abs(r.budget.directMismatch ?? Number.NaN)).toBeLessThan(1e-12);
  });

  it("shares an event's carried balance among its hydrogen-containing products, so a cancellation counts once (hand-solved)", () => {
    // O + H2O -> 2 OH destroys one Ox; each OH owes half of it. Both OH then create an Ox (OH + NO -> NO2 + H):
    // one gives back the Ox destroyed, the other is production, so L_direct = 1 − 2·½ = 0 (copying the whole
    // balance to each OH would give 1 − 2 = −1).
    const mech = handMechanism(
      "shared balance (test, invented)",
      {
        H2O: "held",
        Y: "held",
        Z: "held",
        O2: "held",
        OH: "solved",
        H: "solved",
        NO: "solved",
        NO2: "solved",
        O: "solved",
      },
      {
        R1: "O + H2O -> 2 OH",
        R2: "OH + NO -> NO2 + H",
        R3: "H + Y -> Z",
        R4: "NO2 + hv -> NO + O",
      },
    );
    const state = { numberDensity_cm3: mech.species.map(() => 1), rate_cm3s: [1, 2, 2, 2] };
    const d = directOxLoss(mech, state);
    expectClose(d.loss_cm3s, 0, { abs: 1e-12 }, "direct");
    const weights = Object.fromEntries(d.terms.map((t) => [t.reactionId, t.weight]));
    expectClose(weights.R2, -0.5, { rel: 1e-12 }, "OH + NO weight");
  });

  it("throws if an option is invalid or the mechanism has no odd oxygen", () => {
    const s = chlorine();
    expect(() => analyseCycles(s.mech, s, { fminRelative: -1 })).toThrow(InputError);
    expect(() => analyseCycles(s.mech, s, { fminRelative: 2 })).toThrow(/fminRelative/);
    expect(() => analyseCycles(s.mech, s, { oxDefinition: "odd" as "standard" })).toThrow(/oxDefinition/);
    const noOx = { ...s.mech, species: s.mech.species.map((sp) => ({ ...sp, id: `${sp.id}x` })) };
    expect(() => analyseCycles(noOx, s)).toThrow(/odd-oxygen/);
  });

  it("takes the default for an option given as undefined (as a form or route may pass it)", () => {
    const s = chlorine();
    const r = analyseCycles(s.mech, s, { heldSpecies: ["O", "O3"], fminRelative: undefined, oxDefinition: undefined });
    expect(r.oxDefinition).toBe("standard");
    // f_min scale: the gross extended-Ox destruction, which equals L_direct in a set without HOx
    expectClose(r.fmin_cm3s, 1e-4 * r.budget.directLoss_cm3s, { rel: 1e-12 }, "default fminRelative 1e-4");
  });

  it("warns about held species that are not in the mechanism instead of failing", () => {
    const s = chlorine();
    const r = analyseCycles(s.mech, s, { heldSpecies: ["O3", "Xe"] });
    expect(r.warnings.some((w) => w.includes("Xe"))).toBe(true);
  });
});
