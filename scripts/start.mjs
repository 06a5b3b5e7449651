// `npm start`: builds when no build exists, then serves on PORT (default 3000)
// with the SQLite store under OZONE_DATA_DIR (default ./data).
import { execFileSync, spawn } from "node:child_process";
import { existsSync } from "node:fs";

if (!existsSync(`${process.env.NEXT_DIST_DIR ?? ".next"}/BUILD_ID`) || !existsSync(".engine/worker.mjs")) {
  console.log("No build found: building first (about a minute on 2 cores)…");
  execFileSync("node", ["scripts/build.mjs"], { stdio: "inherit" });
}
const port = process.env.PORT ?? "3000";
// scripts/serve.mjs: next's handler with the real peer address appended to X-Forwarded-For (rate limits)
const child = spawn("node", ["scripts/serve.mjs", port], {
  stdio: "inherit",
  env: { ...process.env, NODE_ENV: "production", NEXT_TELEMETRY_DISABLED: "1" },
});
for (const sig of ["SIGINT", "SIGTERM"]) process.on(sig, () => child.kill(sig));
child.on("exit", (code) => process.exit(code ?? 0));
