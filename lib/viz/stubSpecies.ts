/**
 * Species the network draws as short per-reaction stubs instead of one chip
 * with long edges: the bath gases (family "bath"), O2 and N2 when they are
 * not solved. They take part in so many reactions that a single hub would
 * pull dozens of lines across the board.
 */
import { familyOf } from "../analysis/familyOf";
import type { MechanismSpeciesView } from "./types";

const ALWAYS = new Set(["O2", "N2"]);

export function isStubSpecies(sp: Pick<MechanismSpeciesView, "id" | "role" | "group" | "atoms">): boolean {
  if (sp.role === "solved") return false;
  return familyOf(sp) === "bath" || ALWAYS.has(sp.id);
}
