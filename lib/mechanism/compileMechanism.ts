/**
 * Compiles a checked mechanism document: species with their atoms, reactions
 * with species indices and rate laws, element balance of every reaction,
 * conserved pools with their external reactions, and the conservation
 * relations of the solved species. Problems go to the sink with their path.
 */
import { EngineError } from "../errors";
import type { RateLaw } from "../kinetics/types";
import { describeBidiControl } from "./bidiControls";
import type { DiagnosticSink, DocPath } from "./diagnostics";
import { externalReactions } from "./externalReactions";
import { elementWeights, searchConservation } from "./findConservationRelations";
import { molarMass_gmol } from "./molarMass";
import { parseEquation } from "./parseEquation";
import { parseFormula } from "./parseFormula";
import { weightedSum } from "./poolExpression";
import { rateLawFromEntry, type SurfaceGases } from "./rateLawFromEntry";
import type { ReadResult } from "./readDocument";
import { stoichiometryMatrix } from "./stoichiometryMatrix";
import { surfaceEquationProblem } from "./surfaceEquation";
import type { CompiledMechanism, CompiledReaction, ConservedPool, Species, Term } from "./types";

const RESERVED = new Set(["hv", "->"]);

/** Reports an id holding a bidi control character (it could pass for another id); true when it does. */
function hasBidiControl(sink: DiagnosticSink, path: DocPath, kind: string, id: string): boolean {
  const bidi = describeBidiControl(id);
  if (bidi)
    sink.error(
      path,
      "bidi-control",
      `a ${kind} id cannot hold the bidirectional control character ${bidi}: it can make the id look like another one`,
    );
  return bidi !== undefined;
}

function closest(name: string, ids: Iterable<string>): string | undefined {
  const low = name.toLowerCase();
  for (const id of ids) if (id.toLowerCase() === low) return id;
  return undefined;
}

