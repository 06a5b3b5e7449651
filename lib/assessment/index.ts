export { fmix32, mulberry32, variantSeed } from "../random";
export { readCsv, writeCsv } from "./csv";
export { DEFAULTS as DRAW_DEFAULTS, drawCondition, SCALAR_FIELDS } from "./drawCondition";
export { answerTemplateCsv, keyCsv, keyJson, marksCsv } from "./exports";
export { formatAnswer, formatTolerance } from "./formatKey";
export type { GeneratedAssessment, GenerateOptions, VariantAnalyses } from "./generateAssessment";
export { DEFAULTS as GENERATE_DEFAULTS, distinctStarts, generateAssessment, questionInfo } from "./generateAssessment";
export { markAnswer, withinTolerance } from "./markAnswer";
export { LIMITS as MARKING_LIMITS, markClass } from "./markClass";
export { normaliseName, parseNumberAnswer } from "./parseAnswer";
export { qtiFiles, qtiPackage } from "./qti";
export { formatMixingRatio, sheetConditions } from "./sheetConditions";
export { formatSignificant, roundToSignificant } from "./significant";
export type { MechanismOffer } from "./specSchema";
export {
  assessmentPreviewSchema,
  assessmentSpecSchema,
  checkAgainstMechanism,
  LIMITS as SPEC_LIMITS,
  parseAssessmentSpec,
} from "./specSchema";
export { studentView } from "./studentView";
export { QUESTION_TEMPLATES, templateOf } from "./templates";
export type * from "./types";
