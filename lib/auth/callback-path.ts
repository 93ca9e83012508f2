/**
 * Where a person goes after signing in: only a page path of this app. A callbackUrl arrives in a link
 * anyone can write, so an absolute URL elsewhere, a protocol-relative "//host" or a "/\host" that
 * browsers read as one would turn the sign-in page into an open redirect.
 */
const BASE = "http://scarpline.invalid";

/** The same-origin path (with query and fragment) `value` points to, or null when it points elsewhere. */
export function safeCallbackPath(value: string | null | undefined, appOrigin?: string): string | null {
  if (!value) return null;
  let url: URL;
  try {
    if (value.startsWith("/")) {
      if (value.startsWith("//") || value.startsWith("/\\")) return null;
      url = new URL(value, BASE);
      if (url.origin !== BASE) return null;
    } else {
      if (!appOrigin) return null;
      url = new URL(value);
      if (url.origin !== new URL(appOrigin).origin) return null;
    }
  } catch {
    return null;
  }
  // The API answers JSON, not a page.
  if (url.pathname.startsWith("/api/")) return null;
  return url.pathname + url.search + url.hash;
}

/** The sign-in page's address for a visitor who wanted `path`. */
export function signInPathFor(path: string | null | undefined): string {
  const back = safeCallbackPath(path);
  return back && back !== "/" && !back.startsWith("/sign-in")
    ? `/sign-in?callbackUrl=${encodeURIComponent(back)}`
    : "/sign-in";
}
