/**
 * The signed odd-oxygen value of a reaction for the diverging colour mode,
 * molecules cm⁻³ s⁻¹: positive = Ox destroyed through the catalytic cycles the
 * reaction takes part in (ReactionOx.oxDestroyed_cm3s); negative = Ox the
 * reaction itself produces (the positive part of ReactionOx.netOxChange_cm3s,
 * e.g. O2 photolysis), when it destroys none.
 */
import type { ReactionOx } from "../analysis/types";

export function reactionOxValue(r: ReactionOx | undefined): number {
  if (!r) return 0;
  if (r.oxDestroyed_cm3s > 0) return r.oxDestroyed_cm3s;
  return r.netOxChange_cm3s > 0 ? -r.netOxChange_cm3s : 0;
}
