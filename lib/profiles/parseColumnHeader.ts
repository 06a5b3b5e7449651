/**
 * One header cell of a profile CSV: `name (unit)`, e.g. `altitude (km)`,
 * `T (K)`, `p (hPa)`, `H2O (ppmv)`, `Cly (ppbv)`. Bare Cly, Bry and NOy are
 * pool totals; `total:X (unit)` names any other pool, `held:X (unit)` forces a
 * held species. The syntax is this project's (docs/profile-format.md).
 */
import { InputError } from "../errors";
import type { ProfileColumn } from "./types";
import { ALTITUDE_UNITS, MIXING_RATIO_UNITS, normaliseUnit, PRESSURE_UNITS } from "./units";

/** Pool ids read as totals without a `total:` prefix (the project's shared pool ids). */
export const KNOWN_POOLS: readonly string[] = ["Cly", "Bry", "NOy"];

const NAMES: Readonly<Record<string, "altitude" | "T" | "p">> = {
  altitude: "altitude",
  alt: "altitude",
  z: "altitude",
  t: "T",
  temperature: "T",
  p: "p",
  pressure: "p",
};

const SPECIES_ID = /^[A-Za-z][A-Za-z0-9()+\-_]*$/;

/** Parses a header cell; `where` is the error path of the cell, e.g. `profile.csv row 1, column "T (K)"`. */
export function parseColumnHeader(cell: string, where: string): ProfileColumn {
  const header = cell.trim();
  const m = /^(.+?)\s*\(([^()]*)\)\s*$/.exec(header);
  if (!m) {
    throw new InputError(where, `a header must be a name with its unit in brackets, e.g. "p (hPa)" or "H2O (ppmv)"`);
  }
  const name = m[1].trim();
  const unitWritten = m[2].trim();
  const unit = normaliseUnit(unitWritten);
  const quantity = NAMES[name.toLowerCase()];
  if (quantity === "altitude") {
    if (!unit || !(unit in ALTITUDE_UNITS))
      throw unknownUnit(where, unitWritten, "altitude", Object.keys(ALTITUDE_UNITS));
    return { header, quantity, unit };
  }
  if (quantity === "T") {
    if (unit !== "K") throw unknownUnit(where, unitWritten, "temperature", ["K"]);
    return { header, quantity, unit };
  }
  if (quantity === "p") {
    if (!unit || !(unit in PRESSURE_UNITS))
      throw unknownUnit(where, unitWritten, "pressure", Object.keys(PRESSURE_UNITS));
    return { header, quantity, unit };
  }
  let id = name;
  let kind: "held" | "poolTotal" = KNOWN_POOLS.includes(name) ? "poolTotal" : "held";
  const prefixed = /^(held|total)\s*:\s*(.+)$/i.exec(name);
  if (prefixed) {
    id = prefixed[2].trim();
    kind = prefixed[1].toLowerCase() === "total" ? "poolTotal" : "held";
  }
  if (!SPECIES_ID.test(id)) {
    throw new InputError(
      where,
      `"${id}" is not a species or pool id; use e.g. "H2O (ppmv)", "Cly (ppbv)" or "total:X (pptv)"`,
    );
  }
  const amountUnits = [...Object.keys(MIXING_RATIO_UNITS), "cm-3"];
  if (!unit || !amountUnits.includes(unit)) throw unknownUnit(where, unitWritten, `amount of ${id}`, amountUnits);
  return { header, quantity: kind, id, unit };
}

function unknownUnit(where: string, written: string, what: string, allowed: string[]): InputError {
  return new InputError(
    where,
    written
      ? `unknown ${what} unit "${written}"; use one of ${allowed.join(", ")}`
      : `no unit for ${what}; use one of ${allowed.join(", ")}`,
  );
}
