/**
 * Hand-built mechanisms and hand-solved steady states for the analysis tests,
 * independent of the mechanism loader and the solver.
 */
import type { CompiledMechanism, CompiledReaction, Species, SpeciesRole, Term } from "@/lib/mechanism/types";

function atomsOf(formula: string): Record<string, number> {
  const atoms: Record<string, number> = {};
  for (const [, el, n] of formula.replace(/\(.*?\)/g, "").matchAll(/([A-Z][a-z]?)(\d*)/g))
    atoms[el] = (atoms[el] ?? 0) + (n ? Number(n) : 1);
  return atoms;
}

/** Builds a compiled mechanism from species roles and "id: A + B -> C + D" lines (hv and M allowed). */
export function handMechanism(
  title: string,
  species: Record<string, SpeciesRole>,
  reactions: Record<string, string>,
): CompiledMechanism {
  const list: Species[] = Object.entries(species).map(([id, role]) => ({ id, label: id, role, atoms: atomsOf(id) }));
  const speciesIndex = Object.fromEntries(list.map((s, i) => [s.id, i]));
  const side = (text: string): { terms: Term[]; M: boolean; hv: boolean } => {
    const terms: Term[] = [];
    let M = false;
    let hv = false;
    for (const raw of text.split(" + ")) {
      const tok = raw.trim();
      if (tok === "M") M = true;
      else if (tok === "hv") hv = true;
      else {
        const m = tok.match(/^(\d+(?:\.\d+)?)\s+(.+)$/);
        const coef = m ? Number(m[1]) : 1;
        const id = m ? m[2] : tok;
        const idx = speciesIndex[id];
        if (idx === undefined) throw new Error(`helper: unknown species ${id}`);
        const old = terms.find((t) => t.species === idx);
        if (old) old.coef += coef;
        else terms.push({ species: idx, coef });
      }
    }
    return { terms, M, hv };
  };
  const rx: CompiledReaction[] = Object.entries(reactions).map(([id, eq], index) => {
    const [l, r] = eq.split("->");
    const L = side(l);
    const R = side(r);
    return {
      index,
      id,
      equation: eq.trim(),
      reactants: L.terms,
      products: R.terms,
      thirdBody: L.M,
      photolysis: L.hv,
      rate: { law: "arrhenius", A: 1, EoverR_K: 0 },
    };
  });
  return {
    title,
    version: "test",
    description: "hand-built test mechanism (invented)",
    species: list,
    speciesIndex,
    reactions: rx,
    pools: [],
    conservation: [],
    photolysisChannels: [],
    warnings: [],
  };
}

/** Mass-action rates from number densities (cm⁻³) and effective rate coefficients by reaction id. */
export function massActionRates(mech: CompiledMechanism, n: Record<string, number>, k: Record<string, number>) {
  const numberDensity_cm3 = mech.species.map((s) => n[s.id] ?? 0);
  const rate_cm3s = mech.reactions.map((r) => {
    let v = k[r.id];
    if (v === undefined) throw new Error(`helper: no k for ${r.id}`);
    for (const t of r.reactants) v *= numberDensity_cm3[t.species] ** t.coef;
    if (r.thirdBody) v *= n.M ?? 0;
    return v;
  });
  return { numberDensity_cm3, rate_cm3s };
}

/**
 * Chapman oxygen at an invented mid-stratosphere point, solved exactly:
 * k4 k2 M x² − J1 k4 x − J1 J3 = 0 for x = [O] (from d[O]/dt = d[O3]/dt = 0),
 * then [O3] = k2 [O][O2][M] / (J3 + k4 [O]). Chapman (1930); the quadratic is
 * worked out in Brasseur & Solomon, Aeronomy of the Middle Atmosphere (2005), ch. 5.
 */
export function chapman() {
  const mech = handMechanism(
    "Chapman (test)",
    { O: "solved", O3: "solved", O2: "held", M: "third-body" },
    {
      J1: "O2 + hv -> 2 O",
      K2: "O + O2 + M -> O3 + M",
      J3: "O3 + hv -> O + O2",
      K4: "O + O3 -> 2 O2",
    },
  );
  const M = 3.8e17;
  const O2 = 0.2095 * M;
  const k = { J1: 1e-11, K2: 1.2e-33, J3: 1e-3, K4: 1e-15 };
  const a = k.K4 * k.K2 * M;
  const b = -k.J1 * k.K4;
  const c = -k.J1 * k.J3;
  const O = (-b + Math.sqrt(b * b - 4 * a * c)) / (2 * a);
  const O3 = (k.K2 * O * O2 * M) / (k.J3 + k.K4 * O);
  const n = { O, O3, O2, M };
  return { mech, k, n, ...massActionRates(mech, n, k) };
}

/**
 * Chapman plus a small chlorine system with O, O3, NO, NO2, CH4, OH and H2O
 * held: Cl + O3 → ClO + O2, ClO + O → Cl + O2, ClO + NO → Cl + NO2,
 * Cl + CH4 → HCl + CH3, OH + HCl → H2O + Cl. Solved by hand: with r1 =
 * [ClO]/[Cl] = k5[O3]/(k6[O] + k7[NO]) and r2 = [HCl]/[Cl] = k8[CH4]/(k9[OH]),
 * [Cl] = Cly/(1 + r1 + r2). Invented numbers of upper-stratosphere size.
 */
export function chlorine(opts: { Cly?: number; NO?: number } = {}) {
  const mech = handMechanism(
    "oxygen + chlorine (test)",
    {
      O: "solved",
      O3: "solved",
      Cl: "solved",
      ClO: "solved",
      HCl: "solved",
      O2: "held",
      NO: "held",
      NO2: "held",
      CH4: "held",
      CH3: "held",
      OH: "held",
      H2O: "held",
      M: "third-body",
    },
    {
      J1: "O2 + hv -> 2 O",
      K2: "O + O2 + M -> O3 + M",
      J3: "O3 + hv -> O + O2",
      K4: "O + O3 -> 2 O2",
      C5: "Cl + O3 -> ClO + O2",
      C6: "ClO + O -> Cl + O2",
      C7: "ClO + NO -> Cl + NO2",
      C8: "Cl + CH4 -> HCl + CH3",
      C9: "OH + HCl -> H2O + Cl",
    },
  );
  const M = 8.3e16;
  const k = { J1: 3e-10, K2: 9e-34, J3: 3e-3, K4: 5e-15, C5: 9e-12, C6: 4e-11, C7: 2e-11, C8: 4e-14, C9: 6e-13 };
  const n: Record<string, number> = {
    M,
    O2: 0.2095 * M,
    O3: 6e-6 * M,
    O: 6e8,
    NO: opts.NO ?? 1e9,
    NO2: 5e8,
    CH4: 0.8e-6 * M,
    CH3: 1,
    OH: 5e6,
    H2O: 5e-6 * M,
  };
  const Cly = opts.Cly ?? 3.3e-9 * M;
  const r1 = (k.C5 * n.O3) / (k.C6 * n.O + k.C7 * n.NO);
  const r2 = (k.C8 * n.CH4) / (k.C9 * n.OH);
  n.Cl = Cly / (1 + r1 + r2);
  n.ClO = r1 * n.Cl;
  n.HCl = r2 * n.Cl;
  return { mech, k, n, ...massActionRates(mech, n, k) };
}

/** Rate of the reaction with id `id`. */
export function rateOf(mech: CompiledMechanism, rates: number[], id: string): number {
  const j = mech.reactions.findIndex((r) => r.id === id);
  if (j < 0) throw new Error(`helper: no reaction ${id}`);
  return rates[j];
}
