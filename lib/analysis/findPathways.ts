/**
 * Significant pathways of a reaction system from its reaction rates, after
 * Lehmann, R. (2004), "An algorithm for the determination of all significant
 * pathways in chemical reaction systems", J. Atmos. Chem. 47, 45–78.
 *
 * Every reaction with a non-zero rate starts as a pathway. Branching-point
 * species are taken in order of increasing chemical lifetime τ = [X]/D(X)
 * (only below a lifetime limit; species of interest and held species never).
 * At each branching point b every pathway producing b (net coefficient p > 0)
 * is connected with every pathway consuming it (−d < 0): multiplicities
 * a·x_k + c·x_l with a·p = c·d = L (smallest integers), rate
 * f_kl = (f_k p)(f_l d)/(T L), T = max(P_b, D_b), where P_b and D_b include
 * the flux of pathways deleted earlier so that the branching probabilities
 * are those of the full system. An imbalance P_b ≠ D_b (a held or
 * pool-replaced species, a 24-hour average) is kept as a storage pathway (the
 * producer's unconnected share, b still in its net) or a release pathway.
 * New pathways below f_min, and the shares that would have connected to
 * deleted pathways, are deleted with their net effect added to a per-species
 * deleted budget, so that Σ kept f·net + deleted = Σ_j r_j S_j exactly.
 * Non-elementary new pathways are split (elementaryModes.ts); pathways with
 * identical multiplicity vectors are merged by key; null cycles (zero net
 * effect on every species) are dropped and their total rate reported.
 *
 * Units: rates in molecules cm⁻³ s⁻¹, lifetimes in s.
 */
import { InputError } from "../errors";
import { idRecord, ownValue } from "../idRecord";
import type { CompiledMechanism } from "../mechanism/types";
import type { SteadyState } from "../solver/types";
import { decomposeElementary, eliminationWork, isElementary } from "./elementaryModes";
import { gcd, matchingMultipliers, rationalOrThrow } from "./rational";
import { reactionNet } from "./reactionNet";
import { axpy, type SparseVector, snap, valueAt, weightedSum } from "./sparseVector";
import type { Pathway, PathwayOptions, PathwaySet } from "./types";
import { validateState } from "./validateState";

export const PATHWAY_DEFAULTS: Required<Omit<PathwayOptions, "track">> = {
  fmin_cm3s: 0,
  notBranching: [],
  lifetimeLimit_s: 1e7,
  maxPathways: 50_000,
  maxJoins: 1_000_000,
};

/** A branching point whose production and loss differ by less than this fraction is balanced (solver round-off). */
const BALANCE_TOLERANCE = 1e-7;

interface Work {
  rx: number[];
  mx: number[];
  net: SparseVector;
  rate: number;
  key: string;
  /** known to have no proper balanced sub-pathway (a reaction, or tested); stays true as branching points are added */
  elementary: boolean;
  /** the two pathways joined to make this one, while it is being created */
  parents?: [Work, Work];
  /** the parents share a reaction */
  overlap?: boolean;
}

/** Merge key of a multiplicity vector: "reaction*multiplicity" pairs in reaction order. */
function keyOf(rx: number[], mx: number[]): string {
  let key = "";
  for (let t = 0; t < rx.length; t++) key += t === 0 ? `${rx[t]}*${mx[t]}` : `,${rx[t]}*${mx[t]}`;
  return key;
}

