import Papa from "papaparse";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { CSV_BOM, unescapeText, writeCsv } from "@/lib/section-io";

// RFC 4180 (comma separated values: quoting with doubled quotes, CRLF) and the OWASP "CSV Injection"
// guidance (a cell starting with = + - @, tab or CR is prefixed with an apostrophe); papaparse is the
// independent parser the round trips are checked with.
const parse = (csv: string) => Papa.parse<string[]>(csv.trimEnd(), { newline: "\r\n", delimiter: "," }).data;

describe("writeCsv, the one CSV writer", () => {
  it("prefixes text that starts a formula with an apostrophe, and leaves plain numbers alone", () => {
    for (const lead of ["=", "+", "-", "@", "\t", "\r"]) {
      const [, row] = parse(writeCsv(["a"], [[`${lead}SUM(A1)`]]));
      expect(row[0]).toBe(`'${lead}SUM(A1)`);
    }
    const [, row] = parse(writeCsv(["a", "b", "c", "d"], [["-12.50", -3, "+4", "clay core"]]));
    expect(row).toEqual(["-12.50", "-3", "+4", "clay core"]);
  });

  it("quotes fields with commas, quotes or line breaks and doubles inner quotes", () => {
    const csv = writeCsv(["a", "b"], [['say "hi", then', "two\nlines"]]);
    expect(csv).toContain('"say ""hi"", then","two\nlines"');
  });

  it("starts with a byte-order mark, ends every line with CRLF and writes blanks for missing cells", () => {
    const csv = writeCsv(
      ["x", "y"],
      [
        [1, null],
        [undefined, 2],
      ],
      { comments: ["Caution: check, then check"] },
    );
    expect(csv.startsWith(CSV_BOM)).toBe(true);
    expect(csv.slice(1)).toBe('"# Caution: check, then check"\r\nx,y\r\n1,\r\n,2\r\n');
  });

  it("round-trips any text through papaparse and the app's own reader, formula prefix undone", () => {
    fc.assert(
      fc.property(fc.string(), fc.string(), (a, b) => {
        const [, row] = parse(writeCsv(["a", "b"], [[a, b]]));
        expect(unescapeText(row?.[0] ?? "")).toBe(a);
        expect(unescapeText(row?.[1] ?? "")).toBe(b);
      }),
      { numRuns: 500 },
    );
  });
});
