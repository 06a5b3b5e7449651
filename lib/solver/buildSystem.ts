/**
 * The solved system of one condition: which species are unknowns, the fixed
 * number densities of the others, and the mass-action structure of every
 * reaction precomputed as flat index arrays (compressed rows) so that the hot
 * loops of the Newton solver and the integrator touch only typed arrays.
 *
 * Units: number densities in molecules cm⁻³.
 */
import { InputError } from "../errors";
import { hasId, ownValue } from "../idRecord";
import type { CompiledMechanism } from "../mechanism/types";
import { type DependentRate, dependentRates } from "./dependentRates";
import type { SolveConditions } from "./types";

/** One pool total that replaces one balance equation. */
export interface PoolConstraint {
  poolId: string;
  /** index into `mech.pools` */
  poolIndex: number;
  /** unknown indices of the non-held members */
  members: Int32Array;
  weights: Float64Array;
  /** what the non-held members must sum to (weighted), cm⁻³ */
  total: number;
  /** the total the conditions asked for, cm⁻³ (total plus what held members hold) */
  requestedTotal: number;
  /** unknown index whose balance row this constraint replaces (chosen by the caller; −1 until then) */
  replaced: number;
}

export interface ChemSystem {
  mech: CompiledMechanism;
  /** number of unknowns */
  n: number;
  /** unknown index → species index */
  unknownSpecies: Int32Array;
  /** species index → unknown index, or −1 */
  unknownOf: Int32Array;
  /** number density of every species by species index; unknown slots hold 0 (cm⁻³) */
  fixed: Float64Array;
  nReactions: number;
  /** reactant terms over unknowns: rows rStart[j]..rStart[j+1] */
  rStart: Int32Array;
  rUnknown: Int32Array;
  rCoef: Float64Array;
  /** net stoichiometry (products − reactants) over unknowns */
  sStart: Int32Array;
  sUnknown: Int32Array;
  sNu: Float64Array;
  /** net stoichiometry over every species (for production/loss of held species too) */
  aStart: Int32Array;
  aSpecies: Int32Array;
  aNu: Float64Array;
  /** Π over held reactants of [X]^coef, per reaction */
  heldFactor: Float64Array;
  constraints: PoolConstraint[];
  /** reactions whose γ depends on amounts (dependentRates.ts); their rate is mass action × γ */
  dependent: DependentRate[];
  /** mech.pools indices with no total in the conditions */
  unconstrainedPools: number[];
  warnings: string[];
}

function amountOf(a: { mixingRatio: number } | { numberDensity_cm3: number }, M: number): number {
  return "mixingRatio" in a ? a.mixingRatio * M : a.numberDensity_cm3;
}

function checkNumber(path: string, v: unknown, positive: boolean): number {
  if (typeof v !== "number" || !Number.isFinite(v) || (positive ? v <= 0 : v < 0)) {
    throw new InputError(path, `must be a finite number ${positive ? "> 0" : "≥ 0"}, got ${String(v)}`);
  }
  return v;
}

