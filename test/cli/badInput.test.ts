/**
 * Bad input on every command: an unknown flag or command, a missing or unreadable file, a CSV that is no
 * profile, a condition or sweep file that does not parse, a file that cannot be written. Each is one line on
 * stderr starting with the program's name, a non-zero exit (2 for usage, 1 for the rest, as common
 * command-line practice has it), nothing on stdout and no stack; --debug adds the stack.
 */
import { mkdirSync, mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { runCli } from "./runCli";

let dir = "";

beforeAll(() => {
  dir = mkdtempSync(path.join(tmpdir(), "cli-bad-"));
  mkdirSync(path.join(dir, "a-folder"));
  writeFileSync(
    path.join(dir, "binary.csv"),
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]),
  );
  writeFileSync(path.join(dir, "no-levels.csv"), "altitude (km),T (K),p (hPa)\n");
  writeFileSync(path.join(dir, "ragged.csv"), "altitude (km),T (K),p (hPa)\n20,217,55\n30,227\n");
  writeFileSync(path.join(dir, "bad-condition.yaml"), "altitude_km: [30\n");
  writeFileSync(path.join(dir, "list-condition.json"), "[30]\n");
  writeFileSync(path.join(dir, "not-a-sweep.json"), '{"levels": "none"}\n');
  writeFileSync(path.join(dir, "truncated.json"), '{"levels": [');
});

const cases: { what: string; args: string[]; code: number; line: RegExp }[] = [
  { what: "an unknown command", args: ["analyze-all"], code: 2, line: /unknown command 'analyze-all'/ },
  { what: "an unknown flag of sweep", args: ["sweep", "--levels", "3"], code: 2, line: /unknown option '--levels'/ },
  {
    what: "an unknown flag of check",
    args: ["check", "x.yaml", "--strict"],
    code: 2,
    line: /unknown option '--strict'/,
  },
  {
    what: "an unknown flag of compare",
    args: ["compare", "a.json", "b.json", "--csv", "levels"],
    code: 2,
    line: /unknown option '--csv'/,
  },
  { what: "a missing argument", args: ["compare", "a.json"], code: 2, line: /missing required argument 'b'/ },
  {
    what: "an unknown table",
    args: ["analyse", "--altitude", "30", "--csv", "colours"],
    code: 2,
    line: /unknown table "colours"/,
  },
  {
    what: "a service address that is not http",
    args: ["analyse", "--altitude", "30", "--server", "localhost:3000"],
    code: 2,
    line: /invalid --server localhost:3000/,
  },
  {
    what: "a missing mechanism file",
    args: ["analyse", "-m", "mine.yaml", "--altitude", "30"],
    code: 1,
    line: /cannot read mechanism .* mine\.yaml: no such file$/,
  },
  {
    what: "a folder given as a file",
    args: ["check", "a-folder"],
    code: 1,
    line: /cannot read mechanism document a-folder: it is a folder$/,
  },
  {
    what: "a missing condition file",
    args: ["analyse", "-c", "conditions.yaml"],
    code: 1,
    line: /cannot read .*conditions\.yaml: no such file$/,
  },
  {
    what: "a condition file that does not parse",
    args: ["analyse", "-c", "bad-condition.yaml"],
    code: 1,
    line: /condition file bad-condition\.yaml is not valid JSON or YAML: /,
  },
  {
    what: "a condition file that is no object",
    args: ["analyse", "-c", "list-condition.json"],
    code: 1,
    line: /condition file list-condition\.json must hold one object of condition fields/,
  },
  {
    what: "a binary file as a profile CSV",
    args: ["sweep", "--profile", "binary.csv"],
    code: 1,
    line: /^ozone-cycles: binary\.csv row 1, column 1 .*: a header must be a name with its unit/,
  },
  {
    what: "a profile CSV without levels",
    args: ["sweep", "--profile", "no-levels.csv"],
    code: 1,
    line: /no-levels\.csv row 2: no data rows after the header$/,
  },
  {
    what: "a ragged profile CSV",
    args: ["sweep", "--profile", "ragged.csv"],
    code: 1,
    line: /ragged\.csv row 3: 2 cells, but the header \(row 1\) has 3 columns$/,
  },
  {
    what: "a missing sweep file of compare",
    args: ["compare", "a.json", "b.json"],
    code: 1,
    line: /cannot read .*a\.json: no such file$/,
  },
  {
    what: "a truncated sweep file of compare",
    args: ["compare", "truncated.json", "truncated.json"],
    code: 1,
    line: /sweep file truncated\.json is not JSON \(Unexpected end of JSON input\)/,
  },
  {
    what: "a JSON file that is no sweep",
    args: ["compare", "not-a-sweep.json", "not-a-sweep.json"],
    code: 1,
    line: /sweep file not-a-sweep\.json is not a sweep result/,
  },
  {
    what: "an output file that cannot be written",
    args: ["analyse", "--altitude", "30", "-o", "no-folder/out.txt"],
    code: 1,
    line: /cannot write no-folder\/out\.txt: no such folder$/,
  },
];

describe("ozone-cycles on bad input", () => {
  for (const c of cases) {
    it(`gives ${c.what} one line on stderr and exit ${c.code}, no stack`, async () => {
      const r = await runCli(c.args, dir);
      const lines = r.stderr.trimEnd().split("\n");
      expect(lines, r.stderr).toHaveLength(1);
      expect(lines[0]).toMatch(/^(ozone-cycles: |error: )/);
      expect(lines[0]).toMatch(c.line);
      expect(r.stderr).not.toMatch(/^\s+at /m);
      expect(r.code).toBe(c.code);
      if (c.code !== 0 && !c.args.includes("-o")) expect(r.stdout).toBe("");
    });
  }

  it("adds the stack with --debug", async () => {
    const r = await runCli(["compare", "truncated.json", "truncated.json", "--debug"], dir);
    expect(r.code).toBe(1);
    expect(r.stderr.split("\n")[0]).toMatch(/^ozone-cycles: .*truncated\.json/);
    expect(r.stderr).toMatch(/^\s+at /m);
  });
});
