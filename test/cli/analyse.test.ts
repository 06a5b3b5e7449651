/**
 * `analyse` runs the service's own composition: its --json output equals
 * runAnalysis's result for the same request (the worker threads of POST
 * /api/analyses run runAnalysis through runJob), timings and the engine
 * version aside; its CSV tables equal the routes' tables after the same
 * provenance block.
 */
import { beforeAll, describe, expect, it } from "vitest";
import { withoutCsvComments } from "@/lib/csv";
import { runAnalysis } from "@/lib/engine/runAnalysis";
import type { AnalysisRequest, AnalysisResult } from "@/lib/engine/types";
import { loadBuiltinMechanism } from "@/lib/mechanism";
import { BUILTIN_MECHANISMS } from "@/lib/mechanisms";
import { ANALYSIS_CSV_TABLES } from "@/lib/service/csv";
import { runCli, withoutRunFields } from "./runCli";

function expected(request: AnalysisRequest): AnalysisResult {
  const mech = loadBuiltinMechanism(request.mechanismId).mechanism;
  const ref = BUILTIN_MECHANISMS.find((m) => m.id === request.mechanismId);
  if (!ref) throw new Error(`no built-in ${request.mechanismId}`);
  // through JSON, as the route sends it
  return JSON.parse(JSON.stringify(runAnalysis(mech, { id: ref.id, title: ref.title }, request)));
}

describe("ozone-cycles analyse", () => {
  const request: AnalysisRequest = {
    mechanismId: "reference",
    condition: { altitude_km: 30, latitude_deg: 60, poolTotals: { Cly: 3.0e-9 } },
  };
  let reference: AnalysisResult;
  beforeAll(() => {
    reference = expected(request);
  });

  it("writes the same result as runAnalysis for the same request with --json", async () => {
    const r = await runCli(["analyse", "--altitude", "30", "--latitude", "60", "--pool", "Cly=3.0e-9", "--json"]);
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout) as AnalysisResult;
    expect(out.engineVersion).toBe(reference.engineVersion);
    expect(out.steadyState.status).toBe("converged");
    expect(withoutRunFields(out)).toEqual(withoutRunFields(reference));
  });

  it("takes the condition from a YAML file and gives the same result as the flags", async () => {
    const r = await runCli(["analyse", "--condition-file", "condition-30km.yaml", "--json"]);
    expect(r.code).toBe(0);
    expect(withoutRunFields(JSON.parse(r.stdout))).toEqual(withoutRunFields(reference));
  });

  it("lets a flag override the condition file", async () => {
    const r = await runCli(["analyse", "-c", "condition-30km.yaml", "--altitude", "25", "--json"]);
    const out = JSON.parse(r.stdout) as AnalysisResult;
    expect(out.condition.altitude_km).toBe(25);
    expect(out.condition.latitude_deg).toBe(60);
  });

  it("writes a CSV table after its provenance block, and the bare table with --no-comments", async () => {
    const [withBlock, bare] = await Promise.all([
      runCli(["analyse", "-c", "condition-30km.yaml", "--csv", "cycles"]),
      runCli(["analyse", "-c", "condition-30km.yaml", "--csv", "cycles.csv", "--no-comments"]),
    ]);
    expect(withBlock.code).toBe(0);
    expect(withBlock.stdout).toMatch(/^# table: cycles\.csv: /);
    for (const key of ["mechanism-id: reference", "mechanism-version: ", "condition: altitude_km=30;", "caution: "]) {
      expect(withBlock.stdout).toContain(`# ${key}`);
    }
    expect(withoutCsvComments(withBlock.stdout)).toBe(bare.stdout);
    expect(bare.stdout).toBe(ANALYSIS_CSV_TABLES["cycles.csv"].make(reference));
  });

  it("summarises the budget by family and the top cycles with rate-limiting step and chain length", async () => {
    const r = await runCli(["analyse", "-c", "condition-30km.yaml", "--top", "3"]);
    expect(r.code).toBe(0);
    const top = [...reference.cycles.cycles].sort((a, b) => b.share - a.share).slice(0, 3);
    expect(r.stdout).toContain("Ox loss by family:");
    for (const f of reference.cycles.budget.byFamily) {
      expect(r.stdout).toMatch(
        new RegExp(`^  ${f.family.replace(/[-+]/g, "\\$&")}\\s+${(100 * f.fraction).toFixed(1)} %`, "m"),
      );
    }
    expect(r.stdout).toContain(`top cycles (3 of ${reference.cycles.cycles.length}):`);
    for (const c of top) expect(r.stdout).toContain(`rate-limiting step ${c.rateLimitingStep} (`);
    expect(r.stdout.match(/chain length/g)).toHaveLength(3);
  });

  it("writes to the file given with --output, relative to the caller's folder", async () => {
    const { mkdtempSync, readFileSync } = await import("node:fs");
    const { tmpdir } = await import("node:os");
    const path = await import("node:path");
    const dir = mkdtempSync(path.join(tmpdir(), "cli-out-"));
    const r = await runCli(
      ["analyse", "--altitude", "30", "--latitude", "60", "--pool", "Cly=3.0e-9", "--json", "-o", "out.json"],
      dir,
    );
    expect(r.code).toBe(0);
    expect(r.stdout).toBe("");
    expect(withoutRunFields(JSON.parse(readFileSync(path.join(dir, "out.json"), "utf8")))).toEqual(
      withoutRunFields(reference),
    );
  });

  it("exits 2 for an unknown table", async () => {
    const r = await runCli(["analyse", "--altitude", "30", "--csv", "nonsense"]);
    expect(r.code).toBe(2);
    expect(r.stderr.trim()).toBe(
      'ozone-cycles: unknown table "nonsense"; the tables are rates, species, cycles, uncertainty, sensitivities',
    );
  });
});
