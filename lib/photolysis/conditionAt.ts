/**
 * A condition as a chemist states it (ConditionInput of lib/atmosphere/condition.ts)
 * resolved into everything a solve needs: T and p (U.S. Standard Atmosphere
 * 1976 unless overridden, separately), [M] = p/(k_B·T), the sun (zenith angle
 * from latitude, date and local solar time by the NOAA equations, unless
 * given), the overhead O3 column of the default climatology, every J, and
 * the held amounts and pool totals (default climatology unless overridden),
 * each with its source. Units: km, K, hPa, cm⁻³, degrees, s⁻¹.
 */
import {
  airColumnAbove_cm2,
  airNumberDensity_cm3,
  BACKGROUND_SULFATE_SOURCE,
  backgroundSulfateSurface_um2cm3,
  CONDITION_DEFAULTS,
  type ConditionInput,
  climatologyAt,
  climatologySources,
  DOBSON_UNIT_cm2,
  dayOfYear,
  O2_FRACTION,
  ozoneColumnAbove_cm2,
  type ResolvedCondition,
  solarZenithAngle,
  standardAtmosphere,
} from "../atmosphere";
import { InputError } from "../errors";
import { idRecord } from "../idRecord";
import { photolysisFrequencies } from "./photolysisFrequencies";

/** Ids of the climatology that are pool totals rather than held species. */
const POOLS = new Set(["Cly", "Bry", "NOy"]);

/** The resolved condition plus where each value came from. */
export interface AtmosphericCondition extends ResolvedCondition {
  /** source per quantity: "T_K", "p_hPa", "zenith_deg", "o3Column", each held species and pool id */
  sources: Record<string, string>;
}

function check(ok: boolean, path: string, message: string): void {
  if (!ok) throw new InputError(`condition.${path}`, message);
}

function isIn(v: unknown, min: number, max: number): boolean {
  return typeof v === "number" && Number.isFinite(v) && v >= min && v <= max;
}

