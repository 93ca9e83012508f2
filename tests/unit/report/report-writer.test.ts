import { describe, expect, test } from "vitest";
import { ALARM, ReportWriter } from "@/lib/report/report-writer";
import { CAUTION_TEXT } from "@/lib/caution";
import { pdfPages } from "../../support/pdf-text";

const count = (text: string, part: string) => text.split(part).length - 1;

/** pdf.js may split a long line into several text items; compare without the spaces between them. */
const squeeze = (s: string) => s.replace(/\s+/g, "");

describe("the report's text, read back from the PDF", () => {
  test("Greek letters, primes and subscripts are drawn as written, not spelt out", async () => {
    const w = await ReportWriter.create("Symbols");
    // The trade writes effective strength as c′ and φ′, unit weight as γ and Bishop's factor as mα
    // (Bishop 1955, Géotechnique 5(1); common practice in every soil-mechanics text).
    w.paragraph("Effective strength c′ = 5 kPa, φ′ = 32°; unit weight γ = 19.5 kN/m³; smallest mα = 0.412.");
    w.table(
      [
        { header: "Base angle α\n(°)", width: 60 },
        { header: "φ′\n(°)", width: 40 },
        { header: "mα", width: 40 },
      ],
      [["12.5", "32.0", "0.981"]],
    );
    const [page] = await pdfPages(await w.finish("Symbols check", `Caution: ${CAUTION_TEXT}`));
    for (const s of ["c′ = 5 kPa", "φ′ = 32°", "γ = 19.5 kN/m³", "mα = 0.412", "Base angle α", "(°)"])
      expect(squeeze(page)).toContain(squeeze(s));
    expect(page).not.toMatch(/phi|gamma|m-alpha|\?/);
  });

  test("a table header wraps in its column instead of being cut", async () => {
    const w = await ReportWriter.create("Headers");
    w.table(
      [
        { header: "Pore pressure at the base of the slice", width: 50 },
        { header: "Value", width: 40 },
      ],
      [["12.0", "1"]],
    );
    const [page] = await pdfPages(await w.finish("Header check", `Caution: ${CAUTION_TEXT}`));
    expect(squeeze(page)).toContain(squeeze("Pore pressure at the base of the slice"));
    expect(page).not.toContain("…");
  });

  test("the caution appears once on every page: in the box on the first, in the footer on the others", async () => {
    const w = await ReportWriter.create("Caution");
    w.cautionBox("Engineering caution", CAUTION_TEXT, ALARM);
    const rows = Array.from({ length: 150 }, (_, i) => [`${i + 1}`, "x"]);
    w.table(
      [
        { header: "Slice", width: 40 },
        { header: "Value", width: 40 },
      ],
      rows,
    );
    const pages = await pdfPages(await w.finish("Caution check", `Caution: ${CAUTION_TEXT}`));
    expect(pages.length).toBeGreaterThan(1);
    for (const page of pages) expect(count(squeeze(page), squeeze(CAUTION_TEXT))).toBe(1);
  });
});
