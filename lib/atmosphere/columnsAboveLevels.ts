/**
 * Columns above each level of a profile given on discrete levels (e.g. the O3
 * of a profile being solved): each gap integrated exactly for an exponential
 * between the level values, plus a column above the top level.
 * Units: km, molecules cm⁻³ → molecules cm⁻².
 */
import { InputError } from "../errors";

export interface ColumnsAboveLevelsOptions {
  /** column above the highest level, molecules cm⁻²; default: its density × 5 km */
  columnAboveTop_cm2?: number;
}

const DEFAULTS = {
  /** scale height for the default column above the top level, km */
  topScaleHeight_km: 5,
};

/** Column above each level (cm⁻²), levels in any order; densities in cm⁻³. */
export function columnsAboveLevels(
  altitudes_km: readonly number[],
  density_cm3: readonly number[],
  options: ColumnsAboveLevelsOptions = {},
): number[] {
  if (altitudes_km.length !== density_cm3.length || altitudes_km.length === 0) {
    throw new InputError(
      "density_cm3",
      `columnsAboveLevels: need one density per altitude (got ${density_cm3.length} densities for ${altitudes_km.length} altitudes)`,
    );
  }
  density_cm3.forEach((n, i) => {
    if (!Number.isFinite(n) || n < 0) {
      throw new InputError(`density_cm3[${i}]`, `columnsAboveLevels: density ${n} is not a finite number ≥ 0`);
    }
  });
  const order = altitudes_km.map((_, i) => i).sort((a, b) => altitudes_km[b] - altitudes_km[a]);
  const out = new Array<number>(altitudes_km.length);
  const top = order[0];
  let column = options.columnAboveTop_cm2 ?? density_cm3[top] * DEFAULTS.topScaleHeight_km * 1e5;
  out[top] = column;
  for (let k = 1; k < order.length; k++) {
    const hi = order[k - 1];
    const lo = order[k];
    const h_cm = (altitudes_km[hi] - altitudes_km[lo]) * 1e5;
    const n1 = density_cm3[lo];
    const n2 = density_cm3[hi];
    const r = n2 > 0 ? n1 / n2 : 0;
    column += n1 > 0 && n2 > 0 && Math.abs(r - 1) > 1e-6 ? (h_cm * (n1 - n2)) / Math.log(r) : 0.5 * (n1 + n2) * h_cm;
    out[lo] = column;
  }
  return out;
}
