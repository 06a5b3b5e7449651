/**
 * The security headers of every response. Pages get a Content-Security-Policy
 * with a fresh nonce per request (proxy.ts): only the framework's scripts,
 * which Next.js gives that nonce, run; styles come from our own stylesheet,
 * and style attributes (set by React and cytoscape) are allowed, scripts in
 * attributes are not. API responses (JSON, CSV) may load nothing at all.
 * Every response: nosniff, no framing, and no Referer, because the ids in
 * our links are capabilities and must not travel to another site.
 * Plain strings, no server-only import: next.config.ts reads it too.
 */

/**
 * The one inline style element a library adds: cytoscape (3.x) inserts
 * `<style>.__________cytoscape_container { position: relative; }</style>` into
 * the head; it is allowed by the SHA-256 of that exact text (the CSP browser
 * test fails if a new version changes it).
 */
export const CYTOSCAPE_STYLE_HASH = "sha256-pgvDUBa4IjFA2yuSJ2cqcyxmNYJMborsd0ORcRv9vw8=";

/** The CSP of a page rendered with `nonce`; `dev` adds 'unsafe-eval' for React's development build. */
export function pageCsp(nonce: string, dev = false): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ""}`,
    `style-src 'self' 'nonce-${nonce}' '${CYTOSCAPE_STYLE_HASH}'`,
    "style-src-attr 'unsafe-inline'",
    // PNG and SVG exports are drawn to data: and blob: URLs
    "img-src 'self' data: blob:",
    "font-src 'self'",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'none'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}

/** The CSP of API responses: they are data, never documents that load anything. */
export const API_CSP = "default-src 'none'; frame-ancestors 'none'; sandbox";

/** Headers on every response (next.config.ts `headers()`). */
export const COMMON_SECURITY_HEADERS: { key: string; value: string }[] = [
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "Referrer-Policy", value: "no-referrer" },
  { key: "X-Frame-Options", value: "DENY" },
  { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
  { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=(), payment=()" },
];
