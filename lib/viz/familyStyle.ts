/**
 * Tints for the family frames and species chips. The families are told
 * apart first by position and by the frame's printed name; colour is a
 * secondary cue, so the tints are soft and share one lightness (OKLCh,
 * Ottosson 2020), with hues spaced around the circle.
 */

import { ownValue } from "../idRecord";
import { oklchToHex } from "./colorSpace";

export interface FamilyStyle {
  /** frame background, hex */
  frame: string;
  /** frame outline and title, hex */
  frameInk: string;
  /** species chip fill, hex */
  chip: string;
  /** chip outline, hex */
  chipStroke: string;
}

const HUES: Record<string, number> = {
  Ox: 300,
  HOx: 200,
  NOx: 130,
  ClOx: 60,
  BrOx: 20,
  reservoir: 250,
  source: 95,
  organic: 165,
};

export function familyStyle(family: string): FamilyStyle {
  const h = ownValue(HUES, family);
  if (h === undefined) {
    return { frame: "#f4f4f2", frameInk: "#6b6b66", chip: "#ececea", chipStroke: "#9a9a94" };
  }
  return {
    frame: oklchToHex({ L: 0.975, C: 0.012, h }),
    frameInk: oklchToHex({ L: 0.45, C: 0.06, h }),
    chip: oklchToHex({ L: 0.93, C: 0.035, h }),
    chipStroke: oklchToHex({ L: 0.55, C: 0.07, h }),
  };
}
