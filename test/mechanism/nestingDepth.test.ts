import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { MechanismError } from "../../lib/errors";
import {
  builtinMechanisms,
  JsonDepthScanner,
  jsonTooDeep,
  loadBuiltinMechanism,
  loadMechanism,
  yamlTooDeep,
} from "../../lib/mechanism";

const fixture = (f: string) => fs.readFileSync(path.join(process.cwd(), "test", "fixtures", "mechanisms", f), "utf8");

function firstProblem(text: string) {
  try {
    loadMechanism(text);
  } catch (e) {
    if (e instanceof MechanismError) return e.problems[0];
    throw e;
  }
  throw new Error("expected the document to be rejected");
}

describe("the nesting pre-scan", () => {
  it("lets every built-in mechanism and the fixtures through (they nest a few levels)", () => {
    for (const b of builtinMechanisms()) expect(yamlTooDeep(loadBuiltinMechanism(b.id).text ?? "")).toBeNull();
    expect(yamlTooDeep(fixture("chapman-minimal.yaml"))).toBeNull();
    expect(jsonTooDeep(fixture("chapman-minimal.json"))).toBeNull();
  });

  it("finds JSON brackets one level past the limit, with their line and column", () => {
    expect(jsonTooDeep(`${"[".repeat(64)}${"]".repeat(64)}`)).toBeNull();
    expect(jsonTooDeep(`{\n "a": ${"[".repeat(64)}`)).toEqual({ depth: 65, line: 2, column: 70 });
  });

  it("ignores brackets inside JSON strings, escaped quotes included", () => {
    expect(jsonTooDeep(JSON.stringify({ text: `\\"${"[".repeat(500)}` }))).toBeNull();
  });

  it("counts YAML flow brackets, compact sequence entries and indentation", () => {
    expect(yamlTooDeep(`a: ${"[".repeat(70)}`)?.line).toBe(1);
    expect(yamlTooDeep(`x: 1\n${"- ".repeat(70)}y`)?.line).toBe(2);
    const stairs = Array.from({ length: 70 }, (_, i) => `${" ".repeat(i)}k${i}:`).join("\n");
    expect(yamlTooDeep(stairs)?.line).toBe(65);
  });

  it("ignores brackets in YAML comments, quoted scalars and block scalars", () => {
    const deep = "[".repeat(100);
    expect(yamlTooDeep(`a: 1 # ${deep}\nb: '${deep}'\nc: "${deep}"\nd: |\n  ${deep}\n  more\ne: 2`)).toBeNull();
    expect(yamlTooDeep(`note: don't ${deep}`)?.line).toBe(1);
  });

  it("refuses a deep document with a clear message naming the line instead of a stack error (the 100,000-level case)", () => {
    const p = firstProblem(`title: x\nspecies: ${"[".repeat(100_000)}${"]".repeat(100_000)}\nreactions: []\n`);
    expect(p).toMatchObject({ code: "too-deep", line: 2 });
    expect(p.message).toMatch(/nested too deeply: more than 64 levels/);
    expect(firstProblem(`${"[".repeat(2_000)}${"]".repeat(2_000)}`)).toMatchObject({ code: "too-deep", line: 1 });
  });

  it("scans 4 MB of brackets in linear time (a bound, not a benchmark: quadratic work would take minutes)", () => {
    const t0 = performance.now();
    expect(jsonTooDeep("[".repeat(2_000_000) + "]".repeat(2_000_000))?.depth).toBe(65);
    expect(yamlTooDeep(`a:\n${" x: y\n".repeat(600_000)}`)).toBeNull();
    expect(performance.now() - t0).toBeLessThan(5_000);
  });
});

describe("the chunked JSON scan", () => {
  const bytes = (s: string) => new TextEncoder().encode(s);

  it("agrees with the whole-text scan however the body is cut, strings and escapes included", () => {
    const text = `{"a": "\\"[[[[", "b": ${"[".repeat(70)}`;
    const whole = jsonTooDeep(text);
    for (const cut of [1, 2, 3, 7, 16]) {
      const s = new JsonDepthScanner();
      let found = null;
      const b = bytes(text);
      for (let i = 0; i < b.length && !found; i += cut) found = s.feed(b.subarray(i, i + cut));
      expect(found, `chunks of ${cut}`).toEqual(whole);
    }
  });

  it("refuses 2,000,000 brackets on the first 64 KiB chunk", () => {
    const s = new JsonDepthScanner();
    expect(s.feed(bytes("[".repeat(65_536)))).toMatchObject({ depth: 65, line: 1, column: 65 });
  });
});
