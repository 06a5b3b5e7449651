/**
 * Basis of the left null space of the solved-species stoichiometric matrix:
 * weight vectors w with Σᵢ wᵢ S[i][j] = 0 for every reaction j, i.e. exact
 * conservation relations. Method: sparse Gauss–Jordan elimination over the
 * reaction rows, taking as pivot the species that the fewest reactions touch
 * (a Markowitz-like choice that keeps hub radicals such as OH for last and
 * fill-in small on chemical networks). Floating point with a relative drop
 * tolerance; coefficients of chemical equations are small rationals.
 */
import type { SparseStoichiometry } from "./types";

export const DEFAULTS = {
  /** entries below this fraction of the row's largest are dropped */
  dropTolerance: 1e-10,
  /** stop (and report incomplete) beyond this many stored nonzeros */
  maxNonzeros: 4_000_000,
};

export interface NullSpaceResult {
  /** sparse basis vectors over species indices (one per free species), each with a 1 at its free species */
  basis: Map<number, number>[];
  /** false when the size budget stopped the elimination */
  complete: boolean;
}

/**
 * Left null space restricted to the species in `columns` (e.g. the solved
 * species); the other species' rows are ignored.
 */
export function leftNullSpace(
  stoich: SparseStoichiometry,
  columns: readonly number[],
  options: Partial<typeof DEFAULTS> = {},
): NullSpaceResult {
  const opt = { ...DEFAULTS, ...options };
  const inSet = new Set(columns);
  const degree = new Map<number, number>();
  for (const c of columns) degree.set(c, stoich.rows[c].length);
  /** pivot species → its row (normalised to 1 at the pivot, no other pivot species in it) */
  const pivotRows = new Map<number, Map<number, number>>();
  /** non-pivot species → pivot species whose rows contain it */
  const holders = new Map<number, Set<number>>();
  let nonzeros = 0;

  const addHolder = (c: number, p: number) => {
    const s = holders.get(c);
    if (s) s.add(p);
    else holders.set(c, new Set([p]));
  };

  for (const col of stoich.columns) {
    const row = new Map<number, number>();
    for (const t of col) if (inSet.has(t.species)) row.set(t.species, t.coef);
    if (row.size === 0) continue;
    // reduce by the existing pivots (their rows hold no other pivot species)
    for (const c of [...row.keys()]) {
      const P = pivotRows.get(c);
      if (!P) continue;
      const f = row.get(c)!;
      for (const [k, v] of P) row.set(k, (row.get(k) ?? 0) - f * v);
      row.delete(c);
    }
    let big = 0;
    for (const v of row.values()) big = Math.max(big, Math.abs(v));
    for (const [k, v] of row) if (Math.abs(v) <= opt.dropTolerance * big) row.delete(k);
    if (row.size === 0) continue;
    let p = -1;
    for (const k of row.keys()) {
      if (p < 0 || degree.get(k)! < degree.get(p)! || (degree.get(k) === degree.get(p) && k < p)) p = k;
    }
    const inv = 1 / row.get(p)!;
    for (const [k, v] of row) row.set(k, v * inv);
    // eliminate p from the rows that hold it
    const holding = holders.get(p);
    if (holding) {
      for (const q of holding) {
        const Q = pivotRows.get(q)!;
        const f = Q.get(p)!;
        nonzeros -= Q.size;
        for (const [k, v] of row) {
          if (k === p) continue;
          const nv = (Q.get(k) ?? 0) - f * v;
          if (Math.abs(nv) <= opt.dropTolerance) {
            if (Q.delete(k)) holders.get(k)?.delete(q);
          } else {
            if (!Q.has(k)) addHolder(k, q);
            Q.set(k, nv);
          }
        }
        Q.delete(p);
        nonzeros += Q.size;
      }
      holders.delete(p);
    }
    pivotRows.set(p, row);
    nonzeros += row.size;
    for (const k of row.keys()) if (k !== p) addHolder(k, p);
    if (nonzeros > opt.maxNonzeros) return { basis: [], complete: false };
  }

  const basis: Map<number, number>[] = [];
  for (const f of columns) {
    if (pivotRows.has(f)) continue;
    const w = new Map<number, number>([[f, 1]]);
    const holding = holders.get(f);
    if (holding) for (const q of holding) w.set(q, -pivotRows.get(q)!.get(f)!);
    basis.push(w);
  }
  return { basis, complete: true };
}
