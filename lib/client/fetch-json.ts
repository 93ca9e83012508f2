/** An API answer that was not 2xx, carrying the server's `{"error": {...}}` body. */
export class ApiClientError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: Record<string, string[]> = {},
  ) {
    super(message);
  }
}

/** fetch + JSON + error mapping, used by SWR and by form submissions alike. */
export async function fetchJson<T>(url: string, init?: RequestInit & { json?: unknown }): Promise<T> {
  const { json, ...rest } = init ?? {};
  const response = await fetch(url, {
    ...rest,
    headers: { ...(json !== undefined ? { "content-type": "application/json" } : {}), ...rest.headers },
    body: json !== undefined ? JSON.stringify(json) : rest.body,
  });
  if (response.status === 204) return undefined as T;
  const body = await response.json().catch(() => null);
  if (!response.ok) {
    const e = body?.error ?? {};
    throw new ApiClientError(
      response.status,
      e.code ?? "http_error",
      e.message ?? `Request failed (${response.status}).`,
      e.fields ?? {},
    );
  }
  return body as T;
}

export const swrFetcher = <T>(url: string) => fetchJson<T>(url);
