/**
 * Catalytic cycles and the odd-oxygen budget of a steady state: pathways after
 * Lehmann (2004) with odd oxygen as the species of interest, the Ox-destroying
 * ones described as cycles (net reaction, family, rate-limiting step,
 * efficiency, chain length after Lary 1997), the budget by family closed
 * with an "unassigned" share for deleted pathways and checked against the
 * direct formula (directOxLoss.ts), and the Ox destroyed per reaction.
 * Definitions: docs/cycle-analysis.md. Units: molecules cm⁻³ s⁻¹.
 */
import { InputError } from "../errors";
import { idRecord, ownValue } from "../idRecord";
import type { CompiledMechanism } from "../mechanism/types";
import type { SteadyState } from "../solver/types";
import { carrierWeights } from "./carrierFamilies";
import { type DescribeContext, describePathway } from "./describePathway";
import { directOxLoss } from "./directOxLoss";
import { findPathways } from "./findPathways";
import { netStepRates } from "./netStepRates";
import { oxWeights } from "./oxWeights";
import { reactionNet } from "./reactionNet";
import { weightedSum } from "./sparseVector";
import type {
  CarrierFamilyRate,
  CatalyticCycle,
  CycleOptions,
  CycleReport,
  FamilyShare,
  OxBudget,
  ReactionOx,
} from "./types";
import { validateState } from "./validateState";

export const CYCLE_DEFAULTS: Required<CycleOptions> = {
  fminRelative: 1e-4,
  oxDefinition: "standard",
  lifetimeLimit_s: 1e7,
  heldSpecies: [],
  maxPathways: 50_000,
};

/** Budgets whose unassigned share exceeds this get a warning. */
const UNASSIGNED_WARNING = 0.05;
/** Pathway and direct totals further apart than this get a warning. */
const MISMATCH_WARNING = 0.01;

function checkOptions(opt: Required<CycleOptions>): void {
  if (!(opt.fminRelative >= 0 && opt.fminRelative < 1))
    throw new InputError(
      "options.fminRelative",
      `invalid fminRelative: ${opt.fminRelative} (give 0 ≤ f < 1, e.g. 1e-4)`,
    );
  if (opt.oxDefinition !== "standard" && opt.oxDefinition !== "extended")
    throw new InputError(
      "options.oxDefinition",
      `invalid oxDefinition: ${String(opt.oxDefinition)} (standard | extended)`,
    );
  if (!Array.isArray(opt.heldSpecies)) throw new InputError("options.heldSpecies", "give an array of species ids");
}