export function findPathways(
  mech: CompiledMechanism,
  state: Pick<SteadyState, "numberDensity_cm3" | "rate_cm3s">,
  options: PathwayOptions = {},
): PathwaySet {
  const opt = { ...PATHWAY_DEFAULTS, ...options };
  const warnings = validateState(mech, state);
  if (!(opt.fmin_cm3s >= 0) || !Number.isFinite(opt.fmin_cm3s))
    throw new InputError("options.fmin_cm3s", `invalid threshold ${opt.fmin_cm3s}: give a finite rate ≥ 0`);
  if (!(opt.lifetimeLimit_s > 0))
    throw new InputError("options.lifetimeLimit_s", `invalid lifetime limit ${opt.lifetimeLimit_s}: give a time > 0 s`);
  if (!(opt.maxPathways >= 1))
    throw new InputError("options.maxPathways", `invalid limit ${opt.maxPathways}: give a count ≥ 1`);
  for (const id of opt.notBranching)
    if (ownValue(mech.speciesIndex, id) === undefined)
      throw new InputError("options.notBranching", `unknown species "${id}": not in mechanism "${mech.title}"`);

  const nS = mech.species.length;
  const nets = reactionNet(mech);
  const rates = state.rate_cm3s.map((r) => Math.max(r, 0));
  const fmin = opt.fmin_cm3s;
  const tracked = Object.entries(options.track ?? {});

  const deletedNet = new Float64Array(nS);
  const deletedPos = new Float64Array(nS);
  const deletedNeg = new Float64Array(nS);
  const deletedTracked = idRecord<{ produced_cm3s: number; destroyed_cm3s: number }>();
  for (const [name] of tracked) deletedTracked[name] = { produced_cm3s: 0, destroyed_cm3s: 0 };
  const trackedSums = tracked.map(([name]) => deletedTracked[name]);
  let nullRate = 0;

  const deletedFlux = new Float64Array(mech.reactions.length);
  const remove = (rate: number, w: Pick<Work, "rx" | "mx" | "net">) => {
    if (!(rate > 0)) return;
    const net = w.net;
    for (let t = 0; t < w.rx.length; t++) deletedFlux[w.rx[t]] += rate * w.mx[t];
    for (let i = 0; i < net.idx.length; i++) {
      const v = rate * net.val[i];
      const s = net.idx[i];
      deletedNet[s] += v;
      if (v > 0) deletedPos[s] += v;
      else deletedNeg[s] -= v;
    }
    for (let t = 0; t < tracked.length; t++) {
      const dx = rate * weightedSum(net, tracked[t][1]);
      if (dx > 0) trackedSums[t].produced_cm3s += dx;
      else trackedSums[t].destroyed_cm3s -= dx;
    }
  };

  /** remove(coef, w) for the flux and the net, except species `skip` (where every join cancels exactly) and the tracked sums (counted per join). */
  const removeLinear = (coef: number, w: Work, skip: number) => {
    if (!(coef > 0)) return;
    for (let t = 0; t < w.rx.length; t++) deletedFlux[w.rx[t]] += coef * w.mx[t];
    const net = w.net;
    for (let i = 0; i < net.idx.length; i++) {
      const s = net.idx[i];
      if (s === skip) continue;
      const v = coef * net.val[i];
      deletedNet[s] += v;
      if (v > 0) deletedPos[s] += v;
      else deletedNeg[s] -= v;
    }
  };

  // Σ m_t·net(rx_t) in a dense scratch row, gathered sorted
  const scratch = new Float64Array(nS);
  const seen = new Uint8Array(nS);
  const combineNets = (rx: number[], mx: number[]): SparseVector => {
    const list: number[] = [];
    for (let t = 0; t < rx.length; t++) {
      const net = nets[rx[t]];
      for (let q = 0; q < net.idx.length; q++) {
        const sp = net.idx[q];
        if (!seen[sp]) {
          seen[sp] = 1;
          list.push(sp);
        }
        scratch[sp] += mx[t] * net.val[q];
      }
    }
    list.sort((x, y) => x - y);
    const idx: number[] = [];
    const val: number[] = [];
    for (let t = 0; t < list.length; t++) {
      const sp = list[t];
      const v = snap(scratch[sp]);
      scratch[sp] = 0;
      seen[sp] = 0;
      if (v !== 0) {
        idx.push(sp);
        val.push(v);
      }
    }
    return { idx, val };
  };

  let current = new Map<string, Work>();
  const add = (map: Map<string, Work>, w: Work) => {
    if (w.net.idx.length === 0) {
      nullRate += w.rate;
      return;
    }
    if (w.rate < fmin) {
      remove(w.rate, w);
      return;
    }
    const old = map.get(w.key);
    if (old) old.rate += w.rate;
    else map.set(w.key, w);
  };

  // Gross production and loss by species, and the eligible branching points.
  const P0 = new Float64Array(nS);
  const D0 = new Float64Array(nS);
  nets.forEach((net, j) => {
    const r = rates[j];
    if (!(r > 0)) return;
    for (let i = 0; i < net.idx.length; i++) {
      if (net.val[i] > 0) P0[net.idx[i]] += r * net.val[i];
      else D0[net.idx[i]] -= r * net.val[i];
    }
    add(current, { rx: [j], mx: [1], net, rate: r, key: `${j}*1`, elementary: true });
  });

  const excluded = new Set(opt.notBranching.map((id) => ownValue(mech.speciesIndex, id)));
  const order = mech.species
    .map((sp, i) => ({ i, tau: D0[i] > 0 ? state.numberDensity_cm3[i] / D0[i] : Number.POSITIVE_INFINITY, sp }))
    .filter((c) => c.sp.role === "solved" && !excluded.has(c.i) && c.tau < opt.lifetimeLimit_s)
    .sort((x, y) => x.tau - y.tau || x.i - y.i);

  const processed = new Uint8Array(nS);
  const candidate = new Uint8Array(nS);
  for (const o of order) candidate[o.i] = 1;
  const work = eliminationWork(nS);
  // species touched by the first parent, for the two-parent test (stamp = current epoch)
  const touched = new Int32Array(nS);
  let touchEpoch = 0;
  /**
   * Exact shortcut of the rank test: two elementary parents with no common
   * reaction, joined at b, whose reactions touch no processed species other
   * than b in common, make an elementary pathway (a null vector restricted to
   * either parent's columns must be a multiple of that parent, and the row of
   * b fixes the ratio).
   */
  const joinIsElementary = (w: Work, b: number): boolean => {
    if (!w.parents || w.overlap) return false;
    const [k, l] = w.parents;
    if (!k.elementary || !l.elementary) return false;
    const e = ++touchEpoch;
    // indexed loops: this runs for every new pathway, much of it before V8 optimises it, where for-of allocates
    for (let t = 0; t < k.rx.length; t++) {
      const idx = nets[k.rx[t]].idx;
      for (let q = 0; q < idx.length; q++) if (processed[idx[q]] === 1) touched[idx[q]] = e;
    }
    for (let t = 0; t < l.rx.length; t++) {
      const idx = nets[l.rx[t]].idx;
      for (let q = 0; q < idx.length; q++) if (idx[q] !== b && touched[idx[q]] === e) return false;
    }
    return true;
  };
  const storage: PathwaySet["storage"] = [];
  let truncated = false;
  let joins = 0;
  let processedCount = 0;

  for (const { i: b } of order) {
    const producers: Work[] = [];
    const consumers: Work[] = [];
    // pathways that neither make nor use b stay where they are; the map becomes the next one in place
    const next = current;
    let Pcur = 0;
    let Dcur = 0;
    // forEach, not for-of: the same entries in the same order, without an iterator result per entry in cold code
    current.forEach((w) => {
      const v = valueAt(w.net, b);
      if (v > 0) {
        producers.push(w);
        Pcur += w.rate * v;
        current.delete(w.key);
      } else if (v < 0) {
        consumers.push(w);
        Dcur -= w.rate * v;
        current.delete(w.key);
      }
    });
    if (joins + producers.length * consumers.length > opt.maxJoins) {
      // over budget: b and the species after it stay as they are
      for (const w of producers) current.set(w.key, w);
      for (const w of consumers) current.set(w.key, w);
      warnings.push(
        `the pathway search stopped after ${processedCount} of ${order.length} branching points (${joins} joins made, ${producers.length * consumers.length} more needed at ${mech.species[b].id}, budget ${opt.maxJoins}): the species left are not split further, so pathways through them are reported as chains that make or use them (raise fminRelative to search further)`,
      );
      break;
    }
    processedCount++;
    processed[b] = 1;
    const dP = deletedPos[b];
    const dD = deletedNeg[b];
    const P = Pcur + dP;
    const D = Dcur + dD;
    const T = Math.max(P, D);
    storage.push({ species: mech.species[b].id, rate_cm3s: P - D });
    if (!(T > 0)) {
      current = next;
      continue;
    }
    const pq = producers.map((w, k) =>
      rationalOrThrow(valueAt(w.net, b), `pathway producing ${mech.species[b].id} [${k}]`),
    );
    const dq = consumers.map((w, l) =>
      rationalOrThrow(-valueAt(w.net, b), `pathway consuming ${mech.species[b].id} [${l}]`),
    );

    const created = new Map<string, Work>();
    const sums = (w: Work) => tracked.map(([, wt]) => weightedSum(w.net, wt));
    const maxOf = (w: Work) => w.mx.reduce((x, y) => Math.max(x, y), 0);
    const consumerSums = consumers.map(sums);
    const consumerMax = consumers.map(maxOf);
    // Joins deleted before they are built: their flux and net are linear in the parents, so each parent's share is
    // summed and removed once; only at branching points still to come, where one parent produces what the other
    // consumes, does the joined net differ from the sum of the parts in its sign split (corrected per join).
    const future = (w: Work): SparseVector => {
      const idx: number[] = [];
      const val: number[] = [];
      for (let t = 0; t < w.net.idx.length; t++) {
        const sp = w.net.idx[t];
        if (candidate[sp] === 1 && processed[sp] === 0) {
          idx.push(sp);
          val.push(w.net.val[t]);
        }
      }
      return { idx, val };
    };
    const consumerFuture = consumers.map(future);
    const shareK = new Float64Array(producers.length);
    const shareL = new Float64Array(consumers.length);
    const removeJoin = (
      rate: number,
      a: number,
      ik: number,
      kf: SparseVector,
      kSums: number[],
      c: number,
      il: number,
    ) => {
      if (!(rate > 0)) return;
      shareK[ik] += rate * a;
      shareL[il] += rate * c;
      const lf = consumerFuture[il];
      let i = 0;
      let j = 0;
      while (i < kf.idx.length && j < lf.idx.length) {
        if (kf.idx[i] < lf.idx[j]) i++;
        else if (kf.idx[i] > lf.idx[j]) j++;
        else {
          const x = a * kf.val[i++];
          const y = c * lf.val[j];
          const sp = lf.idx[j++];
          if (x > 0 === y > 0) continue;
          const m = rate * Math.min(Math.abs(x), Math.abs(y));
          deletedPos[sp] -= m;
          deletedNeg[sp] -= m;
        }
      }
      const wl = consumerSums[il];
      for (let t = 0; t < trackedSums.length; t++) {
        const dx = rate * (a * kSums[t] + c * wl[t]);
        if (dx > 0) trackedSums[t].produced_cm3s += dx;
        else trackedSums[t].destroyed_cm3s -= dx;
      }
    };
    const fdOf = consumers.map((l, il) => l.rate * (dq[il][0] / dq[il][1]));
    joins += producers.length * consumers.length;
    producers.forEach((k, ik) => {
      const fp = k.rate * (pq[ik][0] / pq[ik][1]);
      const kSums = sums(k);
      const kMax = maxOf(k);
      const kFuture = future(k);
      const [pn, pd] = pq[ik];
      for (let il = 0; il < consumers.length; il++) {
        const l = consumers[il];
        const fd = fdOf[il];
        // smallest a, c with a·p = c·d = L (matchingMultipliers, inlined: this loop runs for every pair)
        const [dn, dd] = dq[il];
        let a = 1;
        let c = 1;
        let L = pn;
        if (pd !== 1 || dd !== 1 || pn !== dn) {
          const m = matchingMultipliers(pq[ik], dq[il]);
          a = m.a;
          c = m.c;
          L = m.L;
        }
        let rate = (fp * fd) / (T * L);
        // rate × (largest multiplicity) does not change when the vector is made coprime, and bounds the rate of
        // every elementary part: below f_min the joined pathway is deleted before it is built.
        if (rate * (a * kMax + c * consumerMax[il]) < fmin) {
          removeJoin(rate, a, ik, kFuture, kSums, c, il);
          continue;
        }
        // merged multiplicities a·x_k + c·x_l, made coprime
        const rx: number[] = [];
        const mx: number[] = [];
        let p = 0;
        let q = 0;
        let overlap = false;
        while (p < k.rx.length || q < l.rx.length) {
          const rk = p < k.rx.length ? k.rx[p] : Number.POSITIVE_INFINITY;
          const rl = q < l.rx.length ? l.rx[q] : Number.POSITIVE_INFINITY;
          if (rk === rl) {
            overlap = true;
            rx.push(rk);
            mx.push(a * k.mx[p++] + c * l.mx[q++]);
          } else if (rk < rl) {
            rx.push(rk);
            mx.push(a * k.mx[p++]);
          } else {
            rx.push(rl);
            mx.push(c * l.mx[q++]);
          }
        }
        let g = 0;
        for (let t = 0; t < mx.length; t++) g = gcd(g, mx[t]);
        if (g > 1) for (let t = 0; t < mx.length; t++) mx[t] /= g;
        rate *= g;
        const net = axpy(a / g, k.net, c / g, l.net);
        const key = keyOf(rx, mx);
        const old = created.get(key);
        if (old) old.rate += rate;
        else created.set(key, { rx, mx, net, rate, key, elementary: false, parents: [k, l], overlap });
      }
      // unconnected shares: storage of b, and the share that fed deleted consumers
      if (T - D > BALANCE_TOLERANCE * T) add(next, { ...k, rate: (k.rate * (T - D)) / T });
      else remove((k.rate * (T - D)) / T, k);
      remove((k.rate * dD) / T, k);
    });
    for (let ik = 0; ik < producers.length; ik++) removeLinear(shareK[ik], producers[ik], b);
    for (let il = 0; il < consumers.length; il++) removeLinear(shareL[il], consumers[il], b);
    for (const l of consumers) {
      if (T - P > BALANCE_TOLERANCE * T) add(next, { ...l, rate: (l.rate * (T - P)) / T });
      else remove((l.rate * (T - P)) / T, l);
      remove((l.rate * dP) / T, l);
    }

    created.forEach((w) => {
      const parents = w.parents;
      w.parents = undefined;
      if (next.has(w.key) || w.net.idx.length === 0) {
        add(next, w);
        return;
      }
      // Every elementary part of w runs at most at rate·max(multiplicity) < f_min, so all of them would be
      // deleted: deleting w whole removes the same flux and net effect, without the split.
      let mMax = 0;
      for (let t = 0; t < w.mx.length; t++) mMax = Math.max(mMax, w.mx[t]);
      if (w.rate * mMax < fmin) {
        remove(w.rate, w);
        return;
      }
      w.parents = parents;
      const shortcut = joinIsElementary(w, b);
      w.parents = undefined;
      const isRow = (s: number) => processed[s] === 1 && valueAt(w.net, s) === 0;
      if (shortcut || isElementary(w.rx, nets, isRow, work)) {
        w.elementary = true;
        add(next, w);
        return;
      }
      const parts = decomposeElementary(
        w.mx.map((m) => m * w.rate),
        w.rx,
        nets,
        isRow,
        work,
      );
      if (!parts) {
        warnings.push(
          `a pathway through ${mech.species[b].id} could not be split into elementary pathways; kept whole`,
        );
        add(next, w);
        return;
      }
      for (const part of parts) {
        const rx: number[] = [];
        const mx: number[] = [];
        part.multiplicity.forEach((m, t) => {
          if (m > 0) {
            rx.push(w.rx[t]);
            mx.push(m);
          }
        });
        const key = keyOf(rx, mx);
        const known = next.get(key);
        if (known && part.rate >= fmin) {
          known.rate += part.rate;
          continue;
        }
        add(next, { rx, mx, net: known ? known.net : combineNets(rx, mx), rate: part.rate, key, elementary: true });
      }
    });

    if (next.size > opt.maxPathways) {
      const sorted = [...next.values()].sort((x, y) => y.rate - x.rate);
      for (const w of sorted.slice(opt.maxPathways)) {
        remove(w.rate, w);
        next.delete(w.key);
      }
      truncated = true;
    }
    current = next;
  }
  if (truncated)
    warnings.push(
      `more than ${opt.maxPathways} pathways at some branching point: the slowest were deleted (raise fminRelative to avoid this)`,
    );

  const pathways: Pathway[] = [...current.values()]
    .sort((x, y) => y.rate - x.rate)
    .map((w) => ({
      steps: w.rx.map((reaction, t) => ({ reaction, multiplicity: w.mx[t] })),
      rate_cm3s: w.rate,
      net: w.net.idx.map((species, t) => ({ species, coef: w.net.val[t] })),
    }));
  return {
    pathways,
    branchingPoints: order.slice(0, processedCount).map((o) => mech.species[o.i].id),
    fmin_cm3s: fmin,
    deleted: { net_cm3s: Array.from(deletedNet), flux_cm3s: Array.from(deletedFlux), tracked: deletedTracked },
    nullCycleRate_cm3s: nullRate,
    storage,
    warnings,
  };
}
