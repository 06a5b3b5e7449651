/**
 * Small hand-built compiled mechanisms for the solver tests, so that the
 * solver can be tested independently of the mechanism loader. Equations are
 * written "2 O + M -> O2 + M", "O3 + hv -> O + O2".
 */
import type { RateLaw } from "../../lib/kinetics/types";
import type {
  CompiledMechanism,
  CompiledReaction,
  ConservedPool,
  Species,
  SpeciesRole,
  Term,
} from "../../lib/mechanism/types";

export interface SpeciesSpec {
  id: string;
  role: SpeciesRole;
  atoms?: Record<string, number>;
}

export interface ReactionSpec {
  id?: string;
  equation: string;
  rate: RateLaw;
}

export interface PoolSpec {
  id: string;
  /** species id → weight */
  weights: Record<string, number>;
}

function side(text: string, index: Record<string, number>, where: string): { terms: Term[]; M: boolean; hv: boolean } {
  const terms: Term[] = [];
  let M = false;
  let hv = false;
  for (const raw of text.split(" + ")) {
    const part = raw.trim();
    if (part === "M") {
      M = true;
      continue;
    }
    if (part === "hv") {
      hv = true;
      continue;
    }
    const m = /^(\d+(?:\.\d+)?)\s+(\S+)$/.exec(part);
    const coef = m ? Number(m[1]) : 1;
    const id = m ? m[2] : part;
    if (!(id in index)) throw new Error(`${where}: unknown species ${id}`);
    const existing = terms.find((t) => t.species === index[id]);
    if (existing) existing.coef += coef;
    else terms.push({ species: index[id], coef });
  }
  return { terms, M, hv };
}

export function makeMechanism(spec: {
  species: SpeciesSpec[];
  reactions: ReactionSpec[];
  pools?: PoolSpec[];
}): CompiledMechanism {
  const species: Species[] = spec.species.map((s) => ({ id: s.id, label: s.id, role: s.role, atoms: s.atoms ?? {} }));
  const speciesIndex: Record<string, number> = {};
  species.forEach((s, i) => {
    speciesIndex[s.id] = i;
  });
  const reactions: CompiledReaction[] = spec.reactions.map((r, index) => {
    const [lhs, rhs] = r.equation.split(" -> ");
    const left = side(lhs, speciesIndex, r.equation);
    const right = side(rhs, speciesIndex, r.equation);
    return {
      index,
      id: r.id ?? `R${index + 1}`,
      equation: r.equation,
      reactants: left.terms,
      products: right.terms,
      thirdBody: left.M,
      photolysis: left.hv,
      rate: r.rate,
    };
  });
  const pools: ConservedPool[] = (spec.pools ?? []).map((p) => ({
    id: p.id,
    label: p.id,
    weights: Object.entries(p.weights).map(([id, w]) => ({ species: speciesIndex[id], coef: w })),
    expression: Object.entries(p.weights)
      .map(([id, w]) => (w === 1 ? id : `${w} ${id}`))
      .join(" + "),
    exact: false,
    externalReactions: [],
  }));
  const channels = new Set<string>();
  for (const r of reactions) if (r.rate.law === "photolysis") channels.add(r.rate.channel);
  return {
    title: "test mechanism (invented for the tests)",
    version: "0",
    description: "",
    species,
    speciesIndex,
    reactions,
    pools,
    conservation: [],
    photolysisChannels: [...channels].sort(),
    warnings: [],
  };
}

/** JPL-style rate laws used below; parameters of JPL 19-5 (from memory; docs/references.md, Kinetics). */
const arr = (A: number, EoverR_K: number): RateLaw => ({ law: "arrhenius", A, EoverR_K });
const J = (channel: string): RateLaw => ({ law: "photolysis", channel });

/** Pure-oxygen (Chapman) mechanism with O(1D) solved; O2 and N2 held. No O(1D) + O3 so the analytic solution holds. */
export function chapmanMechanism(): CompiledMechanism {
  return makeMechanism({
    species: [
      { id: "O", role: "solved", atoms: { O: 1 } },
      { id: "O(1D)", role: "solved", atoms: { O: 1 } },
      { id: "O3", role: "solved", atoms: { O: 3 } },
      { id: "O2", role: "held", atoms: { O: 2 } },
      { id: "N2", role: "held", atoms: { N: 2 } },
      { id: "M", role: "third-body" },
    ],
    reactions: [
      { id: "J1", equation: "O2 + hv -> 2 O", rate: J("O2") },
      { id: "K2", equation: "O + O2 + M -> O3 + M", rate: { law: "termolecular", k0_300: 6.0e-34, n: 2.4 } },
      { id: "J3a", equation: "O3 + hv -> O(1D) + O2", rate: J("O3_O1D") },
      { id: "J3b", equation: "O3 + hv -> O + O2", rate: J("O3_O") },
      { id: "K4", equation: "O + O3 -> 2 O2", rate: arr(8.0e-12, 2060) },
      { id: "Q1", equation: "O(1D) + N2 -> O + N2", rate: arr(2.15e-11, -110) },
      { id: "Q2", equation: "O(1D) + O2 -> O + O2", rate: arr(3.3e-11, -55) },
    ],
  });
}

