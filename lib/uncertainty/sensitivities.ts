/**
 * Normalised sensitivity coefficients S_ip = ∂ln(output_i)/∂ln(k_p) of the
 * key outputs of one analysis (defineOutputs) with respect to every rate
 * constant and every photolysis channel.
 *
 * Method. The state part is exact: ∂ln x/∂ln k from the steady-state
 * Jacobian by the implicit-function theorem (lib/solver
 * steadyStateSensitivities, adjoint solves). The rates follow from mass
 * action, ∂ln r_m/∂ln k_p = δ_mp + Σ_l ν_lm ∂ln x_l/∂ln k_p, which gives the
 * tangent of the whole state (x, r) for each parameter. The cycle outputs
 * (total Ox loss, family shares, cycle rates and chain lengths) are
 * functions of (x, r) through the pathway analysis (Lehmann 2004) with the
 * pathway structure frozen at the central solution; their derivative along
 * each tangent is the directional difference quotient of the analysis alone
 * (no steady state is solved again), with a step of 1e-6 in ln k (forward)
 * or 1e-4 (central). A perturbation under which the set of pathways, cycles
 * or branching points changes is reported (coefficient null, warning):
 * there the frozen-structure derivative does not exist. Definitions:
 * docs/uncertainty.md.
 *
 * A photolysis channel's coefficient is the sum over the reactions that use
 * it (k ∝ J for each). Units: dimensionless.
 */
import { analyseCycles } from "../analysis/analyseCycles";
import type { CycleOptions, CycleReport } from "../analysis/types";
import { InputError } from "../errors";
import { ownValue } from "../idRecord";
import type { CompiledMechanism } from "../mechanism/types";
import { steadyStateSensitivities } from "../solver";
import type { SolveConditions, SteadyState } from "../solver/types";
import { defineOutputs, type OutputOptions } from "./defineOutputs";
import { evaluateOutputs } from "./evaluateOutputs";
import type { OutputDef, SensitivityParameter, SensitivityReport } from "./types";

export const SENSITIVITY_DEFAULTS = {
  /** differentiate the cycle outputs: "forward" (one analysis per parameter), "central" (two) or "none"; default "forward" */
  cycleDifference: "forward" as "forward" | "central" | "none",
  /** step in ln k of the forward quotient */
  forwardStep: 1e-6,
  /** step in ln k of the central quotient */
  centralStep: 1e-4,
};

export interface SensitivityOptions extends OutputOptions {
  /** how the cycle-structure outputs are differentiated; default "forward" */
  cycleDifference?: "forward" | "central" | "none";
  /** step in ln k for that quotient; default 1e-6 (forward) or 1e-4 (central) */
  step?: number;
}

/** Reaction parameters by mechanism index, then one per photolysis channel. */
export function sensitivityParameters(mech: CompiledMechanism): SensitivityParameter[] {
  const params: SensitivityParameter[] = mech.reactions.map((r, j) => ({
    id: r.id,
    kind: "reaction",
    label: r.equation,
    reactions: [j],
  }));
  const channels = new Map<string, number[]>();
  mech.reactions.forEach((r, j) => {
    if (r.rate.law !== "photolysis") return;
    const list = channels.get(r.rate.channel) ?? [];
    list.push(j);
    channels.set(r.rate.channel, list);
  });
  for (const [channel, reactions] of [...channels].sort((a, b) => a[0].localeCompare(b[0])))
    params.push({
      id: `J:${channel}`,
      kind: "photolysis-channel",
      label: `J(${channel}): ${reactions.map((j) => mech.reactions[j].id).join(", ")}`,
      reactions,
    });
  return params;
}

const CYCLE_KINDS = new Set<OutputDef["kind"]>(["ox-loss", "family-share", "cycle-rate", "chain-length"]);

/** Same pathway structure: cycles, branching order and pathway count. */
function sameStructure(a: CycleReport, b: CycleReport): boolean {
  if (a.pathwayCount !== b.pathwayCount || a.cycles.length !== b.cycles.length) return false;
  if (a.branchingPoints.join("|") !== b.branchingPoints.join("|")) return false;
  const ids = new Set(a.cycles.map((c) => c.id));
  return b.cycles.every((c) => ids.has(c.id));
}

