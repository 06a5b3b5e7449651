/**
 * One question of one variant as an IMS QTI 2.1 assessmentItem
 * (IMS Question and Test Interoperability 2.1, final specification, 2012).
 * The item body is what a student sees (the variant's conditions, the
 * question, and a text entry or a choice among the sheet's choices); the
 * answer is only in the response declaration and the response processing,
 * which the learning-management system keeps from the student. A numeric
 * answer is marked with the key's tolerance: QTI's `equal` with toleranceMode
 * "relative" (in percent) or "absolute" (in the question's unit).
 */
import type { KeyEntry, SheetCondition, SheetQuestion } from "../types";
import { escapeXml, XML_DECLARATION } from "./xml";

export const QTI_ITEM_NAMESPACE = "http://www.imsglobal.org/xsd/imsqti_v2p1";
export const QTI_ITEM_SCHEMA = "http://www.imsglobal.org/xsd/qti/qtiv2p1/imsqti_v2p1.xsd";

export interface QtiItemInput {
  /** XML identifier of the item, e.g. "v3-q2" */
  identifier: string;
  title: string;
  variant: number;
  conditions: SheetCondition[];
  question: SheetQuestion;
  key: KeyEntry;
}

/** The choice identifier of a sheet letter ("a" → "choice_a"). */
export const choiceId = (letter: string) => `choice_${letter}`;

function conditionTable(variant: number, conditions: SheetCondition[]): string {
  const rows = conditions.map((c) => `<tr><th>${escapeXml(c.label)}</th><td>${escapeXml(c.value)}</td></tr>`);
  return `<p>Conditions of variant ${variant}:</p>\n    <table><tbody>${rows.join("")}</tbody></table>`;
}

/** The marking of a numeric answer: QTI's equal within the key's tolerance. */
function numericMatch(key: KeyEntry): string {
  const t = key.tolerance;
  const cmp = '<variable identifier="RESPONSE"/><correct identifier="RESPONSE"/>';
  if (t.kind === "relative") {
    // as a percentage, without the binary rounding of ×100 (0.07 → "7", not "7.000000000000001")
    const pct = String(Number((t.rel * 100).toPrecision(12)));
    return `<equal toleranceMode="relative" tolerance="${pct} ${pct}">${cmp}</equal>`;
  }
  if (t.kind === "absolute") return `<equal toleranceMode="absolute" tolerance="${t.abs} ${t.abs}">${cmp}</equal>`;
  return `<equal toleranceMode="exact">${cmp}</equal>`;
}

/** The marking of a named answer without choices: any accepted spelling, case ignored. */
function namedMatch(key: KeyEntry): string {
  const spellings = [...new Set([String(key.value), ...key.accepted])];
  const m = spellings.map(
    (s) =>
      `<stringMatch caseSensitive="false"><variable identifier="RESPONSE"/><baseValue baseType="string">${escapeXml(s)}</baseValue></stringMatch>`,
  );
  return m.length === 1 ? m[0] : `<or>${m.join("")}</or>`;
}

export function qtiItem(input: QtiItemInput): string {
  const { question: q, key } = input;
  const choices = q.choices ?? [];
  const correctChoice = choices.find((c) => c.value === key.value);
  if (choices.length > 0 && !correctChoice) {
    throw new RangeError(`qtiItem: variant ${input.variant}, question ${q.number}: the key is none of the choices`);
  }
  let declaration: string;
  let interaction: string;
  let match: string;
  if (correctChoice) {
    declaration = `<responseDeclaration identifier="RESPONSE" cardinality="single" baseType="identifier">
    <correctResponse><value>${choiceId(correctChoice.letter)}</value></correctResponse>
  </responseDeclaration>`;
    const simple = choices.map(
      (c) => `<simpleChoice identifier="${choiceId(c.letter)}" fixed="true">${escapeXml(c.text)}</simpleChoice>`,
    );
    interaction = `<choiceInteraction responseIdentifier="RESPONSE" shuffle="false" maxChoices="1">
      <prompt>${escapeXml(q.text)}</prompt>
      ${simple.join("\n      ")}
    </choiceInteraction>`;
    match = `<match><variable identifier="RESPONSE"/><correct identifier="RESPONSE"/></match>`;
  } else {
    const numeric = typeof key.value === "number";
    declaration = `<responseDeclaration identifier="RESPONSE" cardinality="single" baseType="${numeric ? "float" : "string"}">
    <correctResponse><value>${escapeXml(String(key.value))}</value></correctResponse>
  </responseDeclaration>`;
    const unit = q.unit && q.unit !== "dimensionless" ? ` ${escapeXml(q.unit)}` : "";
    interaction = `<p>${escapeXml(q.text)}</p>
    <p><textEntryInteraction responseIdentifier="RESPONSE" expectedLength="16"/>${unit}</p>`;
    match = numeric ? numericMatch(key) : namedMatch(key);
  }
  return `${XML_DECLARATION}
<assessmentItem xmlns="${QTI_ITEM_NAMESPACE}" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance"
  xsi:schemaLocation="${QTI_ITEM_NAMESPACE} ${QTI_ITEM_SCHEMA}"
  identifier="${input.identifier}" title="${escapeXml(input.title)}" adaptive="false" timeDependent="false">
  ${declaration}
  <outcomeDeclaration identifier="SCORE" cardinality="single" baseType="float">
    <defaultValue><value>0</value></defaultValue>
  </outcomeDeclaration>
  <outcomeDeclaration identifier="MAXSCORE" cardinality="single" baseType="float">
    <defaultValue><value>${key.points}</value></defaultValue>
  </outcomeDeclaration>
  <itemBody>
    ${conditionTable(input.variant, input.conditions)}
    ${interaction}
  </itemBody>
  <responseProcessing>
    <responseCondition>
      <responseIf>
        <isNull><variable identifier="RESPONSE"/></isNull>
        <setOutcomeValue identifier="SCORE"><baseValue baseType="float">0</baseValue></setOutcomeValue>
      </responseIf>
      <responseElseIf>
        ${match}
        <setOutcomeValue identifier="SCORE"><baseValue baseType="float">${key.points}</baseValue></setOutcomeValue>
      </responseElseIf>
    </responseCondition>
  </responseProcessing>
</assessmentItem>
`;
}
