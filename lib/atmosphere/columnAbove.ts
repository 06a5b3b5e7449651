/**
 * Vertical columns above an altitude, molecules cm⁻².
 *
 * Method: ∫ n dz from z to 86 km on a 0.25 km grid, each step integrated
 * exactly for an exponential between its end values, h·(n₁ − n₂)/ln(n₁/n₂),
 * plus a tail above 86 km of n(86)·H with the air scale height H = k_B·T/(m·g)
 * at 86 km (common practice). Default profiles: the U.S. Standard Atmosphere
 * 1976 for air and O2 (O2 fraction 0.209476) and the default climatology's O3
 * mixing ratio times the standard atmosphere's [M].
 * Units: km, molecules cm⁻³ → molecules cm⁻².
 */
import { InputError } from "../errors";
import { climatologyMixingRatio } from "./climatologyAt";
import { AIR_MOLECULE_MASS_kg, BOLTZMANN_J_K, G0_m_s2, O2_FRACTION, R0_GEOPOTENTIAL_km } from "./constants";
import { standardAtmosphere } from "./standardAtmosphere";

const DEFAULTS = {
  /** integration step, km */
  step_km: 0.25,
  /** top of the tabulated profiles, km */
  top_km: 86,
};

/** A number-density profile, molecules cm⁻³ at a geometric altitude in km. */
export type DensityProfile = (z_km: number) => number;

/** Air scale height k_B·T/(m·g(z)) in km at a geometric altitude, for temperature T (K). */
export function airScaleHeight_km(z_km: number, T_K: number): number {
  const g = G0_m_s2 * (R0_GEOPOTENTIAL_km / (R0_GEOPOTENTIAL_km + z_km)) ** 2;
  return (BOLTZMANN_J_K * T_K) / (AIR_MOLECULE_MASS_kg * g) / 1000;
}

/** O3 number density of the default climatology, molecules cm⁻³. */
export function defaultOzoneDensity_cm3(z_km: number): number {
  return climatologyMixingRatio("O3", z_km) * standardAtmosphere(z_km).M_cm3;
}

function stepIntegral(n1: number, n2: number, h_cm: number): number {
  if (n1 <= 0 || n2 <= 0) return 0.5 * (n1 + n2) * h_cm;
  const r = n1 / n2;
  if (Math.abs(r - 1) < 1e-6) return 0.5 * (n1 + n2) * h_cm;
  return (h_cm * (n1 - n2)) / Math.log(r);
}

/** Column (cm⁻²) of a density profile above z_km: 86 km top plus an exponential tail. */
export function columnAboveFromProfile(z_km: number, profile: DensityProfile): number {
  checkAltitude(z_km, "columnAboveFromProfile");
  const top = DEFAULTS.top_km;
  const nSteps = Math.max(1, Math.ceil((top - z_km) / DEFAULTS.step_km));
  const h = (top - z_km) / nSteps;
  let sum = 0;
  let nLow = profile(z_km);
  for (let k = 1; k <= nSteps; k++) {
    const nHigh = profile(z_km + k * h);
    sum += stepIntegral(nLow, nHigh, h * 1e5);
    nLow = nHigh;
  }
  const tail = nLow * airScaleHeight_km(top, standardAtmosphere(top).T_K) * 1e5;
  return sum + tail;
}

/** Tabulated default columns on the 0.25 km grid, integrated once from the top down. */
const TABLE = (() => {
  const n = Math.round(DEFAULTS.top_km / DEFAULTS.step_km) + 1;
  const z = new Float64Array(n);
  const air = new Float64Array(n);
  const o3 = new Float64Array(n);
  const nAir = new Float64Array(n);
  const nO3 = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    z[i] = Math.min(i * DEFAULTS.step_km, DEFAULTS.top_km);
    nAir[i] = standardAtmosphere(z[i]).M_cm3;
    nO3[i] = nAir[i] * climatologyMixingRatio("O3", z[i]);
  }
  const H = airScaleHeight_km(DEFAULTS.top_km, standardAtmosphere(DEFAULTS.top_km).T_K) * 1e5;
  air[n - 1] = nAir[n - 1] * H;
  o3[n - 1] = nO3[n - 1] * H;
  for (let i = n - 2; i >= 0; i--) {
    const h = (z[i + 1] - z[i]) * 1e5;
    air[i] = air[i + 1] + stepIntegral(nAir[i], nAir[i + 1], h);
    o3[i] = o3[i + 1] + stepIntegral(nO3[i], nO3[i + 1], h);
  }
  return { air, o3 };
})();

function fromTable(values: Float64Array, z_km: number): number {
  const x = z_km / DEFAULTS.step_km;
  const i = Math.min(Math.floor(x), values.length - 2);
  const f = x - i;
  return Math.exp(Math.log(values[i]) * (1 - f) + Math.log(values[i + 1]) * f);
}

function checkAltitude(z_km: number, fn: string): void {
  if (!Number.isFinite(z_km) || z_km < 0 || z_km > DEFAULTS.top_km) {
    throw new InputError("z_km", `${fn}: altitude ${z_km} km is outside 0–86 km`);
  }
}

/** Air column above z (cm⁻²) of the U.S. Standard Atmosphere 1976. */
export function airColumnAbove_cm2(z_km: number): number {
  checkAltitude(z_km, "airColumnAbove_cm2");
  return fromTable(TABLE.air, z_km);
}

/** O2 column above z (cm⁻²): the standard atmosphere × 0.209476, or the given O2 density profile. */
export function o2ColumnAbove_cm2(z_km: number, o2Profile?: DensityProfile): number {
  checkAltitude(z_km, "o2ColumnAbove_cm2");
  if (o2Profile) return columnAboveFromProfile(z_km, o2Profile);
  return O2_FRACTION * fromTable(TABLE.air, z_km);
}

/** O3 column above z (cm⁻²): the default climatology × standard atmosphere, or the given O3 density profile. */
export function ozoneColumnAbove_cm2(z_km: number, o3Profile?: DensityProfile): number {
  checkAltitude(z_km, "ozoneColumnAbove_cm2");
  if (o3Profile) return columnAboveFromProfile(z_km, o3Profile);
  return fromTable(TABLE.o3, z_km);
}
