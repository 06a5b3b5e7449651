import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { MechanismError } from "../../lib/errors";
import { loadMechanism } from "../../lib/mechanism";
import { expectClose } from "../helpers/close";

const fixture = (f: string) => fs.readFileSync(path.join(process.cwd(), "test", "fixtures", "mechanisms", f), "utf8");

function problems(text: string, options?: Parameters<typeof loadMechanism>[1]) {
  try {
    loadMechanism(text, options);
  } catch (e) {
    if (e instanceof MechanismError) return e.problems;
    throw e;
  }
  throw new Error("expected the document to be rejected");
}

const minimal = fixture("chapman-minimal.yaml");

describe("loadMechanism", () => {
  it("compiles species, reactions and rate laws from YAML", () => {
    const { mechanism: m } = loadMechanism(minimal);
    expect(m.title).toBe("Chapman minimal");
    expect(m.species.map((s) => s.id)).toEqual(["O2", "M", "O", "O3"]);
    expect(m.speciesIndex.O3).toBe(3);
    const r2 = m.reactions[1];
    expect(r2.thirdBody).toBe(true);
    expect(r2.reactants).toEqual([
      { species: 2, coef: 1 },
      { species: 0, coef: 1 },
    ]);
    expect(r2.rate).toEqual({ law: "termolecular", k0_300: 6e-34, n: 2.4 });
    expect(m.reactions[3].rate).toEqual({ law: "arrhenius", A: 8e-12, EoverR_K: 2060 });
    expect(m.reactions[0].photolysis).toBe(true);
    expect(m.photolysisChannels).toEqual(["O2", "O3_O"]);
  });

  it("compiles an uptake reaction with the molar mass of its gas from the atoms (IUPAC atomic weights)", () => {
    const text = minimal
      .replace(
        "  - { id: O3, role: solved }",
        "  - { id: O3, role: solved }\n  - { id: N2O5, role: solved }\n  - { id: HNO3, role: held, mixingRatio: 1e-9 }",
      )
      .concat(
        "  - id: H1\n    equation: N2O5 -> 2 HNO3\n    rate: { law: uptake, gamma: 0.1 }\n    unbalanced: water from the aerosol\n    source: test\n",
      );
    const { mechanism: m } = loadMechanism(text);
    const r = m.reactions.find((x) => x.id === "H1")!;
    expect(r.rate.law).toBe("uptake");
    // 2 × 14.007 + 5 × 15.999 = 108.009 g/mol
    expectClose((r.rate as { molarMass_gmol: number }).molarMass_gmol, 108.009, { rel: 1e-9 });
  });

  it("rejects an uptake reaction with three reactants or a γ above 1, naming the entry", () => {
    const base = minimal.replace(
      "  - { id: O3, role: solved }",
      "  - { id: O3, role: solved }\n  - { id: N2O5, role: solved }\n  - { id: HNO3, role: held, mixingRatio: 1e-9 }",
    );
    const two = problems(
      `${base}  - id: H1\n    equation: N2O5 + O + O3 -> 2 HNO3\n    rate: { law: uptake, gamma: 0.1 }\n    unbalanced: test\n`,
    );
    expect(two.some((p) => p.code === "uptake" && /at most one gas-phase partner/.test(p.message))).toBe(true);
    const big = problems(
      `${base}  - id: H1\n    equation: N2O5 -> 2 HNO3\n    rate: { law: uptake, gamma: 1.5 }\n    unbalanced: test\n`,
    );
    expect(big.some((p) => /uptake probability in \(0, 1\]/.test(p.message))).toBe(true);
  });

  it("gives the same canonical text for the YAML and the JSON form of a document", () => {
    const y = loadMechanism(minimal);
    const j = loadMechanism(fixture("chapman-minimal.json"));
    expect(j.canonical).toBe(y.canonical);
    expect(j.mechanism.reactions).toEqual(y.mechanism.reactions);
    // canonical JSON sorts keys
    expect(y.canonical.startsWith('{"description":')).toBe(true);
    expect(loadMechanism(minimal, { format: "yaml" }).canonical).toBe(y.canonical);
  });

  it("detects JSON by its opening brace and honours an explicit format", () => {
    expect(() => loadMechanism(minimal, { format: "json" })).toThrow(/malformed JSON/);
  });

  it("accepts the JPL spellings k∞ and f(298) for kinf and f298", () => {
    const text = minimal
      .replace("k0: 6.0e-34, n: 2.4", "k0: 6.0e-34, n: 2.4, k∞: 3.0e-11, m: 0")
      .replace("f298: 1.15", "f(298): 1.15");
    const { mechanism } = loadMechanism(text);
    expect(mechanism.reactions[1].rate).toMatchObject({ kinf_300: 3e-11, m: 0 });
    expect(mechanism.reactions[3].uncertainty).toEqual({ f298: 1.15, g: 200 });
  });

  it("reports every problem at once, in document order, each with path, line and column", () => {
    const text = minimal
      .replace("{ id: O, role: solved }", "{ id: O, role: solvd }")
      .replace("A: 8.0e-12", "A: fast")
      .replace("O2 + hv -> 2 O", "O2 + hv -> 2 O + Q");
    const ps = problems(text);
    expect(ps.map((p) => p.path)).toEqual(["species[2].role", "reactions[0].equation", "reactions[3].rate.A"]);
    for (const p of ps) {
      expect(p.severity).toBe("error");
      expect(p.line).toBeGreaterThan(0);
      expect(p.column).toBeGreaterThan(0);
    }
    // "A: fast" is on the line of reaction R4's rate
    const line = minimal.split("\n").findIndex((l) => l.includes("A: 8.0e-12")) + 1;
    expect(ps[2]).toMatchObject({ line, message: 'expected a positive number, found string "fast"' });
  });

  it("does not report a species dropped for an error again where equations use it", () => {
    const ps = problems(minimal.replace("{ id: O, role: solved }", "{ id: O, role: solvd }"));
    expect(ps).toHaveLength(1);
  });

  it("throws MechanismError whose message is the first problem, formatted", () => {
    expect(() => loadMechanism(minimal.replace("n: 2.4", "n: two"))).toThrow(
      /^reactions\[1\]\.rate\.n: expected a number, found string "two" \(line \d+, column \d+\)$/,
    );
  });

  it("gives the parser's line and column for malformed YAML", () => {
    const [p] = problems("title: x\nspecies:\n  - { id: O, role: solved\nreactions: []\n");
    expect(p.code).toBe("yaml-syntax");
    expect(p.line).toBeGreaterThanOrEqual(3);
  });

  it("rejects duplicate mapping keys in YAML", () => {
    const [p] = problems(minimal.replace("title: Chapman minimal", "title: Chapman minimal\ntitle: again"));
    expect(p).toMatchObject({ code: "yaml-syntax", line: 4 });
  });

  it("rejects text beyond the size limit before parsing it", () => {
    const [p] = problems(`${minimal}\n# ${"x".repeat(2000)}`, { limits: { maxTextBytes: 1500 } });
    expect(p.code).toBe("too-large");
    expect(p.message).toMatch(/beyond the limit of 1500 bytes/);
  });

  it("rejects more species or reactions than the limits allow, with a clear error", () => {
    expect(problems(minimal, { limits: { maxSpecies: 3 } })[0]).toMatchObject({
      code: "too-large",
      path: "species",
      message: "4 species exceed the limit of 3",
    });
    expect(problems(minimal, { limits: { maxReactions: 2 } })[0].message).toBe("4 reactions exceed the limit of 2");
  });

  it("accepts at least 2,000 species and 10,000 reactions by default", () => {
    const lines = ["title: big", 'version: "1"', "species:", "  - { id: M, role: third-body }"];
    for (let i = 0; i < 2000; i++) lines.push(`  - { id: X${i}, role: solved, atoms: { C: 1 } }`);
    lines.push("reactions:");
    for (let j = 0; j < 10000; j++) {
      const a = j % 2000;
      const b = (j * 7 + 1) % 2000;
      lines.push(
        `  - { id: R${j}, equation: X${a} -> X${b}, rate: { law: arrhenius, A: 1.0e-3 }, uncertainty: { f298: 2 }, source: invented }`,
      );
    }
    const { mechanism } = loadMechanism(lines.join("\n"));
    expect(mechanism.species).toHaveLength(2001);
    expect(mechanism.reactions).toHaveLength(10000);
  });

  it("warns about a parameter that suggests a unit mistake (a bimolecular A outside 1e-20–1e-8)", () => {
    const { warnings } = loadMechanism(minimal.replace("A: 8.0e-12", "A: 4.8e+3"));
    expect(warnings).toHaveLength(1);
    expect(warnings[0]).toMatchObject({ severity: "warning", code: "unit-suspect", path: "reactions[3].rate.A" });
    expect(warnings[0].message).toMatch(/a bimolecular A = 4800 is outside 1e-20–1e-8 cm³ molecule⁻¹ s⁻¹/);
  });

  it("warns about a solved species that is never lost or never produced", () => {
    const noLoss = minimal
      .replace("O + O3 -> 2 O2", "O + O2 -> O3")
      .replace("O3 + hv -> O + O2", "O2 + O2 + hv -> O3 + O");
    const w = loadMechanism(noLoss).warnings.find((x) => x.code === "never-lost");
    expect(w?.message).toBe('solved species "O3" is produced but never lost; it has no steady state');
    expect(w?.path).toBe("species[3]");
  });

  it("accepts a knowingly unbalanced reaction only with its reason, and keeps the reason", () => {
    const text = minimal.replace("O + O3 -> 2 O2", "O + O3 -> O2");
    expect(problems(text)[0].code).toBe("unbalanced");
    const marked = text.replace(
      "    uncertainty: { f298: 1.15, g: 200 }\n",
      "    uncertainty: { f298: 1.15, g: 200 }\n    unbalanced: invented lumped example\n",
    );
    const r = loadMechanism(marked).mechanism.reactions[3];
    expect(r.unbalanced).toBe("invented lumped example");
  });

  it("resolves a reverse rate's forward reaction by id", () => {
    const text = `${minimal}  - id: R5
    equation: O3 + M -> O + O2 + M
    rate: { law: equilibrium-reverse, forward: R2, K: { A: 1.0e-28, B: 12000 } }
    uncertainty: { f298: 2, g: 500 }
    source: invented for this test
`;
    const r = loadMechanism(text).mechanism.reactions[4];
    expect(r.rate).toEqual({
      law: "equilibrium-reverse",
      forward: { law: "termolecular", k0_300: 6e-34, n: 2.4 },
      Keq_A_cm3: 1e-28,
      Keq_B_K: 12000,
    });
  });

  it("requires M to be declared as the third body", () => {
    const text = minimal.replace("  - { id: M, role: third-body }\n", "");
    expect(problems(text)[0].message).toBe('unknown species "M"; declare it with role "third-body"');
  });

  it("throws if the document is not a mapping", () => {
    expect(problems("- just\n- a list\n")[0].message).toMatch(/a mechanism document is a mapping/);
    expect(() => loadMechanism(42 as unknown as string)).toThrow(MechanismError);
  });

  it("never evaluates text as code: an expression in a parameter is an error", () => {
    const ps = problems(minimal.replace("A: 8.0e-12", 'A: "8.0e-12 * 1"'));
    expect(ps[0].message).toBe('expected a positive number, found string "8.0e-12 * 1"');
  });
});