/** Chapman plus a two-member chlorine pool (Cl, ClO) and a reservoir HCl formed with held CH4 and released by held OH. */
export function chlorineMechanism(): CompiledMechanism {
  return makeMechanism({
    species: [
      { id: "O", role: "solved", atoms: { O: 1 } },
      { id: "O(1D)", role: "solved", atoms: { O: 1 } },
      { id: "O3", role: "solved", atoms: { O: 3 } },
      { id: "Cl", role: "solved", atoms: { Cl: 1 } },
      { id: "ClO", role: "solved", atoms: { Cl: 1, O: 1 } },
      { id: "HCl", role: "solved", atoms: { H: 1, Cl: 1 } },
      { id: "CFCl3", role: "held", atoms: { C: 1, F: 1, Cl: 3 } },
      { id: "CH4", role: "held", atoms: { C: 1, H: 4 } },
      { id: "OH", role: "held", atoms: { O: 1, H: 1 } },
      { id: "O2", role: "held", atoms: { O: 2 } },
      { id: "N2", role: "held", atoms: { N: 2 } },
      { id: "M", role: "third-body" },
    ],
    reactions: [
      { id: "J1", equation: "O2 + hv -> 2 O", rate: J("O2") },
      { id: "K2", equation: "O + O2 + M -> O3 + M", rate: { law: "termolecular", k0_300: 6.0e-34, n: 2.4 } },
      { id: "J3a", equation: "O3 + hv -> O(1D) + O2", rate: J("O3_O1D") },
      { id: "J3b", equation: "O3 + hv -> O + O2", rate: J("O3_O") },
      { id: "K4", equation: "O + O3 -> 2 O2", rate: arr(8.0e-12, 2060) },
      { id: "Q1", equation: "O(1D) + N2 -> O + N2", rate: arr(2.15e-11, -110) },
      { id: "Q2", equation: "O(1D) + O2 -> O + O2", rate: arr(3.3e-11, -55) },
      { id: "C1", equation: "Cl + O3 -> ClO + O2", rate: arr(2.3e-11, 200) },
      { id: "C2", equation: "ClO + O -> Cl + O2", rate: arr(2.8e-11, -85) },
      { id: "C3", equation: "Cl + CH4 -> HCl", rate: arr(7.3e-12, 1280) },
      { id: "C4", equation: "HCl + OH -> Cl", rate: arr(1.8e-12, 250) },
      { id: "S1", equation: "CFCl3 + hv -> 3 Cl", rate: J("CFCl3") },
    ],
    pools: [{ id: "Cly", weights: { Cl: 1, ClO: 1, HCl: 1 } }],
  });
}

/** Conditions near 30 km (U.S. Standard Atmosphere 1976: T 226.5 K, n 3.83e17 cm⁻³) with invented round J values. */
export function conditions30km(overrides: { J_s?: Record<string, number> } = {}) {
  const M_cm3 = 3.828e17;
  return {
    T_K: 226.5,
    M_cm3,
    J_s: { O2: 1e-11, O3_O1D: 2e-4, O3_O: 8e-4, CFCl3: 1e-9, ...overrides.J_s },
    held_cm3: { O2: 0.2095 * M_cm3, N2: 0.7808 * M_cm3, CH4: 1e-6 * M_cm3, OH: 1e6, CFCl3: 1e-10 * M_cm3 },
    poolTotals_cm3: { Cly: 3e-9 * M_cm3 },
  };
}

/** Cl and ClO only, exchanging through O3 and O: Cl + ClO is exactly conserved (invented test set, JPL-like constants). */
export function clOxMechanism(): CompiledMechanism {
  return makeMechanism({
    species: [
      { id: "Cl", role: "solved", atoms: { Cl: 1 } },
      { id: "ClO", role: "solved", atoms: { Cl: 1, O: 1 } },
      { id: "O3", role: "held", atoms: { O: 3 } },
      { id: "O", role: "held", atoms: { O: 1 } },
      { id: "O2", role: "held", atoms: { O: 2 } },
    ],
    reactions: [
      { id: "C1", equation: "Cl + O3 -> ClO + O2", rate: arr(2.3e-11, 200) },
      { id: "C2", equation: "ClO + O -> Cl + O2", rate: arr(2.8e-11, -85) },
    ],
    pools: [{ id: "ClOx", weights: { Cl: 1, ClO: 1 } }],
  });
}

/** Every number in a value (recursively), for "never NaN or Infinity" checks. */
export function allNumbers(value: unknown, out: number[] = []): number[] {
  if (typeof value === "number") out.push(value);
  else if (Array.isArray(value)) for (const v of value) allNumbers(v, out);
  else if (value && typeof value === "object") for (const v of Object.values(value)) allNumbers(v, out);
  return out;
}
