/**
 * The coefficient that multiplies Π[reactant]^coef in a compiled reaction's
 * rate: the law's value, times [M] when the equation is written with + M and
 * the law does not already include it (an Arrhenius expression with + M, e.g.
 * the [M]-dependent part of HO2 + HO2 in JPL 19-5). Units depend on the order.
 */
import type { CompiledReaction } from "../mechanism/types";
import { lawIncludesM, rateConstant } from "./rateConstant";
import type { KineticsEnv } from "./types";

export function effectiveRateConstant(reaction: CompiledReaction, env: KineticsEnv): number {
  const k = rateConstant(reaction.rate, env);
  return reaction.thirdBody && !lawIncludesM(reaction.rate) ? k * env.M_cm3 : k;
}
