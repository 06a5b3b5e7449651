/**
 * An invented open reaction network of any size, for the benchmark of large
 * mechanisms (bench/cases/largeMechanism.ts) and the sparse-step tests: held
 * precursors P and R feed the isomers S0… and the hub radicals H0…H19 by
 * photolysis; each isomer turns into a near successor (alone, by light,
 * catalysed by a hub, or with P and M, which gives Q) or is lost to the held
 * product Q, and each hub is lost to the held product Z. Every reaction is
 * balanced, and the network has one steady state. (The loader benchmark's
 * network moves hubs into one another at rates set by the isomer flow, so it
 * has none.) Four reactions per species, like the loader benchmark's.
 */

const HUBS = 20;

/**
 * A JSON mechanism document of `nSolved` solved species (20 hubs, the rest
 * isomers; at least 60) and `nReactions` reactions (at least 4 per species, so
 * that every isomer is lost by some reaction). With `ozone`, also the Chapman
 * reactions (O and O3 solved, O2 held) and O + O3 → 2 O2 catalysed by each hub,
 * so that the cycle analysis has odd oxygen to follow (2 + nSolved solved
 * species, nReactions + 24 reactions).
 */
export function openNetwork(nSolved: number, nReactions: number, options: { ozone?: boolean } = {}): string {
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
    // the first 4 × 20 reactions: each hub's source and loss, and 20 isomer sources
    if (j < 4 * HUBS && j % 4 === 1) add(`H${hub} -> Z`, { law: "arrhenius", A: 1e-3, "E/R": 0 });
    else if (j < 4 * HUBS && j % 4 === 2) add(`R + hv -> H${hub}`, { law: "photolysis", channel: "NO2", factor: 0.01 });
    else if (j < 4 * HUBS && j % 4 === 3) add(`P + hv -> S${i}`, { law: "photolysis", channel: "NO2", factor: 0.01 });
    else if (j % 4 === 0) add(`S${i} + H${hub} -> ${next(i, j)} + H${hub}`, { law: "arrhenius", A: 1e-10, "E/R": 300 });
    else if (j % 4 === 1)
      add(Math.floor(j / chain) % 2 === 0 ? `S${i} -> ${next(i, j)}` : `S${i} -> Q`, {
        law: "arrhenius",
        A: 1e-3,
        "E/R": 0,
      });
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
  if (options.ozone) {
    species.push(
      { id: "O2", role: "held", mixingRatio: 0.2095 },
      { id: "O", role: "solved" },
      { id: "O3", role: "solved" },
    );
    add("O2 + hv -> 2 O", { law: "photolysis", channel: "O2" });
    add("O + O2 + M -> O3 + M", { law: "termolecular", k0: 6.1e-34, n: 2.4, kinf: 1e-10, m: 0 });
    add("O3 + hv -> O + O2", { law: "photolysis", channel: "O3_O" });
    add("O + O3 -> 2 O2", { law: "arrhenius", A: 8e-12, "E/R": 2060 });
    for (let h = 0; h < HUBS; h++) add(`H${h} + O + O3 -> H${h} + 2 O2`, { law: "arrhenius", A: 1e-30, "E/R": 0 });
  }
  return JSON.stringify({ title: "generated open network", version: "1", description: "invented", species, reactions });
}
