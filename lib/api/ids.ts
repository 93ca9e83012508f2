import { notFound } from "next/navigation";

/** A database id as written in a URL: 1 to 4294967295, digits only ("abc", "1e3", "Infinity" are not ids). */
export function toId(value: string | undefined): number | null {
  if (value === undefined || !/^[1-9]\d{0,9}$/.test(value)) return null;
  const id = Number(value);
  return id <= 4294967295 ? id : null;
}

/** For pages: an id segment that is not an id renders "not found" (404) before anything is queried. */
export function pageId(value: string | undefined): number {
  const id = toId(value);
  if (id === null) notFound();
  return id;
}
