import http from "node:http";
import { describe, expect, test } from "vitest";
import { AppClient, sessionCookie, signedIn } from "../support/http";
import { demoProject } from "../support/demo";
import { getDb } from "@/db/index";
import type { SectionDocument } from "@/lib/stability";

async function count(table: string): Promise<number> {
  return Number((await getDb()(table).count({ n: "*" }).first())?.n);
}

/**
 * PUTs a body on a connection of its own (the server answers 413 while the body is still arriving, and
 * such a connection must not be handed to the next test's request), with or without a Content-Length.
 */
function send(
  url: URL,
  cookie: string,
  body: string,
  declareLength: boolean,
): Promise<{ status: number; body: string }> {
  return new Promise((resolve, reject) => {
    const bytes = Buffer.from(body);
    const headers: Record<string, string> = { "content-type": "application/json", cookie };
    if (declareLength) headers["content-length"] = String(bytes.length);
    const req = http.request(url, { method: "PUT", agent: false, headers }, (res) => {
      let text = "";
      res.setEncoding("utf8");
      res.on("data", (d: string) => (text += d));
      res.on("end", () => resolve({ status: res.statusCode ?? 0, body: text }));
    });
    // Writing the rest may fail once the server has answered and closed: the answer is what counts.
    let answered = false;
    req.on("response", () => (answered = true));
    req.on("error", (err) => setTimeout(() => (answered ? undefined : reject(err)), 1000));
    for (let i = 0; i < bytes.length; i += 256 * 1024) req.write(bytes.subarray(i, i + 256 * 1024));
    req.end();
  });
}

const sectionBody = (name: string, document: unknown) => JSON.stringify({ name, description: "", document });

describe("request bodies are bounded (issue 12, items 3 and 4)", () => {
  test("a 6 MiB JSON body gets 413 unparsed, with or without a Content-Length; nothing is written", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const { projectId, sectionId, version } = await demoProject(engineer);
    const cookie = await sessionCookie("engineer@scarpline.test");
    const before = await count("section_versions");
    const big = JSON.stringify({ baseVersion: version, document: { version: 1, pad: "x".repeat(6 * 1024 * 1024) } });
    const target = new URL(`/api/projects/${projectId}/sections/${sectionId}`, engineer.baseUrl);

    const declared = await send(target, cookie, big, true);
    expect(declared.status).toBe(413);
    expect(JSON.parse(declared.body).error.message).toMatch(/2 MiB/);
    // Sent in chunks with no Content-Length: counted while it arrives.
    const streamed = await send(target, cookie, big, false);
    expect(streamed.status).toBe(413);
    expect(await count("section_versions")).toBe(before);
  });

  test("a section of 20,000 vertices gets 400 naming the region and the limit; nothing is written", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const { projectId, document } = await demoProject(engineer);
    const before = await count("sections");
    const points = Array.from({ length: 20_000 }, (_, i) => {
      const a = (2 * Math.PI * i) / 20_000;
      return [50 + 40 * Math.cos(a), 20 + 10 * Math.sin(a)];
    });
    const huge = { ...document, regions: [{ ...document.regions[0], points }] } as SectionDocument;
    const res = await engineer.request(`/api/projects/${projectId}/sections`, {
      method: "POST",
      json: { name: "Far too detailed", description: "", document: huge },
    });
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.error.code).toBe("section_too_large");
    expect(body.error.fields["document.regions.0.points"][0]).toMatch(/At most 5000 points in one region/);
    expect(await count("sections")).toBe(before);
  });
});

describe("cross-site requests (issue 12, item 5)", () => {
  test("a text/plain body posted as the signed-in user gets 415; nothing is written", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const { projectId, document } = await demoProject(engineer);
    const before = await count("sections");
    const res = await engineer.request(`/api/projects/${projectId}/sections`, {
      method: "POST",
      headers: { "content-type": "text/plain;charset=UTF-8" },
      body: sectionBody("Posted by a form", document),
    });
    expect(res.status).toBe(415);
    expect((await res.json()).error.code).toBe("unsupported_media_type");
    expect(await count("sections")).toBe(before);
  });

  test("a foreign Origin (a same-site page on another port too) gets 403; the app's own passes", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const { projectId, document } = await demoProject(engineer);
    const before = await count("sections");
    const own = new URL(engineer.baseUrl);
    for (const origin of ["https://elsewhere.example", `http://${own.hostname}:1`, "null"]) {
      const res = await engineer.request(`/api/projects/${projectId}/sections`, {
        method: "POST",
        headers: { "content-type": "application/json", origin },
        body: sectionBody(`From ${origin}`, document),
      });
      expect(res.status, origin).toBe(403);
      expect((await res.json()).error.code).toBe("foreign_origin");
    }
    const noOrigin = await engineer.request(`/api/projects/${projectId}/sections`, {
      method: "POST",
      headers: { "content-type": "application/json", "sec-fetch-site": "same-site" },
      body: sectionBody("Same site, no origin", document),
    });
    expect(noOrigin.status).toBe(403);
    expect(await count("sections")).toBe(before);

    const ours = await engineer.request(`/api/projects/${projectId}/sections`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: own.origin, "sec-fetch-site": "same-origin" },
      body: sectionBody("Posted from the app itself", document),
    });
    expect(ours.status).toBe(201);
  });

  test("a foreign Origin cannot sign anyone in or out either", async () => {
    const client = new AppClient();
    const csrf = await (await client.request("/api/auth/csrf")).json();
    const res = await client.request("/api/auth/callback/credentials", {
      method: "POST",
      headers: { "content-type": "application/x-www-form-urlencoded", origin: "https://elsewhere.example" },
      body: new URLSearchParams({
        csrfToken: csrf.csrfToken,
        email: "engineer@scarpline.test",
        password: "scarpline-demo",
      }).toString(),
    });
    expect(res.status).toBe(403);
  });
});

describe("security headers (issue 12, item 7)", () => {
  test("pages, API answers and static files carry CSP (frame-ancestors 'none'), nosniff, referrer, DENY", async () => {
    const client = new AppClient();
    const page = await client.request("/sign-in");
    const html = await page.text();
    const api = await client.request("/api/projects");
    const script = html.match(/src="(\/_next\/static\/[^"]+\.js)"/)?.[1];
    expect(script).toBeDefined();
    const asset = await client.request(script!);
    for (const res of [page, api, asset]) {
      expect(res.headers.get("content-security-policy")).toMatch(/frame-ancestors 'none'/);
      expect(res.headers.get("x-content-type-options")).toBe("nosniff");
      expect(res.headers.get("referrer-policy")).toBe("strict-origin-when-cross-origin");
      expect(res.headers.get("x-frame-options")).toBe("DENY");
    }
    // Pages allow only scripts bearing this response's nonce (Next puts it on its own script tags).
    const nonce = page.headers.get("content-security-policy")?.match(/'nonce-([^']+)'/)?.[1];
    expect(nonce).toBeDefined();
    expect(html).toContain(`nonce="${nonce}"`);
    expect(page.headers.get("content-security-policy")).not.toMatch(/script-src[^;]*'unsafe-inline'/);
  });
});