export function conditionAt(input: ConditionInput): AtmosphericCondition {
  check(isIn(input?.altitude_km, 0, 86), "altitude_km", `altitude ${input?.altitude_km} km is outside 0–86 km`);
  if (input.T_K !== undefined)
    check(isIn(input.T_K, 150, 350), "T_K", `temperature ${input.T_K} K is outside 150–350 K`);
  if (input.p_hPa !== undefined) {
    check(isIn(input.p_hPa, Number.MIN_VALUE, 1100), "p_hPa", `pressure ${input.p_hPa} hPa must be > 0 and ≤ 1100`);
  }
  if (input.latitude_deg !== undefined) {
    check(isIn(input.latitude_deg, -90, 90), "latitude_deg", `latitude ${input.latitude_deg}° is outside −90–90°`);
  }
  if (input.localSolarTime_h !== undefined) {
    check(
      isIn(input.localSolarTime_h, 0, 24),
      "localSolarTime_h",
      `local solar time ${input.localSolarTime_h} h is outside 0–24 h`,
    );
  }
  if (input.zenith_deg !== undefined) {
    check(isIn(input.zenith_deg, 0, 180), "zenith_deg", `zenith angle ${input.zenith_deg}° is outside 0–180°`);
  }
  if (input.albedo !== undefined) check(isIn(input.albedo, 0, 1), "albedo", `albedo ${input.albedo} is outside 0–1`);
  if (input.aerosolOpticalDepth !== undefined) {
    check(
      isIn(input.aerosolOpticalDepth, 0, 10),
      "aerosolOpticalDepth",
      `aerosol optical depth ${input.aerosolOpticalDepth} is outside 0–10`,
    );
  }
  for (const [group, values] of [
    ["held", input.held],
    ["poolTotals", input.poolTotals],
  ] as const) {
    for (const [id, x] of Object.entries(values ?? {})) {
      check(isIn(x, 0, 1), `${group}.${id}`, `mixing ratio ${x} must be a number in 0–1 (mol/mol)`);
    }
  }

  const z = input.altitude_km;
  const std = standardAtmosphere(z);
  const T_K = input.T_K ?? std.T_K;
  const p_hPa = input.p_hPa ?? std.p_hPa;
  const M_cm3 = airNumberDensity_cm3(p_hPa * 100, T_K);
  const latitude_deg = input.latitude_deg ?? CONDITION_DEFAULTS.latitude_deg;
  const date = input.date ?? CONDITION_DEFAULTS.date;
  let doy: number;
  try {
    doy = dayOfYear(date);
  } catch (e) {
    throw new InputError("condition.date", e instanceof Error ? e.message : String(e));
  }
  const localSolarTime_h = input.localSolarTime_h ?? CONDITION_DEFAULTS.localSolarTime_h;
  const zenith_deg =
    input.zenith_deg ??
    solarZenithAngle({
      latitude_deg,
      dayOfYear: doy,
      localSolarTime_h: localSolarTime_h,
      year: Number(date.slice(0, 4)),
    });

  const albedo = input.albedo ?? CONDITION_DEFAULTS.albedo;
  const aerosolOpticalDepth = input.aerosolOpticalDepth ?? CONDITION_DEFAULTS.aerosolOpticalDepth;
  const sources: Record<string, string> = idRecord({
    T_K: input.T_K !== undefined ? "given" : "U.S. Standard Atmosphere 1976",
    p_hPa: input.p_hPa !== undefined ? "given" : "U.S. Standard Atmosphere 1976",
    zenith_deg:
      input.zenith_deg !== undefined
        ? "given"
        : "NOAA solar-position equations (declination, equation of time, hour angle) for latitude, date and local mean solar time",
    o3Column: `default climatology O3 × standard atmosphere: ${climatologySources.O3}`,
    J: `photolysisFrequencies (lib/photolysis): direct beam and delta-Eddington two-stream scattered light, ground albedo ${albedo}${aerosolOpticalDepth > 0 ? `, aerosol optical depth ${aerosolOpticalDepth} at 550 nm` : ""}; cross sections and solar spectrum approximate, from memory (lib/photolysis/tables/README.md)`,
    aerosol: input.aerosolSurface_um2cm3 !== undefined ? "given" : BACKGROUND_SULFATE_SOURCE,
  });

  const clim = climatologyAt(z);
  const held_cm3 = idRecord<number>();
  const poolTotals_cm3 = idRecord<number>();
  for (const [id, x] of Object.entries(clim)) {
    const target = POOLS.has(id) ? poolTotals_cm3 : held_cm3;
    target[id] = x * M_cm3;
    sources[id] = `default climatology: ${climatologySources[id as keyof typeof climatologySources]}`;
  }
  for (const [id, x] of Object.entries(input.held ?? {})) {
    held_cm3[id] = x * M_cm3;
    sources[id] = "given";
  }
  for (const [id, x] of Object.entries(input.poolTotals ?? {})) {
    poolTotals_cm3[id] = x * M_cm3;
    sources[id] = "given";
  }

  const o3Above = ozoneColumnAbove_cm2(z);
  // the O2 column follows the pressure at the level when that is overridden
  const o2Above = O2_FRACTION * airColumnAbove_cm2(z) * (p_hPa / std.p_hPa);
  const J_s = photolysisFrequencies(
    { altitude_km: z, zenith_deg, T_K, o3ColumnAbove_cm2: o3Above, o2ColumnAbove_cm2: o2Above, M_cm3 },
    { jScale: input.jScale, fixed: input.J, albedo, aerosolOpticalDepth },
  );
  if (input.J && Object.keys(input.J).length > 0)
    sources.J += `; fixed by the user: ${Object.keys(input.J).join(", ")}`;
  if (input.jScale !== undefined && input.jScale !== 1) sources.J += `; computed values × ${input.jScale}`;

  return {
    altitude_km: z,
    T_K,
    p_hPa,
    M_cm3,
    latitude_deg,
    date,
    dayOfYear: doy,
    localSolarTime_h,
    zenith_deg,
    mode: input.mode ?? CONDITION_DEFAULTS.mode,
    ozone: input.ozone ?? CONDITION_DEFAULTS.ozone,
    o3ColumnAbove_DU: o3Above / DOBSON_UNIT_cm2,
    aerosolSurface_um2cm3: input.aerosolSurface_um2cm3 ?? backgroundSulfateSurface_um2cm3(z),
    albedo,
    aerosolOpticalDepth,
    J_s,
    held_cm3,
    poolTotals_cm3,
    sources,
  };
}
