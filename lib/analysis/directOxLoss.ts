/**
 * Direct odd-oxygen loss written from the rate-limiting reactions, the form
 * used in budget studies (e.g. 2k[O][O3] + 2k[NO2][O] + 2k[ClO][O] +
 * 2k[BrO][O] + k[HO2][O3] + k[OH][O3] + k[HO2][O] + k[OH][O] + k[O(1D)][H2O]
 * + 2k[ClO][BrO] + …), computed without any pathway analysis.
 *
 * Rule (this project's): each reaction j is weighed by the odd oxygen it
 * destroys when Ox is counted with the extended weights of oxWeights.ts,
 * w_j = −Σ_i E_i S_ij. With those weights the fast exchanges inside the
 * family (NO + O3 → NO2, NO2 + hv, Cl + O3 → ClO, ClO + NO, reservoir
 * formation and photolysis) weigh 0, so only the rate-limiting steps remain.
 * Reactions that create Ox (w_j < 0) are primary sources and left out when
 * they consume no hydrogen-containing species (O2 + hv, NO + hv, N + O2).
 * The others (HO2 + NO, CH3O2 + NO, HO2NO2 + hv → OH + NO3, …) undo an
 * earlier Ox-destroying HOx step when their radical was made by one (the
 * HO2 + NO / OH + O3 null cycle) but are true Ox production when it came from
 * CO, CH4 or H2 oxidation; they are counted with weight w_j·φ, φ the mean
 * over their hydrogen-containing reactants of the share of that radical's
 * production whose last Ox-relevant step destroyed Ox (a fixed point over the
 * production rates, backConversionShares). L_direct = Σ_j w_j r_j.
 *
 * Units: molecules cm⁻³ s⁻¹.
 */
import type { CompiledMechanism } from "../mechanism/types";
import type { SteadyState } from "../solver/types";
import { oxWeights } from "./oxWeights";
import { reactionNet } from "./reactionNet";
import { weightedSum } from "./sparseVector";
import type { DirectTerm } from "./types";
import { validateState } from "./validateState";

/** Fixed-point sweeps for the back-conversion shares (they converge geometrically; 60 is ample). */
const SWEEPS = 60;

/**
 * φ_X for every hydrogen-containing solved species X: the share of X's
 * production whose last Ox-relevant step destroyed odd oxygen. A producing
 * step counts 1 if it destroys Ox (w > 0), 0 if it creates Ox (w < 0), and
 * passes on the mean φ of its hydrogen-containing reactants if it is Ox-neutral.
 */
function backConversionShares(mech: CompiledMechanism, raw: Float64Array, rates: number[]): Float64Array {
  const nS = mech.species.length;
  const hydrogenous = mech.species.map((sp) => sp.role === "solved" && (sp.atoms.H ?? 0) > 0);
  const hReactants = mech.reactions.map((r) => r.reactants.map((t) => t.species).filter((i) => hydrogenous[i]));
  const P = new Float64Array(nS);
  mech.reactions.forEach((r, j) => {
    for (const t of r.products) if (hydrogenous[t.species]) P[t.species] += t.coef * rates[j];
  });
  let phi = new Float64Array(nS);
  for (let sweep = 0; sweep < SWEEPS; sweep++) {
    const next = new Float64Array(nS);
    mech.reactions.forEach((r, j) => {
      if (!(rates[j] > 0)) return;
      let psi = 0;
      if (raw[j] > 0) psi = 1;
      else if (raw[j] === 0 && hReactants[j].length)
        psi = hReactants[j].reduce((s, i) => s + phi[i], 0) / hReactants[j].length;
      if (psi === 0) return;
      for (const t of r.products) if (hydrogenous[t.species]) next[t.species] += t.coef * rates[j] * psi;
    });
    for (let i = 0; i < nS; i++) next[i] = P[i] > 0 ? Math.min(1, next[i] / P[i]) : 0;
    phi = next;
  }
  return phi;
}

/** Weight of every reaction in the direct formula (Ox destroyed per event). */
export function directOxWeights(mech: CompiledMechanism, state: Pick<SteadyState, "rate_cm3s">): Float64Array {
  const { weights } = oxWeights(mech, "extended");
  const nets = reactionNet(mech);
  const rates = state.rate_cm3s.map((r) => Math.max(r, 0));
  const raw = Float64Array.from(
    nets.map((net) => {
      const w = -weightedSum(net, weights);
      return Math.abs(w) < 1e-12 ? 0 : w;
    }),
  );
  const phi = backConversionShares(mech, raw, rates);
  return raw.map((w, j) => {
    if (w >= 0) return w;
    const h = mech.reactions[j].reactants.filter(
      (t) => mech.species[t.species].role === "solved" && (mech.species[t.species].atoms.H ?? 0) > 0,
    );
    if (h.length === 0) return 0;
    return (w * h.reduce((s, t) => s + phi[t.species], 0)) / h.length;
  });
}

export function directOxLoss(
  mech: CompiledMechanism,
  state: Pick<SteadyState, "numberDensity_cm3" | "rate_cm3s">,
): { loss_cm3s: number; terms: DirectTerm[] } {
  validateState(mech, state);
  const w = directOxWeights(mech, state);
  const terms: DirectTerm[] = [];
  let loss = 0;
  mech.reactions.forEach((r, j) => {
    if (w[j] === 0) return;
    const rate = Math.max(0, state.rate_cm3s[j]);
    const l = w[j] * rate;
    loss += l;
    terms.push({ reactionId: r.id, equation: r.equation, weight: w[j], loss_cm3s: l });
  });
  terms.sort((a, b) => Math.abs(b.loss_cm3s) - Math.abs(a.loss_cm3s));
  return { loss_cm3s: loss, terms };
}
