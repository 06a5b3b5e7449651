/**
 * First-order loss of a gas to particle surfaces, the free-molecular form
 * used for stratospheric sulfate aerosol (JPL 19-5, section 5; common practice):
 *
 *   k = γ · v̄ · A / 4,   v̄ = √(8RT / (π M))
 *
 * γ the reaction (uptake) probability, v̄ the mean molecular speed, A the
 * aerosol surface area density. Valid for particles small next to the mean
 * free path (Knudsen number ≫ 1), as stratospheric sulfate is; gas-phase
 * diffusion limitation is not included.
 *
 * Units: T in K, M in g mol⁻¹, A in cm² cm⁻³; returns s⁻¹.
 */

/** J mol⁻¹ K⁻¹ (CODATA 2018, exact) */
export const GAS_CONSTANT = 8.314462618;

/** Mean molecular speed, cm s⁻¹. */
export function meanMolecularSpeed_cms(T_K: number, molarMass_gmol: number): number {
  return 100 * Math.sqrt((8 * GAS_CONSTANT * T_K) / (Math.PI * (molarMass_gmol / 1000)));
}

export function uptake(gamma: number, molarMass_gmol: number, T_K: number, surface_cm2cm3: number): number {
  return (gamma * meanMolecularSpeed_cms(T_K, molarMass_gmol) * surface_cm2cm3) / 4;
}
