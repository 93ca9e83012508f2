import "server-only";
import { NextResponse } from "next/server";
import { ZodError, type ZodType } from "zod";
import { ApiError } from "./errors";
import { toId } from "./ids";
import { isServiceDown, SERVICE_UNAVAILABLE } from "./service-down";
import {
  MAX_JSON_BYTES,
  MAX_JSON_LABEL,
  readCappedText,
  refuseForeignOrigin,
  requireJsonContentType,
} from "./request-guards";

export interface ErrorBody {
  error: { code: string; message: string; fields?: Record<string, string[]> };
}

/** Turns zod issues into `{ "a.b": ["message"] }`, the shape every form reads. */
export function fieldErrors(error: ZodError): Record<string, string[]> {
  const fields: Record<string, string[]> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join(".") : "_";
    (fields[key] ??= []).push(issue.message);
  }
  return fields;
}

export function errorResponse(err: unknown): NextResponse<ErrorBody> {
  if (err instanceof ApiError) {
    return NextResponse.json(
      { error: { code: err.code, message: err.message, fields: err.fields } },
      { status: err.status },
    );
  }
  if (err instanceof ZodError) {
    return NextResponse.json(
      { error: { code: "invalid_input", message: "Some fields are not valid.", fields: fieldErrors(err) } },
      { status: 400 },
    );
  }
  if (isServiceDown(err)) {
    console.error("[api] the database is out of reach", err);
    return NextResponse.json({ error: { code: "unavailable", message: SERVICE_UNAVAILABLE } }, { status: 503 });
  }
  console.error("[api] unexpected error", err);
  return NextResponse.json(
    { error: { code: "internal", message: "Something went wrong on the server." } },
    { status: 500 },
  );
}

/**
 * Reads and validates a JSON body: another content type is a 415, a body over 2 MiB a 413 (refused
 * before it is parsed), and a body that is not JSON a 400 like any other bad field.
 */
export async function parseJson<T>(request: Request, schema: ZodType<T>): Promise<T> {
  requireJsonContentType(request);
  const text = await readCappedText(request, MAX_JSON_BYTES, MAX_JSON_LABEL);
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    throw new ApiError(400, "invalid_json", "The request body is not valid JSON.", { _: ["Send a JSON object."] });
  }
  return schema.parse(raw);
}

/** Parses a numeric route parameter such as a project id. */
export function parseId(value: string, what: string): number {
  const id = toId(value);
  if (id === null) throw new ApiError(404, "not_found", `${what} was not found.`);
  return id;
}

type Handler<C> = (request: Request, context: C) => Promise<Response>;

/**
 * Wraps a route handler so every failure answers `{"error": {code, message, fields}}`, and so every
 * state-changing request from a foreign origin is refused (403) before the handler runs.
 */
export function apiRoute<C>(handler: Handler<C>): Handler<C> {
  return async (request, context) => {
    try {
      refuseForeignOrigin(request);
      return await handler(request, context);
    } catch (err) {
      return errorResponse(err);
    }
  };
}
