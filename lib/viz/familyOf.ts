/**
 * The display family of a species: the mechanism's `group` when given, else
 * a guess from the role and the atoms (Br before Cl before N before H, since a
 * species carrying a halogen is read with its halogen family; species mixing
 * two of H, N, Cl, Br are reservoirs). Common practice in stratospheric
 * chemistry texts; the exact rule is this project's.
 */

import { ownValue } from "../idRecord";
import type { MechanismSpeciesView } from "./types";

/** Families in display order; unknown groups follow, sorted by name. */
export const FAMILY_ORDER = [
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

export function familyOf(sp: Pick<MechanismSpeciesView, "role" | "group" | "atoms">): string {
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

/** Sort key: index in FAMILY_ORDER, unknown families after in name order. */
export function familyRank(family: string): number {
  const i = (FAMILY_ORDER as readonly string[]).indexOf(family);
  return i >= 0 ? i : FAMILY_ORDER.length;
}
