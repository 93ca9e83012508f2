import { NextResponse, type NextRequest } from "next/server";
import { pagePolicy } from "@/lib/api/content-security";
import { SERVICE_UNAVAILABLE } from "@/lib/api/service-down";
import { REQUEST_PATH_HEADER } from "@/lib/api/request-path";
import { pingDatabase } from "@/db/queries/health";

// Pages that read the database answer 503 while it is out of reach, instead of rendering "not found".
const PAGES_NEEDING_DB = /^\/($|(projects|account|admin|reset-password)(\/|$))/;
const PING_TTL_MS = 2000;
let lastPing: { at: number; ok: boolean } | null = null;

async function databaseAnswers(): Promise<boolean> {
  if (lastPing && Date.now() - lastPing.at < PING_TTL_MS) return lastPing.ok;
  try {
    await pingDatabase();
    lastPing = { at: Date.now(), ok: true };
  } catch (err) {
    console.error("[pages] the database is out of reach", err);
    lastPing = { at: Date.now(), ok: false };
  }
  return lastPing.ok;
}

function unavailablePage(policy: string): NextResponse {
  const html =
    '<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Unavailable · Scarpline</title></head>' +
    `<body><main><h1>Unavailable</h1><p>${SERVICE_UNAVAILABLE}</p></main></body></html>`;
  return new NextResponse(html, {
    status: 503,
    headers: { "content-type": "text/html; charset=utf-8", "retry-after": "30", "content-security-policy": policy },
  });
}

/** Gives every page its own CSP nonce (Next reads it from the request header and puts it on its scripts). */
export async function proxy(request: NextRequest): Promise<NextResponse> {
  const nonce = Buffer.from(crypto.randomUUID()).toString("base64");
  const policy = pagePolicy(nonce, process.env.NODE_ENV === "development");
  if (PAGES_NEEDING_DB.test(request.nextUrl.pathname) && !(await databaseAnswers())) return unavailablePage(policy);
  const headers = new Headers(request.headers);
  headers.set("x-nonce", nonce);
  headers.set("content-security-policy", policy);
  // Pages behind sign-in read it to send the visitor back here after signing in (lib/auth/session.ts).
  headers.set(REQUEST_PATH_HEADER, request.nextUrl.pathname + request.nextUrl.search);
  const response = NextResponse.next({ request: { headers } });
  response.headers.set("content-security-policy", policy);
  return response;
}

export const config = {
  // Pages only: API answers and static files get their headers from next.config.ts.
  matcher: ["/((?!api/|_next/static|_next/image|favicon.ico|icon.svg).*)"],
};
