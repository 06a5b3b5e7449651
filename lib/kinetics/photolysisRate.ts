/**
 * Photolysis frequency of a reaction: the J of a named channel computed by the
 * photolysis module, scaled by a factor (a multiple of another channel), or a
 * fixed J. Units: s⁻¹. A channel missing from the conditions has J = 0 (night).
 */
import { ownValue } from "../idRecord";

/** J = factor · J(channel); a missing channel gives 0. */
export function photolysisRate(channel: string, J_s: Readonly<Record<string, number>>, factor = 1): number {
  const J = ownValue(J_s, channel);
  return J === undefined ? 0 : factor * J;
}
