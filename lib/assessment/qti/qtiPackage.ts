/**
 * An assessment as an IMS QTI 2.1 content package (a zip): imsmanifest.xml,
 * one item per question and variant (items/v<variant>-q<question>.xml), and
 * one test per variant (tests/variant-<n>.xml). Zipped with fflate.
 */
import { strToU8, zipSync } from "fflate";
import type { InstructorAssessment } from "../types";
import { qtiItem } from "./qtiItem";
import { type ManifestResource, QTI_ITEM_RESOURCE, QTI_TEST_RESOURCE, qtiManifest } from "./qtiManifest";
import { qtiTest } from "./qtiTest";

type PackageSource = Pick<InstructorAssessment, "title" | "key" | "sheets" | "instructorId">;

/** The files of the package by path, as text (imsmanifest.xml first). */
export function qtiFiles(a: PackageSource): Map<string, string> {
  const items = new Map<string, string>();
  const tests = new Map<string, string>();
  const resources: ManifestResource[] = [];
  for (const sheet of a.sheets) {
    const refs: { identifier: string; href: string }[] = [];
    for (const q of sheet.questions) {
      const key = a.key.find((k) => k.variant === sheet.variant && k.question === q.number);
      if (!key) throw new RangeError(`qtiFiles: no key for variant ${sheet.variant}, question ${q.number}`);
      const identifier = `v${sheet.variant}-q${q.number}`;
      const href = `items/${identifier}.xml`;
      const title = `${a.title}: variant ${sheet.variant}, question ${q.number}`;
      items.set(
        href,
        qtiItem({ identifier, title, variant: sheet.variant, conditions: sheet.conditions, question: q, key }),
      );
      resources.push({ identifier, type: QTI_ITEM_RESOURCE, href });
      refs.push({ identifier, href: `../${href}` });
    }
    const identifier = `variant-${sheet.variant}`;
    const href = `tests/${identifier}.xml`;
    tests.set(href, qtiTest({ identifier, title: `${a.title}: variant ${sheet.variant}`, items: refs }));
    resources.push({ identifier, type: QTI_TEST_RESOURCE, href, dependencies: refs.map((r) => r.identifier) });
  }
  const manifest = qtiManifest(`assessment-${a.instructorId}`, a.title, resources);
  return new Map([["imsmanifest.xml", manifest], ...items, ...tests]);
}

/** The package as zip bytes. */
export function qtiPackage(a: PackageSource): Uint8Array {
  const entries: Record<string, Uint8Array> = {};
  for (const [p, text] of qtiFiles(a)) entries[p] = strToU8(text);
  return zipSync(entries, { level: 6, mtime: new Date("2026-01-01T00:00:00Z") });
}
