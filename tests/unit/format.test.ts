import { describe, expect, test } from "vitest";
import { countOf, formatCount, formatDate, formatDateTime, formatScientific, withUnit } from "@/lib/format";

// ISO 8601 (calendar date YYYY-MM-DD, time hh:mm) in UTC, and the en-GB thousands separator.
describe("formatDate, formatDateTime and formatCount", () => {
  test("dates are ISO 8601 in UTC whatever the instant's own offset", () => {
    expect(formatDate("2026-03-14T23:30:00-02:00")).toBe("2026-03-15");
    expect(formatDateTime("2026-03-14T09:30:59Z")).toBe("2026-03-14 09:30 UTC");
    expect(formatDateTime(Date.UTC(2026, 0, 2, 3, 4))).toBe("2026-01-02 03:04 UTC");
  });

  test("counts are whole numbers with a comma every three digits", () => {
    expect(formatCount(1234567)).toBe("1,234,567");
    expect(formatCount(999.6)).toBe("1,000");
    expect(formatCount(0)).toBe("0");
  });
});

// The SI Brochure (BIPM, 9th edition, 2019; section number from memory: 5.4.3) puts a space between a
// number and its unit, except for the degree, minute and second of plane angle; powers of ten are
// written "× 10" with a superscript exponent (common practice in the trade's tables).
describe("withUnit, formatScientific and countOf", () => {
  test("a space before a unit, none before a degree sign", () => {
    expect(withUnit(19, "kN/m³")).toBe("19 kN/m³");
    expect(withUnit("26.9", "°")).toBe("26.9°");
    expect(withUnit(0.3, "–")).toBe("0.3");
    expect(withUnit(4, undefined)).toBe("4");
  });

  test("small numbers as powers of ten with superscript exponents", () => {
    expect(withUnit(formatScientific(6.31e-9), "m³/s")).toBe("6.31 × 10⁻⁹ m³/s");
    expect(formatScientific(1.2e12, 1)).toBe("1.2 × 10¹²");
    expect(formatScientific(0)).toBe("0");
    expect(formatScientific(Number.NaN)).toBe("—");
  });

  test("one of a thing is singular, any other count plural", () => {
    expect(countOf(1, "slice")).toBe("1 slice");
    expect(countOf(0, "slice")).toBe("0 slices");
    expect(countOf(2, "vertex", "vertices")).toBe("2 vertices");
    expect(countOf(1500, "circle")).toBe("1,500 circles");
  });
});
