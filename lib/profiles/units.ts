/**
 * Units accepted in profile CSV headers and their conversion to the engine's
 * units (pressure in hPa, amounts in mol/mol). Factors: 1 hPa = 100 Pa =
 * 1 mbar; 1 atm = 1013.25 hPa; 1 Torr = 1013.25/760 hPa (exact, by the
 * definitions of the standard atmosphere and the torr, BIPM SI brochure);
 * ppmv/ppbv/pptv = 1e-6/1e-9/1e-12 mol/mol (common practice). Number densities
 * (cm⁻³) become mixing ratios by dividing by the air number density
 * [M] = p/(k_B·T) of the same row.
 */
import { BOLTZMANN_J_K } from "../atmosphere";

/** hPa per unit, by normalised unit name. */
export const PRESSURE_UNITS: Readonly<Record<string, number>> = {
  Pa: 0.01,
  kPa: 10,
  hPa: 1,
  mbar: 1,
  atm: 1013.25,
  Torr: 1013.25 / 760,
};

/** mol/mol per unit for mixing ratios; "cm-3" is handled separately. */
export const MIXING_RATIO_UNITS: Readonly<Record<string, number>> = {
  "mol/mol": 1,
  ppmv: 1e-6,
  ppbv: 1e-9,
  pptv: 1e-12,
};

/** km per unit of altitude. */
export const ALTITUDE_UNITS: Readonly<Record<string, number>> = { km: 1, m: 1e-3 };

const ALIASES: Readonly<Record<string, string>> = {
  pa: "Pa",
  kpa: "kPa",
  hpa: "hPa",
  mbar: "mbar",
  mb: "mbar",
  atm: "atm",
  torr: "Torr",
  "mol/mol": "mol/mol",
  "mol mol-1": "mol/mol",
  vmr: "mol/mol",
  ppmv: "ppmv",
  ppm: "ppmv",
  ppbv: "ppbv",
  ppb: "ppbv",
  pptv: "pptv",
  ppt: "pptv",
  "cm-3": "cm-3",
  "cm^-3": "cm-3",
  "cm⁻³": "cm-3",
  "molecules cm-3": "cm-3",
  "molec cm-3": "cm-3",
  "/cm3": "cm-3",
  km: "km",
  m: "m",
  k: "K",
};

/** The normalised name of a unit as written (case and spacing ignored), or null. */
export function normaliseUnit(written: string): string | null {
  return ALIASES[written.trim().replace(/\s+/g, " ").toLowerCase()] ?? null;
}

/** Air number density [M], molecules cm⁻³, from p (hPa) and T (K). */
export function airDensityOf_cm3(p_hPa: number, T_K: number): number {
  return (p_hPa * 100) / (BOLTZMANN_J_K * T_K) / 1e6;
}

/** A pressure in a normalised unit, in hPa. */
export function toHectopascal(value: number, unit: string): number {
  const f = PRESSURE_UNITS[unit];
  if (f === undefined) throw new RangeError(`toHectopascal: unknown pressure unit ${unit}`);
  return value * f;
}

/** An amount in a normalised unit, as a mixing ratio (mol/mol); M_cm3 is needed for "cm-3". */
export function toMixingRatio(value: number, unit: string, M_cm3: number): number {
  if (unit === "cm-3") return value / M_cm3;
  const f = MIXING_RATIO_UNITS[unit];
  if (f === undefined) throw new RangeError(`toMixingRatio: unknown amount unit ${unit}`);
  return value * f;
}

/** The inverse of toMixingRatio. */
export function fromMixingRatio(x: number, unit: string, M_cm3: number): number {
  if (unit === "cm-3") return x * M_cm3;
  const f = MIXING_RATIO_UNITS[unit];
  if (f === undefined) throw new RangeError(`fromMixingRatio: unknown amount unit ${unit}`);
  return x / f;
}
