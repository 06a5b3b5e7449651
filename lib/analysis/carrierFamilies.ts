/**
 * Catalyst families and the carrier families of chain lengths.
 *
 * Naming: a catalyst (a species other than O, O(1D), O3, O2 and held species
 * that a pathway both consumes and regenerates) belongs to ClOx if it holds
 * Cl, BrOx if Br, NOx if N, HOx if H (a species may belong to several, e.g.
 * HOCl to ClOx and HOx). A cycle is named from the union of its catalysts'
 * families in the order ClOx, BrOx, NOx, HOx joined by "-" (e.g. "ClOx-BrOx",
 * "ClOx-HOx"); a cycle without catalysts is "Ox" (pure oxygen).
 *
 * Carrier families (the active radicals whose removal ends a chain, after
 * Lary 1997), weights in atoms of the family element: HOx = H + OH + HO2;
 * NOx = N + NO + NO2 + NO3; ClOx = Cl + ClO + ClOO + OClO + 2 Cl2O2 + 2 Cl2 +
 * BrCl; BrOx = Br + BrO + BrCl + 2 Br2. A mechanism species whose `group`
 * names a family is added with its atom count of the family element.
 * Everything else holding the element (HCl, HOCl, ClONO2, HNO3, N2O5, HO2NO2,
 * H2O2, HOBr, BrONO2, HBr, …) is a reservoir or sink.
 */

import { ownValue } from "../idRecord";
import type { CompiledMechanism } from "../mechanism/types";

/** The catalyst families, in the order a cycle's name joins them (display order: DISPLAY_FAMILY_ORDER, familyOf.ts). */
export const FAMILY_ORDER = ["ClOx", "BrOx", "NOx", "HOx"] as const;

const ELEMENT_OF: Record<string, string> = { ClOx: "Cl", BrOx: "Br", NOx: "N", HOx: "H" };

export const CARRIER_MEMBERS: Readonly<Record<string, Readonly<Record<string, number>>>> = {
  HOx: { H: 1, OH: 1, HO2: 1 },
  NOx: { N: 1, NO: 1, NO2: 1, NO3: 1 },
  ClOx: { Cl: 1, ClO: 1, ClOO: 1, OClO: 1, Cl2O2: 2, Cl2: 2, BrCl: 1 },
  BrOx: { Br: 1, BrO: 1, BrCl: 1, Br2: 2 },
};

/** Families a species belongs to by its atoms, in FAMILY_ORDER. */
export function familiesOfSpecies(atoms: Readonly<Record<string, number>>): string[] {
  return FAMILY_ORDER.filter((f) => (atoms[ELEMENT_OF[f]] ?? 0) > 0);
}

/** The cycle family named from its catalysts' families; "Ox" when there are none. */
export function familyName(families: Iterable<string>): string {
  const set = new Set(families);
  const named = FAMILY_ORDER.filter((f) => set.has(f));
  return named.length ? named.join("-") : "Ox";
}

/** Carrier-family weights by species index for every family present in the mechanism. */
export function carrierWeights(mech: Pick<CompiledMechanism, "species">): Map<string, Float64Array> {
  const out = new Map<string, Float64Array>();
  for (const fam of FAMILY_ORDER) {
    const w = new Float64Array(mech.species.length);
    let any = false;
    mech.species.forEach((sp, i) => {
      if (sp.role !== "solved") return;
      const listed = ownValue(CARRIER_MEMBERS[fam], sp.id);
      const grouped = sp.group === fam ? (sp.atoms[ELEMENT_OF[fam]] ?? 0) : 0;
      const v = listed ?? grouped;
      if (v > 0) {
        w[i] = v;
        any = true;
      }
    });
    if (any) out.set(fam, w);
  }
  return out;
}
