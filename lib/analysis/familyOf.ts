/**
 * The display family of a species: the mechanism's `group` when given, else
 * a guess from the role and the atoms (Br before Cl before N before H, since a
 * species carrying a halogen is read with its halogen family; species mixing
 * two of H, N, Cl, Br are reservoirs). Common practice in stratospheric
 * chemistry texts; the exact rule is this project's.
 *
 * The display order (Ox, HOx, NOx, ClOx, BrOx, then the other groups) is for
 * reading: the network board, profile charts, assessment sheets. Cycle names
 * join their catalyst families in the other order, `FAMILY_ORDER` of
 * carrierFamilies.ts, which is part of the engine's results.
 */

import { ownValue } from "../idRecord";
import type { SpeciesRole } from "../mechanism/types";

/** What the family of a species is read from (a compiled species or its view). */
export interface FamilySpecies {
  role: SpeciesRole;
  group?: string;
  atoms: Readonly<Record<string, number>>;
}

/** Families in display order; unknown groups follow, sorted by name. */
export const DISPLAY_FAMILY_ORDER = [
  "Ox",
  "HOx",
  "NOx",
  "ClOx",
  "BrOx",
  "reservoir",
  "source",
  "organic",
  "bath",
  "held",
  "product",
  "other",
] as const;

const ALIASES: Record<string, string> = {
  ox: "Ox",
  hox: "HOx",
  nox: "NOx",
  clox: "ClOx",
  brox: "BrOx",
  cly: "ClOx",
  bry: "BrOx",
  noy: "NOx",
  reservoir: "reservoir",
  reservoirs: "reservoir",
  source: "source",
  sources: "source",
  held: "held",
  bath: "bath",
  organic: "organic",
  product: "product",
  products: "product",
  other: "other",
};

export function familyOf(sp: FamilySpecies): string {
  if (sp.group) return ownValue(ALIASES, sp.group.toLowerCase()) ?? sp.group;
  if (sp.role !== "solved") return "held";
  const a = sp.atoms;
  const has = (el: string) => (a[el] ?? 0) > 0;
  const actors = ["H", "N", "Cl", "Br"].filter(has);
  if (actors.length >= 2 && !(actors.length === 2 && has("Cl") && has("Br"))) return "reservoir";
  if (has("Br")) return "BrOx";
  if (has("Cl")) return "ClOx";
  if (has("N")) return "NOx";
  if (has("H")) return "HOx";
  if (Object.keys(a).every((el) => el === "O")) return "Ox";
  return "other";
}

/** Sort key: index in DISPLAY_FAMILY_ORDER; unknown families share the last rank (sort them by name). */
export function familyRank(family: string): number {
  const i = (DISPLAY_FAMILY_ORDER as readonly string[]).indexOf(family);
  return i >= 0 ? i : DISPLAY_FAMILY_ORDER.length;
}
