/**
 * Uncertainty factor of a rate coefficient in the form of the NASA/JPL
 * evaluation (Publication 19-5, Section 1): f(T) = f(298) exp|g (1/T − 1/298)|.
 * g and T in K; f is dimensionless (a 1σ multiplicative factor).
 */
import type { Uncertainty } from "./types";

export function uncertaintyFactor(u: Uncertainty, T_K: number): number {
  return u.f298 * Math.exp(Math.abs(u.g * (1 / T_K - 1 / 298)));
}
