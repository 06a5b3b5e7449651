/**
 * The IMS QTI 2.1 content package of an assessment (lib/assessment/qti).
 * The standard's XSDs (imsqti_v2p1.xsd, imscp_v1p1) cannot be had through the
 * package registries this project reaches, so the XML is not validated
 * against them here: it is parsed (well-formed, namespaced) and checked
 * structurally against the element order and attributes the QTI 2.1 final
 * specification (IMS Global, 2012) gives for assessmentItem, and the content
 * packaging rules for imsmanifest.xml (every file listed, every listed file
 * present).
 */
import { DOMParser, type Element } from "@xmldom/xmldom";
import { strFromU8, unzipSync } from "fflate";
import { beforeAll, describe, expect, test } from "vitest";
import { type InstructorAssessment, qtiPackage, withinTolerance } from "@/lib/assessment";
import { qtiItem } from "@/lib/assessment/qti";
import { instructorRecord } from "./instructorRecord";

const QTI = "http://www.imsglobal.org/xsd/imsqti_v2p1";
const CP = "http://www.imsglobal.org/xsd/imscp_v1p1";

function parse(xml: string, file: string): Element {
  const problems: string[] = [];
  const doc = new DOMParser({ onError: (level, msg) => problems.push(`${file}: ${level}: ${msg}`) }).parseFromString(
    xml,
    "text/xml",
  );
  expect(problems).toEqual([]);
  return doc.documentElement as Element;
}

const children = (e: Element) => Array.from(e.childNodes).filter((n): n is Element => n.nodeType === 1);
const child = (e: Element, name: string) => children(e).find((c) => c.localName === name);
const all = (e: Element, name: string) => Array.from(e.getElementsByTagNameNS(QTI, name));

/** QTI 2.1 `equal` with toleranceMode relative (t in percent) or absolute, as the specification defines it (from memory: the specification could not be fetched here). */
function qtiEqual(x: number, y: number, mode: string, t: number): boolean {
  if (mode === "relative") return y * (1 - t / 100) <= x && x <= y * (1 + t / 100);
  if (mode === "absolute") return y - t <= x && x <= y + t;
  return x === y;
}

