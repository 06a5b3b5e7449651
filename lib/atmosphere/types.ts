/**
 * Types of the atmosphere and sun-geometry domain. Altitudes in km
 * (geometric unless named geopotential), temperatures in K, pressures in Pa or
 * hPa as named, number densities in molecules cm⁻³, angles in degrees.
 */

/** The U.S. Standard Atmosphere 1976 at one geometric altitude. */
export interface StandardAtmosphereState {
  /** geometric altitude, km */
  z_km: number;
  /** geopotential altitude, km' */
  geopotential_km: number;
  /** kinetic temperature, K */
  T_K: number;
  /** pressure, Pa */
  p_Pa: number;
  /** pressure, hPa */
  p_hPa: number;
  /** mass density, kg m⁻³ */
  density_kgm3: number;
  /** air number density [M], molecules cm⁻³ */
  M_cm3: number;
}

/** Species and pool ids of the default climatology. */
export type ClimatologySpecies =
  | "O2"
  | "N2"
  | "H2O"
  | "CH4"
  | "N2O"
  | "O3"
  | "CO"
  | "H2"
  | "CFCl3"
  | "CF2Cl2"
  | "Cly"
  | "Bry"
  | "NOy";

/** A mixing-ratio profile on altitude nodes, with where it comes from. */
export interface MixingRatioProfile {
  /** altitude nodes, km, increasing, covering 0–86 */
  z_km: readonly number[];
  /** mixing ratio at each node, mol/mol (pools: mol of the pool's atoms per mol of air) */
  mixingRatio: readonly number[];
  /** the source, or "approximate, from memory" with what it is meant to resemble */
  source: string;
}

/** The sun's position for a place and time. */
export interface SolarPositionInput {
  /** latitude, degrees north (−90–90) */
  latitude_deg: number;
  /** day of year, 1–366 */
  dayOfYear: number;
  /** local solar time, h (0–24); mean solar time unless `apparentTime` is true */
  localSolarTime_h: number;
  /** true when localSolarTime_h is apparent (true) solar time, so the equation of time is not applied; default false */
  apparentTime?: boolean;
  /** longitude, degrees east, used only to find Universal Time for the Sun's declination; default 0 */
  longitude_deg?: number;
  /** calendar year; default 2026 */
  year?: number;
}

/** A profile of an invented demonstration atmosphere. */
export interface DemoProfile {
  id: string;
  title: string;
  /** always states that the data are invented */
  provenance: string;
  levels: ReadonlyArray<{
    /** km */
    z_km: number;
    /** K */
    T_K: number;
    /** hPa */
    p_hPa: number;
    /** optional mixing ratios, mol/mol, by species id */
    mixingRatios?: Readonly<Record<string, number>>;
  }>;
}
