/**
 * The one date and number formatter of the pages, the report, the mail and the exports. Dates are
 * ISO 8601 in UTC (2026-03-14, 2026-03-14 09:30 UTC): the same on the server that renders a page
 * and in the browser that hydrates it, whatever either's time zone, and unambiguous to every reader.
 */

const iso = (value: string | number | Date) => new Date(value).toISOString();

/** A calendar date, `2026-03-14`. */
export function formatDate(value: string | number | Date): string {
  return iso(value).slice(0, 10);
}

/** A date and time to the minute, `2026-03-14 09:30 UTC`. */
export function formatDateTime(value: string | number | Date): string {
  return `${iso(value).slice(0, 16).replace("T", " ")} UTC`;
}

const counts = new Intl.NumberFormat("en-GB", { maximumFractionDigits: 0 });

/** A whole number with thousands separators, `12,345`. */
export function formatCount(value: number): string {
  return counts.format(value);
}
