/**
 * The surface laws in documents (docs/mechanism-format.md, "Surface
 * reactions"): uptake on sulfate, NAT or ice with an optional gas-phase
 * partner, and the liquid-aerosol γ of Shi et al. (2001); the loader's
 * messages for bad parameters, with their lines; element balance of the
 * reference mechanism's surface reactions.
 */
import { describe, expect, it } from "vitest";
import { MechanismError } from "@/lib/errors";
import { loadBuiltinMechanism, loadMechanism } from "@/lib/mechanism";
import { expectClose } from "../helpers/close";

const HEAD = `title: surface test
version: "1"
description: surface laws
species:
  - { id: H2O, role: held, mixingRatio: 5e-6 }
  - { id: HNO3, role: held, mixingRatio: 1e-9 }
  - { id: Cl2, role: solved }
  - { id: HCl, role: solved }
  - { id: HOCl, role: solved }
  - { id: ClONO2, role: solved }
reactions:
`;
const doc = (rate: string, equation = "ClONO2 + HCl -> Cl2 + HNO3", extra = "") =>
  `${HEAD}  - id: S1\n    equation: ${equation}\n    rate: ${rate}\n    uncertainty: { f298: 2, g: 0 }\n    source: test\n${extra}`;

function problems(text: string) {
  try {
    const loaded = loadMechanism(text);
    return loaded.warnings;
  } catch (e) {
    if (e instanceof MechanismError) return e.problems;
    throw e;
  }
}

describe("surface laws in a document", () => {
  it("compiles ClONO2 + HCl on NAT as first order in ClONO2 with HCl as the partner (molar masses from IUPAC atomic weights)", () => {
    const m = loadMechanism(doc("{ law: uptake, gamma: 0.2, surface: nat }")).mechanism;
    const r = m.reactions[0];
    expect(r.firstOrderIn).toBe(m.speciesIndex.ClONO2);
    expect(r.rate).toMatchObject({ law: "uptake", gamma: 0.2, surface: "nat", partner: { species: "HCl" } });
    // Cl 35.45 + N 14.007 + 3 O 15.999 = 97.454 g/mol
    expectClose((r.rate as { molarMass_gmol: number }).molarMass_gmol, 97.454, { rel: 1e-4 });
  });

  it("compiles the liquid-aerosol law with its process and radius", () => {
    const m = loadMechanism(doc("{ law: liquid-aerosol, process: ClONO2+HCl, radius_um: 0.2 }")).mechanism;
    expect(m.reactions[0].rate).toMatchObject({ law: "liquid-aerosol", process: "ClONO2+HCl", radius_cm: 2e-5 });
  });

  it("rejects a missing process, naming the field and the line", () => {
    const p = problems(doc("{ law: liquid-aerosol }"));
    const e = p.find((x) => x.severity === "error" && /process/.test(x.message));
    expect(e?.path).toBe("reactions[0].rate.process");
    expect(e?.line).toBe(14);
  });

  it("rejects an unknown parameter, an unknown surface and an unknown process", () => {
    expect(problems(doc("{ law: uptake, gamma: 0.2, sticking: 1 }")).some((x) => x.code === "unknown-parameter")).toBe(
      true,
    );
    expect(
      problems(doc("{ law: uptake, gamma: 0.2, surface: cirrus }")).some((x) =>
        /one of sulfate, nat, ice/.test(x.message),
      ),
    ).toBe(true);
    expect(
      problems(doc("{ law: liquid-aerosol, process: N2O5+H2O }")).some((x) =>
        /ClONO2\+H2O, ClONO2\+HCl, HOCl\+HCl/.test(x.message),
      ),
    ).toBe(true);
  });

  it("rejects reactants that do not fit the process", () => {
    const p = problems(doc("{ law: liquid-aerosol, process: HOCl+HCl }"));
    expect(p.some((x) => x.code === "uptake" && /takes HOCl \+ HCl/.test(x.message))).toBe(true);
  });

  it("warns about an implausibly small γ or a radius outside 0.01–10 µm", () => {
    expect(problems(doc("{ law: uptake, gamma: 1e-9, surface: ice }")).some((x) => x.code === "implausible")).toBe(
      true,
    );
    expect(
      problems(doc("{ law: liquid-aerosol, process: ClONO2+HCl, radius_um: 50 }")).some(
        (x) => x.code === "implausible",
      ),
    ).toBe(true);
  });
});

describe("the reference mechanism's surface reactions", () => {
  const m = loadBuiltinMechanism("reference").mechanism;
  const surface = m.reactions.filter((r) => r.firstOrderIn !== undefined);

  it("has the sulfate, NAT and ice reactions of chlorine activation", () => {
    const ids = surface.map((r) => r.id);
    for (const id of ["HET_ClONO2_HCl_sulfate", "HET_ClONO2_HCl_NAT", "HET_ClONO2_HCl_ice", "HET_HOCl_HCl_ice"])
      expect(ids).toContain(id);
  });

  it("balances every element in each one, or marks it unbalanced for the water of the particle", () => {
    for (const r of surface) {
      const count = (side: typeof r.reactants) => {
        const out: Record<string, number> = {};
        for (const t of side)
          for (const [el, k] of Object.entries(m.species[t.species].atoms)) out[el] = (out[el] ?? 0) + k * t.coef;
        return out;
      };
      const left = count(r.reactants);
      const right = count(r.products);
      const balanced = Object.keys({ ...left, ...right }).every((el) => (left[el] ?? 0) === (right[el] ?? 0));
      if (!balanced) expect(r.unbalanced, r.id).toMatch(/water/);
      else expect(r.unbalanced, r.id).toBeUndefined();
    }
  });
});
