/**
 * The conditions printed at the top of a variant's sheet: what the variant
 * sets, plus the temperature and pressure it resolves to, in round numbers
 * and with units, so that a student can enter them in the explorer.
 */
import type { AnalysisResult, ConditionInput } from "../engine/types";
import { formatSignificant } from "./significant";
import type { SheetCondition } from "./types";

/** Mixing ratio printed in the unit that keeps it between 0.1 and 1000. */
export function formatMixingRatio(x: number): string {
  if (x === 0) return "0";
  const units: [number, string][] = [
    [1e-12, "pptv"],
    [1e-9, "ppbv"],
    [1e-6, "ppmv"],
    [1e-2, "%"],
  ];
  let chosen = units[0];
  for (const u of units) if (x / u[0] >= 0.1) chosen = u;
  return `${formatSignificant(x / chosen[0], 3)} ${chosen[1]}`;
}

function hours(h: number): string {
  const hh = Math.floor(h);
  const mm = Math.round((h - hh) * 60);
  return `${String(hh + (mm === 60 ? 1 : 0)).padStart(2, "0")}:${String(mm % 60).padStart(2, "0")}`;
}

export function sheetConditions(c: ConditionInput, resolved: AnalysisResult["condition"]): SheetCondition[] {
  const rows: SheetCondition[] = [{ label: "Altitude", value: `${formatSignificant(c.altitude_km, 3)} km` }];
  if (c.zenith_deg !== undefined)
    rows.push({ label: "Solar zenith angle", value: `${formatSignificant(c.zenith_deg, 3)}°` });
  else {
    const lat = resolved.latitude_deg;
    rows.push({ label: "Latitude", value: `${Math.abs(lat)}° ${lat < 0 ? "S" : "N"}` });
    rows.push({ label: "Date", value: resolved.date });
    rows.push({ label: "Local solar time", value: hours(resolved.localSolarTime_h) });
  }
  rows.push({
    label: "Temperature",
    value: `${formatSignificant(resolved.T_K, 3)} K${c.T_K === undefined ? " (standard atmosphere)" : ""}`,
  });
  rows.push({
    label: "Pressure",
    value: `${formatSignificant(resolved.p_hPa, 3)} hPa${c.p_hPa === undefined ? " (standard atmosphere)" : ""}`,
  });
  for (const [id, x] of Object.entries(c.poolTotals ?? {}).sort())
    rows.push({ label: `Total ${id}`, value: formatMixingRatio(x) });
  for (const [id, x] of Object.entries(c.held ?? {}).sort())
    rows.push({ label: `${id} (held)`, value: formatMixingRatio(x) });
  for (const [ch, j] of Object.entries(c.J ?? {}).sort())
    rows.push({ label: `J(${ch})`, value: `${formatSignificant(j, 3)} s⁻¹` });
  if (c.jScale !== undefined && c.jScale !== 1)
    rows.push({ label: "Photolysis scaled by", value: `× ${formatSignificant(c.jScale, 3)}` });
  if (c.mode === "diurnal") rows.push({ label: "Averaging", value: "24-hour mean of the periodic diurnal solution" });
  if (c.ozone === "solved") rows.push({ label: "Ozone", value: "solved (not held at the climatology)" });
  return rows;
}
