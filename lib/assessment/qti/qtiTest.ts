/**
 * One variant as an IMS QTI 2.1 assessmentTest: its questions in order, in
 * one section, so a learning-management system can hand a student the whole
 * variant as one quiz (the items stay in the package on their own as well).
 */
import { QTI_ITEM_NAMESPACE, QTI_ITEM_SCHEMA } from "./qtiItem";
import { escapeXml, XML_DECLARATION } from "./xml";

export interface QtiTestInput {
  /** XML identifier of the test, e.g. "variant-3" */
  identifier: string;
  title: string;
  /** the items of the variant in order: identifier and href relative to the test file */
  items: { identifier: string; href: string }[];
}

export function qtiTest(input: QtiTestInput): string {
  const refs = input.items.map((i) => `<assessmentItemRef identifier="${i.identifier}" href="${escapeXml(i.href)}"/>`);
  return `${XML_DECLARATION}
<assessmentTest xmlns="${QTI_ITEM_NAMESPACE}" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance"
  xsi:schemaLocation="${QTI_ITEM_NAMESPACE} ${QTI_ITEM_SCHEMA}"
  identifier="${input.identifier}" title="${escapeXml(input.title)}">
  <testPart identifier="${input.identifier}-part" navigationMode="nonlinear" submissionMode="simultaneous">
    <assessmentSection identifier="${input.identifier}-section" title="${escapeXml(input.title)}" visible="true">
      ${refs.join("\n      ")}
    </assessmentSection>
  </testPart>
</assessmentTest>
`;
}
