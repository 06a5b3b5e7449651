/** The question templates by kind, in the order the builder offers them. */
import type { QuestionKind, QuestionTemplate } from "../types";
import { chainLength } from "./chainLength";
import { cloxShareChange } from "./cloxShareChange";
import { dominantFamily } from "./dominantFamily";
import { ozonePerCatalyst } from "./ozonePerCatalyst";
import { rateLimitingStep } from "./rateLimitingStep";
import { speciesRatio } from "./speciesRatio";

export const QUESTION_TEMPLATES: readonly QuestionTemplate[] = [
  dominantFamily,
  rateLimitingStep,
  chainLength,
  speciesRatio,
  cloxShareChange,
  ozonePerCatalyst,
];

export function templateOf(kind: QuestionKind): QuestionTemplate {
  const t = QUESTION_TEMPLATES.find((q) => q.kind === kind);
  if (!t) throw new RangeError(`templateOf: unknown question kind ${kind}`);
  return t;
}
