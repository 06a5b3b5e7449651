/**
 * Reads a profile CSV (docs/profile-format.md): optional `# key: value`
 * lines, one header row of `name (unit)` cells, then one row per level.
 * Converts every value to the engine's units on load (km, K, hPa, mol/mol)
 * and checks it; every error names the row (the 1-based line of the file)
 * and the column as written, e.g. `profile.csv row 7, column "T (K)"`.
 */
import { InputError } from "../errors";
import { parseColumnHeader } from "./parseColumnHeader";
import { skipCommentLine } from "./skipCommentLine";
import { splitCsvLine } from "./splitCsvLine";
import type { Profile, ProfileColumn, ProfileLevel } from "./types";
import { ALTITUDE_UNITS, airDensityOf_cm3, toHectopascal, toMixingRatio } from "./units";

export const PARSE_PROFILE_DEFAULTS = {
  /** name used in error paths; default "profile.csv" */
  fileName: "profile.csv",
  /** most data rows accepted; default 2000 */
  maxRows: 2000,
};

export type ParseProfileOptions = Partial<typeof PARSE_PROFILE_DEFAULTS>;

const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

export function parseProfileCsv(text: string, options: ParseProfileOptions = {}): Profile {
  const o = { ...PARSE_PROFILE_DEFAULTS, ...options };
  const file = o.fileName;
  const lines = text.replace(/^\uFEFF/, "").split(/\r\n|\n|\r/);
  const meta: Record<string, string> = {};
  let headerRow = -1;
  let columns: ProfileColumn[] = [];
  const levels: ProfileLevel[] = [];
  const rowOf: number[] = [];

  for (let li = 0; li < lines.length; li++) {
    const row = li + 1;
    const line = lines[li];
    if (skipCommentLine(line, meta, headerRow < 0)) continue;
    const cells = splitCsvLine(line);
    if (headerRow < 0) {
      headerRow = row;
      columns = cells.map((c, j) => parseColumnHeader(c, `${file} row ${row}, column ${j + 1} "${c}"`));
      checkColumns(columns, file, row);
      continue;
    }
    if (levels.length >= o.maxRows) throw new InputError(`${file} row ${row}`, `more than ${o.maxRows} levels`);
    if (cells.length !== columns.length) {
      throw new InputError(
        `${file} row ${row}`,
        `${cells.length} cells, but the header (row ${headerRow}) has ${columns.length} columns`,
      );
    }
    levels.push(readRow(cells, columns, file, row));
    rowOf.push(row);
  }
  if (headerRow < 0) {
    throw new InputError(`${file} row 1`, `no header row; start with e.g. "altitude (km),T (K),p (hPa)"`);
  }
  if (levels.length === 0) throw new InputError(`${file} row ${headerRow + 1}`, "no data rows after the header");
  checkMonotonic(levels, columns, rowOf, file);
  if (levels.length > 1 && levels[1].altitude_km < levels[0].altitude_km) levels.reverse();
  return {
    id: "upload",
    title: meta.title || (options.fileName ?? "Uploaded profile"),
    source: "upload",
    // a file that says it is invented demo data (as the demo profiles' own CSV does) stays labelled so
    demo: meta.demo !== undefined,
    note: meta.note ?? "",
    levels,
    columns,
  };
}

function checkColumns(columns: ProfileColumn[], file: string, row: number): void {
  const where = `${file} row ${row} (header)`;
  const need: [ProfileColumn["quantity"], string][] = [
    ["altitude", `"altitude (km)"`],
    ["T", `"T (K)"`],
    ["p", `"p (hPa)"`],
  ];
  for (const [q, example] of need) {
    if (!columns.some((c) => c.quantity === q)) throw new InputError(where, `missing column ${example}`);
  }
  const seen = new Map<string, string>();
  for (const c of columns) {
    const key = c.quantity === "held" || c.quantity === "poolTotal" ? `${c.quantity}:${c.id}` : c.quantity;
    const prior = seen.get(key);
    if (prior) throw new InputError(`${where}, column "${c.header}"`, `repeats column "${prior}"`);
    seen.set(key, c.header);
  }
}

function readRow(cells: string[], columns: ProfileColumn[], file: string, row: number): ProfileLevel {
  const values = cells.map((cell, j) => {
    const c = columns[j];
    const where = `${file} row ${row}, column "${c.header}"`;
    if (cell === "") {
      if (c.quantity === "held" || c.quantity === "poolTotal") return null;
      throw new InputError(where, "empty cell; altitude, T and p are needed on every row");
    }
    if (!NUMBER.test(cell)) throw new InputError(where, `"${cell}" is not a number`);
    return Number(cell);
  });
  const at = (q: ProfileColumn["quantity"]) => columns.findIndex((c) => c.quantity === q);
  const iz = at("altitude");
  const iT = at("T");
  const ip = at("p");
  const where = (j: number) => `${file} row ${row}, column "${columns[j].header}"`;
  const altitude_km = (values[iz] as number) * ALTITUDE_UNITS[columns[iz].unit];
  if (!(altitude_km >= 0 && altitude_km <= 86)) {
    throw new InputError(where(iz), `altitude ${altitude_km} km is outside 0–86 km (the 1976 standard's range)`);
  }
  const T_K = values[iT] as number;
  if (!(T_K >= 150 && T_K <= 350)) throw new InputError(where(iT), `temperature ${T_K} K is outside 150–350 K`);
  const p_hPa = toHectopascal(values[ip] as number, columns[ip].unit);
  if (!(p_hPa > 0 && p_hPa <= 1100)) {
    throw new InputError(where(ip), `pressure ${values[ip]} ${columns[ip].unit} is not above 0 and at most 1100 hPa`);
  }
  const M_cm3 = airDensityOf_cm3(p_hPa, T_K);
  const level: ProfileLevel = { altitude_km, T_K, p_hPa };
  columns.forEach((c, j) => {
    const v = values[j];
    if (v === null || (c.quantity !== "held" && c.quantity !== "poolTotal")) return;
    const x = toMixingRatio(v, c.unit, M_cm3);
    if (!(x >= 0 && x <= 1)) {
      throw new InputError(where(j), `${v} ${c.unit} is ${x.toExponential(3)} mol/mol, outside 0–1`);
    }
    const key = c.quantity === "held" ? "held" : "poolTotals";
    level[key] = { ...level[key], [c.id as string]: x };
  });
  return level;
}

function checkMonotonic(levels: ProfileLevel[], columns: ProfileColumn[], rowOf: number[], file: string): void {
  if (levels.length < 2) return;
  const header = columns.find((c) => c.quantity === "altitude")?.header ?? "altitude";
  const dir = Math.sign(levels[1].altitude_km - levels[0].altitude_km);
  for (let i = 1; i < levels.length; i++) {
    const d = Math.sign(levels[i].altitude_km - levels[i - 1].altitude_km);
    if (d === 0 || d !== dir) {
      const was = dir > 0 ? "increasing" : "decreasing";
      throw new InputError(
        `${file} row ${rowOf[i]}, column "${header}"`,
        d === 0
          ? `altitude ${levels[i].altitude_km} km repeats row ${rowOf[i - 1]}; altitudes must be strictly monotonic`
          : `altitude ${levels[i].altitude_km} km after ${levels[i - 1].altitude_km} km (row ${rowOf[i - 1]}) breaks the ${was} order; altitudes must be strictly monotonic`,
      );
    }
  }
}
