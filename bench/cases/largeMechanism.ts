/**
 * The steady state of large mechanisms: generated networks of 500 to 2,000
 * solved species at 4 reactions per species (the size and sparsity of the
 * loader benchmark's documents), solved cold with the sparse LU and, up to
 * 500 species, with the dense LU, to show where the sparse step pays. Also
 * the reference mechanism, to show the small case is no slower.
 *
 * The network is invented and open, so that it has one steady state: held
 * precursors P and R feed the isomers S0… and the hub radicals H0…H19 by
 * photolysis; each isomer turns into a near successor (alone, by light,
 * catalysed by a hub, or with P and M, which gives Q) or is lost to the held
 * product Q, and each hub is lost to the held product Z. Every reaction is
 * balanced. (The loader benchmark's network moves hubs into one another at
 * rates set by the isomer flow, so it has no steady state.)
 */
import { resolveCondition, solveConditionsOf } from "../../lib/engine/resolve-condition";
import { loadBuiltinMechanism, loadMechanism } from "../../lib/mechanism";
import type { CompiledMechanism } from "../../lib/mechanism/types";
import { solveSteadyState } from "../../lib/solver";
import type { SolveConditions } from "../../lib/solver/types";
import type { BenchCase } from "../types";

const HUBS = 20;

/** A JSON mechanism document of `nSolved` solved species (20 hubs, the rest isomers) and `nReactions` reactions. */
export function openNetwork(nSolved: number, nReactions: number): string {
  const chain = nSolved - HUBS;
  const species: object[] = [
    { id: "M", role: "third-body" },
    { id: "P", role: "held", atoms: { C: 1 }, mixingRatio: 1e-6 },
    { id: "Q", role: "held", atoms: { C: 1 }, mixingRatio: 1e-9 },
    { id: "R", role: "held", atoms: { N: 1 }, mixingRatio: 1e-8 },
    { id: "Z", role: "held", atoms: { N: 1 }, mixingRatio: 1e-10 },
  ];
  for (let h = 0; h < HUBS; h++) species.push({ id: `H${h}`, role: "solved", atoms: { N: 1 } });
  for (let i = 0; i < chain; i++) species.push({ id: `S${i}`, role: "solved", atoms: { C: 1 } });
  const next = (i: number, j: number) => `S${(i + 1 + (Math.floor(j / chain) % 8)) % chain}`;
  const uncertainty = { f298: 1.5, g: 100 };
  const reactions: object[] = [];
  const add = (equation: string, rate: object) =>
    reactions.push({ id: `G${reactions.length}`, equation, rate, uncertainty, source: "invented" });
  for (let j = 0; j < nReactions; j++) {
    const i = j % chain;
    const hub = Math.floor(j / 4) % HUBS;
    if (j < 8 * HUBS && j % 4 === 2) add(`R + hv -> H${hub}`, { law: "photolysis", channel: "NO2", factor: 0.01 });
    else if (j < 8 * HUBS && j % 4 === 1) add(`H${hub} -> Z`, { law: "arrhenius", A: 1e-3, "E/R": 0 });
    else if (j % 4 === 0) add(`S${i} + H${hub} -> ${next(i, j)} + H${hub}`, { law: "arrhenius", A: 1e-10, "E/R": 300 });
    else if (j % 4 === 1)
      add(Math.floor(j / chain) % 2 === 0 ? `S${i} -> ${next(i, j)}` : `S${i} -> Q`, {
        law: "arrhenius",
        A: 1e-3,
        "E/R": 0,
      });
    else if (j % 40 === 2) add(`P + hv -> S${i}`, { law: "photolysis", channel: "NO2", factor: 0.01 });
    else if (j % 4 === 2) add(`S${i} + hv -> ${next(i, j)}`, { law: "photolysis", channel: "NO2", factor: 0.01 });
    else
      add(`S${i} + P + M -> ${next(i, j)} + Q + M`, {
        law: "termolecular",
        k0: 1e-31,
        n: 3,
        kinf: 1e-11,
        m: 1,
      });
  }
  return JSON.stringify({ title: "generated open network", version: "1", description: "invented", species, reactions });
}

function conditionsOf(mech: CompiledMechanism): SolveConditions {
  return solveConditionsOf(resolveCondition(mech, { altitude_km: 30, zenith_deg: 30 }));
}

export async function setup(): Promise<BenchCase[]> {
  const cases: BenchCase[] = [];
  const reference = loadBuiltinMechanism("reference").mechanism;
  const refCond = conditionsOf(reference);
  cases.push({
    name: "large: reference steady state (30 km, SZA 30°), dense step",
    run: () => solveSteadyState(reference, refCond),
  });
  cases.push({
    name: "large: reference steady state (30 km, SZA 30°), sparse step",
    run: () => solveSteadyState(reference, refCond, { sparseFromUnknowns: 1 }),
  });
  for (const n of [60, 120, 250, 500, 1000, 2000]) {
    const mech = loadMechanism(openNetwork(n, 4 * n)).mechanism;
    const cond = conditionsOf(mech);
    const s = solveSteadyState(mech, cond);
    const note = `${s.status}, ${s.iterations} iterations (${s.coldStartSteps} pseudo-time)`;
    cases.push({
      name: `large: ${n} solved species / ${4 * n} reactions, sparse step`,
      run: () => solveSteadyState(mech, cond, { sparseFromUnknowns: 1 }),
      iterations: n >= 1000 ? 3 : undefined,
      note,
    });
    if (n <= 500)
      cases.push({
        name: `large: ${n} solved species / ${4 * n} reactions, dense step`,
        run: () => solveSteadyState(mech, cond, { sparseFromUnknowns: Number.MAX_SAFE_INTEGER }),
        iterations: n >= 250 ? 3 : undefined,
        note,
      });
  }
  return cases;
}
