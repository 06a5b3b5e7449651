import { execFile } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { expect, test } from "@playwright/test";
import { unzipSync } from "fflate";

// The curl and Python examples of docs/api.md, read from the page itself (so that the page and this test cannot
// drift), run against the really started production server (playwright.config.ts webServer) with OZONE_URL set
// to it. The Python one needs python3 on the PATH (this machine's image has it; Debian's python3 package otherwise):
// without it the test fails and says so, rather than passing unrun.

const DOC = path.resolve(import.meta.dirname, "../../docs/api.md");

/** The first fenced block of `lang` after the heading `heading`. */
function block(heading: string, lang: string): string {
  const text = fs.readFileSync(DOC, "utf8");
  const at = text.indexOf(`\n${heading}\n`);
  if (at < 0) throw new Error(`docs/api.md has no heading ${heading}`);
  const fence = "```";
  const m = text.slice(at).match(new RegExp(`${fence}${lang}\\n([\\s\\S]*?)${fence}`));
  if (!m) throw new Error(`docs/api.md: no ${lang} block under ${heading}`);
  return m[1];
}

/** Shell commands of a block: continuation lines joined, comments and blank lines dropped. */
function commands(sh: string): string[] {
  return sh
    .replace(/\\\n\s*/g, "")
    .split("\n")
    .map((l) => l.trim())
    .filter((l) => l && !l.startsWith("#"));
}

/** Which answer each upper-case stand-in of the page comes from: the route posted to, and the field. */
const STAND_INS: Record<string, [route: string, field: string]> = {
  INSTRUCTOR_ID: ["/api/assessments", "instructorId"],
  JOB_ID: ["/api/profiles", "id"],
  ID: ["/api/analyses", "id"],
};

interface Run {
  code: number;
  stdout: string;
  stderr: string;
}

function run(file: string, args: string[], env: Record<string, string>, cwd: string): Promise<Run> {
  return new Promise((resolve) => {
    execFile(file, args, { env: { ...process.env, ...env }, cwd, maxBuffer: 64 * 1024 * 1024 }, (err, stdout, stderr) =>
      resolve({ code: err ? (typeof err.code === "number" ? err.code : 1) : 0, stdout, stderr }),
    );
  });
}

test.describe("the examples of docs/api.md", () => {
  test("the curl commands run as written and answer what the page says", async ({ baseURL }) => {
    test.setTimeout(180_000);
    const all = commands(block("## curl", "sh"));
    const preamble = all.filter((c) => /^[A-Z_]+=/.test(c));
    const calls = all.filter((c) => c.startsWith("curl "));
    // the one assignment: the address, from OZONE_URL when it is set
    expect(preamble).toEqual([`BASE=\${OZONE_URL:-http://localhost:3000}`]);
    expect(calls.length).toBe(6);

    const dir = fs.mkdtempSync(path.join(os.tmpdir(), "api-docs-"));
    const ids: Record<string, string> = {};
    const outputs: string[] = [];
    for (const call of calls) {
      let cmd = call;
      for (const [word] of Object.entries(STAND_INS)) {
        if (new RegExp(`\\b${word}\\b`).test(cmd)) {
          expect(ids[word], `${word} is answered before ${call}`).toBeDefined();
          cmd = cmd.replace(new RegExp(`\\b${word}\\b`, "g"), ids[word]);
        }
      }
      const r = await run("bash", ["-c", [...preamble, cmd].join("\n")], { OZONE_URL: baseURL as string }, dir);
      expect(r.stderr, cmd).toBe("");
      expect(r.code, cmd).toBe(0);
      outputs.push(r.stdout);
      const posted = cmd.match(/-X POST "\$BASE(\/api\/[a-z]+)"/)?.[1];
      for (const [word, [route, field]] of Object.entries(STAND_INS))
        if (posted === route) ids[word] = JSON.parse(r.stdout)[field];
    }

    const [analysis, cycles, job, status, assessment] = outputs;
    expect(JSON.parse(analysis).result.cycles.budget.byFamily.length).toBeGreaterThan(3);
    expect(cycles.split("\n")[0]).toMatch(/^cycle_id,family,/);
    expect(JSON.parse(job).statusUrl).toBe(`/api/jobs/${ids.JOB_ID}`);
    expect(["queued", "running", "done"]).toContain(JSON.parse(status).state);
    expect(JSON.parse(assessment).studentId).toBeTruthy();
    const zip = unzipSync(fs.readFileSync(path.join(dir, "quiz.zip")));
    expect(Object.keys(zip)).toContain("imsmanifest.xml");
    fs.rmSync(dir, { recursive: true, force: true });
  });

  test("the Python program runs with the standard library alone", async ({ baseURL }) => {
    test.setTimeout(180_000);
    const probe = await run("python3", ["--version"], {}, os.tmpdir());
    const needed = "python3 is needed to run the Python example of docs/api.md (apt-get install -y python3)";
    expect(probe.code, needed).toBe(0);
    const program = block("## Python, standard library only", "python");
    const imports = [...program.matchAll(/^import (\S+)/gm)].map((m) => m[1].split(".")[0]);
    expect(new Set(imports)).toEqual(new Set(["json", "os", "time", "urllib"]));

    const r = await run("python3", ["-c", program], { OZONE_URL: baseURL as string }, os.tmpdir());
    expect(r.stderr).toBe("");
    expect(r.code).toBe(0);
    const lines = r.stdout.trim().split("\n");
    // the budget by family, one line each with its share in %
    expect(lines.filter((l) => /^[A-Za-z-]+ \d+(\.\d+)? %$/.test(l)).length).toBeGreaterThan(3);
    expect(r.stdout).toMatch(/^cycle_id,family,/m);
    // the standard profile from 10 to 60 km in 1 km steps
    expect(lines.at(-1)).toBe("51 levels");
  });
});
