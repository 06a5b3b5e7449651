/**
 * Production and loss of one species by reaction: rate × net stoichiometric
 * coefficient from each equation, molecules cm⁻³ s⁻¹, sorted largest first,
 * each with its share of the species' total production or loss.
 */
import type { ReactionState } from "../solver/types";
import { equationView } from "./equationView";

export interface SpeciesTerm {
  reactionId: string;
  equation: string;
  /** molecules cm⁻³ s⁻¹, > 0 */
  rate_cm3s: number;
  /** 0–1 of the column total */
  share: number;
}

export interface SpeciesBudget {
  production: SpeciesTerm[];
  loss: SpeciesTerm[];
  /** molecules cm⁻³ s⁻¹ */
  totalProduction_cm3s: number;
  totalLoss_cm3s: number;
}

export function speciesBudget(speciesId: string, reactions: readonly ReactionState[]): SpeciesBudget {
  const production: SpeciesTerm[] = [];
  const loss: SpeciesTerm[] = [];
  for (const r of reactions) {
    const eq = equationView(r.equation);
    let c = 0;
    for (const t of eq.products) if (t.species === speciesId) c += t.coef;
    for (const t of eq.reactants) if (t.species === speciesId) c -= t.coef;
    if (c === 0 || !(r.rate_cm3s > 0)) continue;
    const term = { reactionId: r.id, equation: r.equation, rate_cm3s: Math.abs(c) * r.rate_cm3s, share: 0 };
    (c > 0 ? production : loss).push(term);
  }
  const finish = (list: SpeciesTerm[]) => {
    list.sort((a, b) => b.rate_cm3s - a.rate_cm3s || a.reactionId.localeCompare(b.reactionId));
    const total = list.reduce((s, t) => s + t.rate_cm3s, 0);
    for (const t of list) t.share = total > 0 ? t.rate_cm3s / total : 0;
    return total;
  };
  const totalProduction_cm3s = finish(production);
  const totalLoss_cm3s = finish(loss);
  return { production, loss, totalProduction_cm3s, totalLoss_cm3s };
}
