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
 * Steps that consume a hydrogen-containing radical can cancel an earlier step
 * in that radical's history: HO2 + NO → OH + NO2 gives back the Ox that the
 * OH + O3 which made the HO2 took (the HO2 + NO / OH + O3 null cycle), and an
 * OH + O3 takes back the Ox that a CH3O2 + NO or HO2 + NO upstream created.
 * Each radical therefore carries a balance (carriedBalance): the share of its
 * production still owing an Ox destroyed (deficit) and the share still
 * holding an Ox created (surplus); an event's balance is shared among its
 * hydrogen-containing product molecules. A creating step enters the loss with
 * weight w_j·deficit (w_j < 0: the share that gives back an Ox counted as
 * destroyed upstream; the rest is production, not loss), a destroying step
 * with w_j·(1 − surplus) (the surplus share takes back an Ox whose creation
 * was never counted). Each cancellation is counted once, at whichever of the
 * two steps comes second. L_direct = Σ_j w_j r_j.
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

/** Fixed-point sweeps for the carried balance: until no share changes by more than TOLERANCE, at most MAX_SWEEPS. */
const MAX_SWEEPS = 2000;
const TOLERANCE = 1e-13;

/**
 * The odd-oxygen balance a hydrogen-containing radical carries from the steps
 * that made it: deficit[X] is the share of X's production whose last
 * Ox-relevant step destroyed Ox not yet given back, surplus[X] the share whose
 * last such step created Ox not yet taken back. A destroying step made from a
 * surplus, or a creating step made from a deficit, cancels and leaves the
 * product neutral; Ox-neutral steps pass on the mean balance of their
 * hydrogen-containing reactants.
 */
interface CarriedBalance {
  deficit: Float64Array;
  surplus: Float64Array;
}

function carriedBalance(mech: CompiledMechanism, raw: Float64Array, rates: number[]): CarriedBalance {
  const nS = mech.species.length;
  const hydrogenous = mech.species.map((sp) => sp.role === "solved" && (sp.atoms.H ?? 0) > 0);
  const P = new Float64Array(nS);
  mech.reactions.forEach((r, j) => {
    for (const t of r.products) if (hydrogenous[t.species]) P[t.species] += t.coef * rates[j];
  });
  // The reactions that pass a balance on (a rate > 0 and a hydrogen-containing product), flattened once: their
  // hydrogen-containing reactants (hStart..), and their hydrogen-containing products with coef·share, where an
  // event's balance is shared among its hydrogen-containing product molecules (O(1D) + H2O -> 2 OH destroys one
  // Ox, so each OH owes half of it). The sweeps below visit these in reaction order, as the plain loop would.
  const active: number[] = [];
  const hStart = [0];
  const hSpecies: number[] = [];
  const pStart = [0];
  const pSpecies: number[] = [];
  const pShare: number[] = [];
  mech.reactions.forEach((r, j) => {
    const hProducts = r.products.reduce((n, t) => (hydrogenous[t.species] ? n + t.coef : n), 0);
    if (!(rates[j] > 0) || hProducts === 0) return;
    active.push(j);
    for (const t of r.reactants) if (hydrogenous[t.species]) hSpecies.push(t.species);
    hStart.push(hSpecies.length);
    const share = rates[j] / hProducts;
    for (const t of r.products)
      if (hydrogenous[t.species]) {
        pSpecies.push(t.species);
        pShare.push(t.coef * share);
      }
    pStart.push(pSpecies.length);
  });
  let deficit = new Float64Array(nS);
  let surplus = new Float64Array(nS);
  // two buffers for the next shares, swapped with the current ones after each sweep
  let nextD = new Float64Array(nS);
  let nextS = new Float64Array(nS);
  for (let sweep = 0; sweep < MAX_SWEEPS; sweep++) {
    nextD.fill(0);
    nextS.fill(0);
    for (let a = 0; a < active.length; a++) {
      const j = active[a];
      const h0 = hStart[a];
      const nh = hStart[a + 1] - h0;
      let d = 0;
      let u = 0;
      if (nh > 0) {
        for (let q = h0; q < h0 + nh; q++) d += deficit[hSpecies[q]];
        d /= nh;
        for (let q = h0; q < h0 + nh; q++) u += surplus[hSpecies[q]];
        u /= nh;
      }
      let toD = d;
      let toS = u;
      if (raw[j] > 0) {
        toD = 1 - u;
        toS = 0;
      } else if (raw[j] < 0) {
        toD = 0;
        toS = nh > 0 ? 1 - d : 0;
      }
      if (toD === 0 && toS === 0) continue;
      for (let q = pStart[a]; q < pStart[a + 1]; q++) {
        nextD[pSpecies[q]] += pShare[q] * toD;
        nextS[pSpecies[q]] += pShare[q] * toS;
      }
    }
    let change = 0;
    for (let i = 0; i < nS; i++) {
      nextD[i] = P[i] > 0 ? Math.min(1, nextD[i] / P[i]) : 0;
      nextS[i] = P[i] > 0 ? Math.min(1 - nextD[i], nextS[i] / P[i]) : 0;
      change = Math.max(change, Math.abs(nextD[i] - deficit[i]), Math.abs(nextS[i] - surplus[i]));
    }
    const oldD = deficit;
    const oldS = surplus;
    deficit = nextD;
    surplus = nextS;
    nextD = oldD;
    nextS = oldS;
    if (change <= TOLERANCE) break;
  }
  return { deficit, surplus };
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
  const { deficit, surplus } = carriedBalance(mech, raw, rates);
  return raw.map((w, j) => {
    if (w === 0) return 0;
    const h = mech.reactions[j].reactants.filter(
      (t) => mech.species[t.species].role === "solved" && (mech.species[t.species].atoms.H ?? 0) > 0,
    );
    if (h.length === 0) return Math.max(w, 0);
    const mean = (a: Float64Array) => h.reduce((s, t) => s + a[t.species], 0) / h.length;
    return w > 0 ? w * (1 - mean(surplus)) : w * mean(deficit);
  });
}

export function directOxLoss(
  mech: CompiledMechanism,
  state: Pick<SteadyState, "numberDensity_cm3" | "rate_cm3s">,
): { loss_cm3s: number; terms: DirectTerm[]; weights: Float64Array } {
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
  return { loss_cm3s: loss, terms, weights: w };
}
