/**
 * TEST FIXTURE — an invented, hand-made analysis of a small oxygen–chlorine
 * set, shaped like the route's output. The numbers are round values of
 * plausible size chosen for these tests; they are not computed and are not
 * data about the atmosphere.
 */
import type { AnalysisResult } from "@/lib/engine/types";
import type { MechanismView } from "@/lib/viz/types";

export const fixtureMechanism: MechanismView = {
  id: "fixture",
  title: "Invented test set (oxygen + chlorine)",
  description: "Test fixture, invented.",
  builtin: false,
  species: [
    { id: "O", label: "O", role: "solved", group: "Ox", atoms: { O: 1 } },
    { id: "O(1D)", label: "O(1D)", role: "solved", group: "Ox", atoms: { O: 1 } },
    { id: "O3", label: "O3", role: "solved", group: "Ox", atoms: { O: 3 } },
    { id: "Cl", label: "Cl", role: "solved", atoms: { Cl: 1 } },
    { id: "ClO", label: "ClO", role: "solved", atoms: { Cl: 1, O: 1 } },
    { id: "Cl2O2", label: "Cl2O2", role: "solved", atoms: { Cl: 2, O: 2 } },
    { id: "HCl", label: "HCl", role: "solved", atoms: { H: 1, Cl: 1 } },
    { id: "CH3", label: "CH3", role: "solved", atoms: { C: 1, H: 3 }, group: "organic" },
    { id: "O2", label: "O2", role: "held", atoms: { O: 2 } },
    { id: "N2", label: "N2", role: "held", atoms: { N: 2 } },
    { id: "CH4", label: "CH4", role: "held", group: "source", atoms: { C: 1, H: 4 } },
    { id: "M", label: "M", role: "third-body", atoms: {} },
  ],
  reactions: [
    { id: "J1", equation: "O2 + hv -> 2 O", rate: { law: "photolysis", channel: "O2" } },
    { id: "K1", equation: "O + O2 + M -> O3 + M", rate: { law: "termolecular", k0_300: 6e-34, n: 2.4 } },
    { id: "J2", equation: "O3 + hv -> O + O2", rate: { law: "photolysis", channel: "O3_O" } },
    { id: "J3", equation: "O3 + hv -> O(1D) + O2", rate: { law: "photolysis", channel: "O3_O1D" } },
    { id: "K2", equation: "O(1D) + N2 -> O + N2", rate: { law: "arrhenius", A: 2.15e-11, EoverR_K: -110 } },
    { id: "K3", equation: "O + O3 -> 2 O2", rate: { law: "arrhenius", A: 8e-12, EoverR_K: 2060 }, source: "invented" },
    { id: "C1", equation: "Cl + O3 -> ClO + O2", rate: { law: "arrhenius", A: 2.3e-11, EoverR_K: 200 } },
    { id: "C2", equation: "ClO + O -> Cl + O2", rate: { law: "arrhenius", A: 2.8e-11, EoverR_K: -85 } },
    { id: "C3", equation: "2 ClO + M -> Cl2O2 + M", rate: { law: "termolecular", k0_300: 1.9e-32, n: 3.6 } },
    { id: "C4", equation: "Cl2O2 + hv -> 2 Cl + O2", rate: { law: "photolysis", channel: "Cl2O2" } },
    { id: "C5", equation: "Cl + CH4 -> HCl + CH3", rate: { law: "arrhenius", A: 7.1e-12, EoverR_K: 1270 } },
  ],
  pools: [{ id: "Cly", label: "Cl atoms", expression: "Cl + ClO + 2 Cl2O2 + HCl" }],
};

const rate: Record<string, number> = {
  J1: 2.0e5,
  K1: 3.0e7,
  J2: 2.4e7,
  J3: 5.0e6,
  K2: 5.0e6,
  K3: 6.0e5,
  C1: 9.0e5,
  C2: 8.0e5,
  C3: 5.0e4,
  C4: 5.0e4,
  C5: 2.0e3,
};
const density: Record<string, number> = {
  O: 3.0e7,
  "O(1D)": 50,
  O3: 3.0e12,
  Cl: 1.0e4,
  ClO: 3.0e7,
  Cl2O2: 1.0e5,
  HCl: 5.0e9,
  CH3: 1.0,
  O2: 8.0e16,
  N2: 3.0e17,
  CH4: 5.0e11,
};

