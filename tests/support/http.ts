import { inject } from "vitest";

/** A signed-in (or anonymous) HTTP client for the app under test, keeping cookies like a browser. */
export class AppClient {
  private cookies = new Map<string, string>();
  constructor(readonly baseUrl: string = inject("appUrl")) {}

  private cookieHeader(): string {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
  }

  private keepCookies(res: Response): void {
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(";");
      const i = pair.indexOf("=");
      this.cookies.set(pair.slice(0, i).trim(), pair.slice(i + 1).trim());
    }
  }

  async request(path: string, init: RequestInit & { json?: unknown } = {}): Promise<Response> {
    const { json, ...rest } = init;
    const headers = new Headers(rest.headers);
    if (this.cookies.size) headers.set("cookie", this.cookieHeader());
    if (json !== undefined) headers.set("content-type", "application/json");
    const res = await fetch(this.baseUrl + path, {
      ...rest,
      headers,
      body: json !== undefined ? JSON.stringify(json) : rest.body,
      redirect: "manual",
    });
    this.keepCookies(res);
    return res;
  }

  /** Signs in through next-auth's credentials endpoint; returns whether a session was issued. */
  async signIn(email: string, password: string): Promise<{ ok: boolean; error: string | null }> {
    const csrf = await (await this.request("/api/auth/csrf")).json();
    const res = await this.request("/api/auth/callback/credentials", {
      method: "POST",
      headers: { "content-type": "application/x-www-form-urlencoded" },
      body: new URLSearchParams({ csrfToken: csrf.csrfToken, email, password, json: "true" }).toString(),
    });
    // With json=true next-auth answers {url}; otherwise it redirects. The error rides in the URL either way.
    const body = res.headers.get("content-type")?.includes("json") ? await res.json() : null;
    const target = body?.url ?? res.headers.get("location") ?? "";
    const error = new URL(target, this.baseUrl).searchParams.get("error");
    return { ok: this.cookies.has("next-auth.session-token") && !error, error };
  }
}

export async function signedIn(email: string, password = "scarpline-demo"): Promise<AppClient> {
  const client = new AppClient();
  const { ok, error } = await client.signIn(email, password);
  if (!ok) throw new Error(`sign-in as ${email} failed: ${error}`);
  return client;
}

/**
 * Signs in without a client and returns the raw Cookie header (CSRF and session cookies), for tests that
 * replay a token after it should have died or send requests on connections of their own.
 */
export async function sessionCookie(email: string, password = "scarpline-demo"): Promise<string> {
  const base = inject("appUrl");
  const csrfRes = await fetch(`${base}/api/auth/csrf`);
  const csrfCookie = csrfRes.headers.getSetCookie().map((c) => c.split(";")[0]);
  const { csrfToken } = await csrfRes.json();
  const res = await fetch(`${base}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: csrfCookie.join("; ") },
    body: new URLSearchParams({ csrfToken, email, password, json: "true" }).toString(),
  });
  const token = res.headers.getSetCookie().find((c) => c.startsWith("next-auth.session-token="));
  if (!token) throw new Error(`no session for ${email}`);
  return [...csrfCookie, token.split(";")[0]].join("; ");
}
