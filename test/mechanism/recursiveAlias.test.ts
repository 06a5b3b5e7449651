import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { parseDocument } from "yaml";
import { MechanismError } from "../../lib/errors";
import { findRecursiveAlias, loadMechanism } from "../../lib/mechanism";

const minimal = fs.readFileSync(path.join(__dirname, "../fixtures/mechanisms/chapman-minimal.yaml"), "utf8");
const find = (text: string) => findRecursiveAlias(parseDocument(text));

describe("findRecursiveAlias", () => {
  it("finds an alias inside the list its anchor names (the fuzz document that kept a worker busy for 30 s)", () => {
    const text = `a: &a [${"*a, ".repeat(50)}]`;
    expect(find(text)).toEqual({ name: "a", offset: text.indexOf("*a") });
  });

  it("finds an alias nested deeper inside its anchor's mapping", () => {
    const text = "title: x\nspecies: &s\n  - id: O\n    more: { back: [*s] }\n";
    expect(find(text)).toEqual({ name: "s", offset: text.indexOf("*s") });
  });

  it("passes an alias to a node that is complete before it (shared, not circular)", () => {
    expect(find("x: &a [1, 2]\ny: *a\nz: [*a, *a]\n")).toBeNull();
  });

  it("follows the latest anchor of a name: an inner redefinition is not an ancestor", () => {
    expect(find("x: &a [ &a 1, *a ]\n")).toBeNull();
  });
});

describe("loadMechanism refuses a recursive alias", () => {
  it("with the code recursive-alias at the alias's line and column", () => {
    const text = `a: &a [${"*a, ".repeat(50)}]`;
    let problems: MechanismError["problems"] = [];
    try {
      loadMechanism(text);
    } catch (e) {
      if (!(e instanceof MechanismError)) throw e;
      problems = e.problems;
    }
    expect(problems).toHaveLength(1);
    expect(problems[0]).toMatchObject({ code: "recursive-alias", line: 1, column: 8 });
    expect(problems[0].message).toMatch(/^the alias \*a stands inside the node its anchor names/);
  });

  it("while a document with a shared, non-circular alias still loads", () => {
    const shared = minimal
      .replace("title: Chapman minimal", "title: &t Chapman minimal")
      .replace(/^description: .*$/m, "description: *t");
    expect(shared).not.toBe(minimal);
    expect(loadMechanism(shared).mechanism.description).toBe("Chapman minimal");
  });
});
