import { describe, expect, test } from "vitest";
import { formatCount, formatDate, formatDateTime } from "@/lib/format";

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
