export { airNumberDensity_cm3 } from "./airNumberDensity";
export {
  BACKGROUND_SULFATE_SOURCE,
  BACKGROUND_SULFATE_SURFACE,
  backgroundSulfateSurface_um2cm3,
} from "./backgroundAerosol";
export { chapmanGrazing } from "./chapmanGrazing";
export { climatologyAt, climatologyMixingRatio, climatologySources, climatologySpecies } from "./climatologyAt";
export {
  airColumnAbove_cm2,
  airScaleHeight_km,
  columnAboveFromProfile,
  type DensityProfile,
  defaultOzoneDensity_cm3,
  o2ColumnAbove_cm2,
  ozoneColumnAbove_cm2,
} from "./columnAbove";
export { type ColumnsAboveLevelsOptions, columnsAboveLevels } from "./columnsAboveLevels";
export {
  type AnalysisMode,
  CONDITION_DEFAULTS,
  type ConditionInput,
  type ResolvedCondition,
} from "./condition";
export {
  AVOGADRO_mol,
  BOLTZMANN_J_K,
  DOBSON_UNIT_cm2,
  EARTH_RADIUS_km,
  N2_FRACTION,
  O2_FRACTION,
} from "./constants";
export { type DaylightInput, daylightHours } from "./daylightHours";
export { dayOfYear, isLeapYear } from "./dayOfYear";
export { DEMO_PROFILES, INVENTED_COLD_PROFILE, INVENTED_WARM_PROFILE } from "./demoProfiles";
export { equationOfTime_min } from "./equationOfTime";
export { erfcx } from "./erfcx";
export { frostPoint_K, iceVapourPressure_hPa } from "./frostPoint";
export { geometricToGeopotential_km, geopotentialToGeometric_km } from "./geopotential";
export { type HourAngleOptions, hourAngle_deg } from "./hourAngle";
export { NAT_DEFAULTS, natExistenceTemperature_K, natHno3Pressure_hPa } from "./natExistenceTemperature";
export { noonZenith } from "./noonZenith";
export {
  CLOUD_DEFAULTS,
  type CloudInput,
  type CloudPresent,
  type CloudState,
  type CloudType,
  polarCloud,
} from "./polarCloud";
export { checkDayOfYear, type SolarCoordinates, solarCoordinates } from "./solarCoordinates";
export { solarDeclination } from "./solarDeclination";
export { solarZenithAngle } from "./solarZenithAngle";
export { standardAtmosphere } from "./standardAtmosphere";
export { sunsetZenith_deg } from "./sunsetZenith";
export type * from "./types";
