import { describe, expect, test } from "vitest";
import fc from "fast-check";
import { safeCallbackPath, signInPathFor } from "@/lib/auth/callback-path";

/**
 * Sources: OWASP Unvalidated Redirects and Forwards Cheat Sheet (a redirect target taken from a request
 * must be checked against the application's own destinations); RFC 3986 §4.2 ("//host/…" is a
 * network-path reference, i.e. another host); the WHATWG URL Standard (browsers read "\" as "/" in
 * http(s) URLs, so "/\host" is "//host"). Quoted from memory.
 */
const BASE = "http://scarpline.invalid";
const APP = "http://127.0.0.1:3000";

describe("safeCallbackPath: where sign-in may send a person", () => {
  test("a page path of the app is kept with its query and fragment", () => {
    expect(safeCallbackPath("/projects/3/runs/12/review")).toBe("/projects/3/runs/12/review");
    expect(safeCallbackPath("/projects/3/runs?status=submitted#list")).toBe("/projects/3/runs?status=submitted#list");
    // Dot segments resolve inside the app (RFC 3986 §5.2.4), never out of it.
    expect(safeCallbackPath("/projects/../admin/users")).toBe("/admin/users");
  });

  test("other hosts are refused however they are spelled", () => {
    for (const evil of [
      "//evil.example/projects",
      "/\\evil.example/projects",
      "https://evil.example/projects",
      "javascript:alert(1)",
      "http://127.0.0.1:3001/projects",
      "projects",
      "",
    ]) {
      expect(safeCallbackPath(evil, APP), evil).toBeNull();
    }
  });

  test("an absolute URL of the app's own origin becomes its path; the API is no page to land on", () => {
    expect(safeCallbackPath(`${APP}/projects/7`, APP)).toBe("/projects/7");
    expect(safeCallbackPath(`${APP}/projects/7`)).toBeNull();
    expect(safeCallbackPath("/api/users")).toBeNull();
  });

  test("whatever the input, an accepted target resolves to this app's origin (property)", () => {
    fc.assert(
      fc.property(
        fc.oneof(
          fc.string(),
          fc.webUrl(),
          fc.string().map((s) => "/" + s),
        ),
        (raw) => {
          const out = safeCallbackPath(raw, APP);
          if (out === null) return;
          expect(out.startsWith("/")).toBe(true);
          expect(new URL(out, BASE).origin).toBe(BASE);
          expect(new URL(out, APP).origin).toBe(APP);
        },
      ),
    );
  });

  test("the sign-in address carries the page asked for, except the home page and sign-in itself", () => {
    expect(signInPathFor("/projects/3/runs/12/review")).toBe(
      "/sign-in?callbackUrl=%2Fprojects%2F3%2Fruns%2F12%2Freview",
    );
    expect(signInPathFor("/")).toBe("/sign-in");
    expect(signInPathFor("/sign-in?callbackUrl=%2Fx")).toBe("/sign-in");
    expect(signInPathFor("//evil.example")).toBe("/sign-in");
    expect(signInPathFor(null)).toBe("/sign-in");
  });
});
