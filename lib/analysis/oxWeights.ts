/**
 * Odd-oxygen definitions as weights per species: the number of odd oxygen
 * atoms a species stands for.
 *
 * - "standard": Ox = O + O(1D) + O3 (common practice; the project's default).
 * - "extended": the standard members plus the species that hold odd oxygen
 *   in fast exchange with them, each weighted by the odd oxygen it returns:
 *   NO2 (NO + O) 1, NO3 (NO + 2 O) 2, N2O5 (NO2 + NO3) 3, HNO3 (OH + NO2) 1,
 *   HO2NO2 (HO2 + NO2) 1, ClO 1, OClO (ClO + O) 2, Cl2O2 (2 ClO) 2,
 *   ClONO2 (ClO + NO2) 2, BrO 1, BrONO2 (BrO + NO2) 2. With these weights the
 *   fast null cycles (NO + O3 / NO2 + hv, Cl + O3 / ClO + NO, reservoir
 *   formation and photolysis back to the same radicals) change Ox by 0.
 */

import { idRecord, ownValue } from "../idRecord";
import type { CompiledMechanism } from "../mechanism/types";
import type { OxDefinition } from "./types";

export const STANDARD_OX: Readonly<Record<string, number>> = { O: 1, "O(1D)": 1, O1D: 1, O3: 1 };

export const EXTENDED_OX: Readonly<Record<string, number>> = {
  ...STANDARD_OX,
  NO2: 1,
  NO3: 2,
  N2O5: 3,
  HNO3: 1,
  HO2NO2: 1,
  ClO: 1,
  OClO: 2,
  Cl2O2: 2,
  ClONO2: 2,
  BrO: 1,
  BrONO2: 2,
};

/** Weight by species index (0 for non-members) and the members present, id → weight. */
export function oxWeights(
  mech: Pick<CompiledMechanism, "species">,
  definition: OxDefinition,
): { weights: Float64Array; members: Record<string, number> } {
  const table = definition === "extended" ? EXTENDED_OX : STANDARD_OX;
  const weights = new Float64Array(mech.species.length);
  const members = idRecord<number>();
  mech.species.forEach((sp, i) => {
    const w = ownValue(table, sp.id);
    if (w) {
      weights[i] = w;
      members[sp.id] = w;
    }
  });
  return { weights, members };
}