export const fixtureResult: AnalysisResult = {
  engineVersion: "fixture-1",
  mechanism: { id: "fixture", title: fixtureMechanism.title },
  condition: {
    altitude_km: 40,
    T_K: 250,
    p_hPa: 2.9,
    M_cm3: 8.4e16,
    latitude_deg: 45,
    date: "2026-03-20",
    dayOfYear: 79,
    localSolarTime_h: 12,
    zenith_deg: 45,
    mode: "instantaneous",
    ozone: "held",
    o3ColumnAbove_DU: 25,
    J_s: { O2: 1e-9 },
    held_cm3: { O2: 8.0e16, N2: 3.0e17, CH4: 5.0e11 },
    poolTotals_cm3: { Cly: 5.1e9 },
  },
  options: { fminRelative: 1e-4, oxDefinition: "standard" },
  steadyState: {
    status: "converged",
    message: "",
    iterations: 7,
    residualNorm: 1e-12,
    T_K: 250,
    M_cm3: 8.4e16,
    species: Object.entries(density).map(([id, n]) => ({
      id,
      role: ["O2", "N2", "CH4"].includes(id) ? "held" : "solved",
      numberDensity_cm3: n,
      mixingRatio: n / 8.4e16,
      production_cm3s: 1e5,
      loss_cm3s: 1e5,
      lifetime_s: n / 1e5,
    })),
    reactions: fixtureMechanism.reactions.map((r) => ({
      id: r.id,
      equation: r.equation,
      k: 1e-12,
      rate_cm3s: rate[r.id],
    })),
    pools: [],
    numberDensity_cm3: [],
    rate_cm3s: [],
  },
  cycles: {
    cycles: [
      {
        id: "C1+C2",
        netEquation: "O + O3 -> 2 O2",
        steps: [
          { reactionId: "C1", equation: "Cl + O3 -> ClO + O2", multiplicity: 1, rate_cm3s: 9.0e5 },
          { reactionId: "C2", equation: "ClO + O -> Cl + O2", multiplicity: 1, rate_cm3s: 8.0e5 },
        ],
        rate_cm3s: 8.0e5,
        oxPerTurnover: 2,
        oxLoss_cm3s: 1.6e6,
        family: "ClOx",
        catalysts: ["Cl", "ClO"],
        share: 0.55,
        efficiency: 0.89,
        rateLimitingStep: "C2",
        chainLength: 400,
      },
      {
        id: "K3",
        netEquation: "O + O3 -> 2 O2",
        steps: [{ reactionId: "K3", equation: "O + O3 -> 2 O2", multiplicity: 1, rate_cm3s: 6.0e5 }],
        rate_cm3s: 6.0e5,
        oxPerTurnover: 2,
        oxLoss_cm3s: 1.2e6,
        family: "Ox",
        catalysts: [],
        share: 0.41,
        efficiency: 1,
        rateLimitingStep: "K3",
        chainLength: null,
      },
      {
        id: "2C1+C3+C4",
        netEquation: "2 O3 -> 3 O2",
        steps: [
          { reactionId: "C1", equation: "Cl + O3 -> ClO + O2", multiplicity: 2, rate_cm3s: 9.0e5 },
          { reactionId: "C3", equation: "2 ClO + M -> Cl2O2 + M", multiplicity: 1, rate_cm3s: 5.0e4 },
          { reactionId: "C4", equation: "Cl2O2 + hv -> 2 Cl + O2", multiplicity: 1, rate_cm3s: 5.0e4 },
        ],
        rate_cm3s: 5.0e4,
        oxPerTurnover: 2,
        oxLoss_cm3s: 1.0e5,
        family: "ClOx",
        catalysts: ["Cl", "ClO"],
        share: 0.034,
        efficiency: 0.05,
        rateLimitingStep: "C3",
        chainLength: 25,
      },
    ],
    budget: {
      definition: ["O", "O(1D)", "O3"],
      production_cm3s: 4.0e5,
      loss_cm3s: 2.92e6,
      byFamily: [
        { family: "ClOx", oxLoss_cm3s: 1.7e6, fraction: 0.582 },
        { family: "Ox", oxLoss_cm3s: 1.2e6, fraction: 0.411 },
      ],
      directLoss_cm3s: 2.9e6,
      unassignedLoss_cm3s: 2.0e4,
    },
    perReaction: [
      { reactionId: "J1", oxDestroyed_cm3s: 0, netOxChange_cm3s: 4.0e5 },
      { reactionId: "K1", oxDestroyed_cm3s: 0, netOxChange_cm3s: 0 },
      { reactionId: "J2", oxDestroyed_cm3s: 0, netOxChange_cm3s: 0 },
      { reactionId: "J3", oxDestroyed_cm3s: 0, netOxChange_cm3s: 0 },
      { reactionId: "K2", oxDestroyed_cm3s: 0, netOxChange_cm3s: 0 },
      { reactionId: "K3", oxDestroyed_cm3s: 1.2e6, netOxChange_cm3s: -1.2e6 },
      { reactionId: "C1", oxDestroyed_cm3s: 1.7e6, netOxChange_cm3s: -9.0e5 },
      { reactionId: "C2", oxDestroyed_cm3s: 1.6e6, netOxChange_cm3s: -8.0e5 },
      { reactionId: "C3", oxDestroyed_cm3s: 1.0e5, netOxChange_cm3s: 0 },
      { reactionId: "C4", oxDestroyed_cm3s: 1.0e5, netOxChange_cm3s: 0 },
      { reactionId: "C5", oxDestroyed_cm3s: 0, netOxChange_cm3s: 0 },
    ],
    pathwayCount: 3,
    fmin_cm3s: 292,
    warnings: [],
  },
  elapsed_ms: 12,
};

/** The same analysis with every reaction rate multiplied by `factor` (a "different altitude"). */
export function scaledResult(factor: number): AnalysisResult {
  return {
    ...fixtureResult,
    condition: { ...fixtureResult.condition, altitude_km: 25 },
    steadyState: {
      ...fixtureResult.steadyState,
      reactions: fixtureResult.steadyState.reactions.map((r, i) => ({
        ...r,
        rate_cm3s: r.rate_cm3s * factor ** (i % 3),
      })),
    },
  };
}
