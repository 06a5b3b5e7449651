import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // A separate build directory per developer checkout or parallel build (default .next).
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  serverExternalPackages: ["better-sqlite3"],
  // The mechanism documents are read from disk at run time by lib/mechanism.
  outputFileTracingIncludes: { "/**": ["./lib/mechanisms/*.yaml"] },
};

export default nextConfig;
