/**
 * Reads a trajectory CSV (docs/runs.md): optional `# key: value` lines, one
 * header row of field names, then one row per time. Required columns:
 * time_h, T_K, p_hPa, latitude_deg; optional altitude_km and
 * aerosolSurface_um2cm3; any other column is passed to the condition under
 * its name (numbers as numbers), so condition fields the engine learns later
 * need no change here. Every error names the row (the 1-based line of the
 * file) and the column, e.g. `trajectory.csv row 7, column "T_K"`.
 */
import { InputError } from "../errors";
import { skipCommentLine } from "../profiles/skipCommentLine";
import { splitCsvLine } from "../profiles/splitCsvLine";
import type { TrajectoryPoint } from "./types";

export const PARSE_TRAJECTORY_DEFAULTS = {
  /** name used in error paths */
  fileName: "trajectory.csv",
  /** most data rows accepted */
  maxRows: 10_000,
};

export type ParseTrajectoryOptions = Partial<typeof PARSE_TRAJECTORY_DEFAULTS>;

const REQUIRED = ["time_h", "T_K", "p_hPa", "latitude_deg"] as const;
/** column → allowed range (inclusive) and what it is */
const RANGES: Record<string, [number, number, string]> = {
  time_h: [0, 24 * 366, "time since the start, h"],
  T_K: [150, 350, "temperature, K"],
  p_hPa: [1e-6, 1100, "pressure, hPa"],
  latitude_deg: [-90, 90, "latitude, degrees north"],
  altitude_km: [0, 86, "altitude, km"],
  aerosolSurface_um2cm3: [0, 10_000, "aerosol surface area density, µm² cm⁻³"],
};
const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;
const NAME = /^[A-Za-z][A-Za-z0-9_]*$/;

export interface ParsedTrajectory {
  points: TrajectoryPoint[];
  /** the `# key: value` lines */
  meta: Record<string, string>;
  /** columns passed to the condition as given */
  extraColumns: string[];
}

export function parseTrajectoryCsv(text: string, options: ParseTrajectoryOptions = {}): ParsedTrajectory {
  const o = { ...PARSE_TRAJECTORY_DEFAULTS, ...options };
  const file = o.fileName;
  const lines = text.replace(/^\uFEFF/, "").split(/\r\n|\n|\r/);
  const meta: Record<string, string> = {};
  let header: string[] | null = null;
  let headerRow = 0;
  const points: TrajectoryPoint[] = [];
  for (let li = 0; li < lines.length; li++) {
    const row = li + 1;
    const line = lines[li];
    if (skipCommentLine(line, meta, !header)) continue;
    const cells = splitCsvLine(line);
    if (!header) {
      header = cells;
      headerRow = row;
      checkHeader(cells, file, row);
      continue;
    }
    if (points.length >= o.maxRows)
      throw new InputError(
        `${file} row ${row}`,
        `more than ${o.maxRows} rows: split the trajectory or thin it`,
        "too-many-rows",
      );
    if (cells.length !== header.length)
      throw new InputError(
        `${file} row ${row}`,
        `${cells.length} cells, but the header (row ${headerRow}) has ${header.length} columns`,
      );
    points.push(readRow(cells, header, file, row));
    const prev = points[points.length - 2];
    const cur = points[points.length - 1];
    if (prev && !(cur.time_h > prev.time_h))
      throw new InputError(
        `${file} row ${row}, column "time_h"`,
        `time ${cur.time_h} h does not follow ${prev.time_h} h of the row before: times must increase`,
      );
  }
  if (!header) throw new InputError(`${file} row 1`, `no header row; start with "${REQUIRED.join(",")}"`);
  if (points.length === 0) throw new InputError(`${file} row ${headerRow + 1}`, "no data rows after the header");
  if (points[0].time_h !== 0)
    throw new InputError(
      `${file} row ${headerRow + 1}, column "time_h"`,
      `the first row must be at time 0 h, not ${points[0].time_h} h`,
    );
  const extraColumns = header.filter((c) => !(c in RANGES));
  return { points, meta, extraColumns };
}

function checkHeader(cells: string[], file: string, row: number): void {
  const seen = new Set<string>();
  cells.forEach((c, j) => {
    if (!NAME.test(c))
      throw new InputError(`${file} row ${row}, column ${j + 1}`, `"${c}" is not a field name (letters, digits, _)`);
    if (seen.has(c)) throw new InputError(`${file} row ${row}, column "${c}"`, "appears twice");
    seen.add(c);
  });
  for (const r of REQUIRED)
    if (!seen.has(r))
      throw new InputError(
        `${file} row ${row}`,
        `no column "${r}" (${RANGES[r][2]}); the header needs ${REQUIRED.join(", ")}`,
      );
}

function readRow(cells: string[], header: string[], file: string, row: number): TrajectoryPoint {
  const known: Record<string, number> = {};
  const extra: Record<string, number | string> = {};
  header.forEach((name, j) => {
    const cell = cells[j];
    const where = `${file} row ${row}, column "${name}"`;
    const range = RANGES[name];
    if (!range) {
      if (cell !== "") extra[name] = NUMBER.test(cell) ? Number(cell) : cell;
      return;
    }
    if (cell === "") {
      if ((REQUIRED as readonly string[]).includes(name)) throw new InputError(where, `empty; give the ${range[2]}`);
      return;
    }
    if (!NUMBER.test(cell)) throw new InputError(where, `"${cell}" is not a number (${range[2]})`);
    const v = Number(cell);
    if (!(v >= range[0] && v <= range[1]))
      throw new InputError(where, `${v} is outside ${range[0]}–${range[1]} (${range[2]})`);
    known[name] = v;
  });
  return {
    time_h: known.time_h,
    T_K: known.T_K,
    p_hPa: known.p_hPa,
    latitude_deg: known.latitude_deg,
    ...(known.altitude_km !== undefined ? { altitude_km: known.altitude_km } : {}),
    ...(known.aerosolSurface_um2cm3 !== undefined ? { aerosolSurface_um2cm3: known.aerosolSurface_um2cm3 } : {}),
    ...(Object.keys(extra).length ? { extra } : {}),
  };
}
