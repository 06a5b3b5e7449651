/**
 * Which balance equation each pool total replaces: the dominant reservoir of
 * the pool gives up its own (common practice for conserved families in
 * steady-state solvers). Kept apart from initialGuess.ts and newtonLog.ts,
 * which both call it.
 *
 * Units: molecules cm⁻³ (x), s⁻¹ (loss frequencies).
 */
import type { ChemSystem } from "./buildSystem";

/**
 * For each pool total, the member with the largest weighted amount (the
 * dominant reservoir) gives up its balance equation; greedily distinct across
 * pools, in mechanism order. Ties go to the longest-lived member (smallest
 * loss frequency `lossFrequency[i]`). With `hysteresis` > 1 a current choice is
 * kept unless another member is larger by that factor. Returns true when any
 * choice changed.
 */
export function chooseReplaced(
  sys: ChemSystem,
  x: Float64Array,
  lossFrequency?: Float64Array,
  hysteresis = 1,
): boolean {
  const taken = new Set<number>();
  let changed = false;
  for (const c of sys.constraints) {
    if (hysteresis > 1 && c.replaced >= 0 && !taken.has(c.replaced)) {
      // keep the current choice unless another member exceeds it by the factor `hysteresis`
      let current = 0;
      let largest = 0;
      for (let q = 0; q < c.members.length; q++) {
        const a = c.weights[q] * x[c.members[q]];
        if (c.members[q] === c.replaced) current = a;
        if (!taken.has(c.members[q])) largest = Math.max(largest, a);
      }
      if (current * hysteresis >= largest) {
        taken.add(c.replaced);
        continue;
      }
    }
    let best = -1;
    let bestAmount = -1;
    for (let q = 0; q < c.members.length; q++) {
      const m = c.members[q];
      if (taken.has(m)) continue;
      const amount = c.weights[q] * x[m];
      const better =
        amount > bestAmount * (1 + 1e-9) ||
        (amount >= bestAmount * (1 - 1e-9) && lossFrequency !== undefined && lossFrequency[m] < lossFrequency[best]);
      if (best < 0 || better) {
        best = m;
        bestAmount = amount;
      }
    }
    if (best < 0) best = c.members[0];
    taken.add(best);
    if (c.replaced !== best) changed = true;
    c.replaced = best;
  }
  return changed;
}
