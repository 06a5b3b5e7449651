import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { formatDiagnostic, MechanismError } from "../../lib/errors";
import { loadMechanism } from "../../lib/mechanism";

const dir = path.join(process.cwd(), "test", "fixtures", "mechanisms");
const expected: Record<string, string[]> = JSON.parse(fs.readFileSync(path.join(dir, "expected.json"), "utf8"));
const docs = fs.readFileSync(path.join(process.cwd(), "docs", "mechanism-format.md"), "utf8");

function problemsOf(file: string): string[] {
  try {
    loadMechanism(fs.readFileSync(path.join(dir, file), "utf8"));
  } catch (e) {
    if (e instanceof MechanismError) return e.problems.map(formatDiagnostic);
    throw e;
  }
  return [];
}

describe("broken example documents (test/fixtures/mechanisms)", () => {
  it("has an expected message for every broken example in the folder", () => {
    const files = fs
      .readdirSync(dir)
      .filter((f) => /\.(ya?ml|json|txt)$/.test(f) && !f.startsWith("chapman-minimal") && f !== "expected.json");
    expect(files.sort()).toEqual(Object.keys(expected).sort());
  });

  for (const [file, messages] of Object.entries(expected)) {
    it(`${file} gives the documented message with its path, line and column`, () => {
      expect(messages.length).toBeGreaterThan(0);
      expect(problemsOf(file)).toEqual(messages);
      for (const m of messages) expect(m).toMatch(/\(line \d+, column \d+\)$/);
    });

    it(`${file}: its first message is quoted in docs/mechanism-format.md`, () => {
      expect(docs).toContain(messages[0]);
    });
  }
});

describe("docs/mechanism-format.md", () => {
  it("has a complete example that loads without errors or warnings", () => {
    const block = /```yaml\n([\s\S]*?)```/.exec(docs);
    expect(block).not.toBeNull();
    const { mechanism, warnings } = loadMechanism(block![1]);
    expect(warnings).toEqual([]);
    expect(mechanism.reactions).toHaveLength(8);
    expect(mechanism.pools[0].expression).toBe("Cl + ClO");
  });
});
