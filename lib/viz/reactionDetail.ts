/**
 * Which reactions the network draws at a given level of detail: the ones that
 * carry the largest part of the flux (colour by rate) or of the odd oxygen
 * destroyed (colour by Ox), at most `limit` of them, never one with zero
 * flux. Reactions listed in `keep` (a selected cycle's steps, the inspected
 * reaction) are drawn whatever their rank. Before any analysis every reaction
 * is drawn. Pure; rates in molecules cm⁻³ s⁻¹.
 */
import type { AnalysisResult } from "../engine/types";
import type { ColorMode, MechanismView } from "./types";

export const DETAIL_DEFAULTS = {
  /** largest number of reactions drawn; default 40 (Infinity draws every reaction with flux) */
  limit: 40,
  /** what ranks the reactions; default "flux" */
  colorMode: "flux" as ColorMode,
};

/**
 * The most reactions the explorer draws of a very large mechanism (more than
 * LARGE_MECHANISM_SPECIES species), whatever the detail control says: more
 * would make the canvas's first drawing one long task of seconds.
 */
export const LARGE_MECHANISM_CAP = 120;

/** The choices offered by the detail control, reactions drawn at most. */
export const DETAIL_LEVELS = [15, 25, 40, 80, Infinity] as const;

export interface DetailOptions extends Partial<typeof DETAIL_DEFAULTS> {
  /** reaction ids always drawn when they exist */
  keep?: readonly string[];
  /**
   * hard cap on the reactions drawn, whatever `limit` says; with a cap, the
   * view before any analysis draws the first min(cap, limit) reactions in
   * mechanism order instead of all; `keep` still adds to it; default no cap.
   * The explorer sets it for very large mechanisms.
   */
  cap?: number;
}

export interface ReactionDetail {
  /** ids of the reactions drawn, in mechanism order */
  shown: string[];
  /** reactions not drawn, zero-flux ones included */
  hidden: number;
  /** of the hidden, how many have zero flux */
  zeroFlux: number;
  /** share of the ranking quantity (Σ rate or Σ Ox destroyed) the drawn reactions carry, 0–1; null before an analysis */
  covered: number | null;
}

export function reactionDetail(
  mech: Pick<MechanismView, "reactions">,
  result: AnalysisResult | null,
  options: DetailOptions = {},
): ReactionDetail {
  const o = { ...DETAIL_DEFAULTS, ...options };
  if (!(o.limit > 0)) throw new RangeError(`reactionDetail: invalid limit: ${o.limit} (expected a positive count)`);
  const cap = options.cap ?? Infinity;
  if (!(cap > 0)) throw new RangeError(`reactionDetail: invalid cap: ${cap} (expected a positive count)`);
  const ids = mech.reactions.map((r) => r.id);
  /** `chosen` with the kept reactions that exist added */
  const withKept = (chosen: Set<string>): Set<string> => {
    if (!o.keep?.length) return chosen;
    const exists = new Set(ids);
    for (const id of o.keep) if (exists.has(id)) chosen.add(id);
    return chosen;
  };
  if (!result) {
    if (ids.length <= cap) return { shown: ids, hidden: 0, zeroFlux: 0, covered: null };
    const chosen = withKept(new Set(ids.slice(0, Math.min(cap, o.limit))));
    return { shown: ids.filter((id) => chosen.has(id)), hidden: ids.length - chosen.size, zeroFlux: 0, covered: null };
  }
  const order = new Map(ids.map((id, i) => [id, i]));
  const rate = new Map(result.steadyState.reactions.map((r) => [r.id, r.rate_cm3s]));
  const ox = new Map(result.cycles.perReaction.map((r) => [r.reactionId, r.oxDestroyed_cm3s]));
  const flowing = ids.filter((id) => (rate.get(id) ?? 0) > 0);
  const weight = (id: string) => (o.colorMode === "ox" ? (ox.get(id) ?? 0) : (rate.get(id) ?? 0));
  // Ox mode: the Ox destroyed ranks first, the rate breaks ties (most reactions destroy none)
  const ranked = [...flowing].sort(
    (a, b) => weight(b) - weight(a) || (rate.get(b) ?? 0) - (rate.get(a) ?? 0) || order.get(a)! - order.get(b)!,
  );
  const chosen = withKept(new Set(ranked.slice(0, Math.min(o.limit, cap, ranked.length))));
  const total = flowing.reduce((a, id) => a + weight(id), 0);
  const carried = [...chosen].reduce((a, id) => a + weight(id), 0);
  return {
    shown: ids.filter((id) => chosen.has(id)),
    hidden: ids.length - chosen.size,
    zeroFlux: ids.filter((id) => !chosen.has(id) && !((rate.get(id) ?? 0) > 0)).length,
    covered: total > 0 ? carried / total : 0,
  };
}
