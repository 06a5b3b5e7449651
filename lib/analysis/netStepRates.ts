/**
 * The rate of each reaction as a step of a cycle: its net rate when the
 * mechanism also has its reverse (an equilibrium pair such as
 * ClO + ClO + M ⇄ Cl2O2 + M), since the reverse undoes it; otherwise its
 * rate. A pair running against the step keeps the step's own rate. Used for
 * the rate-limiting step (docs/cycle-analysis.md): in the cold the net
 * association ClO + ClO + M equals the photolysis of Cl2O2 that follows it,
 * and the step that forms the dimer is the one named.
 *
 * Units: molecules cm⁻³ s⁻¹.
 */
import type { CompiledMechanism } from "../mechanism/types";

export function netStepRates(mech: CompiledMechanism, rates: readonly number[]): number[] {
  const out = rates.slice();
  for (const r of mech.reactions) {
    const f = r.forwardReaction;
    if (f === undefined) continue;
    const net = rates[f] - rates[r.index];
    if (net > 0) out[f] = net;
    else if (net < 0) out[r.index] = -net;
  }
  return out;
}
