/**
 * Writes a profile as CSV in the format parseProfileCsv reads: the columns
 * and units of the upload when it has them, else km, K, hPa and mol/mol.
 * Values are written with full precision, so that parsing the output gives
 * back the same profile (to rounding in the unit conversions).
 */
import { standardAtmosphere } from "../atmosphere";
import { KNOWN_POOLS } from "./parseColumnHeader";
import type { Profile, ProfileColumn } from "./types";
import { ALTITUDE_UNITS, airDensityOf_cm3, fromMixingRatio, PRESSURE_UNITS } from "./units";

function quote(s: string): string {
  return /[",\n\r]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

function canonicalColumns(profile: Profile): ProfileColumn[] {
  const held = new Set<string>();
  const pools = new Set<string>();
  for (const l of profile.levels) {
    for (const id of Object.keys(l.held ?? {})) held.add(id);
    for (const id of Object.keys(l.poolTotals ?? {})) pools.add(id);
  }
  const poolHeader = (id: string) => (KNOWN_POOLS.includes(id) ? id : `total:${id}`);
  const heldHeader = (id: string) => (KNOWN_POOLS.includes(id) ? `held:${id}` : id);
  return [
    { header: "altitude (km)", quantity: "altitude", unit: "km" },
    { header: "T (K)", quantity: "T", unit: "K" },
    { header: "p (hPa)", quantity: "p", unit: "hPa" },
    ...[...held]
      .sort()
      .map((id) => ({ header: `${heldHeader(id)} (mol/mol)`, quantity: "held" as const, id, unit: "mol/mol" })),
    ...[...pools]
      .sort()
      .map((id) => ({ header: `${poolHeader(id)} (mol/mol)`, quantity: "poolTotal" as const, id, unit: "mol/mol" })),
  ];
}

export function profileToCsv(profile: Profile): string {
  const columns = profile.columns ?? canonicalColumns(profile);
  const out: string[] = [`# title: ${profile.title.replace(/[\r\n]+/g, " ")}`];
  if (profile.note) out.push(`# note: ${profile.note.replace(/[\r\n]+/g, " ")}`);
  if (profile.demo) out.push("# demo: invented data for demonstration, not a measurement");
  out.push(columns.map((c) => quote(c.header)).join(","));
  for (const l of profile.levels) {
    const std = l.T_K === undefined || l.p_hPa === undefined ? standardAtmosphere(l.altitude_km) : null;
    const T_K = l.T_K ?? (std?.T_K as number);
    const p_hPa = l.p_hPa ?? (std?.p_hPa as number);
    const M = airDensityOf_cm3(p_hPa, T_K);
    const cells = columns.map((c) => {
      switch (c.quantity) {
        case "altitude":
          return String(l.altitude_km / ALTITUDE_UNITS[c.unit]);
        case "T":
          return String(T_K);
        case "p":
          return String(p_hPa / PRESSURE_UNITS[c.unit]);
        case "held": {
          const x = l.held?.[c.id as string];
          return x === undefined ? "" : String(fromMixingRatio(x, c.unit, M));
        }
        case "poolTotal": {
          const x = l.poolTotals?.[c.id as string];
          return x === undefined ? "" : String(fromMixingRatio(x, c.unit, M));
        }
        default:
          return "";
      }
    });
    out.push(cells.join(","));
  }
  return `${out.join("\r\n")}\r\n`;
}
