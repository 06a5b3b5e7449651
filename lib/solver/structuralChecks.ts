/**
 * Structural reasons why a steady state cannot exist or is undetermined,
 * found from the reaction graph before any iteration:
 * - species with no chemical source: not reachable from the held species
 *   through reactions with k > 0 (e.g. radicals when every J = 0);
 * - species produced but never lost;
 * - linear combinations of the unknowns conserved by every active reaction
 *   and not fixed by a pool total (singular Jacobian).
 * Reachability is the usual closure over the species–reaction graph (common practice).
 */
import type { ChemSystem } from "./buildSystem";

export interface StructuralReport {
  /** unknown indices with no chemical source */
  noSource: number[];
  /** unknown indices produced but never lost */
  neverLost: number[];
  /** relations (pool or conservation ids) that make the system singular */
  conserved: { id: string; expression: string; isPool: boolean }[];
  /** 1 where an unknown can become positive */
  reachable: Uint8Array;
}

export function structuralChecks(sys: ChemSystem, kEff: Float64Array): StructuralReport {
  const { n, nReactions: nr, rStart, rUnknown, sStart, sUnknown, sNu } = sys;
  const reachable = new Uint8Array(n);
  const fired = new Uint8Array(nr);
  const propagate = () => {
    let changed = true;
    while (changed) {
      changed = false;
      for (let j = 0; j < nr; j++) {
        if (fired[j] || !(kEff[j] > 0)) continue;
        let ok = true;
        for (let q = rStart[j]; q < rStart[j + 1]; q++) if (!reachable[rUnknown[q]]) ok = false;
        if (!ok) continue;
        fired[j] = 1;
        for (let s = sStart[j]; s < sStart[j + 1]; s++) {
          if (sNu[s] > 0 && !reachable[sUnknown[s]]) {
            reachable[sUnknown[s]] = 1;
            changed = true;
          }
        }
      }
    }
  };
  propagate();
  // A pool with a positive total holds atoms even when nothing makes them: seed its members.
  for (const c of sys.constraints) {
    let any = false;
    for (const m of c.members) if (reachable[m]) any = true;
    if (!any) {
      for (const m of c.members) reachable[m] = 1;
      propagate();
    }
  }
  const inPool = new Uint8Array(n);
  for (const c of sys.constraints) for (const m of c.members) inPool[m] = 1;

  const noSource: number[] = [];
  const lost = new Uint8Array(n);
  for (let j = 0; j < nr; j++) {
    if (!fired[j]) continue;
    for (let s = sStart[j]; s < sStart[j + 1]; s++) if (sNu[s] < 0) lost[sUnknown[s]] = 1;
  }
  const neverLost: number[] = [];
  for (let i = 0; i < n; i++) {
    if (!reachable[i]) noSource.push(i);
    else if (!lost[i] && !inPool[i]) neverLost.push(i);
  }

  const conserved: StructuralReport["conserved"] = [];
  const relations = [
    ...sys.unconstrainedPools.map((p) => ({ rel: sys.mech.pools[p], isPool: true })),
    ...(sys.mech.conservation ?? []).map((rel) => ({ rel, isPool: false })),
  ];
  const seen = new Set<string>();
  for (const { rel, isPool } of relations) {
    const w = new Float64Array(n);
    let any = false;
    for (const t of rel.weights) {
      const u = sys.unknownOf[t.species];
      if (u >= 0 && reachable[u]) {
        w[u] += t.coef;
        any = true;
      }
    }
    if (!any || seen.has(rel.id)) continue;
    let isConserved = true;
    for (let j = 0; j < nr && isConserved; j++) {
      if (!fired[j]) continue;
      let sum = 0;
      let mag = 0;
      for (let s = sStart[j]; s < sStart[j + 1]; s++) {
        sum += w[sUnknown[s]] * sNu[s];
        mag += Math.abs(w[sUnknown[s]] * sNu[s]);
      }
      if (Math.abs(sum) > 1e-12 * (mag + 1)) isConserved = false;
    }
    if (!isConserved || coveredByConstraint(sys, w)) continue;
    seen.add(rel.id);
    conserved.push({ id: rel.id, expression: rel.expression, isPool });
  }
  return { noSource, neverLost, conserved, reachable };
}

/** True when w (over unknowns) is proportional to the weights of one pool constraint. */
function coveredByConstraint(sys: ChemSystem, w: Float64Array): boolean {
  for (const c of sys.constraints) {
    const v = new Float64Array(sys.n);
    for (let q = 0; q < c.members.length; q++) v[c.members[q]] += c.weights[q];
    let ratio = 0;
    let ok = true;
    for (let i = 0; i < sys.n && ok; i++) {
      if ((w[i] === 0) !== (v[i] === 0)) ok = false;
      else if (w[i] !== 0) {
        const r = w[i] / v[i];
        if (ratio === 0) ratio = r;
        else if (Math.abs(r - ratio) > 1e-12 * Math.abs(ratio)) ok = false;
      }
    }
    if (ok) return true;
  }
  return false;
}
