/**
 * The binary's interface: exit codes (0 ok, 1 failure, 2 usage, common
 * practice), --help on every command, one line on stderr for bad input, and
 * a malformed document's problems with their line and column.
 */
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { runCli } from "./runCli";

const COMMANDS = ["check", "analyse", "sweep", "compare"];

describe("ozone-cycles", () => {
  beforeAll(async () => {
    // the first run bundles lib/ when its sources changed; later runs reuse the bundle
    await runCli(["--help"]);
  }, 120_000);

  it("prints its commands with --help and exits 0", async () => {
    const r = await runCli(["--help"]);
    expect(r.code).toBe(0);
    for (const c of COMMANDS) expect(r.stdout).toMatch(new RegExp(`^\\s+${c}\\b`, "m"));
  });

  it.each(COMMANDS)("prints the usage of %s with --help and exits 0", async (c) => {
    const r = await runCli([c, "--help"]);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain(`Usage: ozone-cycles ${c}`);
    expect(r.stderr).toBe("");
  });

  it("exits 2 without a command, with the usage on stderr", async () => {
    const r = await runCli([]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain("Usage: ozone-cycles");
    expect(r.stdout).toBe("");
  });

  it("exits 2 with one line on stderr for an unknown flag", async () => {
    const r = await runCli(["analyse", "--altitude", "30", "--no-such-flag"]);
    expect(r.code).toBe(2);
    expect(r.stderr.trim().split("\n")).toEqual([expect.stringContaining("--no-such-flag")]);
  });

  it("exits 2 for a flag value that is not a number", async () => {
    const r = await runCli(["analyse", "--altitude", "thirty"]);
    expect(r.code).toBe(2);
    expect(r.stderr.trim().split("\n")).toEqual([expect.stringContaining('expected a number, got "thirty"')]);
  });

  it("exits 2 for an analysis without an altitude", async () => {
    const r = await runCli(["analyse"]);
    expect(r.code).toBe(2);
    expect(r.stderr.trim()).toBe(
      "ozone-cycles: no altitude: give --altitude <km>, or altitude_km in the condition file",
    );
  });

  it("exits 1 with one line naming the field for a value out of range", async () => {
    const r = await runCli(["analyse", "--altitude", "99"]);
    expect(r.code).toBe(1);
    expect(r.stderr.trim().split("\n")).toEqual([
      "ozone-cycles: condition.altitude_km: expected an altitude between 0 and 86 km",
    ]);
  });

  it("exits 1 with one line, without a stack, for a missing file", async () => {
    const r = await runCli(["check", "no-such-document.yaml"]);
    expect(r.code).toBe(1);
    expect(r.stderr.trim().split("\n")).toEqual([
      "ozone-cycles: cannot read mechanism document no-such-document.yaml: no such file",
    ]);
  });

  it("prints the stack of an error only with --debug", async () => {
    const plain = await runCli(["sweep", "--profile", "no-such-profile.csv"]);
    const debug = await runCli(["sweep", "--profile", "no-such-profile.csv", "--debug"]);
    expect(plain.code).toBe(1);
    expect(plain.stderr).not.toMatch(/^\s+at /m);
    expect(debug.code).toBe(1);
    expect(debug.stderr).toMatch(/^\s+at /m);
  });

  it("exits 1 with one line for an unreadable profile CSV", async () => {
    const r = await runCli(["sweep", "--profile", "condition-30km.yaml", "--from", "20", "--to", "22"]);
    expect(r.code).toBe(1);
    expect(r.stderr.trim().split("\n")).toHaveLength(1);
    expect(r.stderr).toMatch(/^ozone-cycles: /);
  });

  it("lists every problem of a malformed document with its line and column and exits 1", async () => {
    const r = await runCli(["check", "unknown-field.yaml"]);
    expect(r.code).toBe(1);
    // lines and columns of the fixture (test/cli/fixtures/README.md)
    expect(r.stdout).toContain("unknown-field.yaml:11:11: error: reactions[0].rate.law:");
    expect(r.stdout).toContain('unknown-field.yaml:15:5: error: reactions[1].colour: unknown field "colour"');
    expect(r.stdout.trim().split("\n").at(-1)).toMatch(/^unknown-field\.yaml: \d+ errors$/);
  });

  it("reports a YAML syntax error at its line and column", async () => {
    // written here, not kept as a fixture: the formatter would refuse the malformed file
    const dir = mkdtempSync(path.join(tmpdir(), "cli-check-"));
    const lines = ["title: Invented document with a YAML syntax error", 'version: "1"', "reactions:", "  - id: R1"];
    // an unclosed flow sequence, its "}" on line 5 at column 17
    writeFileSync(path.join(dir, "bad-syntax.yaml"), [...lines, "    rate: {A: [1}", ""].join("\n"));
    const r = await runCli(["check", "bad-syntax.yaml"], dir);
    expect(r.code).toBe(1);
    expect(r.stdout).toMatch(/^bad-syntax\.yaml:5:17: error: malformed YAML: /m);
  });

  it("exits 0 for a valid document and counts its species and reactions", async () => {
    const r = await runCli(["check", "../../../lib/mechanisms/oxygen.yaml"]);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/oxygen\.yaml: no errors \(6 species, 9 reactions, 0 warnings\)/);
  });

  it("gives a malformed mechanism's problems on stderr when analysing with it", async () => {
    const r = await runCli(["analyse", "-m", "unknown-field.yaml", "--altitude", "30"]);
    expect(r.code).toBe(1);
    expect(r.stderr).toContain("unknown-field.yaml:15:5: error:");
    expect(r.stdout).toBe("");
  });

  it("draws no progress on stderr when stderr is not a terminal", async () => {
    const r = await runCli(["sweep", "--from", "30", "--to", "32", "--csv", "levels"]);
    expect(r.code).toBe(0);
    expect(r.stderr).not.toContain("[#");
    expect(r.stdout).toMatch(/^# table: levels\.csv/);
  });
});
