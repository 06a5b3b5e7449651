/**
 * The key outputs of an analysis whose sensitivity and spread are reported:
 * the total odd-oxygen loss rate, each family's share of it, the rate and
 * chain length of each major catalytic cycle, and the steady-state number
 * densities of the main radicals (and of O3 when it is solved). Chosen once
 * at the central solution, so every perturbed or sampled solution is read
 * against the same list.
 *
 * Units: rates molecules cm⁻³ s⁻¹, number densities molecules cm⁻³.
 */
import type { CycleReport } from "../analysis/types";
import { InputError } from "../errors";
import { hasId } from "../idRecord";
import type { CompiledMechanism } from "../mechanism/types";
import type { SteadyState } from "../solver/types";
import type { OutputDef } from "./types";

export const OUTPUT_DEFAULTS = {
  /** a cycle is major when its share of the Ox loss is at least this, 0–1; default 0.01 */
  majorCycleShare: 0.01,
  /** at most this many cycles, largest first; default 12 */
  maxCycles: 12,
  /** display groups whose solved members are "main radicals" */
  radicalGroups: ["Ox", "HOx", "NOx", "ClOx", "BrOx"] as readonly string[],
};

export interface OutputOptions {
  /** share of the Ox loss above which a cycle is reported, 0–1; default 0.01 */
  majorCycleShare?: number;
  /** most cycles reported; default 12 */
  maxCycles?: number;
  /** species ids whose number densities are outputs; default the solved members of the Ox, HOx, NOx, ClOx and BrOx groups */
  species?: string[];
}

export function defineOutputs(
  mech: CompiledMechanism,
  state: Pick<SteadyState, "species">,
  report: CycleReport,
  options: OutputOptions = {},
): OutputDef[] {
  const share = options.majorCycleShare ?? OUTPUT_DEFAULTS.majorCycleShare;
  const maxCycles = options.maxCycles ?? OUTPUT_DEFAULTS.maxCycles;
  if (!(share >= 0 && share <= 1))
    throw new InputError("options.majorCycleShare", `invalid majorCycleShare: ${share} (give 0–1, e.g. 0.01)`);
  if (!(Number.isInteger(maxCycles) && maxCycles >= 0))
    throw new InputError("options.maxCycles", `invalid maxCycles: ${maxCycles} (give an integer ≥ 0)`);
  const out: OutputDef[] = [{ key: "oxLoss", kind: "ox-loss", label: "total Ox loss rate", unit: "cm⁻³ s⁻¹" }];
  for (const f of report.budget.byFamily) {
    if (f.family === "unassigned") continue;
    out.push({
      key: `share:${f.family}`,
      kind: "family-share",
      label: `${f.family} share of Ox loss`,
      unit: "1",
      family: f.family,
    });
  }
  const cycles = report.cycles
    .filter((c) => c.share >= share)
    .sort((a, b) => b.share - a.share)
    .slice(0, maxCycles);
  for (const c of cycles) {
    out.push({
      key: `cycle:${c.id}:rate`,
      kind: "cycle-rate",
      label: `rate of ${c.netEquation} (${c.family}: ${c.steps.map((s) => s.reactionId).join(", ")})`,
      unit: "cm⁻³ s⁻¹",
      cycleId: c.id,
    });
    if (c.chainLength !== null)
      out.push({
        key: `cycle:${c.id}:chainLength`,
        kind: "chain-length",
        label: `chain length of the ${c.family} cycle (${c.steps.map((s) => s.reactionId).join(", ")})`,
        unit: "1",
        cycleId: c.id,
      });
  }
  const solved = new Set(state.species.filter((s) => s.role === "solved").map((s) => s.id));
  const ids =
    options.species ??
    mech.species
      .filter((sp) => sp.group !== undefined && OUTPUT_DEFAULTS.radicalGroups.includes(sp.group))
      .map((sp) => sp.id);
  for (const id of ids) {
    if (!hasId(mech.speciesIndex, id))
      throw new InputError("options.species", `unknown species ${id} in mechanism "${mech.title}"`);
    if (!solved.has(id)) continue; // a held species (O3 by default) is an input, not an output
    out.push({ key: `density:${id}`, kind: "number-density", label: `[${id}]`, unit: "cm⁻³", species: id });
  }
  return out;
}
