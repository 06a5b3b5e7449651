/**
 * `sweep` and `compare` run the service's sweep (lib/profiles/prepareSweep.ts)
 * and comparison (lib/profiles/compareSweeps.ts): the JSON of a sweep equals
 * the same request run in-process with as many chains as the engine pool,
 * timings and the engine version aside, and the comparison of two saved
 * sweeps equals compareSweeps of the two.
 */
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { DEMO_PROFILES } from "@/lib/atmosphere/demoProfiles";
import { withoutCsvComments } from "@/lib/csv";
import { compileSource } from "@/lib/engine/mechanismSource";
import { BUILTIN_MECHANISMS } from "@/lib/mechanisms";
import { compareSweeps } from "@/lib/profiles/compareSweeps";
import { comparisonCsv, sweepLevelsCsv } from "@/lib/profiles/csvTables";
import { prepareSweep, runPreparedSweep } from "@/lib/profiles/prepareSweep";
import { runLevelBatch } from "@/lib/profiles/runLevelBatch";
import { inlineExecutor } from "@/lib/profiles/runSweep";
import type { SweepRequest, SweepResult } from "@/lib/profiles/types";
import { POOL_DEFAULTS } from "@/lib/runtime/pool";
import { runCli, withoutRunFields } from "./runCli";

const oxygen = BUILTIN_MECHANISMS.find((m) => m.id === "oxygen-chlorine");

async function inProcess(request: SweepRequest): Promise<SweepResult> {
  if (!oxygen) throw new Error("no built-in oxygen-chlorine");
  const src = { id: oxygen.id, title: oxygen.title };
  const mech = compileSource(src);
  const p = prepareSweep(request, src, DEMO_PROFILES);
  const executor = inlineExecutor((b) => runLevelBatch(mech, src, b), POOL_DEFAULTS.size);
  return JSON.parse(JSON.stringify(await runPreparedSweep(p, executor)));
}

describe("ozone-cycles sweep and compare", () => {
  let dir: string;
  let a: SweepResult;
  let b: SweepResult;
  const args = ["sweep", "-m", "oxygen-chlorine", "--from", "20", "--to", "40", "--step", "5"];

  beforeAll(async () => {
    dir = mkdtempSync(path.join(tmpdir(), "cli-sweep-"));
    const [ra, rb] = await Promise.all([
      runCli([...args, "--json", "-o", "a.json"], dir),
      runCli([...args, "--profile", "invented-cold", "--pool", "Cly=4e-9", "--json", "-o", "b.json"], dir),
    ]);
    expect(ra.code).toBe(0);
    expect(rb.code).toBe(0);
    const { readFileSync } = await import("node:fs");
    a = JSON.parse(readFileSync(path.join(dir, "a.json"), "utf8"));
    b = JSON.parse(readFileSync(path.join(dir, "b.json"), "utf8"));
  }, 180_000);

  it("writes the same sweep as the service's sweep run in-process", async () => {
    const want = await inProcess({
      mechanismId: "oxygen-chlorine",
      profile: { kind: "standard" },
      grid: { from_km: 20, to_km: 40, step_km: 5 },
    });
    expect(a.levels.map((l) => l.altitude_km)).toEqual([20, 25, 30, 35, 40]);
    expect(withoutRunFields(a)).toEqual(withoutRunFields(want));
  });

  it("runs a demo profile with a request-wide pool total", async () => {
    const want = await inProcess({
      mechanismId: "oxygen-chlorine",
      profile: { kind: "demo", id: "invented-cold" },
      grid: { from_km: 20, to_km: 40, step_km: 5 },
      condition: { poolTotals: { Cly: 4e-9 } },
    });
    expect(b.profile.demo).toBe(true);
    expect(withoutRunFields(b)).toEqual(withoutRunFields(want));
  });

  it("runs several chains in worker threads with the service's result (--parallel parallel)", async () => {
    const r = await runCli([...args, "--to", "30", "--parallel", "parallel", "--json"], dir);
    expect(r.code).toBe(0);
    const want = await inProcess({
      mechanismId: "oxygen-chlorine",
      profile: { kind: "standard" },
      grid: { from_km: 20, to_km: 30, step_km: 5 },
      options: { parallel: "parallel" },
    });
    const out = JSON.parse(r.stdout) as SweepResult;
    expect(out.timing.chains).toBe(Math.min(3, POOL_DEFAULTS.size));
    expect(withoutRunFields(out)).toEqual(withoutRunFields(want));
  });

  it("writes the levels table after its provenance block by default", async () => {
    const r = await runCli([...args, "--to", "25"], dir);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/^# table: levels\.csv: /);
    expect(r.stdout).toContain("# profile: U.S. Standard Atmosphere 1976");
    const table = withoutCsvComments(r.stdout);
    expect(table.split("\n")[0]).toBe(sweepLevelsCsv(a).split("\n")[0]);
    expect(table.trim().split("\n")).toHaveLength(1 + 2);
  });

  it("reads a profile CSV file", async () => {
    const { profileToCsv } = await import("@/lib/profiles/profileToCsv");
    const { standardProfile } = await import("@/lib/profiles/standardProfile");
    writeFileSync(path.join(dir, "my-profile.csv"), profileToCsv(standardProfile()));
    const r = await runCli([...args, "--profile", "my-profile.csv", "--to", "25", "--json"], dir);
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout) as SweepResult;
    expect(out.profile.source).toBe("upload");
    expect(out.levels).toHaveLength(2);
  });

  it("compares two saved sweeps as compareSweeps does", async () => {
    const r = await runCli(["compare", "a.json", "b.json", "--label-b", "cold, more Cly", "--no-comments"], dir);
    expect(r.code).toBe(0);
    expect(r.stdout).toBe(comparisonCsv(compareSweeps(a, b, { labels: { b: "cold, more Cly" } })));
  });

  it("writes the comparison as JSON with --json", async () => {
    const r = await runCli(["compare", "a.json", "b.json", "--json", "--top", "2"], dir);
    expect(r.code).toBe(0);
    expect(JSON.parse(r.stdout)).toEqual(JSON.parse(JSON.stringify(compareSweeps(a, b, { topCycles: 2 }))));
  });

  it("exits 1 with one line for a file that is not a sweep", async () => {
    writeFileSync(path.join(dir, "not-a-sweep.json"), '{"hello": 1}');
    const r = await runCli(["compare", "a.json", "not-a-sweep.json"], dir);
    expect(r.code).toBe(1);
    expect(r.stderr.trim().split("\n")).toEqual([expect.stringContaining("not-a-sweep.json is not a sweep result")]);
  });
});
