/**
 * Runs before every page request (Node.js runtime, the default for proxy.ts in Next.js 16):
 * - gives it a fresh nonce and the Content-Security-Policy that names it
 *   (lib/service/securityHeaders.ts). Next.js reads the nonce from the request's CSP header and
 *   puts it on its own scripts; pages are rendered per request (app/layout.tsx), so each response
 *   carries its own nonce;
 * - answers the page of a deleted or expired record with 410 Gone and app/gone/page.tsx
 *   (lib/service/recordPages.ts), which a page itself cannot: it can only end in 404.
 */
import { type NextRequest, NextResponse } from "next/server";
import { GONE_PATH, goneRecordOfPage } from "@/lib/service/recordPages";
import { pageCsp } from "@/lib/service/securityHeaders";

export async function proxy(request: NextRequest) {
  const nonce = Buffer.from(crypto.randomUUID()).toString("base64");
  const csp = pageCsp(nonce, process.env.NODE_ENV === "development");
  const headers = new Headers(request.headers);
  headers.set("content-security-policy", csp);
  const { pathname, searchParams } = request.nextUrl;
  const gone = pathname === GONE_PATH ? (searchParams.get("what") ?? "") : await goneOrNull(pathname, searchParams);
  const response =
    gone !== null
      ? NextResponse.rewrite(new URL(`${GONE_PATH}?what=${encodeURIComponent(gone)}`, request.url), {
          status: 410,
          request: { headers },
        })
      : NextResponse.next({ request: { headers } });
  response.headers.set("content-security-policy", csp);
  return response;
}

/** A store that cannot be read here lets the page try, and fail with its error page (500). */
async function goneOrNull(pathname: string, search: URLSearchParams): Promise<string | null> {
  try {
    return await goneRecordOfPage(pathname, search);
  } catch {
    return null;
  }
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
