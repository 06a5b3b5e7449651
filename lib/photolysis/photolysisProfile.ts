/**
 * Photolysis frequencies on a list of altitudes under one sun, with the O3
 * column above each level taken from the levels above when an O3 profile is
 * given (e.g. while solving a profile with O3 free), else from the default
 * climatology. Units: km, K, cm⁻³ → s⁻¹.
 */
import { columnsAboveLevels, ozoneColumnAbove_cm2, standardAtmosphere } from "../atmosphere";
import { InputError } from "../errors";
import { photolysisFrequencies } from "./photolysisFrequencies";
import type { PhotolysisOptions } from "./types";

export interface PhotolysisProfileInput {
  /** geometric altitudes, km (0–86), any order */
  altitudes_km: readonly number[];
  /** solar zenith angle, degrees (0–180) */
  zenith_deg: number;
  /** temperature per level, K; default: U.S. Standard Atmosphere 1976 */
  T_K?: readonly number[];
  /** O3 number density per level, cm⁻³; default: columns of the default climatology */
  o3_cm3?: readonly number[];
  /** O3 column above the highest level, cm⁻²; default: the default climatology's column there */
  o3ColumnAboveTop_cm2?: number;
}

/** J (s⁻¹) by channel for each level, in the order of `altitudes_km`. */
export function photolysisProfile(
  input: PhotolysisProfileInput,
  options: PhotolysisOptions = {},
): Array<Record<string, number>> {
  const z = input.altitudes_km;
  for (const [name, arr] of [
    ["T_K", input.T_K],
    ["o3_cm3", input.o3_cm3],
  ] as const) {
    if (arr && arr.length !== z.length) {
      throw new InputError(name, `photolysisProfile: ${name} has ${arr.length} values for ${z.length} altitudes`);
    }
  }
  let columns: number[] | undefined;
  let o3ColumnAt: ((zz: number) => number) | undefined;
  if (input.o3_cm3) {
    const top = Math.max(...z);
    columns = columnsAboveLevels(z, input.o3_cm3, {
      columnAboveTop_cm2: input.o3ColumnAboveTop_cm2 ?? ozoneColumnAbove_cm2(top),
    });
    const sorted = z.map((zz, i) => [zz, columns![i]] as const).sort((a, b) => a[0] - b[0]);
    o3ColumnAt = (zz: number) => columnAtLevels(sorted, zz);
  }
  return z.map((zz, i) => {
    const T = input.T_K?.[i] ?? standardAtmosphere(zz).T_K;
    return photolysisFrequencies(
      {
        altitude_km: zz,
        zenith_deg: input.zenith_deg,
        T_K: T,
        o3ColumnAbove_cm2: columns?.[i],
      },
      { ...options, o3ColumnAt: options.o3ColumnAt ?? o3ColumnAt },
    );
  });
}

/** Log-linear interpolation of columns between levels; the climatology's shape outside them. */
function columnAtLevels(sorted: ReadonlyArray<readonly [number, number]>, z_km: number): number {
  const first = sorted[0];
  const last = sorted[sorted.length - 1];
  if (z_km <= first[0]) return (first[1] * ozoneColumnAbove_cm2(z_km)) / ozoneColumnAbove_cm2(first[0]);
  if (z_km >= last[0]) return (last[1] * ozoneColumnAbove_cm2(z_km)) / ozoneColumnAbove_cm2(last[0]);
  let k = 0;
  while (sorted[k + 1][0] < z_km) k++;
  const [z0, c0] = sorted[k];
  const [z1, c1] = sorted[k + 1];
  const f = (z_km - z0) / (z1 - z0);
  if (c0 <= 0 || c1 <= 0) return c0 + (c1 - c0) * f;
  return Math.exp(Math.log(c0) + (Math.log(c1) - Math.log(c0)) * f);
}
