/**
 * A small flowing layout over pdf-lib: headings, paragraphs, label–value rows and tables that
 * continue on a new page when the current one is full. Units are PDF points (1/72 in).
 */
import { readFile } from "node:fs/promises";
import path from "node:path";
import { PDFDocument, PDFFont, PDFPage, rgb, type RGB } from "pdf-lib";
import fontkit from "@pdf-lib/fontkit";
import { clipText, pdfSafe, wrapText } from "./pdf-text";

// Shipped with the app (licence in lib/report/fonts/LICENSE.txt): the standard PDF fonts cannot draw φ′, γ or mα.
const FONT_DIR = path.join(process.cwd(), "lib", "report", "fonts");
const FONT_FILES = { regular: "DejaVuSansCondensed.ttf", bold: "DejaVuSansCondensed-Bold.ttf" } as const;

// Read once per server process: every report embeds the same two files.
const fontCache = new Map<string, Promise<Buffer>>();
function fontBytes(file: string): Promise<Buffer> {
  let bytes = fontCache.get(file);
  if (!bytes) {
    bytes = readFile(path.join(FONT_DIR, file));
    fontCache.set(file, bytes);
    bytes.catch(() => fontCache.delete(file));
  }
  return bytes;
}

export const A4: [number, number] = [595.28, 841.89];
export const A4_LANDSCAPE: [number, number] = [841.89, 595.28];
const MARGIN = 42;
const FOOTER = 34;

export const INK = rgb(0.12, 0.12, 0.13);
export const SOFT = rgb(0.38, 0.38, 0.4);
export const RULE = rgb(0.78, 0.77, 0.74);
export const ALARM = rgb(0.62, 0.14, 0.1);
export const MOSS = rgb(0.18, 0.42, 0.2);

export interface TableColumn {
  header: string;
  width: number;
  align?: "left" | "right";
}

export class ReportWriter {
  page!: PDFPage;
  y = 0;
  /** Pages that carry the caution in full in their body; the footer does not repeat it there. */
  private readonly cautionPages = new Set<PDFPage>();
  private constructor(
    readonly doc: PDFDocument,
    readonly regular: PDFFont,
    readonly bold: PDFFont,
  ) {}

  static async create(title: string): Promise<ReportWriter> {
    const doc = await PDFDocument.create();
    doc.registerFontkit(fontkit);
    doc.setTitle(title);
    doc.setCreator("Scarpline");
    doc.setProducer("Scarpline calculation report (pdf-lib)");
    const [regular, bold] = await Promise.all(
      [FONT_FILES.regular, FONT_FILES.bold].map(async (f) => doc.embedFont(await fontBytes(f), { subset: true })),
    );
    const w = new ReportWriter(doc, regular, bold);
    w.newPage();
    return w;
  }

  get left(): number {
    return MARGIN;
  }
  get width(): number {
    return this.page.getWidth() - 2 * MARGIN;
  }

  newPage(size: [number, number] = A4): void {
    this.page = this.doc.addPage(size);
    this.y = this.page.getHeight() - MARGIN;
  }

  /** Starts a new page when less than `height` points are left above the footer. */
  ensure(height: number): void {
    if (this.y - height < MARGIN + FOOTER) this.newPage([this.page.getWidth(), this.page.getHeight()]);
  }

  text(s: string, x: number, y: number, size: number, opts: { bold?: boolean; color?: RGB } = {}): void {
    const font = opts.bold ? this.bold : this.regular;
    this.page.drawText(pdfSafe(s, font), {
      x,
      y,
      size,
      font,
      color: opts.color ?? INK,
    });
  }

  heading(s: string, size = 12): void {
    this.ensure(size + 24);
    this.y -= 10;
    this.text(s, this.left, this.y - size, size, { bold: true });
    this.y -= size + 4;
    this.page.drawLine({
      start: { x: this.left, y: this.y },
      end: { x: this.left + this.width, y: this.y },
      thickness: 0.5,
      color: RULE,
    });
    this.y -= 6;
  }

  paragraph(s: string, opts: { size?: number; bold?: boolean; color?: RGB; indent?: number } = {}): void {
    const size = opts.size ?? 9;
    const indent = opts.indent ?? 0;
    const lines = wrapText(s, opts.bold ? this.bold : this.regular, size, this.width - indent);
    for (const line of lines) {
      this.ensure(size + 3);
      this.text(line, this.left + indent, this.y - size, size, opts);
      this.y -= size + 3;
    }
    this.y -= 2;
  }

