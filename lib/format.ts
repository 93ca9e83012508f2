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

/** A very small or large number as the trade writes it: 6.31 × 10⁻⁹ (`digits` decimals on the mantissa). */
export function formatScientific(value: number | undefined | null, digits = 2): string {
  if (value === undefined || value === null || !Number.isFinite(value)) return "—";
  if (value === 0) return "0";
  const [mantissa, exponent] = value.toExponential(digits).split("e");
  const sup: Record<string, string> = {
    "-": "⁻",
    "+": "",
    0: "⁰",
    1: "¹",
    2: "²",
    3: "³",
    4: "⁴",
    5: "⁵",
    6: "⁶",
    7: "⁷",
    8: "⁸",
    9: "⁹",
  };
  const power = [...exponent].map((ch) => sup[ch] ?? ch).join("");
  return `${mantissa} × 10${power}`;
}

/** A number for tables: fixed decimals, without a trailing "-0". */
export function formatValue(value: number | undefined | null, digits = 1): string {
  if (value === undefined || value === null || !Number.isFinite(value)) return "—";
  const s = value.toFixed(digits);
  return /^-0(\.0+)?$/.test(s) ? s.slice(1) : s;
}

/** Units written straight after the number, with no space: angles (26.9°, 12′). */
const UNSPACED_UNITS = new Set(["°", "′", "″"]);

/**
 * A value with its unit as the trade writes it (SI Brochure, 9th ed., §5.4.3: a space between
 * number and unit, except for the plane-angle signs): 19 kN/m³, 26.9°, 6.31 × 10⁻⁹ m³/s. A unit
 * of "" or "–" leaves the number alone.
 */
export function withUnit(value: string | number, unit: string | undefined): string {
  const v = String(value);
  if (!unit || unit === "–" || unit === "-") return v;
  return UNSPACED_UNITS.has(unit) ? `${v}${unit}` : `${v} ${unit}`;
}

/** A count with its noun, singular or plural as English needs: "1 slice", "3 slices", "0 slices". */
export function countOf(n: number, one: string, many = `${one}s`): string {
  return `${formatCount(n)} ${n === 1 ? one : many}`;
}

/** A probability as the reports write it: 0.31 % down to 0.1 %, then 6.2 × 10⁻⁴ (`digits` decimals). */
export function formatProbability(p: number | null | undefined, digits = 2): string {
  if (p === null || p === undefined || !Number.isFinite(p)) return "—";
  return p >= 0.001 || p === 0 ? `${(p * 100).toFixed(2)} %` : formatScientific(p, digits);
}