export function sensitivities(
  mech: CompiledMechanism,
  cond: SolveConditions,
  state: SteadyState,
  report: CycleReport,
  cycleOptions: CycleOptions = {},
  options: SensitivityOptions = {},
): SensitivityReport {
  const t0 = performance.now();
  const method = options.cycleDifference ?? SENSITIVITY_DEFAULTS.cycleDifference;
  if (method !== "forward" && method !== "central" && method !== "none")
    throw new InputError(
      "options.cycleDifference",
      `invalid cycleDifference: ${String(method)} (forward | central | none)`,
    );
  const h =
    options.step ?? (method === "central" ? SENSITIVITY_DEFAULTS.centralStep : SENSITIVITY_DEFAULTS.forwardStep);
  if (!(h > 0 && h <= 0.1)) throw new InputError("options.step", `invalid step: ${h} (give 0 < step ≤ 0.1 in ln k)`);
  const outputs = defineOutputs(mech, state, report, options);
  const parameters = sensitivityParameters(mech);
  const central = evaluateOutputs(outputs, state, report);
  const nr = mech.reactions.length;
  const empty = (status: SensitivityReport["status"], message: string): SensitivityReport => ({
    status,
    message,
    outputs,
    parameters,
    central,
    coefficients: outputs.map(() => parameters.map(() => null)),
    cycleMethod: "none",
    warnings: [],
    elapsed_ms: performance.now() - t0,
  });
  if (state.status !== "converged")
    return empty("not-converged", `no sensitivities: the steady state did not converge (${state.message})`);

  const solvedIds = state.species.filter((s) => s.role === "solved").map((s) => s.id);
  const ss = steadyStateSensitivities(mech, cond, state, solvedIds);
  if (ss.status !== "ok") return empty(ss.status === "singular" ? "singular" : "not-converged", ss.message);
  // dlnx[s] = row of ∂ln x_s/∂ln k_j by reaction (zeros for held species)
  const dlnx: (number[] | null)[] = mech.species.map(() => null);
  solvedIds.forEach((id, o) => {
    dlnx[ownValue(mech.speciesIndex, id) ?? -1] = ss.coefficients[o];
  });

  const warnings: string[] = [];
  const byReaction: (number | null)[][] = outputs.map(() => new Array<number | null>(nr).fill(0));
  const x0 = state.numberDensity_cm3;
  const r0 = state.rate_cm3s;
  const lnY0 = central.map((v) => (v !== null && v > 0 ? Math.log(v) : null));
  const structural = outputs.map((o) => CYCLE_KINDS.has(o.kind));
  const analyse = (x: number[], r: number[]) =>
    analyseCycles(mech, { numberDensity_cm3: x, rate_cm3s: r }, cycleOptions);
  const shifted = (j: number, e: number) => {
    const x = x0.map((v, s) => (dlnx[s] ? v * Math.exp(e * (dlnx[s] as number[])[j]) : v));
    const r = r0.map((v, m) => {
      let d = m === j ? 1 : 0;
      const reaction = mech.reactions[m];
      for (const t of reaction.reactants) {
        // a surface reaction is first order in its gas; the dependence through γ is left out here
        if (reaction.firstOrderIn !== undefined && t.species !== reaction.firstOrderIn) continue;
        const row = dlnx[t.species];
        if (row) d += t.coef * row[j];
      }
      return v * Math.exp(e * d);
    });
    return analyse(x, r);
  };

  for (let j = 0; j < nr; j++) {
    const active = r0[j] > 0;
    outputs.forEach((o, i) => {
      if (o.kind === "number-density")
        byReaction[i][j] =
          lnY0[i] === null ? null : (dlnx[ownValue(mech.speciesIndex, o.species ?? "") ?? -1]?.[j] ?? 0);
      else if (lnY0[i] === null) byReaction[i][j] = null;
      else if (!active || method === "none") byReaction[i][j] = active ? null : 0;
    });
    if (!active || method === "none" || !structural.some(Boolean)) continue;
    const plus = shifted(j, h);
    const minus = method === "central" ? shifted(j, -h) : null;
    if (!sameStructure(report, plus) || (minus && !sameStructure(report, minus))) {
      warnings.push(
        `${mech.reactions[j].id}: the pathway structure changes under a perturbation of ${h} in ln k; its cycle-output coefficients are not defined (null)`,
      );
      outputs.forEach((_o, i) => {
        if (structural[i]) byReaction[i][j] = null;
      });
      continue;
    }
    const yPlus = evaluateOutputs(outputs, state, plus);
    const yMinus = minus ? evaluateOutputs(outputs, state, minus) : null;
    outputs.forEach((_o, i) => {
      if (!structural[i] || lnY0[i] === null) return;
      const p = yPlus[i];
      const m = yMinus ? yMinus[i] : central[i];
      byReaction[i][j] =
        p !== null && p > 0 && m !== null && m > 0 ? (Math.log(p) - Math.log(m)) / (yMinus ? 2 * h : h) : null;
    });
  }

  const coefficients = byReaction.map((row) =>
    parameters.map((p) => {
      let s = 0;
      for (const j of p.reactions) {
        const v = row[j];
        if (v === null) return null;
        s += v;
      }
      return s;
    }),
  );
  if (state.species.some((s) => s.id === "O3" && s.role === "held"))
    warnings.push(
      "O3 is held at the climatology, so [O3] is an input here, not an output (solve O3 to see its sensitivity)",
    );
  return {
    status: "ok",
    message: "ok",
    outputs,
    parameters,
    central,
    coefficients,
    cycleMethod:
      method === "none" ? "none" : method === "central" ? "analysis-derivative-central" : "analysis-derivative-forward",
    warnings,
    elapsed_ms: performance.now() - t0,
  };
}
