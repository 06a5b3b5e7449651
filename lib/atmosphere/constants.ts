/**
 * Physical constants and the defining constants of the U.S. Standard
 * Atmosphere, 1976 (NOAA-S/T 76-1562, U.S. GPO, Washington DC, 1976).
 *
 * SI exact values from the SI Brochure, 9th ed. (BIPM 2019). The 1976
 * gas constant R* is the standard's own value, not CODATA's; it is used only
 * inside the standard-atmosphere formulas so that tabulated values are met.
 */

/** Boltzmann constant, J K⁻¹ (SI exact). */
export const BOLTZMANN_J_K = 1.380649e-23;

/** Avogadro constant, mol⁻¹ (SI exact). */
export const AVOGADRO_mol = 6.02214076e23;

/** Standard gravity g0, m s⁻² (1976 standard). */
export const G0_m_s2 = 9.80665;

/** Gas constant R* of the 1976 standard, J kmol⁻¹ K⁻¹. */
export const R_STAR_1976_J_kmolK = 8314.32;

/** Sea-level mean molar mass of air M0, kg kmol⁻¹ (1976 standard). */
export const M0_1976_kg_kmol = 28.9644;

/** Effective Earth radius r0 for geopotential altitude, km (1976 standard). */
export const R0_GEOPOTENTIAL_km = 6356.766;

/** Mean Earth radius used for the sun's ray geometry (slant paths, sunset), km (common practice). */
export const EARTH_RADIUS_km = 6371.0;

/**
 * One Dobson unit in molecules cm⁻²: the Loschmidt constant (2.6867811e19 cm⁻³)
 * times 1e-3 cm (IUPAC Gold Book, "Dobson unit").
 */
export const DOBSON_UNIT_cm2 = 2.6868e16;

/** Volume fraction of O2 in dry air below 86 km (1976 standard sea-level composition: 0.209476). */
export const O2_FRACTION = 0.209476;

/** Volume fraction of N2 in dry air below 86 km (1976 standard sea-level composition: 0.78084). */
export const N2_FRACTION = 0.78084;

/** Mass of a mean air molecule, kg (M0 / N_A). */
export const AIR_MOLECULE_MASS_kg = M0_1976_kg_kmol / 1000 / AVOGADRO_mol;
