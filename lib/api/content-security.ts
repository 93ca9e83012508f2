/**
 * The Content-Security-Policy of the app's pages. Scripts run only with the per-request nonce that Next
 * puts on its own script tags ('strict-dynamic' lets those load the chunks and workers they need). Styles
 * allow inline attributes because React renders `style={…}` as attributes, which a nonce cannot cover.
 */
export function pagePolicy(nonce: string, dev: boolean): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' blob: data:",
    "font-src 'self'",
    "connect-src 'self'",
    "worker-src 'self' blob:",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}

/** For API answers and downloads: nothing may run in them or frame them. */
export const NON_PAGE_POLICY = "default-src 'none'; frame-ancestors 'none'";

/**
 * For the app's static files. A dedicated worker runs under the policy its own script arrives with, and
 * the search workers load their chunks from the app itself, so scripts from 'self' must stay allowed.
 */
export const STATIC_POLICY = "default-src 'self'; object-src 'none'; base-uri 'none'; frame-ancestors 'none'";

/** Sent on every response (next.config.ts). */
export const COMMON_SECURITY_HEADERS = [
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
  { key: "X-Frame-Options", value: "DENY" },
];
