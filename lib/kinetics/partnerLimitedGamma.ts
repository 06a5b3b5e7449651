/**
 * The uptake probability of a gas X that reacts on a surface with a second
 * gas Y (e.g. ClONO2 + HCl on NAT or ice), limited by Y's arrival:
 *
 *   γ_eff = γ / (1 + γ · v̄_X [X] / (v̄_Y [Y])),   v̄_X / v̄_Y = √(M_Y / M_X)
 *
 * The same form as the HCl depletion factor of Shi et al. (2001, J. Geophys.
 * Res. 106, 24259; JPL 19-5, Section 5), where 0.612 = √(36.46/97.46) is this
 * speed ratio for ClONO2 and HCl. For [Y] ≫ γ [X] it is the evaluation's γ;
 * as [Y] → 0 the rate γ_eff v̄_X A [X]/4 tends to the collision rate of Y,
 * v̄_Y A [Y]/4, so a surface cannot use up more of the partner than reaches
 * it (our choice for the constant-γ surfaces; docs/heterogeneous.md).
 *
 * Units: number densities in cm⁻³ (any common unit), molar masses in g mol⁻¹.
 */

export function partnerLimitedGamma(
  gamma: number,
  gas_cm3: number,
  gasMolarMass_gmol: number,
  partner_cm3: number,
  partnerMolarMass_gmol: number,
): number {
  if (!(partner_cm3 > 0)) return 0;
  const speedRatio = Math.sqrt(partnerMolarMass_gmol / gasMolarMass_gmol);
  return gamma / (1 + (gamma * speedRatio * Math.max(gas_cm3, 0)) / partner_cm3);
}
