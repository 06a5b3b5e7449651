// A production server for a benchmark or the soak run: `scripts/serve.mjs` on `port` with a temporary
// store, and a wait until /api/health answers. `stop()` kills it and removes the store.
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
