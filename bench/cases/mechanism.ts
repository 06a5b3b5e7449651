/**
 * Mechanism loading: parse, validate and compile (element balance,
 * stoichiometry, conservation search) of the reference stratosphere and of
 * generated mechanisms of 2,000 species with 2,000 to 8,000 reactions (and of
 * 500 and 1,000 species at 4 reactions per species), to show how the cost grows
 * with the number of reactions. YAML parsing (the `yaml` package) dominates.
 *
 * The generated documents are invented: species S0…S1979 are isomers (one C
 * atom each) and H0…H19 are hub radicals. Like a large oxidation mechanism,
 * each reaction joins species close in a chain with, at times, one of the
 * hubs; every reaction is balanced.
 */
import fs from "node:fs";
import path from "node:path";
import { builtinMechanismDir, loadMechanism } from "../../lib/mechanism";
import type { BenchCase } from "../types";

const HUBS = 20;

/** Deterministic pseudo-random integers (a linear congruential generator). */
function lcg(seed: number): (n: number) => number {
  let s = seed >>> 0;
  return (n) => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s % n;
  };
}

export function generatedMechanism(nSpecies: number, nReactions: number, format: "yaml" | "json"): string {
  const rand = lcg(12345);
  const chain = nSpecies - HUBS;
  const species: { id: string; role: string; atoms?: Record<string, number> }[] = [{ id: "M", role: "third-body" }];
  for (let h = 0; h < HUBS; h++) species.push({ id: `H${h}`, role: "solved", atoms: { C: 1 } });
  for (let i = 0; i < chain; i++) species.push({ id: `S${i}`, role: "solved", atoms: { C: 1 } });
  // every species is lost (as reactant i = j mod chain) and produced (by its predecessor) once nReactions ≥ nSpecies
  const next = (i: number, j: number) => `S${(i + 1 + (Math.floor(j / chain) % 8)) % chain}`;
  const near = (i: number) => `S${(i + 1 + rand(8)) % chain}`;
  const reactions: {
    id: string;
    equation: string;
    rate: Record<string, unknown>;
    uncertainty?: object;
    source: string;
  }[] = [];
  for (let j = 0; j < nReactions; j++) {
    const i = j % chain;
    const h = `H${Math.floor(j / 4) % HUBS}`;
    const h2 = `H${(Math.floor(j / 4) + 1 + rand(3)) % HUBS}`;
    const id = `G${j}`;
    const source = "invented";
    const uncertainty = { f298: 1.5, g: 100 };
    switch (j % 4) {
      case 0:
        reactions.push({
          id,
          equation: `S${i} + ${h} -> ${next(i, j)} + ${h2}`,
          rate: { law: "arrhenius", A: 1e-12, "E/R": 300 },
          uncertainty,
          source,
        });
        break;
      case 1:
        reactions.push({
          id,
          equation: `S${i} -> ${next(i, j)}`,
          rate: { law: "arrhenius", A: 1e-3, "E/R": 0 },
          uncertainty,
          source,
        });
        break;
      case 2:
        reactions.push({
          id,
          equation: `S${i} + hv -> ${next(i, j)}`,
          rate: { law: "photolysis", channel: "NO2", factor: 0.01 },
          source,
        });
        break;
      default:
        reactions.push({
          id,
          equation: `S${i} + ${near(i)} + M -> ${next(i, j)} + ${near(i)} + M`,
          rate: { law: "termolecular", k0: 1e-31, n: 3, kinf: 1e-11, m: 1 },
          uncertainty,
          source,
        });
    }
  }
  const doc = { title: "generated", version: "1", description: "invented benchmark network", species, reactions };
  if (format === "json") return JSON.stringify(doc);
  const lines = ["title: generated", 'version: "1"', "description: invented benchmark network", "species:"];
  for (const s of species) {
    lines.push(`  - { id: ${s.id}, role: ${s.role}${s.atoms ? ", atoms: { C: 1 }" : ""} }`);
  }
  lines.push("reactions:");
  for (const r of reactions) {
    const rate = Object.entries(r.rate)
      .map(([k, v]) => `${k}: ${v}`)
      .join(", ");
    const u = r.uncertainty ? ", uncertainty: { f298: 1.5, g: 100 }" : "";
    lines.push(`  - { id: ${r.id}, equation: "${r.equation}", rate: { ${rate} }${u}, source: invented }`);
  }
  return `${lines.join("\n")}\n`;
}

const reference = fs.readFileSync(path.join(builtinMechanismDir(), "reference.yaml"), "utf8");
const referenceJson = JSON.stringify(JSON.parse(loadMechanism(reference).canonical));

const generated = (nS: number, nR: number, format: "yaml" | "json"): BenchCase => {
  const text = generatedMechanism(nS, nR, format);
  return {
    name: `load generated ${nS.toLocaleString("en")} species / ${nR.toLocaleString("en")} reactions (${format.toUpperCase()}, ${(text.length / 1e6).toFixed(2)} MB)`,
    run: () => loadMechanism(text),
    iterations: format === "yaml" ? 5 : 10,
    note: "compare medians across a series: cost ∝ reactions",
  };
};

export const cases: BenchCase[] = [
  { name: "load reference mechanism (YAML)", run: () => loadMechanism(reference) },
  { name: "load reference mechanism (JSON form)", run: () => loadMechanism(referenceJson) },
  generated(2000, 2000, "yaml"),
  generated(2000, 4000, "yaml"),
  generated(2000, 8000, "yaml"),
  generated(2000, 2000, "json"),
  generated(2000, 4000, "json"),
  generated(2000, 8000, "json"),
  generated(500, 2000, "json"),
  generated(1000, 4000, "json"),
];
