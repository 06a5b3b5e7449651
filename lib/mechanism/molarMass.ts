/**
 * Molar mass of a species from its atoms, with the IUPAC abridged standard
 * atomic weights (IUPAC Commission on Isotopic Abundances and Atomic Weights,
 * 2021 table, abridged to five significant figures).
 *
 * Units: g mol⁻¹. Returns undefined when an element is not in the table.
 */
export const ATOMIC_WEIGHT_gmol: Readonly<Record<string, number>> = {
  H: 1.008,
  C: 12.011,
  N: 14.007,
  O: 15.999,
  F: 18.998,
  S: 32.06,
  Cl: 35.45,
  Br: 79.904,
  I: 126.9,
};

export function molarMass_gmol(atoms: Readonly<Record<string, number>>): number | undefined {
  let m = 0;
  for (const [el, n] of Object.entries(atoms)) {
    const w = ATOMIC_WEIGHT_gmol[el];
    if (w === undefined) return undefined;
    m += w * n;
  }
  return m > 0 ? m : undefined;
}