describe("the QTI 2.1 package", () => {
  let a: InstructorAssessment;
  let files: Record<string, string>;
  beforeAll(async () => {
    a = await instructorRecord();
    files = Object.fromEntries(Object.entries(unzipSync(qtiPackage(a))).map(([k, v]) => [k, strFromU8(v)]));
  });

  test("unzips to a manifest that lists every file of the package and no other", () => {
    const m = parse(files["imsmanifest.xml"], "imsmanifest.xml");
    expect(m.namespaceURI).toBe(CP);
    expect(m.localName).toBe("manifest");
    expect(child(child(m, "metadata") as Element, "schema")?.textContent).toBe("QTIv2.1 Package");
    const resources = Array.from(m.getElementsByTagNameNS(CP, "resource"));
    const listed = resources.map((r) => r.getAttribute("href"));
    expect(new Set(listed)).toEqual(new Set(Object.keys(files).filter((f) => f !== "imsmanifest.xml")));
    const ids = new Set(resources.map((r) => r.getAttribute("identifier")));
    for (const d of Array.from(m.getElementsByTagNameNS(CP, "dependency"))) {
      expect(ids.has(d.getAttribute("identifierref"))).toBe(true);
    }
  });

  test("holds one item per question and variant, and one test per variant", () => {
    const items = Object.keys(files).filter((f) => f.startsWith("items/"));
    expect(items).toHaveLength(a.variants.length * a.questions.length);
    expect(Object.keys(files).filter((f) => f.startsWith("tests/"))).toHaveLength(a.variants.length);
    for (const v of a.variants) {
      const t = parse(files[`tests/variant-${v.number}.xml`], "test");
      expect(t.localName).toBe("assessmentTest");
      const refs = all(t, "assessmentItemRef").map((r) => r.getAttribute("href"));
      expect(refs).toEqual(a.questions.map((q) => `../items/v${v.number}-q${q.number}.xml`));
    }
  });

  test("gives every item its elements in the order of the specification", () => {
    const order = ["responseDeclaration", "outcomeDeclaration", "itemBody", "responseProcessing"];
    for (const [f, xml] of Object.entries(files).filter(([k]) => k.startsWith("items/"))) {
      const item = parse(xml, f);
      expect(item.namespaceURI).toBe(QTI);
      expect(item.localName).toBe("assessmentItem");
      for (const attr of ["identifier", "title", "adaptive", "timeDependent"])
        expect(item.hasAttribute(attr)).toBe(true);
      const names = children(item).map((c) => c.localName);
      const ranks = names.map((n) => order.indexOf(n as string));
      expect(ranks.every((r) => r >= 0)).toBe(true);
      expect([...ranks].sort((x, y) => x - y)).toEqual(ranks);
      expect(names.filter((n) => n === "itemBody")).toHaveLength(1);
    }
  });

  test("carries every answer of the key, numbers with the tolerance we mark with", () => {
    const seen = new Set<string>();
    for (const k of a.key) {
      seen.add(k.tolerance.kind);
      const item = parse(files[`items/v${k.variant}-q${k.question}.xml`], "item");
      const decl = child(item, "responseDeclaration") as Element;
      const value = all(decl, "value")[0]?.textContent ?? "";
      const q = a.sheets.find((s) => s.variant === k.variant)?.questions.find((x) => x.number === k.question);
      if (q?.choices?.length) {
        expect(decl.getAttribute("baseType")).toBe("identifier");
        const letter = q.choices.find((c) => c.value === k.value)?.letter;
        expect(value).toBe(`choice_${letter}`);
        continue;
      }
      if (typeof k.value !== "number") {
        expect(value).toBe(k.value);
        continue;
      }
      expect(decl.getAttribute("baseType")).toBe("float");
      expect(Number(value)).toBe(k.value);
      const eq = all(child(item, "responseProcessing") as Element, "equal")[0];
      const mode = eq.getAttribute("toleranceMode") as string;
      const t = Number((eq.getAttribute("tolerance") ?? "0").split(" ")[0]);
      // the package marks as lib/assessment/markAnswer does, just inside and just outside the tolerance
      const width =
        k.tolerance.kind === "relative"
          ? k.tolerance.rel * Math.abs(k.value)
          : k.tolerance.kind === "absolute"
            ? k.tolerance.abs
            : 0;
      for (const f of [0, 0.99, -0.99, 1.01, -1.01]) {
        const given = k.value + f * width;
        expect(qtiEqual(given, k.value, mode, t)).toBe(withinTolerance(given, k.value, k.tolerance));
      }
    }
    // the invented assessment has choice questions and numeric ones with relative and absolute tolerances
    expect(seen).toContain("exact");
    expect(seen).toContain("relative");
    expect(seen).toContain("absolute");
  });

  test("keeps every answer out of what the student sees (the item body)", () => {
    for (const k of a.key) {
      const item = parse(files[`items/v${k.variant}-q${k.question}.xml`], "item");
      const body = child(item, "itemBody") as Element;
      const text = body.toString();
      for (const hidden of ["responseDeclaration", "correctResponse", "responseProcessing", "correct"]) {
        expect(all(body, hidden)).toHaveLength(0);
      }
      if (typeof k.value === "number") {
        expect(text).not.toContain(String(k.value));
        expect(text).not.toContain(k.display);
      }
      // a choice question offers all its choices, none marked
      const choices = all(body, "simpleChoice");
      const q = a.sheets.find((s) => s.variant === k.variant)?.questions.find((x) => x.number === k.question);
      expect(choices).toHaveLength(q?.choices?.length ?? 0);
      for (const c of choices)
        expect(
          Array.from(c.attributes)
            .map((x) => x.name)
            .sort(),
        ).toEqual(["fixed", "identifier"]);
    }
  });

  test("escapes markup in the texts", () => {
    const b = { ...a, title: 'Quiz <1> & "two"' };
    const f = unzipSync(qtiPackage(b));
    const item = parse(strFromU8(f["items/v1-q1.xml"]), "item");
    expect(item.getAttribute("title")).toBe('Quiz <1> & "two": variant 1, question 1');
  });

  test("writes a relative tolerance as a plain percentage", () => {
    const k = a.key.find((x) => typeof x.value === "number") as (typeof a.key)[number];
    const sheet = a.sheets.find((x) => x.variant === k.variant);
    const q = sheet?.questions.find((x) => x.number === k.question);
    if (!sheet || !q) throw new Error("no sheet question for the key entry");
    const xml = qtiItem({
      identifier: "x",
      title: "t",
      variant: k.variant,
      conditions: sheet.conditions,
      question: q,
      key: { ...k, tolerance: { kind: "relative", rel: 0.07 } },
    });
    expect(all(parse(xml, "item"), "equal")[0].getAttribute("tolerance")).toBe("7 7");
  });

  test("throws when a question of a sheet has no key", () => {
    expect(() => qtiPackage({ ...a, key: a.key.slice(1) })).toThrow(/qtiFiles: no key for variant/);
  });
});
