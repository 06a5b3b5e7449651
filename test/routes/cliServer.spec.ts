import path from "node:path";
import { expect, test } from "@playwright/test";
import { ROOT, runCli, withoutRunFields } from "../cli/runCli";

// The command line's --server against the really started production server (playwright.config.ts webServer):
// the same request sent through lib/client, its permalink printed, and the stored result equal to the one the
// command computes in its own process.

const PERMALINK = /^permalink: (http:\/\/\S+)$/m;

/** A result without what differs between the service and the command's own run: timings, engine and mechanism id. */
const comparable = (r: { mechanism: Record<string, unknown> }) =>
  withoutRunFields({ ...r, mechanism: { ...r.mechanism, id: undefined } });

test.describe("the command line with --server", () => {
  test("analyse stores the analysis on the service, prints its permalink, and the result is the local one", async ({
    request,
    baseURL,
  }) => {
    const args = ["analyse", "--altitude", "32", "--latitude", "50", "--pool", "Cly=3e-9"];
    const remote = await runCli([...args, "--server", baseURL as string]);
    expect(remote.stderr).toBe("");
    expect(remote.code).toBe(0);
    expect(remote.stdout).toContain("Ox loss by family:");
    const link = remote.stdout.match(PERMALINK)?.[1] as string;
    expect(link).toMatch(new RegExp(`^${baseURL}/a/[A-Za-z0-9_-]+$`));
    expect((await request.get(link)).status()).toBe(200);

    const id = link.split("/").pop() as string;
    const stored = (await (await request.get(`/api/analyses/${id}`)).json()).result;
    const local = await runCli([...args, "--json"]);
    expect(local.code).toBe(0);
    expect(comparable(stored)).toEqual(comparable(JSON.parse(local.stdout)));
  });

  test("analyse --json of a mechanism file uploads it first; the permalink goes to stderr", async ({
    request,
    baseURL,
  }) => {
    const file = path.join(ROOT, "lib/mechanisms/oxygen-chlorine.yaml");
    const r = await runCli(["analyse", "-m", file, "--altitude", "40", "--json", "--server", baseURL as string]);
    expect(r.code).toBe(0);
    const result = JSON.parse(r.stdout);
    expect(result.mechanism.id).toMatch(/^u-/);
    const link = r.stderr.match(PERMALINK)?.[1] as string;
    expect((await request.get(`/api/analyses/${link.split("/").pop()}`)).status()).toBe(200);
  });

  test("analyse --csv gives the service's table, provenance with the permalink", async ({ baseURL }) => {
    const r = await runCli(["analyse", "--altitude", "30", "--csv", "cycles", "--server", baseURL as string]);
    expect(r.code).toBe(0);
    const link = r.stderr.match(PERMALINK)?.[1] as string;
    expect(r.stdout).toMatch(/^# /);
    expect(r.stdout).toContain(link.split("/").pop() as string);
    expect(r.stdout).toContain("cycle_id,family");
  });

  test("sweep runs as a job of the service and writes its stored result", async ({ request, baseURL }) => {
    const r = await runCli([
      "sweep",
      "--from",
      "20",
      "--to",
      "40",
      "--step",
      "10",
      "--json",
      "--server",
      baseURL as string,
    ]);
    expect(r.code).toBe(0);
    const link = r.stderr.match(PERMALINK)?.[1] as string;
    expect(link).toMatch(new RegExp(`^${baseURL}/profiles/[A-Za-z0-9_-]+$`));
    const id = link.split("/").pop() as string;
    const stored = (await (await request.get(`/api/profiles/${id}`)).json()).body.result;
    const out = JSON.parse(r.stdout);
    expect(out.levels.map((l: { altitude_km: number }) => l.altitude_km)).toEqual([20, 30, 40]);
    expect(withoutRunFields(out)).toEqual(withoutRunFields(stored));
  });

  test("a refusal of the service and a service nobody runs are one line on stderr and exit 1", async ({ baseURL }) => {
    const refused = await runCli([
      "analyse",
      "--altitude",
      "30",
      "--server",
      baseURL as string,
      "-m",
      "oxygen",
      "--pool",
      "Cly=1e-9",
    ]);
    expect(refused.code).toBe(1);
    expect(refused.stderr.trim().split("\n")).toHaveLength(1);
    expect(refused.stderr).toMatch(/^ozone-cycles: the service at \S+ answered 400 /);

    // 3429: a port of this test's range that nothing listens on
    const away = await runCli(["analyse", "--altitude", "30", "--server", "http://127.0.0.1:3429"]);
    expect(away.code).toBe(1);
    expect(away.stderr).toBe("ozone-cycles: cannot reach the service at http://127.0.0.1:3429: ECONNREFUSED\n");
    expect(away.stdout).toBe("");
  });
});
