/**
 * Colours of a cycle family in the profile charts, taken from the explorer's
 * family tints (lib/viz familyStyle) so that a family looks the same on every
 * page. A coupled family ("ClOx-NOx") takes the light frame tint of its first
 * member and the outline of its second; the part below the pathway threshold
 * is grey. Colour is a secondary cue: areas and lines are also labelled.
 */
import { familyStyle } from "../../viz/familyStyle";

export interface FamilyColor {
  /** area fill, hex */
  fill: string;
  /** outline and line colour, hex */
  stroke: string;
  /** darker ink for labels and lines, hex */
  ink: string;
}

export function familyColor(family: string): FamilyColor {
  if (family === "unassigned") return { fill: "#e4e2dc", stroke: "#8f8c84", ink: "#5f5d57" };
  const parts = family.split("-");
  const first = familyStyle(parts[0]);
  if (parts.length === 1) return { fill: first.chip, stroke: first.chipStroke, ink: first.frameInk };
  const second = familyStyle(parts[1]);
  return { fill: first.frame, stroke: second.chipStroke, ink: first.frameInk };
}

/** Printed name of a family in the charts. */
export function familyName(family: string): string {
  return family === "unassigned" ? "below threshold" : family;
}
