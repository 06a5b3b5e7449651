/**
 * The owner cookie: a random value the server sets on a client's first
 * upload (HttpOnly, SameSite=Lax, a year). Uploads are listed only to the
 * client that holds the cookie they were made with; everyone else reaches
 * an upload by its link alone. The store keeps the cookie's SHA-256.
 */
import "server-only";
import { randomBytes } from "node:crypto";
import { sha256Hex } from "./lifecycle";

export const OWNER_COOKIE = "ozone-owner";
const OWNER_PATTERN = /^[A-Za-z0-9_-]{43}$/;
const YEAR_S = 365 * 24 * 3600;

/** The owner cookie's value in a Cookie header, when it is well formed. */
export function ownerFromCookieHeader(header: string | null | undefined): string | undefined {
  for (const part of (header ?? "").split(";")) {
    const [name, ...rest] = part.trim().split("=");
    if (name === OWNER_COOKIE) {
      const value = rest.join("=");
      return OWNER_PATTERN.test(value) ? value : undefined;
    }
  }
  return undefined;
}

export const ownerHash = (owner: string | undefined) => (owner ? sha256Hex(owner) : undefined);

/** The request's owner, or a new one with the Set-Cookie header that gives it to the client. */
export function ownerOf(req: Request): { owner: string; setCookie?: string } {
  const known = ownerFromCookieHeader(req.headers.get("cookie"));
  if (known) return { owner: known };
  const owner = randomBytes(32).toString("base64url");
  const https = new URL(req.url).protocol === "https:" || req.headers.get("x-forwarded-proto") === "https";
  const setCookie = `${OWNER_COOKIE}=${owner}; Path=/; Max-Age=${YEAR_S}; HttpOnly; SameSite=Lax${https ? "; Secure" : ""}`;
  return { owner, setCookie };
}

/** The owner cookie's value from a page's cookie store (next/headers `cookies()`), when well formed. */
export function ownerFromCookies(jar: { get(name: string): { value: string } | undefined }): string | undefined {
  const value = jar.get(OWNER_COOKIE)?.value;
  return value && OWNER_PATTERN.test(value) ? value : undefined;
}
