export { builtinMechanismDir, builtinMechanisms, loadBuiltinMechanism } from "./builtinMechanisms";
export { canonicalJson } from "./canonicalJson";
export { compileMechanism } from "./compileMechanism";
export { externalReactions } from "./externalReactions";
export {
  type ConservationSearch,
  elementWeights,
  findConservationRelations,
  searchConservation,
} from "./findConservationRelations";
export { leftNullSpace } from "./leftNullSpace";
export {
  DEFAULTS as MECHANISM_LIMITS,
  type LoadMechanismOptions,
  loadMechanism,
  tooDeepDiagnostic,
} from "./loadMechanism";
export { missingContent } from "./missingContent";
export { JsonDepthScanner, jsonTooDeep, NESTING_DEFAULTS, type TooDeep, yamlTooDeep } from "./nestingDepth";
export { type EquationTerm, type ParsedEquation, parseEquation } from "./parseEquation";
export { parseFormula } from "./parseFormula";
export { poolExpression, weightedSum } from "./poolExpression";
export { findRecursiveAlias } from "./recursiveAlias";
export { stoichiometryMatrix } from "./stoichiometryMatrix";
export type * from "./types";
