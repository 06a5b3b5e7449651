/**
 * A level of a sweep from a full analysis result: the budget, the cycles and
 * the species, without the per-reaction detail (open the level as a single
 * analysis for that). A level that did not converge keeps its status and
 * reason, with no budget and no cycles, so no number from a failed solve is
 * shown as a result.
 */
import type { AnalysisRequest, AnalysisResult } from "../engine/types";
import type { SweepLevel } from "./types";

export function summariseLevel(request: AnalysisRequest, result: AnalysisResult, warmStarted: boolean): SweepLevel {
  const ss = result.steadyState;
  const ok = ss.status === "converged";
  const c = result.condition;
  const b = result.cycles.budget;
  return {
    altitude_km: request.condition.altitude_km,
    status: ss.status,
    message: ok ? "" : ss.message || `the steady state did not converge (${ss.status})`,
    request,
    condition: {
      T_K: c.T_K,
      p_hPa: c.p_hPa,
      M_cm3: c.M_cm3,
      zenith_deg: c.zenith_deg,
      o3ColumnAbove_DU: c.o3ColumnAbove_DU,
      aerosolSurface_um2cm3: c.aerosolSurface_um2cm3,
      ...(c.cloud && c.cloud.present !== "none"
        ? {
            cloud: c.cloud.present,
            cloudSurface_um2cm3: c.cloud.present === "NAT" ? c.cloud.natSurface_um2cm3 : c.cloud.iceSurface_um2cm3,
          }
        : {}),
    },
    budget: ok
      ? {
          production_cm3s: b.production_cm3s,
          loss_cm3s: b.loss_cm3s,
          byFamily: b.byFamily.map((f) => ({ family: f.family, oxLoss_cm3s: f.oxLoss_cm3s, fraction: f.fraction })),
          unassignedLoss_cm3s: b.unassignedLoss_cm3s,
        }
      : null,
    cycles: ok
      ? result.cycles.cycles.map((y) => ({
          id: y.id,
          stepsKey: stepsKey(y.steps),
          family: y.family,
          netEquation: y.netEquation,
          rate_cm3s: y.rate_cm3s,
          oxLoss_cm3s: y.oxLoss_cm3s,
          share: y.share,
          rateLimitingStep: y.rateLimitingStep,
          chainLength: y.chainLength,
        }))
      : [],
    species: ss.species.map((s) => ({
      id: s.id,
      role: s.role,
      numberDensity_cm3: s.numberDensity_cm3,
      mixingRatio: s.mixingRatio,
    })),
    iterations: ss.iterations,
    residualNorm: ss.residualNorm,
    warmStarted,
    elapsed_ms: result.elapsed_ms,
  };
}

/** The steps of a cycle as sorted equations with their multiplicities. */
export function stepsKey(steps: readonly { equation: string; multiplicity: number }[]): string {
  return steps
    .map((s) => (s.multiplicity > 1 ? `${s.multiplicity}×(${s.equation})` : s.equation))
    .sort()
    .join(" ; ");
}

/** A level whose condition or solve threw: its reason, nothing else. */
export function failedLevel(request: AnalysisRequest, error: unknown): SweepLevel {
  return {
    altitude_km: request.condition.altitude_km,
    status: "error",
    message: error instanceof Error ? error.message : String(error),
    request,
    condition: null,
    budget: null,
    cycles: [],
    species: [],
    iterations: 0,
    residualNorm: 0,
    warmStarted: false,
    elapsed_ms: 0,
  };
}