  /** Label–value rows, the value wrapped in the column right of the labels. */
  keyValues(rows: readonly [string, string][], labelWidth = 130, size = 9): void {
    for (const [label, value] of rows) {
      const lines = wrapText(value, this.regular, size, this.width - labelWidth);
      this.ensure(size + 3);
      this.text(label, this.left, this.y - size, size, { color: SOFT });
      for (const line of lines) {
        this.ensure(size + 3);
        this.text(line, this.left + labelWidth, this.y - size, size);
        this.y -= size + 3;
      }
    }
    this.y -= 3;
  }

  /** A boxed paragraph, for the caution and the review status. */
  box(title: string, body: string, color: RGB): void {
    const size = 9;
    const lines = wrapText(body, this.regular, size, this.width - 16);
    const height = 20 + lines.length * (size + 3) + 6;
    this.ensure(height + 6);
    const top = this.y - 4;
    this.page.drawRectangle({
      x: this.left,
      y: top - height,
      width: this.width,
      height,
      borderColor: color,
      borderWidth: 1.2,
    });
    this.text(title, this.left + 8, top - 15, 10, { bold: true, color });
    let y = top - 20;
    for (const line of lines) {
      this.text(line, this.left + 8, y - size, size);
      y -= size + 3;
    }
    this.y = top - height - 8;
  }

  /** The caution in a box, marking the page so its footer does not say it again. */
  cautionBox(title: string, body: string, color: RGB): void {
    this.box(title, body, color);
    this.cautionPages.add(this.page);
  }

  /**
   * A table whose header repeats on each page it spans. Headers wrap onto as many lines as their
   * column needs (a line break in a header, e.g. label then unit, is kept); only body cells too
   * long for their column are cut with "…".
   */
  table(columns: readonly TableColumn[], rows: readonly string[][], size = 8): void {
    const rowHeight = size + 4;
    const headerText = columns.map((c) =>
      c.header.split("\n").flatMap((part) => wrapText(part, this.bold, size, c.width - 4)),
    );
    const headerLines = Math.max(...headerText.map((lines) => lines.length));
    const drawHeader = () => {
      this.ensure(rowHeight * (headerLines + 1));
      let x = this.left;
      for (const [ci, c] of columns.entries()) {
        headerText[ci].forEach((line, i) => {
          const y = this.y;
          this.y -= i * (size + 2);
          this.cell(line, x, c, size, true);
          this.y = y;
        });
        x += c.width;
      }
      this.y -= rowHeight + (headerLines - 1) * (size + 2);
      this.page.drawLine({
        start: { x: this.left, y: this.y + 2 },
        end: { x: this.left + columns.reduce((s, c) => s + c.width, 0), y: this.y + 2 },
        thickness: 0.5,
        color: RULE,
      });
    };
    drawHeader();
    for (const row of rows) {
      if (this.y - rowHeight < MARGIN + FOOTER) {
        this.newPage([this.page.getWidth(), this.page.getHeight()]);
        drawHeader();
      }
      let x = this.left;
      columns.forEach((c, i) => {
        this.cell(row[i] ?? "", x, c, size, false);
        x += c.width;
      });
      this.y -= rowHeight;
    }
    this.y -= 4;
  }

  private cell(s: string, x: number, c: TableColumn, size: number, bold: boolean): void {
    const font = bold ? this.bold : this.regular;
    const t = clipText(s, font, size, c.width - 4);
    const tx = c.align === "right" ? x + c.width - 3 - font.widthOfTextAtSize(t, size) : x + 1;
    this.page.drawText(t, { x: tx, y: this.y - size, size, font, color: bold ? SOFT : INK });
  }

  /**
   * Writes the footer on every page and returns the file. The caution appears once on each page:
   * in full in the footer, except on a page whose body already holds it in a box.
   */
  async finish(footer: string, caution: string): Promise<Uint8Array> {
    const pages = this.doc.getPages();
    pages.forEach((p, i) => {
      const w = p.getWidth();
      const lines = this.cautionPages.has(p) ? [] : wrapText(caution, this.regular, 6.5, w - 2 * MARGIN);
      const top = MARGIN + 2 + Math.max(1, lines.length) * 8.5;
      p.drawLine({ start: { x: MARGIN, y: top }, end: { x: w - MARGIN, y: top }, thickness: 0.4, color: RULE });
      lines.forEach((line, n) => {
        p.drawText(line, { x: MARGIN, y: top - 8.5 * (n + 1), size: 6.5, font: this.regular, color: SOFT });
      });
      const right = `page ${i + 1} of ${pages.length}`;
      p.drawText(clipText(footer, this.regular, 7, w - 2 * MARGIN - 70), {
        x: MARGIN,
        y: MARGIN - 6,
        size: 7,
        font: this.regular,
        color: SOFT,
      });
      p.drawText(right, {
        x: w - MARGIN - this.regular.widthOfTextAtSize(right, 7),
        y: MARGIN - 6,
        size: 7,
        font: this.regular,
        color: SOFT,
      });
    });
    return this.doc.save();
  }
}
