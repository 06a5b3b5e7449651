import type { NextConfig } from "next";
import { API_CSP, COMMON_SECURITY_HEADERS } from "./lib/service/securityHeaders";

const nextConfig: NextConfig = {
  // A separate build directory per developer checkout or parallel build (default .next).
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  // bullmq: loaded by Node at run time (its optional Redis drivers are not bundled)
  serverExternalPackages: ["better-sqlite3", "bullmq", "ioredis", "pg", "rate-limiter-flexible"],
  // The mechanism documents are read from disk at run time by lib/mechanism.
  outputFileTracingIncludes: { "/**": ["./lib/mechanisms/*.yaml"] },
  // No X-Powered-By: the framework is nobody's business.
  poweredByHeader: false,
  // NEXT_BROWSER_SOURCE_MAPS=1: browser source maps, for reading a profile (bench/trace-first-load.mjs)
  productionBrowserSourceMaps: process.env.NEXT_BROWSER_SOURCE_MAPS === "1",
  // Security headers (lib/service/securityHeaders.ts); pages get their CSP with a nonce from proxy.ts.
  async headers() {
    return [
      { source: "/:path*", headers: COMMON_SECURITY_HEADERS },
      { source: "/api/:path*", headers: [{ key: "Content-Security-Policy", value: API_CSP }] },
    ];
  },
};

export default nextConfig;
