/**
 * Gives every page request a fresh nonce and the Content-Security-Policy that
 * names it (lib/service/securityHeaders.ts). Next.js reads the nonce from the
 * request's CSP header and puts it on its own scripts; pages are rendered per
 * request (app/layout.tsx), so each response carries its own nonce.
 */
import { type NextRequest, NextResponse } from "next/server";
import { pageCsp } from "@/lib/service/securityHeaders";

export function proxy(request: NextRequest) {
  const nonce = Buffer.from(crypto.randomUUID()).toString("base64");
  const csp = pageCsp(nonce, process.env.NODE_ENV === "development");
  const headers = new Headers(request.headers);
  headers.set("content-security-policy", csp);
  const response = NextResponse.next({ request: { headers } });
  response.headers.set("content-security-policy", csp);
  return response;
}

export const config = {
  // pages only: API routes have their own policy (next.config.ts), static files need none
  matcher: [
    {
      source: "/((?!api/|_next/static|_next/image|icon.svg|favicon.ico).*)",
      missing: [
        { type: "header", key: "next-router-prefetch" },
        { type: "header", key: "purpose", value: "prefetch" },
      ],
    },
  ],
};