export function analyseCycles(
  mech: CompiledMechanism,
  state: Pick<SteadyState, "numberDensity_cm3" | "rate_cm3s">,
  options: CycleOptions = {},
): CycleReport {
  // an option given as undefined takes its default
  const given = Object.fromEntries(Object.entries(options).filter(([, v]) => v !== undefined));
  const opt: Required<CycleOptions> = { ...CYCLE_DEFAULTS, ...given };
  checkOptions(opt);
  const warnings = validateState(mech, state);
  const rates = state.rate_cm3s.map((r) => Math.max(r, 0));
  const nS = mech.species.length;
  const { weights, members } = oxWeights(mech, opt.oxDefinition);
  if (Object.keys(members).length === 0)
    throw new InputError(
      "mechanism.species",
      `mechanism "${mech.title}" has none of the odd-oxygen species O, O(1D), O3`,
    );

  const held = new Uint8Array(nS);
  mech.species.forEach((sp, i) => {
    if (sp.role !== "solved") held[i] = 1;
  });
  for (const id of opt.heldSpecies) {
    const i = ownValue(mech.speciesIndex, id);
    if (i === undefined) warnings.push(`held species "${id}" is not in mechanism "${mech.title}"; ignored`);
    else held[i] = 1;
  }

  const direct = directOxLoss(mech, state);
  const nets = reactionNet(mech);
  // f_min scale: the gross Ox destruction of the reactions under the extended weights, before the direct formula's
  // cancellations (measured 1.45 × L_direct at 20 km, 1.09 × at 30 km, 1.01 × at 40 km). Unlike L_direct it stays
  // large where production and destruction nearly cancel (the upper troposphere), so f_min does not collapse there.
  const extended = oxWeights(mech, "extended").weights;
  const scale = nets.reduce((s, net, j) => s + rates[j] * Math.max(0, -weightedSum(net, extended)), 0);
  const fmin = opt.fminRelative * scale;

  const notBranching = mech.species.filter((_sp, i) => held[i] === 1 || weights[i] > 0).map((sp) => sp.id);
  const set = findPathways(mech, state, {
    fmin_cm3s: fmin,
    notBranching,
    lifetimeLimit_s: opt.lifetimeLimit_s,
    track: { Ox: weights },
    maxPathways: opt.maxPathways,
  });
  warnings.push(...set.warnings);
  const branching = new Set(set.branchingPoints);
  for (const sp of mech.species)
    if (sp.role === "solved" && !branching.has(sp.id) && !notBranching.includes(sp.id))
      warnings.push(`${sp.id} is not a branching point (lifetime above ${opt.lifetimeLimit_s} s or never consumed)`);

  // carrier families: loss to and production from reservoirs
  const carrierFamilies: CarrierFamilyRate[] = [];
  const carrierLoss = new Map<string, number>();
  for (const [family, w] of carrierWeights(mech)) {
    let loss = 0;
    let prod = 0;
    nets.forEach((net, j) => {
      const d = weightedSum(net, w) * rates[j];
      if (d < 0) loss -= d;
      else prod += d;
    });
    const present = idRecord<number>();
    mech.species.forEach((sp, i) => {
      if (w[i] > 0) present[sp.id] = w[i];
    });
    carrierFamilies.push({
      family,
      members: present,
      lossToReservoirs_cm3s: loss,
      productionFromReservoirs_cm3s: prod,
    });
    carrierLoss.set(family, loss);
  }

  const ctx: DescribeContext = {
    mech,
    rates,
    oxWeights: weights,
    held,
    carrierLoss,
    stepRates: netStepRates(mech, rates),
  };
  const cycles: CatalyticCycle[] = [];
  const other: CatalyticCycle[] = [];
  // Deleted pathways are often unfinished (radicals unresolved), so their gross Ox loss is measured with the
  // direct-formula weights of the reaction flux they carried; production follows so that the net stays exact.
  const del = set.deleted.tracked;
  const dW = direct.weights;
  const deletedDirect = set.deleted.flux_cm3s.reduce((s, f, j) => s + f * dW[j], 0);
  const deletedNet = del.Ox.produced_cm3s - del.Ox.destroyed_cm3s;
  const unassigned = Math.max(deletedDirect, -deletedNet, 0);
  const unassignedProduction = unassigned + deletedNet;
  let production = unassignedProduction;
  let loss = unassigned;
  const oxDestroyed = new Float64Array(mech.reactions.length);
  for (const p of set.pathways) {
    let d = 0;
    for (const t of p.net) d += weights[t.species] * t.coef;
    if (Math.abs(d) < 1e-9) continue;
    if (d > 0) {
      production += d * p.rate_cm3s;
      continue;
    }
    loss -= d * p.rate_cm3s;
    const { catalytic, ...c } = describePathway(ctx, p);
    for (const s of p.steps) oxDestroyed[s.reaction] += c.oxLoss_cm3s;
    (catalytic ? cycles : other).push({ ...c, share: 0 });
  }
  const byName = new Map<string, number>();
  for (const c of [...cycles, ...other]) {
    c.share = loss > 0 ? c.oxLoss_cm3s / loss : 0;
    byName.set(c.family, (byName.get(c.family) ?? 0) + c.oxLoss_cm3s);
  }
  cycles.sort((a, b) => b.oxLoss_cm3s - a.oxLoss_cm3s);
  other.sort((a, b) => b.oxLoss_cm3s - a.oxLoss_cm3s);
  const byFamily: FamilyShare[] = [...byName.entries()]
    .map(([family, l]) => ({ family, oxLoss_cm3s: l, fraction: loss > 0 ? l / loss : 0 }))
    .sort((a, b) => b.oxLoss_cm3s - a.oxLoss_cm3s);
  byFamily.push({ family: "unassigned", oxLoss_cm3s: unassigned, fraction: loss > 0 ? unassigned / loss : 0 });

  const netChange = nets.reduce((s, net, j) => s + rates[j] * weightedSum(net, weights), 0);
  // no check where the direct formula gives no net loss (production and loss cancel in it): null, with a warning
  const mismatch = direct.loss_cm3s > 0 ? (loss - direct.loss_cm3s) / direct.loss_cm3s : loss > 0 ? null : 0;
  const budget: OxBudget = {
    definition: Object.keys(members),
    production_cm3s: production,
    loss_cm3s: loss,
    byFamily,
    directLoss_cm3s: direct.loss_cm3s,
    unassignedLoss_cm3s: unassigned,
    unassignedProduction_cm3s: unassignedProduction,
    weights: members,
    netChange_cm3s: netChange,
    directTerms: direct.terms,
    directMismatch: mismatch,
  };
  if (loss > 0 && unassigned / loss > UNASSIGNED_WARNING)
    warnings.push(
      `${((100 * unassigned) / loss).toFixed(1)} % of the Ox loss is in deleted pathways: lower fminRelative (now ${opt.fminRelative})`,
    );
  if (mismatch === null)
    warnings.push(
      `the direct formula gives no net Ox loss here (${direct.loss_cm3s.toExponential(2)} cm⁻³ s⁻¹): HOx production and loss cancel in it, so the pathway loss is not checked (docs/cycle-analysis.md)`,
    );
  else if (Math.abs(mismatch) > MISMATCH_WARNING)
    warnings.push(
      `pathway Ox loss differs from the direct formula by ${(100 * mismatch).toFixed(2)} %` +
        (direct.loss_cm3s < 0.5 * loss
          ? " (HOx production and loss nearly cancel in the direct formula here, as below about 18 km: docs/cycle-analysis.md)"
          : ""),
    );

  const perReaction: ReactionOx[] = mech.reactions.map((r, j) => ({
    reactionId: r.id,
    oxDestroyed_cm3s: oxDestroyed[j],
    netOxChange_cm3s: rates[j] * weightedSum(nets[j], weights),
  }));

  const heldTendencies = opt.heldSpecies
    .map((id) => ownValue(mech.speciesIndex, id))
    .filter((i): i is number => i !== undefined && mech.species[i].role === "solved")
    .map((i) => ({
      species: mech.species[i].id,
      tendency_cm3s: nets.reduce((s, net, j) => {
        const k = net.idx.indexOf(i);
        return k >= 0 ? s + rates[j] * net.val[k] : s;
      }, 0),
    }));

  return {
    cycles,
    budget,
    perReaction,
    pathwayCount: set.pathways.length,
    fmin_cm3s: fmin,
    warnings,
    otherLossPathways: other,
    branchingPoints: set.branchingPoints,
    carrierFamilies,
    nullCycleRate_cm3s: set.nullCycleRate_cm3s,
    oxDefinition: opt.oxDefinition,
    heldTendencies,
  };
}