/** Checks the conditions and lays out the unknowns; throws InputError for malformed input only. */
export function buildSystem(mech: CompiledMechanism, cond: SolveConditions): ChemSystem {
  if (!mech || !Array.isArray(mech.species) || !Array.isArray(mech.reactions)) {
    throw new InputError("mechanism", "not a compiled mechanism (species and reactions missing)");
  }
  if (!cond || typeof cond !== "object") throw new InputError("conditions", "missing");
  checkNumber("conditions.T_K", cond.T_K, true);
  const M = checkNumber("conditions.M_cm3", cond.M_cm3, true);
  const J = cond.J_s ?? {};
  for (const [ch, v] of Object.entries(J)) checkNumber(`conditions.J_s.${ch}`, v, false);
  const held = cond.held_cm3 ?? {};
  const totals = cond.poolTotals_cm3 ?? {};
  const warnings: string[] = [];
  const ns = mech.species.length;
  const fixed = new Float64Array(ns);
  const isUnknown = new Uint8Array(ns);

  for (const [id, v] of Object.entries(held)) {
    checkNumber(`conditions.held_cm3.${id}`, v, false);
    if (!hasId(mech.speciesIndex, id)) warnings.push(`held_cm3.${id} ignored: not a species of this mechanism`);
  }
  for (const [id, v] of Object.entries(totals)) {
    checkNumber(`conditions.poolTotals_cm3.${id}`, v, false);
    if (!mech.pools.some((p) => p.id === id))
      warnings.push(`poolTotals_cm3.${id} ignored: not a pool of this mechanism`);
  }

  for (let s = 0; s < ns; s++) {
    const sp = mech.species[s];
    if (sp.role === "third-body") fixed[s] = M;
    else if (sp.role === "held") {
      const v = ownValue(held, sp.id);
      if (v !== undefined) fixed[s] = v;
      else if (sp.defaultAmount)
        fixed[s] = checkNumber(`species.${sp.id}.defaultAmount`, amountOf(sp.defaultAmount, M), false);
      else
        throw new InputError(
          `conditions.held_cm3.${sp.id}`,
          `no number density for held species ${sp.id} and the mechanism gives no default amount`,
        );
    } else if (hasId(held, sp.id)) fixed[s] = held[sp.id];
    else isUnknown[s] = 1;
  }

  // A pool with total 0 forces its members to 0: hold them there.
  for (const pool of mech.pools) {
    if (ownValue(totals, pool.id) === 0)
      for (const w of pool.weights) if (isUnknown[w.species]) isUnknown[w.species] = 0;
  }

  const unknownOf = new Int32Array(ns).fill(-1);
  const list: number[] = [];
  for (let s = 0; s < ns; s++) if (isUnknown[s]) unknownOf[s] = list.push(s) - 1;
  const unknownSpecies = Int32Array.from(list);

  const nr = mech.reactions.length;
  const rStart = new Int32Array(nr + 1);
  const sStart = new Int32Array(nr + 1);
  const aStart = new Int32Array(nr + 1);
  const rU: number[] = [];
  const rC: number[] = [];
  const sU: number[] = [];
  const sN: number[] = [];
  const aS: number[] = [];
  const aN: number[] = [];
  const heldFactor = new Float64Array(nr);
  for (let j = 0; j < nr; j++) {
    const r = mech.reactions[j];
    let hf = 1;
    const net = new Map<number, number>();
    for (const t of r.reactants) {
      if (!(t.species >= 0 && t.species < ns))
        throw new InputError(`reactions[${j}].reactants`, "species index out of range");
      net.set(t.species, (net.get(t.species) ?? 0) - t.coef);
      // a surface reaction is first order in the gas taken up alone; its partner enters through γ
      if (r.firstOrderIn !== undefined && t.species !== r.firstOrderIn) continue;
      const u = unknownOf[t.species];
      if (u >= 0) {
        rU.push(u);
        rC.push(t.coef);
      } else hf *= t.coef === 1 ? fixed[t.species] : fixed[t.species] ** t.coef;
    }
    for (const t of r.products) {
      if (!(t.species >= 0 && t.species < ns))
        throw new InputError(`reactions[${j}].products`, "species index out of range");
      net.set(t.species, (net.get(t.species) ?? 0) + t.coef);
    }
    heldFactor[j] = hf;
    for (const [s, nu] of net) {
      if (nu === 0 || mech.species[s].role === "third-body") continue;
      aS.push(s);
      aN.push(nu);
      const u = unknownOf[s];
      if (u >= 0) {
        sU.push(u);
        sN.push(nu);
      }
    }
    rStart[j + 1] = rU.length;
    sStart[j + 1] = sU.length;
    aStart[j + 1] = aS.length;
  }

  const constraints: PoolConstraint[] = [];
  const unconstrainedPools: number[] = [];
  mech.pools.forEach((pool, p) => {
    const total = ownValue(totals, pool.id);
    if (total === undefined) {
      unconstrainedPools.push(p);
      return;
    }
    if (total === 0) return;
    const m: number[] = [];
    const w: number[] = [];
    // Members held for this solve keep their amounts: the unknowns share what is left of the total.
    let heldPart = 0;
    for (const t of pool.weights) {
      const u = unknownOf[t.species];
      if (u >= 0 && t.coef > 0) {
        m.push(u);
        w.push(t.coef);
      } else if (t.coef > 0) heldPart += t.coef * fixed[t.species];
    }
    if (m.length === 0) {
      warnings.push(`pool ${pool.id}: every member is held, so its total is not used`);
      return;
    }
    const rest = total - heldPart;
    if (!(rest > 0))
      throw new InputError(
        `conditions.poolTotals_cm3.${pool.id}`,
        `the members held for this solve already hold ${heldPart.toExponential(3)} cm⁻³ of the total ${total.toExponential(3)} cm⁻³, leaving nothing for the solved members`,
      );
    constraints.push({
      poolId: pool.id,
      poolIndex: p,
      members: Int32Array.from(m),
      weights: Float64Array.from(w),
      total: rest,
      requestedTotal: total,
      replaced: -1,
    });
  });

  return {
    mech,
    n: unknownSpecies.length,
    unknownSpecies,
    unknownOf,
    fixed,
    nReactions: nr,
    rStart,
    rUnknown: Int32Array.from(rU),
    rCoef: Float64Array.from(rC),
    sStart,
    sUnknown: Int32Array.from(sU),
    sNu: Float64Array.from(sN),
    aStart,
    aSpecies: Int32Array.from(aS),
    aNu: Float64Array.from(aN),
    heldFactor,
    constraints,
    dependent: dependentRates(mech, cond),
    unconstrainedPools,
    warnings,
  };
}
