/**
 * U.S. Standard Atmosphere, 1976 (NOAA-S/T 76-1562), 0–86 km geometric.
 *
 * Method: the seven layers of linear molecular-scale temperature T_M in
 * geopotential altitude H; hydrostatic pressure per layer,
 *   Lb ≠ 0: p = pb·[Tb / (Tb + Lb(H − Hb))]^(g0·M0 / (R*·Lb)),
 *   Lb = 0: p = pb·exp(−g0·M0·(H − Hb) / (R*·Tb));
 * density ρ = p·M0 / (R*·T_M); kinetic T = T_M·(M/M0), where M/M0 < 1 only
 * above 80 km (the standard's Table 8); air number density [M] = p / (k_B·T)
 * with the SI-exact Boltzmann constant.
 * Units: km, K, Pa, hPa, kg m⁻³, molecules cm⁻³.
 */
import { InputError } from "../errors";
import { airNumberDensity_cm3 } from "./airNumberDensity";
import { G0_m_s2, M0_1976_kg_kmol, R_STAR_1976_J_kmolK } from "./constants";
import { geometricToGeopotential_km } from "./geopotential";
import type { StandardAtmosphereState } from "./types";

/** g0·M0/R*, K per km' of geopotential altitude. */
const HYDROSTATIC_K_per_km = ((G0_m_s2 * M0_1976_kg_kmol) / R_STAR_1976_J_kmolK) * 1000;

/** Layer bases: geopotential base height (km'), base T_M (K), gradient (K/km'). */
const LAYERS: ReadonlyArray<{ Hb: number; Tb: number; Lb: number }> = [
  { Hb: 0, Tb: 288.15, Lb: -6.5 },
  { Hb: 11, Tb: 216.65, Lb: 0 },
  { Hb: 20, Tb: 216.65, Lb: 1.0 },
  { Hb: 32, Tb: 228.65, Lb: 2.8 },
  { Hb: 47, Tb: 270.65, Lb: 0 },
  { Hb: 51, Tb: 270.65, Lb: -2.8 },
  { Hb: 71, Tb: 214.65, Lb: -2.0 },
];

/** M/M0 between 80 and 86 km geometric every 0.5 km (the standard's Table 8). */
const MOLAR_MASS_RATIO_80_86 = [
  1.0, 0.999996, 0.999989, 0.999971, 0.999941, 0.999909, 0.99987, 0.999829, 0.999786, 0.999741, 0.999694, 0.999641,
  0.999579,
];

/** Base pressures (Pa) chained from 101325 Pa through the layer formulas. */
const BASE_PRESSURES_Pa: number[] = (() => {
  const out = [101325];
  for (let i = 1; i < LAYERS.length; i++) {
    const below = LAYERS[i - 1];
    out.push(layerPressure(below, out[i - 1], LAYERS[i].Hb));
  }
  return out;
})();

function layerPressure(layer: { Hb: number; Tb: number; Lb: number }, pb: number, H: number): number {
  const dH = H - layer.Hb;
  if (layer.Lb === 0) return pb * Math.exp((-HYDROSTATIC_K_per_km * dH) / layer.Tb);
  return pb * (layer.Tb / (layer.Tb + layer.Lb * dH)) ** (HYDROSTATIC_K_per_km / layer.Lb);
}

function molarMassRatio(z_km: number): number {
  if (z_km <= 80) return 1;
  const x = (z_km - 80) / 0.5;
  const i = Math.min(Math.floor(x), MOLAR_MASS_RATIO_80_86.length - 2);
  const f = x - i;
  return MOLAR_MASS_RATIO_80_86[i] * (1 - f) + MOLAR_MASS_RATIO_80_86[i + 1] * f;
}

/** The 1976 standard atmosphere at a geometric altitude (km, 0–86). Throws InputError outside. */
export function standardAtmosphere(z_km: number): StandardAtmosphereState {
  if (!Number.isFinite(z_km) || z_km < 0 || z_km > 86) {
    throw new InputError(
      "z_km",
      `standardAtmosphere: altitude ${z_km} km is outside the 0–86 km range of the U.S. Standard Atmosphere 1976`,
    );
  }
  const H = geometricToGeopotential_km(z_km);
  let i = LAYERS.length - 1;
  while (i > 0 && H < LAYERS[i].Hb) i--;
  const layer = LAYERS[i];
  const T_M = layer.Tb + layer.Lb * (H - layer.Hb);
  const p_Pa = layerPressure(layer, BASE_PRESSURES_Pa[i], H);
  const T_K = T_M * molarMassRatio(z_km);
  const density_kgm3 = (p_Pa * M0_1976_kg_kmol) / (R_STAR_1976_J_kmolK * T_M);
  return {
    z_km,
    geopotential_km: H,
    T_K,
    p_Pa,
    p_hPa: p_Pa / 100,
    density_kgm3,
    M_cm3: airNumberDensity_cm3(p_Pa, T_K),
  };
}
