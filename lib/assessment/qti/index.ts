export { choiceId, QTI_ITEM_NAMESPACE, type QtiItemInput, qtiItem } from "./qtiItem";
export { type ManifestResource, QTI_ITEM_RESOURCE, QTI_TEST_RESOURCE, qtiManifest } from "./qtiManifest";
export { qtiFiles, qtiPackage } from "./qtiPackage";
export { type QtiTestInput, qtiTest } from "./qtiTest";
export { escapeXml } from "./xml";
