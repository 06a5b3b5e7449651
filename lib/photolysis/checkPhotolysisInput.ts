/**
 * Input checks of the photolysis entry points: InputError with the path of
 * the offending field and the allowed range.
 */
import { InputError } from "../errors";
import { photolysisChannels } from "./channels";
import type { PhotolysisInput, PhotolysisOptions } from "./types";

const KNOWN = new Set(photolysisChannels);

function finiteIn(value: unknown, min: number, max: number): value is number {
  return typeof value === "number" && Number.isFinite(value) && value >= min && value <= max;
}

function need(ok: boolean, path: string, message: string): void {
  if (!ok) throw new InputError(path, `photolysis: ${message}`);
}

export function checkPhotolysisInput(input: PhotolysisInput, options: PhotolysisOptions = {}): void {
  need(finiteIn(input?.altitude_km, 0, 86), "altitude_km", `altitude ${input?.altitude_km} km is outside 0–86 km`);
  need(finiteIn(input.zenith_deg, 0, 180), "zenith_deg", `zenith angle ${input.zenith_deg}° is outside 0–180°`);
  need(finiteIn(input.T_K, 150, 350), "T_K", `temperature ${input.T_K} K is outside 150–350 K`);
  for (const key of ["o3ColumnAbove_cm2", "o2ColumnAbove_cm2", "M_cm3"] as const) {
    const v = input[key];
    if (v !== undefined) need(finiteIn(v, 0, Number.MAX_VALUE), key, `${key} = ${v} must be a finite number ≥ 0`);
  }
  if (options.jScale !== undefined) {
    need(
      finiteIn(options.jScale, 0, Number.MAX_VALUE),
      "jScale",
      `jScale = ${options.jScale} must be a finite number ≥ 0`,
    );
  }
  if (options.albedo !== undefined) {
    need(finiteIn(options.albedo, 0, 1), "albedo", `albedo ${options.albedo} is outside 0–1`);
  }
  if (options.aerosolOpticalDepth !== undefined) {
    need(
      finiteIn(options.aerosolOpticalDepth, 0, 10),
      "aerosolOpticalDepth",
      `aerosol optical depth ${options.aerosolOpticalDepth} is outside 0–10`,
    );
  }
  if (options.o3ScaleHeight_km !== undefined) {
    need(
      finiteIn(options.o3ScaleHeight_km, 0.1, 100),
      "o3ScaleHeight_km",
      `O3 scale height ${options.o3ScaleHeight_km} km is outside 0.1–100 km`,
    );
  }
  const range = options.wavelengthRange_nm;
  if (range !== undefined) {
    need(
      Array.isArray(range) && range.length === 2 && finiteIn(range[0], 0, 1e4) && finiteIn(range[1], range[0], 1e4),
      "wavelengthRange_nm",
      `wavelengthRange_nm must be [min, max] in nm with min ≤ max (got ${JSON.stringify(range)})`,
    );
  }
  options.channels?.forEach((id, i) => {
    need(
      KNOWN.has(id),
      `channels[${i}]`,
      `unknown photolysis channel "${id}" (known: ${photolysisChannels.join(", ")})`,
    );
  });
  for (const [id, value] of Object.entries(options.fixed ?? {})) {
    need(KNOWN.has(id), `fixed.${id}`, `unknown photolysis channel "${id}"`);
    need(finiteIn(value, 0, Number.MAX_VALUE), `fixed.${id}`, `fixed J = ${value} s⁻¹ must be a finite number ≥ 0`);
  }
}