/** The compiled mechanism, or undefined when an error was reported. */
export function compileMechanism(
  { doc, at, droppedSpecies }: ReadResult,
  sink: DiagnosticSink,
): CompiledMechanism | undefined {
  // species
  const species: Species[] = [];
  const speciesDocIndex: number[] = [];
  const speciesIndex: Record<string, number> = Object.create(null);
  let thirdBody: string | undefined;
  doc.species.forEach((s, k) => {
    const path: DocPath = ["species", at.species[k]];
    if (RESERVED.has(s.id) || /[\s+]/.test(s.id)) {
      sink.error(
        [...path, "id"],
        "species-id",
        `"${s.id}" cannot be a species id (no spaces or "+"; "hv" is reserved for light)`,
      );
      return;
    }
    if (hasBidiControl(sink, [...path, "id"], "species", s.id)) return;
    if (s.id in speciesIndex) {
      sink.error([...path, "id"], "duplicate-species", `species "${s.id}" is declared twice`);
      return;
    }
    let atoms: Record<string, number> = {};
    if (s.role === "third-body") {
      if (thirdBody !== undefined) {
        sink.error([...path, "role"], "third-body", `only one third body may be declared; "${thirdBody}" already is`);
        return;
      }
      thirdBody = s.id;
    } else if (s.atoms) {
      atoms = s.atoms;
    } else {
      try {
        atoms = parseFormula(s.id);
      } catch (e) {
        const why = e instanceof EngineError ? e.message : String(e);
        sink.error([...path, "id"], "formula", `${why}; give "atoms" for a name that is not a formula`);
        return;
      }
    }
    const sp: Species = { id: s.id, label: s.label ?? s.id, role: s.role, atoms };
    if (s.mixingRatio !== undefined) sp.defaultAmount = { mixingRatio: s.mixingRatio };
    if (s.numberDensity_cm3 !== undefined) sp.defaultAmount = { numberDensity_cm3: s.numberDensity_cm3 };
    if (s.group !== undefined) sp.group = s.group;
    if (sp.defaultAmount && s.role !== "held") {
      sink.warn([...path], "amount-ignored", `a default amount is used only for held species; "${s.id}" is ${s.role}`);
    }
    speciesIndex[s.id] = species.length;
    species.push(sp);
    speciesDocIndex.push(at.species[k]);
  });

  // reactions
  const reactions: CompiledReaction[] = [];
  const byId = new Map<string, number>();
  const pendingReverse: { r: number; path: DocPath; entry: (typeof doc.reactions)[number] }[] = [];
  doc.reactions.forEach((e, k) => {
    const path: DocPath = ["reactions", at.reactions[k]];
    if (hasBidiControl(sink, [...path, "id"], "reaction", e.id)) return;
    if (byId.has(e.id)) {
      sink.error(
        [...path, "id"],
        "duplicate-id",
        `reaction id "${e.id}" is used twice (first at reactions[${at.reactions[byId.get(e.id)!]}])`,
      );
      return;
    }
    byId.set(e.id, k);
    const parsed = parseEquation(e.equation);
    if (!parsed.ok) {
      sink.error([...path, "equation"], "equation", parsed.message);
      return;
    }
    const eq = parsed.equation;
    let ok = true;
    let hasM = false;
    let mRight = false;
    const resolve = (terms: typeof eq.reactants, left: boolean): Term[] => {
      const out: Term[] = [];
      for (const t of terms) {
        if (thirdBody !== undefined && t.species === thirdBody) {
          if (t.coef !== 1) {
            sink.error([...path, "equation"], "equation", `the third body ${thirdBody} takes no coefficient`);
            ok = false;
          }
          if (left) hasM = true;
          else mRight = true;
          continue;
        }
        const i = speciesIndex[t.species];
        if (i === undefined) {
          ok = false;
          if (droppedSpecies.has(t.species)) continue;
          const near = closest(t.species, Object.keys(speciesIndex));
          const hint =
            t.species === "M" ? '; declare it with role "third-body"' : near ? `; did you mean "${near}"?` : "";
          sink.error([...path, "equation"], "unknown-species", `unknown species "${t.species}"${hint}`);
          ok = false;
          continue;
        }
        out.push({ species: i, coef: t.coef });
      }
      return out;
    };
    const reactants = resolve(eq.reactants, true);
    const products = resolve(eq.products, false);
    if (mRight && !hasM) {
      sink.error([...path, "equation"], "equation", `${thirdBody} appears among the products but not the reactants`);
      ok = false;
    }
    const isPhotolysisLaw = e.rate.law === "photolysis";
    if (eq.photolysis !== isPhotolysisLaw) {
      sink.error(
        [...path, "rate", "law"],
        "photolysis",
        eq.photolysis
          ? `the equation has "hv", so the rate law must be "photolysis", found "${e.rate.law}"`
          : `a photolysis rate needs "hv" among the reactants of the equation`,
      );
      ok = false;
    }
    if (!ok) return;

    // element balance
    if (e.unbalanced === undefined) {
      const diff = new Map<string, number>();
      for (const t of reactants)
        for (const [el, n] of Object.entries(species[t.species].atoms)) diff.set(el, (diff.get(el) ?? 0) - n * t.coef);
      for (const t of products)
        for (const [el, n] of Object.entries(species[t.species].atoms)) diff.set(el, (diff.get(el) ?? 0) + n * t.coef);
      const off = [...diff].filter(([, d]) => Math.abs(d) > 1e-9);
      if (off.length) {
        const count = (terms: Term[], el: string) =>
          terms.reduce((s, t) => s + (species[t.species].atoms[el] ?? 0) * t.coef, 0);
        const detail = off.map(
          ([el]) => `${el} ${count(reactants, el)} on the left, ${count(products, el)} on the right`,
        );
        sink.error(
          [...path, "equation"],
          "unbalanced",
          `the equation is not balanced: ${detail.join("; ")}. Fix it, or mark a knowingly lumped reaction with "unbalanced: <reason>"`,
        );
        return;
      }
    }

    if (e.rate.law === "termolecular" && !hasM) {
      sink.warn([...path, "equation"], "third-body", "a termolecular rate usually goes with + M in the equation");
    }
    if (eq.photolysis && hasM) {
      sink.error([...path, "equation"], "equation", "a photolysis reaction cannot have a third body");
      return;
    }
    const order = reactants.reduce((s, t) => s + t.coef, 0) + (hasM && e.rate.law === "arrhenius" ? 1 : 0);
    const r: CompiledReaction = {
      index: reactions.length,
      id: e.id,
      equation: eq.text,
      reactants,
      products,
      thirdBody: hasM,
      photolysis: eq.photolysis,
      rate: { law: "photolysis-fixed", J_s: 0 },
    };
    if (e.rate.law === "equilibrium-reverse" && typeof e.rate.forward === "string") {
      pendingReverse.push({ r: reactions.length, path, entry: e });
    } else {
      let gases: SurfaceGases | undefined;
      if (e.rate.law === "uptake" || e.rate.law === "liquid-aerosol") {
        const problem = surfaceEquationProblem(e.rate, reactants, hasM, species, speciesIndex);
        if (problem) {
          sink.error([...path, "equation"], "uptake", problem);
          return;
        }
        r.firstOrderIn = reactants[0].species;
        const gasMass = molarMass_gmol(species[reactants[0].species].atoms);
        const partner = reactants.length === 2 ? species[reactants[1].species] : undefined;
        const partnerMass = partner ? molarMass_gmol(partner.atoms) : undefined;
        if (gasMass !== undefined && (!partner || partnerMass !== undefined)) {
          gases = { gasMolarMass_gmol: gasMass };
          if (partner && partnerMass !== undefined)
            gases.partner = { species: partner.id, molarMass_gmol: partnerMass };
        }
      }
      const law = rateLawFromEntry(e.rate, [...path, "rate"], order, sink, () => undefined, gases);
      if (!law) return;
      r.rate = law;
    }
    if (e.uncertainty) r.uncertainty = e.uncertainty;
    else if (!eq.photolysis) sink.warn([...path], "no-uncertainty", "no uncertainty (f298, g) is given");
    if (e.source !== undefined) r.source = e.source;
    else sink.warn([...path], "no-source", "no source is cited");
    if (e.note !== undefined) r.note = e.note;
    if (e.unbalanced !== undefined) r.unbalanced = e.unbalanced;
    reactions.push(r);
  });

  // reverse rates that name their forward reaction
  for (const { r, path, entry } of pendingReverse) {
    const rate = entry.rate as Extract<typeof entry.rate, { law: "equilibrium-reverse" }>;
    const fid = rate.forward as string;
    const forward = (id: string): RateLaw | undefined => {
      const fr = reactions.find((x) => x.id === id);
      if (!fr) {
        sink.error(
          [...path, "rate", "forward"],
          "unknown-reaction",
          `no reaction with id "${id}" to take the forward rate from`,
        );
        return undefined;
      }
      if (
        fr.rate.law === "equilibrium-reverse" ||
        fr.rate.law === "uptake" ||
        fr.rate.law === "liquid-aerosol" ||
        fr.photolysis
      ) {
        sink.error(
          [...path, "rate", "forward"],
          "reverse",
          `the forward reaction "${id}" must have a gas-phase thermal rate law of its own`,
        );
        return undefined;
      }
      const me = reactions[r];
      const same = (a: Term[], b: Term[]) =>
        a.length === b.length && a.every((t) => b.some((u) => u.species === t.species && u.coef === t.coef));
      if (!same(fr.reactants, me.products) || !same(fr.products, me.reactants)) {
        sink.warn([...path, "rate", "forward"], "reverse", `reaction "${id}" is not the mirror image of this equation`);
      }
      reactions[r].forwardReaction = fr.index;
      return fr.rate;
    };
    const law = rateLawFromEntry({ ...rate, forward: fid }, [...path, "rate"], 1, sink, forward);
    if (law) reactions[r].rate = law;
    else reactions[r].rate = { law: "photolysis-fixed", J_s: 0 };
  }

  const stoich = stoichiometryMatrix({ species, reactions });

  // a solved species never produced or never lost
  species.forEach((s, i) => {
    if (s.role !== "solved") return;
    let made = false;
    let lost = false;
    for (const { coef } of stoich.rows[i]) {
      if (coef > 0) made = true;
      else if (coef < 0) lost = true;
    }
    const path: DocPath = ["species", speciesDocIndex[i]];
    if (!made && !lost) sink.warn(path, "unused-species", `solved species "${s.id}" takes part in no reaction`);
    else if (!made)
      sink.warn(path, "never-produced", `solved species "${s.id}" is never produced; its steady state is 0`);
    else if (!lost)
      sink.warn(path, "never-lost", `solved species "${s.id}" is produced but never lost; it has no steady state`);
  });

  // pools
  const pools: ConservedPool[] = [];
  const poolIds = new Set<string>();
  doc.totals.forEach((t, k) => {
    const path: DocPath = ["totals", at.totals[k]];
    if (poolIds.has(t.id)) {
      sink.error([...path, "id"], "duplicate-id", `total "${t.id}" is declared twice`);
      return;
    }
    poolIds.add(t.id);
    const weights = elementWeights({ species }, t.element);
    if (weights.length === 0) {
      sink.error([...path, "element"], "pool-element", `no solved species contains the element "${t.element}"`);
      return;
    }
    const pool: ConservedPool = {
      id: t.id,
      label: t.label ?? `${t.element} atoms`,
      element: t.element,
      weights,
      expression: weightedSum(weights, species),
      exact: false,
      externalReactions: externalReactions(stoich, weights),
    };
    pool.exact = pool.externalReactions.length === 0;
    if (t.mixingRatio !== undefined) pool.total = { mixingRatio: t.mixingRatio };
    if (t.numberDensity_cm3 !== undefined) pool.total = { numberDensity_cm3: t.numberDensity_cm3 };
    if (t.note !== undefined) pool.note = t.note;
    pools.push(pool);
  });

  if (sink.errorCount > 0) return undefined;

  const search = searchConservation({ species, reactions }, stoich);
  if (!search.complete) {
    sink.warn(
      [],
      "conservation-incomplete",
      "the search for invariants beyond element balances stopped at its size budget",
    );
  }
  if (search.unlisted > 0)
    sink.warn([], "conservation-unlisted", `${search.unlisted} further invariants are not listed`);

  const channels = new Set<string>();
  for (const r of reactions) if (r.rate.law === "photolysis") channels.add(r.rate.channel);

  return {
    title: doc.title,
    version: doc.version,
    description: doc.description,
    species,
    speciesIndex,
    reactions,
    pools,
    conservation: search.relations,
    photolysisChannels: [...channels].sort(),
    warnings: [],
  };
}
