export { chainLength } from "./chainLength";
export { cloxShareChange, clyMixingRatio } from "./cloxShareChange";
export { dominantFamily } from "./dominantFamily";
export { ozonePerCatalyst } from "./ozonePerCatalyst";
export { rateLimitingStep } from "./rateLimitingStep";
export { QUESTION_TEMPLATES, templateOf } from "./registry";
export { speciesRatio } from "./speciesRatio";
