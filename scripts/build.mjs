// Builds the engine worker bundle (plain Node, no Next) and the Next.js app.
import { execFileSync } from "node:child_process";
import { buildEngineWorker } from "./engine-bundle.mjs";

await buildEngineWorker();
execFileSync("node_modules/.bin/next", ["build"], {
  stdio: "inherit",
  env: { ...process.env, NEXT_TELEMETRY_DISABLED: "1" },
});
