/**
 * Evaluates a rate law (data, never code) at the given conditions. Dispatches
 * to the pure law functions in this folder; see each for its method and source
 * (NASA/JPL Publication 19-5). Units follow `RateLaw`.
 */
import { EngineError } from "../errors";
import { arrhenius } from "./arrhenius";
import { chemicalActivation } from "./chemicalActivation";
import { equilibriumReverse } from "./equilibriumReverse";
import { lindemann } from "./lindemann";
import { photolysisRate } from "./photolysisRate";
import { surfaceArea_cm2cm3 } from "./surfaceArea";
import { termolecular } from "./termolecular";
import type { KineticsEnv, RateLaw } from "./types";
import { uptake } from "./uptake";

/**
 * The rate coefficient of `law` at `env` (termolecular laws include [M]). For a
 * law whose γ depends on amounts (`amountDependence`) it is the collision
 * frequency v̄ A / 4, which the solver multiplies by γ(amounts).
 */
export function rateConstant(law: RateLaw, env: KineticsEnv): number {
  switch (law.law) {
    case "arrhenius":
      return arrhenius(law.A, law.EoverR_K, env.T_K, law.b ?? 0);
    case "termolecular":
      return termolecular(law, env.T_K, env.M_cm3);
    case "chemical-activation":
      return chemicalActivation(law, env.T_K, env.M_cm3);
    case "lindemann":
      return lindemann(law, env.T_K, env.M_cm3);
    case "equilibrium-reverse":
      return equilibriumReverse(rateConstant(law.forward, env), law.Keq_A_cm3, law.Keq_B_K, env.T_K);
    case "photolysis":
      return photolysisRate(law.channel, env.J_s, law.factor ?? 1);
    case "photolysis-fixed":
      return law.J_s;
    case "uptake": {
      const area = surfaceArea_cm2cm3(law.surface ?? "sulfate", env);
      // with a partner, γ depends on the amounts (amountDependence.ts): here the collision frequency (γ = 1)
      return uptake(law.partner ? 1 : law.gamma, law.molarMass_gmol, env.T_K, area);
    }
    case "liquid-aerosol":
      return uptake(1, law.molarMass_gmol, env.T_K, env.aerosolSurface_cm2cm3 ?? 0);
    default:
      throw new EngineError("unknown-rate-law", `rateConstant: unknown rate law "${(law as { law?: unknown }).law}"`);
  }
}

/**
 * True when the law's value already contains the third-body density [M]
 * (termolecular), or depends on it in its own way (chemical activation).
 */
export function lawIncludesM(law: RateLaw): boolean {
  if (law.law === "termolecular" || law.law === "chemical-activation" || law.law === "lindemann") return true;
  if (law.law === "equilibrium-reverse") return lawIncludesM(law.forward);
  return false;
}
