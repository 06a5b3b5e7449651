/**
 * An invented stand-in for the engine in the pure tests: a function of the
 * condition that returns an AnalysisResult-shaped object with made-up but
 * smoothly varying numbers (ClOx share rising with altitude and with Cly,
 * one ClOx cycle that is absent below 20 km). Not chemistry: it only lets the
 * generator, key and marking be tested without the science core.
 */
import type { CatalyticCycle } from "@/lib/analysis/types";
import { ANALYSIS_DEFAULTS } from "@/lib/engine/runAnalysis";
import type { AnalysisRequest, AnalysisResult } from "@/lib/engine/types";

export const CLOX_CYCLE = "R3+R4";
export const NOX_CYCLE = "R5+R6";

const STEPS: Record<string, [string, string]> = {
  R1: ["O2 + hv -> 2 O", "O2"],
  R2: ["O + O3 -> 2 O2", "O"],
  R3: ["Cl + O3 -> ClO + O2", "Cl"],
  R4: ["ClO + O -> Cl + O2", "ClO"],
  R5: ["NO + O3 -> NO2 + O2", "NO"],
  R6: ["NO2 + O -> NO + O2", "NO2"],
};

export function fakeResult(req: AnalysisRequest): AnalysisResult {
  const c = req.condition;
  const z = c.altitude_km;
  const M = 2.5e19 * Math.exp(-z / 7);
  const cly = c.poolTotals?.Cly ?? 3e-9;
  const clox = Math.min(0.9, (cly / 3e-9) * 0.05 * Math.max(0, z - 15) * 0.3);
  const nox = 0.55 - 0.004 * z;
  const ox = Math.max(0.05, 1 - clox - nox);
  const total = clox + nox + ox;
  const loss = 1e6 * (1 + z);
  const rates = { R1: 1e5, R2: loss * 0.2, R3: loss * 0.5 * (1 + z / 100), R4: loss * 0.4, R5: loss, R6: loss * 0.6 };
  const cycle = (id: string, family: string, a: string, b: string, share: number): CatalyticCycle => ({
    id,
    netEquation: "O + O3 -> 2 O2",
    steps: [a, b].map((r) => ({
      reactionId: r,
      equation: STEPS[r][0],
      multiplicity: 1,
      rate_cm3s: rates[r as keyof typeof rates],
    })),
    rate_cm3s: (loss * share) / 2,
    oxPerTurnover: 2,
    oxLoss_cm3s: loss * share,
    family,
    catalysts: [STEPS[a][1]],
    share,
    efficiency: 0.9,
    rateLimitingStep: rates[a as keyof typeof rates] < rates[b as keyof typeof rates] ? a : b,
    chainLength: family === "ClOx" ? 100 + 10 * z : 1000 / (1 + z / 10),
    chainLengthRateLimiting: family === "ClOx" ? 110 + 10 * z : 1100 / (1 + z / 10),
    entryStep: a,
    chainCarrier: family,
    net: { O: -1, O3: -1, O2: 2 },
  });
  const cycles = [cycle(NOX_CYCLE, "NOx", "R5", "R6", nox / total)];
  if (z >= 20) cycles.push(cycle(CLOX_CYCLE, "ClOx", "R3", "R4", clox / total));
  const species = [
    { id: "O", n: 1e7 * (1 + z) },
    { id: "O3", n: 3e12 },
    { id: "Cl", n: 1e4 * z * (cly / 3e-9) },
    { id: "ClO", n: 1e7 * z * (cly / 3e-9) },
  ];
  return {
    engineVersion: "fake",
    mechanism: { id: req.mechanismId, title: "Invented test mechanism" },
    condition: {
      altitude_km: z,
      T_K: c.T_K ?? 220 + z,
      p_hPa: 1013 * Math.exp(-z / 7),
      M_cm3: M,
      latitude_deg: c.latitude_deg ?? 45,
      date: c.date ?? "2026-03-20",
      dayOfYear: 79,
      localSolarTime_h: c.localSolarTime_h ?? 12,
      zenith_deg: 45,
      mode: c.mode ?? "instantaneous",
      ozone: "held",
      o3ColumnAbove_DU: 200,
      aerosolSurface_um2cm3: 0,
      J_s: {},
      held_cm3: {},
      poolTotals_cm3: { Cly: cly * M },
    },
    options: { ...ANALYSIS_DEFAULTS },
    steadyState: {
      status: "converged",
      message: "",
      iterations: 5,
      residualNorm: 1e-12,
      T_K: 220,
      M_cm3: M,
      species: species.map((s) => ({
        id: s.id,
        role: "solved",
        numberDensity_cm3: s.n,
        mixingRatio: s.n / M,
        production_cm3s: 1,
        loss_cm3s: 1,
        lifetime_s: 1,
      })),
      reactions: Object.entries(STEPS).map(([id, [equation]]) => ({
        id,
        equation,
        k: 1,
        rate_cm3s: rates[id as keyof typeof rates],
      })),
      pools: [],
      numberDensity_cm3: species.map((s) => s.n),
      rate_cm3s: Object.values(rates),
    },
    cycles: {
      cycles,
      budget: {
        definition: ["O", "O(1D)", "O3"],
        production_cm3s: loss,
        loss_cm3s: loss,
        byFamily: [
          { family: "Ox", oxLoss_cm3s: (loss * ox) / total, fraction: ox / total },
          { family: "NOx", oxLoss_cm3s: (loss * nox) / total, fraction: nox / total },
          { family: "ClOx", oxLoss_cm3s: (loss * clox) / total, fraction: clox / total },
        ],
        directLoss_cm3s: loss,
        unassignedLoss_cm3s: 0,
        unassignedProduction_cm3s: 0,
        weights: { O: 1, "O(1D)": 1, O3: 1 },
        netChange_cm3s: 0,
        directTerms: [],
        directMismatch: 0,
      },
      perReaction: [],
      pathwayCount: cycles.length,
      fmin_cm3s: 1e-4 * loss,
      warnings: [],
      otherLossPathways: [],
      branchingPoints: [],
      carrierFamilies: [],
      nullCycleRate_cm3s: 0,
      oxDefinition: "standard",
      heldTendencies: [],
    },
    elapsed_ms: 1,
  };
}

export const fakeAnalyse = async (req: AnalysisRequest) => fakeResult(req);
