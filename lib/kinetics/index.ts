export {
  type AmountDependence,
  amountDependence,
  amountSpecies,
  newSurfaceCache,
  partialPressure_atm,
  type SurfaceCache,
} from "./amountDependence";
export { arrhenius } from "./arrhenius";
export { type ChemicalActivationParams, chemicalActivation } from "./chemicalActivation";
export { effectiveRateConstant } from "./effectiveRateConstant";
export { equilibriumConstant, equilibriumReverse } from "./equilibriumReverse";
export { type LindemannParams, lindemann } from "./lindemann";
export { partnerLimitedGamma } from "./partnerLimitedGamma";
export { photolysisRate } from "./photolysisRate";
export { lawIncludesM, rateConstant } from "./rateConstant";
export { type SulfateComposition, sulfateComposition, waterVapourPressure_mbar } from "./sulfateComposition";
export { SULFATE_GAMMA_DEFAULTS, type SulfateGammaInput, type SulfateGammas, sulfateGammas } from "./sulfateGamma";
export { surfaceArea_cm2cm3 } from "./surfaceArea";
export { falloff, type TermolecularParams, termolecular } from "./termolecular";
export type { KineticsEnv, LiquidAerosolProcess, RateLaw, SurfaceKind, Uncertainty } from "./types";
export { uncertaintyFactor } from "./uncertaintyFactor";
export { GAS_CONSTANT, meanMolecularSpeed_cms, uptake } from "./uptake";
