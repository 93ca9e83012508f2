/** The request header proxy.ts sets to the page path and query a visitor asked for. */
export const REQUEST_PATH_HEADER = "x-scarpline-path";
