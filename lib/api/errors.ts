/** Errors that route handlers and server actions turn into one JSON answer each. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string[]>,
  ) {
    super(message);
    this.name = "ApiError";
  }
}

export const unauthorized = () => new ApiError(401, "unauthorized", "Sign in to continue.");
export const forbidden = (what = "do this") =>
  new ApiError(403, "forbidden", `Your role does not allow you to ${what}.`);
export const notFound = (what = "The item") => new ApiError(404, "not_found", `${what} was not found.`);
export const conflict = (message: string) => new ApiError(409, "conflict", message);
