// A production server for a benchmark or the soak run: `scripts/serve.mjs` on `port` with a temporary
// store, and a wait until /api/health answers. `stop()` kills it and removes the store. `sweepAsJob`
// runs the reference mechanism's standard-profile sweep as a job of such a server.
import { spawn } from "node:child_process";
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";

/** @param {number} port @param {Record<string, string>} env */
export async function startBenchServer(port, env = {}) {
  const dataDir = mkdtempSync(path.join(tmpdir(), "ozone-bench-"));
  const proc = spawn("node", ["scripts/serve.mjs", String(port)], {
    env: { ...process.env, OZONE_DATA_DIR: dataDir, NEXT_TELEMETRY_DISABLED: "1", NODE_ENV: "production", ...env },
    stdio: "ignore",
  });
  const stop = () => {
    proc.kill("SIGKILL");
    rmSync(dataDir, { recursive: true, force: true });
  };
  const end = Date.now() + 60_000;
  for (;;) {
    try {
      if ((await fetch(`http://127.0.0.1:${port}/api/health`)).ok) return { proc, stop };
    } catch {
      if (Date.now() > end) {
        stop();
        throw new Error("server did not start");
      }
    }
    await new Promise((r) => setTimeout(r, 250));
  }
}

/** POST a standard-profile sweep of the reference mechanism to `base` and poll its job every 20 ms until done; the result's id. @param {string} base */
export async function sweepAsJob(base) {
  const r = await fetch(`${base}/api/profiles`, {
    method: "POST",
    headers: { "content-type": "application/json" },
    body: JSON.stringify({ mechanismId: "reference", profile: { kind: "standard" } }),
  });
  if (!r.ok) throw new Error(`POST /api/profiles: ${r.status} ${await r.text()}`);
  const job = await r.json();
  for (;;) {
    const s = await (await fetch(`${base}/api/jobs/${job.id}`)).json();
    if (s.state === "done") return s.resultId;
    if (s.state !== "queued" && s.state !== "running") throw new Error(`sweep ${s.state}: ${s.error?.message}`);
    await new Promise((res) => setTimeout(res, 20));
  }
}
