/**
 * The imsmanifest.xml of a QTI 2.1 content package (IMS Content Packaging
 * 1.1 as profiled by QTI 2.1): one resource per item file and one per
 * variant's test, the tests depending on their items.
 */
import { escapeXml, XML_DECLARATION } from "./xml";

export const QTI_ITEM_RESOURCE = "imsqti_item_xmlv2p1";
export const QTI_TEST_RESOURCE = "imsqti_test_xmlv2p1";

export interface ManifestResource {
  identifier: string;
  type: typeof QTI_ITEM_RESOURCE | typeof QTI_TEST_RESOURCE;
  /** path inside the package */
  href: string;
  /** identifiers of the resources it uses */
  dependencies?: string[];
}

export function qtiManifest(identifier: string, title: string, resources: ManifestResource[]): string {
  const rs = resources.map((r) => {
    const deps = (r.dependencies ?? []).map((d) => `\n      <dependency identifierref="${d}"/>`).join("");
    return `    <resource identifier="${r.identifier}" type="${r.type}" href="${escapeXml(r.href)}">
      <file href="${escapeXml(r.href)}"/>${deps}
    </resource>`;
  });
  return `${XML_DECLARATION}
<manifest xmlns="http://www.imsglobal.org/xsd/imscp_v1p1" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance"
  xmlns:imsmd="http://ltsc.ieee.org/xsd/LOM"
  xsi:schemaLocation="http://www.imsglobal.org/xsd/imscp_v1p1 http://www.imsglobal.org/xsd/qti/qtiv2p1/qtiv2p1_imscpv1p2_v1p0.xsd"
  identifier="${identifier}">
  <metadata>
    <schema>QTIv2.1 Package</schema>
    <schemaversion>1.0.0</schemaversion>
    <imsmd:lom><imsmd:general><imsmd:title><imsmd:string>${escapeXml(title)}</imsmd:string></imsmd:title></imsmd:general></imsmd:lom>
  </metadata>
  <organizations/>
  <resources>
${rs.join("\n")}
  </resources>
</manifest>
`;
}
