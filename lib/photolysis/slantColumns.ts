/**
 * Slant columns of O3, O2 and air from an altitude to the sun.
 *
 * Method: zenith χ ≤ 90°, vertical column × Chapman function Ch(X, χ) with
 * X = (R + z)/H, H the air scale height k_B·T/(m·g) for O2 and air and the
 * column scale height N/n of the O3 profile for O3. χ > 90° (sun below the
 * horizon of the level but above geometric sunset), the ray passes a
 * tangent point at z_t = (R + z)·sin χ − R and
 *   S = 2·N(z_t)·Ch(X_t, 90°) − N(z)·Ch(X, 180° − χ),
 * which is the Chapman grazing formula with the actual vertical column at
 * the tangent point in place of an exponential extrapolation (common
 * practice). Beyond geometric sunset (z_t < 0) there is no direct beam.
 * Units: km, K, molecules cm⁻².
 */
import {
  airColumnAbove_cm2,
  airScaleHeight_km,
  chapmanGrazing,
  defaultOzoneDensity_cm3,
  EARTH_RADIUS_km,
  O2_FRACTION,
  ozoneColumnAbove_cm2,
  standardAtmosphere,
} from "../atmosphere";
import type { SlantColumns } from "./types";

const RAD = Math.PI / 180;

export interface SlantColumnsInput {
  /** km */
  altitude_km: number;
  /** degrees */
  zenith_deg: number;
  /** K, local */
  T_K: number;
  /** vertical O3 column above, cm⁻² */
  o3Above_cm2: number;
  /** vertical O2 column above, cm⁻² */
  o2Above_cm2: number;
  /** km; default: the default climatology's column/density */
  o3ScaleHeight_km?: number;
  /** vertical O3 column above any altitude, cm⁻²; default: the given column scaled by the climatology's shape */
  o3ColumnAt?: (z_km: number) => number;
}

/** Column scale height N/n of the default O3 profile, km. */
export function defaultO3ScaleHeight_km(z_km: number): number {
  return ozoneColumnAbove_cm2(z_km) / defaultOzoneDensity_cm3(z_km) / 1e5;
}

export function slantColumns(input: SlantColumnsInput): SlantColumns {
  const z = input.altitude_km;
  const chi = input.zenith_deg;
  const R = EARTH_RADIUS_km;
  const airAbove = input.o2Above_cm2 / O2_FRACTION;
  const Hair = airScaleHeight_km(z, input.T_K);
  const Ho3 = input.o3ScaleHeight_km ?? defaultO3ScaleHeight_km(z);
  if (chi <= 90) {
    const fAir = chapmanGrazing((R + z) / Hair, chi);
    const fO3 = chapmanGrazing((R + z) / Ho3, chi);
    return {
      sunlit: true,
      o3_cm2: input.o3Above_cm2 * fO3,
      o2_cm2: input.o2Above_cm2 * fAir,
      air_cm2: airAbove * fAir,
    };
  }
  const zt = (R + z) * Math.sin(chi * RAD) - R;
  if (zt < 0) return { sunlit: false, o3_cm2: 0, o2_cm2: 0, air_cm2: 0 };
  const back = 180 - chi;
  const airRatio = airColumnAbove_cm2(zt) / airColumnAbove_cm2(z);
  const HairT = airScaleHeight_km(zt, standardAtmosphere(zt).T_K);
  const airSlant =
    2 * airAbove * airRatio * chapmanGrazing((R + zt) / HairT, 90) - airAbove * chapmanGrazing((R + z) / Hair, back);
  const o3AtTangent = input.o3ColumnAt
    ? input.o3ColumnAt(zt)
    : (input.o3Above_cm2 * ozoneColumnAbove_cm2(zt)) / ozoneColumnAbove_cm2(z);
  const Ho3T = input.o3ScaleHeight_km ?? defaultO3ScaleHeight_km(zt);
  const o3Slant =
    2 * o3AtTangent * chapmanGrazing((R + zt) / Ho3T, 90) - input.o3Above_cm2 * chapmanGrazing((R + z) / Ho3, back);
  return {
    sunlit: true,
    o3_cm2: Math.max(o3Slant, 0),
    o2_cm2: Math.max(airSlant * O2_FRACTION, 0),
    air_cm2: Math.max(airSlant, 0),
  };
}
