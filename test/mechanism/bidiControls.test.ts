/**
 * Bidirectional control characters (Unicode Standard Annex #9, Table 4) in a
 * mechanism document: refused in ids, warned about in any other text, with the
 * line and column of the string that holds them.
 */
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { MechanismError } from "@/lib/errors";
import { loadMechanism } from "@/lib/mechanism";
import { BIDI_CONTROL, describeBidiControl } from "@/lib/mechanism/bidiControls";

const RLO = "\u202E";
const chapman = fs.readFileSync(path.join(__dirname, "../fixtures/mechanisms/chapman-minimal.yaml"), "utf8");

function problemsOf(text: string) {
  try {
    loadMechanism(text);
  } catch (e) {
    expect(e).toBeInstanceOf(MechanismError);
    return (e as MechanismError).problems;
  }
  throw new Error("expected the document to be refused");
}

describe("bidirectional control characters", () => {
  it("are named by code point", () => {
    expect(describeBidiControl(`O${RLO}3`)).toBe("U+202E (right-to-left override)");
    expect(describeBidiControl("O3")).toBeUndefined();
    for (const c of [
      "\u200E",
      "\u200F",
      "\u202A",
      "\u202B",
      "\u202C",
      "\u202D",
      "\u2066",
      "\u2067",
      "\u2068",
      "\u2069",
      "\u061C",
    ])
      expect(BIDI_CONTROL.test(c), c.codePointAt(0)?.toString(16)).toBe(true);
    // Arabic and Hebrew letters themselves are not controls
    expect(BIDI_CONTROL.test("أوزون אוזון")).toBe(false);
  });

  it("in a label or the title load with a warning that says where", () => {
    const text = chapman
      .replace("title: Chapman minimal", `title: "Chapman ${RLO}laminim"`)
      .replace("{ id: O3, role: solved }", `{ id: O3, role: solved, label: "${RLO}3O" }`);
    const { warnings, mechanism } = loadMechanism(text);
    const bidi = warnings.filter((w) => w.code === "bidi-control");
    expect(bidi.map((w) => [w.path, w.line])).toEqual([
      ["title", 3],
      ["species[3].label", 10],
    ]);
    expect(bidi[0].message).toContain("U+202E (right-to-left override)");
    expect(bidi[0].column).toBeGreaterThan(1);
    expect(mechanism.species[3].label).toBe(`${RLO}3O`);
  });

  it("in a species id or a reaction id are refused, with the line of the id", () => {
    const species = problemsOf(
      chapman.replace("{ id: O3, role: solved }", `{ id: "X${RLO}3O", atoms: { O: 3 }, role: solved }`),
    );
    expect(species).toContainEqual(
      expect.objectContaining({ code: "bidi-control", severity: "error", path: "species[3].id", line: 10 }),
    );
    const reaction = problemsOf(chapman.replace("  - id: R4\n", `  - id: "R${RLO}4"\n`));
    expect(reaction).toContainEqual(
      expect.objectContaining({ code: "bidi-control", severity: "error", path: "reactions[3].id", line: 25 }),
    );
  });

  it("are found also when JSON writes them as escapes", () => {
    const doc = JSON.parse(
      fs.readFileSync(path.join(__dirname, "../fixtures/mechanisms/chapman-minimal.json"), "utf8"),
    );
    doc.description = `Four ${RLO}reactions`;
    const { warnings } = loadMechanism(JSON.stringify(doc).replace(RLO, "\\u202e"));
    expect(warnings).toContainEqual(expect.objectContaining({ code: "bidi-control", path: "description" }));
  });
});
