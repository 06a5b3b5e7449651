/**
 * Types of the photolysis domain. Altitudes in km, angles in degrees,
 * columns in molecules cm⁻², photolysis frequencies in s⁻¹.
 */

/** Where and under which sun a set of photolysis frequencies is wanted. */
export interface PhotolysisInput {
  /** geometric altitude, km (0–86) */
  altitude_km: number;
  /** solar zenith angle, degrees (0–180); J = 0 beyond the geometric sunset for the altitude */
  zenith_deg: number;
  /** local temperature, K (150–350): used for the T-dependent cross sections and yields and the air scale height */
  T_K: number;
  /** O3 column above the altitude, molecules cm⁻²; default: the default climatology × standard atmosphere */
  o3ColumnAbove_cm2?: number;
  /** O2 column above the altitude, molecules cm⁻²; default: the standard atmosphere × 0.209476 */
  o2ColumnAbove_cm2?: number;
  /** air number density, cm⁻³; accepted for the engine's convenience, not used (no pressure-dependent yields are modelled) */
  M_cm3?: number;
}

export interface PhotolysisOptions {
  /** factor on every computed J (not on `fixed` values); default 1 */
  jScale?: number;
  /** channels to return; default: all of photolysisChannels */
  channels?: string[];
  /** J values (s⁻¹) to return as given instead of computing them, by channel */
  fixed?: Record<string, number>;
  /** Lambertian albedo of the ground (and of clouds below, if any) for the diffuse light (0–1); default 0.3 */
  albedo?: number;
  /** aerosol optical depth of the column at 550 nm (≥ 0), spread like the background sulfate profile; default 0 */
  aerosolOpticalDepth?: number;
  /** include Rayleigh extinction of the direct beam and Rayleigh scattering; default true */
  rayleigh?: boolean;
  /** include the diffuse light (two-stream multiple scattering and ground reflection); default true. Off: direct beam only */
  diffuse?: boolean;
  /** only bins lying wholly inside [min, max] nm get sunlight (for tests and diagnostics); default: all */
  wavelengthRange_nm?: [number, number];
  /** scale height of the O3 column at the altitude, km, for the slant path near and beyond 90°; default: column/density of the default climatology */
  o3ScaleHeight_km?: number;
  /** vertical O3 column above any altitude (cm⁻²), for the tangent point of rays beyond 90°; default: the given column scaled by the default climatology's shape */
  o3ColumnAt?: (z_km: number) => number;
}

/** Slant columns along the sun's ray from the altitude to space. */
export interface SlantColumns {
  /** false beyond geometric sunset: no direct sunlight */
  sunlit: boolean;
  /** molecules cm⁻² */
  o3_cm2: number;
  o2_cm2: number;
  air_cm2: number;
}

/** The actinic flux in each bin at one place. */
export interface ActinicFlux {
  lower_nm: Float64Array;
  upper_nm: Float64Array;
  /** extraterrestrial photon flux, photons cm⁻² s⁻¹ per bin */
  topOfAtmosphere_cm2s: Float64Array;
  /** actinic flux (direct + diffuse), photons cm⁻² s⁻¹ per bin; in the Schumann–Runge bands the band-mean */
  actinic_cm2s: Float64Array;
  /** the diffuse part of it, photons cm⁻² s⁻¹ per bin (0 below 206 nm) */
  diffuse_cm2s: Float64Array;
}
