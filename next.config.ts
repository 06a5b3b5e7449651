import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // A separate build directory per developer checkout or parallel build (default .next).
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  // bullmq: loaded by Node at run time (its optional Redis drivers are not bundled)
  serverExternalPackages: ["better-sqlite3", "bullmq", "ioredis", "pg"],
  // The mechanism documents are read from disk at run time by lib/mechanism.
  outputFileTracingIncludes: { "/**": ["./lib/mechanisms/*.yaml"] },
};

export default nextConfig;
