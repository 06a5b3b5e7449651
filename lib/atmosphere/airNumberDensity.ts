/**
 * Air number density from the ideal-gas law, [M] = p / (k_B·T), with the
 * SI-exact Boltzmann constant (SI Brochure, 9th ed., 2019). Units: Pa, K → cm⁻³.
 */
import { BOLTZMANN_J_K } from "./constants";

/** Air number density [M], molecules cm⁻³, from pressure (Pa) and temperature (K). */
export function airNumberDensity_cm3(p_Pa: number, T_K: number): number {
  return p_Pa / (BOLTZMANN_J_K * T_K) / 1e6;
}
