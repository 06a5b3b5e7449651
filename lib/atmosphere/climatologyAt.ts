/**
 * The default mid-latitude composition climatology at one altitude:
 * log-linear interpolation in mixing ratio between the nodes of
 * tables/climatology.ts. Units: km → mol/mol.
 */
import { InputError } from "../errors";
import { idRecord, ownValue } from "../idRecord";
import { CLIMATOLOGY } from "./tables/climatology";
import type { ClimatologySpecies, MixingRatioProfile } from "./types";

/** Species and pools of the climatology, in a fixed order. */
export const climatologySpecies: readonly ClimatologySpecies[] = Object.keys(CLIMATOLOGY) as ClimatologySpecies[];

/** Where each profile comes from, or "approximate, from memory …". */
export const climatologySources: Readonly<Record<ClimatologySpecies, string>> = Object.fromEntries(
  climatologySpecies.map((id) => [id, CLIMATOLOGY[id].source]),
) as Record<ClimatologySpecies, string>;

/** Mixing ratio (mol/mol) of every climatology species and pool at a geometric altitude (km, 0–86). */
export function climatologyAt(z_km: number): Record<string, number> {
  checkAltitude(z_km);
  const out = idRecord<number>();
  for (const id of climatologySpecies) out[id] = interpolateProfile(CLIMATOLOGY[id], z_km);
  return out;
}

/** Mixing ratio (mol/mol) of one climatology species or pool at a geometric altitude (km, 0–86). */
export function climatologyMixingRatio(species: ClimatologySpecies, z_km: number): number {
  checkAltitude(z_km);
  const profile = ownValue<MixingRatioProfile>(CLIMATOLOGY, species);
  if (!profile) throw new InputError("species", `climatologyMixingRatio: unknown species "${species}"`);
  return interpolateProfile(profile, z_km);
}

function checkAltitude(z_km: number): void {
  if (!Number.isFinite(z_km) || z_km < 0 || z_km > 86) {
    throw new InputError(
      "z_km",
      `climatologyAt: altitude ${z_km} km is outside the 0–86 km of the default climatology`,
    );
  }
}

/** Log-linear interpolation of a mixing-ratio profile (all nodes > 0). */
export function interpolateProfile(profile: MixingRatioProfile, z_km: number): number {
  const z = profile.z_km;
  const x = profile.mixingRatio;
  let i = 0;
  while (i < z.length - 2 && z_km > z[i + 1]) i++;
  const f = (z_km - z[i]) / (z[i + 1] - z[i]);
  return Math.exp(Math.log(x[i]) * (1 - f) + Math.log(x[i + 1]) * f);
}
