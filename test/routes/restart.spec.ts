import { type ChildProcess, spawn } from "node:child_process";
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { expect, test } from "@playwright/test";

// A server of its own, started and killed by this spec: stored data must survive a restart,
// and a computation over the time limit must give a 422 while the server stays responsive.

const PORT = 3231;
const base = `http://127.0.0.1:${PORT}`;

function startServer(dataDir: string, extraEnv: Record<string, string> = {}): ChildProcess {
  return spawn("node_modules/.bin/next", ["start", "-p", String(PORT)], {
    env: { ...process.env, OZONE_DATA_DIR: dataDir, NEXT_TELEMETRY_DISABLED: "1", ...extraEnv },
    stdio: "ignore",
  });
}

async function waitUp(): Promise<void> {
  const end = Date.now() + 60_000;
  while (Date.now() < end) {
    try {
      if ((await fetch(`${base}/api/health`)).ok) return;
    } catch {
      /* not yet listening */
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error("server did not start");
}

async function stop(p: ChildProcess): Promise<void> {
  if (p.exitCode !== null) return;
  const exited = new Promise((r) => p.once("exit", r));
  p.kill("SIGKILL");
  await exited;
}

test("stored analyses survive a killed and restarted server; an over-long job is a 422", async () => {
  const dataDir = mkdtempSync(path.join(tmpdir(), "ozone-restart-"));
  let server = startServer(dataDir);
  try {
    await waitUp();
    const created = await fetch(`${base}/api/analyses`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ mechanismId: "oxygen", condition: { altitude_km: 35, zenith_deg: 30 } }),
    });
    expect(created.status).toBe(201);
    const { id, result } = await created.json();
    await stop(server);

    server = startServer(dataDir, { OZONE_JOB_TIMEOUT_MS: "1" });
    await waitUp();
    const again = await fetch(`${base}/api/analyses/${id}`);
    expect(again.status).toBe(200);
    expect((await again.json()).result.steadyState.numberDensity_cm3).toEqual(result.steadyState.numberDensity_cm3);

    const slow = await fetch(`${base}/api/analyses`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ mechanismId: "reference", condition: { altitude_km: 30, mode: "diurnal" } }),
    });
    expect(slow.status).toBe(422);
    const { error } = await slow.json();
    expect(error.code).toBe("timeout");
    expect((await fetch(`${base}/api/health`)).status).toBe(200);
  } finally {
    await stop(server);
    rmSync(dataDir, { recursive: true, force: true });
  }
});
