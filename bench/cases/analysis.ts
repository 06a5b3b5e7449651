/**
 * Cycle-analysis benchmarks: the reference mechanism level by level (10, 15,
 * 20, 30, 40, 50 km, engine defaults, O3 held), at 40 and 20 km at several
 * f_min, the 51-level 10–60 km profile, and generated mechanisms of growing
 * size so that the growth of the cost with the pathway count is visible.
 * Steady states are solved once, outside the timed part (when the case file is
 * loaded); the notes give the pathway count, the deleted ("unassigned") share
 * of the Ox loss and the direct-formula mismatch of each level.
 */
import { analyseCycles, findPathways } from "../../lib/analysis";
import { runAnalysis } from "../../lib/engine/runAnalysis";
import { loadBuiltinMechanism } from "../../lib/mechanism";
import type { CompiledMechanism, Species } from "../../lib/mechanism/types";
import type { SteadyState } from "../../lib/solver/types";
import type { BenchCase } from "../types";

const mech = loadBuiltinMechanism("reference").mechanism;
const solved = new Map<number, { state: SteadyState; held: string[] }>();
function stateAt(z: number) {
  let s = solved.get(z);
  if (!s) {
    const res = runAnalysis(
      mech,
      { id: "reference", title: mech.title },
      { mechanismId: "reference", condition: { altitude_km: z } },
    );
    s = { state: res.steadyState, held: Object.keys(res.condition.held_cm3) };
    solved.set(z, s);
  }
  return s;
}
const profile = Array.from({ length: 51 }, (_, i) => 10 + i);
const levels = [10, 15, 20, 30, 40, 50];

function analyseAt(z: number, fminRelative?: number) {
  const s = stateAt(z);
  return analyseCycles(mech, s.state, { heldSpecies: s.held, fminRelative });
}

/** Pathway count, deleted share and direct-formula mismatch, for the note. */
function summary(z: number, fminRelative?: number): string {
  const r = analyseAt(z, fminRelative);
  const b = r.budget;
  const deleted = b.loss_cm3s > 0 ? b.unassignedLoss_cm3s / b.loss_cm3s : 0;
  return `${r.pathwayCount} pathways, deleted ${(100 * deleted).toFixed(1)} % of the Ox loss, direct mismatch ${b.directMismatch === null ? "(no direct loss)" : `${(100 * b.directMismatch).toFixed(1)} %`}`;
}
for (const z of profile) stateAt(z);

/**
 * An invented mechanism of n radicals X0…X(n−1) on a ring with odd oxygen:
 * Xi + O3 → Yi + O2, Yi + O → Xi + O2, Yi + Y(i+1) → X(i) + X(i+1) + O2 and a
 * slow exchange Xi → X(i+1), with rates from a fixed pseudo-random sequence.
 * Only the pathway count matters here, the numbers are invented.
 */
function generated(n: number): {
  mech: CompiledMechanism;
  state: Pick<SteadyState, "numberDensity_cm3" | "rate_cm3s">;
} {
  const species: Species[] = [
    { id: "O", label: "O", role: "held", atoms: { O: 1 } },
    { id: "O3", label: "O3", role: "held", atoms: { O: 3 } },
    { id: "O2", label: "O2", role: "held", atoms: { O: 2 } },
  ];
  for (let i = 0; i < n; i++) {
    species.push({ id: `X${i}`, label: `X${i}`, role: "solved", atoms: { Cl: 1 } });
    species.push({ id: `Y${i}`, label: `Y${i}`, role: "solved", atoms: { Cl: 1, O: 1 } });
  }
  const idx = Object.fromEntries(species.map((s, i) => [s.id, i]));
  const reactions: CompiledMechanism["reactions"] = [];
  const rates: number[] = [];
  let seed = 12345;
  const rnd = () => {
    seed = (seed * 1103515245 + 12345) % 2147483648;
    return seed / 2147483648;
  };
  const add = (id: string, re: [string, number][], pr: [string, number][], rate: number) => {
    reactions.push({
      index: reactions.length,
      id,
      equation: id,
      reactants: re.map(([s, c]) => ({ species: idx[s], coef: c })),
      products: pr.map(([s, c]) => ({ species: idx[s], coef: c })),
      thirdBody: false,
      photolysis: false,
      rate: { law: "photolysis-fixed", J_s: 0 },
    });
    rates.push(rate);
  };
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    const a = 1e6 * (1 + rnd());
    const b = 0.3 * a * rnd();
    const c = 0.2 * a * rnd();
    add(
      `A${i}`,
      [
        [`X${i}`, 1],
        ["O3", 1],
      ],
      [
        [`Y${i}`, 1],
        ["O2", 1],
      ],
      a + b + c,
    );
    add(
      `B${i}`,
      [
        [`Y${i}`, 1],
        ["O", 1],
      ],
      [
        [`X${i}`, 1],
        ["O2", 1],
      ],
      a,
    );
    add(
      `C${i}`,
      [
        [`Y${i}`, 1],
        [`Y${j}`, 1],
      ],
      [
        [`X${i}`, 1],
        [`X${j}`, 1],
        ["O2", 1],
      ],
      b,
    );
    add(`D${i}`, [[`Y${i}`, 1]], [[`Y${j}`, 1]], c);
  }
  const numberDensity_cm3 = species.map(() => 1e7);
  return {
    mech: {
      title: `generated ring of ${n} (invented)`,
      version: "bench",
      description: "invented benchmark mechanism",
      species,
      speciesIndex: idx,
      reactions,
      pools: [],
      conservation: [],
      photolysisChannels: [],
      warnings: [],
    },
    state: { numberDensity_cm3, rate_cm3s: rates },
  };
}

const big = [8, 16, 32].map((n) => ({ n, ...generated(n) }));

export const cases: BenchCase[] = [
  ...levels.map((z) => ({
    name: `analysis: reference ${z} km, engine defaults`,
    run: () => analyseAt(z),
    note: summary(z),
  })),
  ...[1e-3, 1e-4, 1e-5].map((f) => ({
    name: `analysis: reference 40 km, fminRelative ${f}`,
    run: () => analyseAt(40, f),
    note: summary(40, f),
  })),
  ...[1e-3, 1e-4, 1e-5].map((f) => ({
    name: `analysis: reference 20 km, fminRelative ${f}`,
    run: () => analyseAt(20, f),
    note: summary(20, f),
  })),
  {
    name: "analysis: reference 10 km, fminRelative 1e-5",
    iterations: 5,
    run: () => analyseAt(10, 1e-5),
    note: summary(10, 1e-5),
  },
  {
    name: "analysis: reference 51-level profile 10–60 km, fminRelative 1e-4",
    note: `${profile.reduce((n, z) => n + analyseAt(z).pathwayCount, 0)} pathways over the 51 levels`,
    iterations: 3,
    run: () =>
      profile.map((z) => {
        const s = stateAt(z);
        return analyseCycles(mech, s.state, { heldSpecies: s.held }).pathwayCount;
      }),
  },
  ...big.map(({ n, mech: m, state }) => ({
    name: `analysis: generated ring of ${n} radicals (${m.reactions.length} reactions), f_min 1e-4 of the fastest rate`,
    run: () =>
      findPathways(m, state, {
        notBranching: ["O", "O3", "O2"],
        fmin_cm3s: 1e-4 * Math.max(...state.rate_cm3s),
      }).pathways.length,
  })),
];
