/**
 * What the equation of a surface reaction must look like: the gas taken up
 * first, then at most one gas-phase partner (e.g. "ClONO2 + HCl -> Cl2 +
 * HNO3"), no third body, coefficients 1. The liquid-aerosol law also fixes
 * the gases by its process and reads H2O, HCl and ClONO2, which the
 * mechanism must have (docs/mechanism-format.md, "Surface reactions").
 */
import type { LIQUID_AEROSOL_PROCESSES } from "./readDocument";
import type { RateEntry, Species, Term } from "./types";

type SurfaceEntry = Extract<RateEntry, { law: "uptake" } | { law: "liquid-aerosol" }>;

/** The reactants each liquid-aerosol process takes, gas first. */
const PROCESS_REACTANTS: Record<(typeof LIQUID_AEROSOL_PROCESSES)[number], string[]> = {
  "ClONO2+H2O": ["ClONO2"],
  "ClONO2+HCl": ["ClONO2", "HCl"],
  "HOCl+HCl": ["HOCl", "HCl"],
};

/** Species the liquid-aerosol γ reads. */
const LIQUID_AEROSOL_READS = ["H2O", "HCl", "ClONO2"];

/** A message naming the problem, or undefined when the equation fits the law. */
export function surfaceEquationProblem(
  rate: SurfaceEntry,
  reactants: Term[],
  hasM: boolean,
  species: Species[],
  speciesIndex: Readonly<Record<string, number>>,
): string | undefined {
  const written = reactants.map((t) => species[t.species].id);
  if (hasM || reactants.length < 1 || reactants.length > 2 || reactants.some((t) => t.coef !== 1)) {
    return `a surface reaction has the gas taken up and at most one gas-phase partner as reactants, without M (e.g. "N2O5 -> 2 HNO3", marked unbalanced: water from the aerosol; or "ClONO2 + HCl -> Cl2 + HNO3"), found ${reactants.length} reactant${reactants.length === 1 ? "" : "s"}${written.length ? ` (${written.join(" + ")})` : ""}`;
  }
  if (rate.law === "uptake") return undefined;
  const expected = PROCESS_REACTANTS[rate.process];
  if (written.length !== expected.length || written.some((id, i) => id !== expected[i])) {
    return `the liquid-aerosol process ${rate.process} takes ${expected.join(" + ")} as its reactants (the gas taken up first), found ${written.join(" + ")}`;
  }
  const missing = LIQUID_AEROSOL_READS.filter((id) => !(id in speciesIndex));
  if (missing.length > 0) {
    return `the liquid-aerosol law reads the amounts of ${LIQUID_AEROSOL_READS.join(", ")}; this mechanism has no ${missing.join(", ")}`;
  }
  return undefined;
}
