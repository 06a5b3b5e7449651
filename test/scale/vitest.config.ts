// The scale-out suite: needs REDIS_URL and DATABASE_URL of servers it may
// write to. Run it through `node scripts/services.mjs run -- …`, which starts
// local ones and stops them afterwards (scripts/test.mjs does).
import { fileURLToPath } from "node:url";
import { defineConfig } from "vitest/config";

const root = fileURLToPath(new URL("../../", import.meta.url));

export default defineConfig({
  root,
  resolve: {
    alias: {
      "@": root,
      "server-only": fileURLToPath(new URL("./empty.ts", import.meta.url)),
    },
  },
  test: {
    include: ["test/scale/**/*.scale.ts"],
    environment: "node",
    // the suites start servers' clients and worker processes: one file at a time on 2 cores
    fileParallelism: false,
    testTimeout: 240_000,
    hookTimeout: 120_000,
  },
});
