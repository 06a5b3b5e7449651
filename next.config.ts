import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  serverExternalPackages: ["better-sqlite3"],
  // The mechanism documents are read from disk at run time by lib/mechanisms.
  outputFileTracingIncludes: { "/**": ["./lib/mechanisms/*.yaml"] },
};

export default nextConfig;
