/**
 * Text for the PDF's standard fonts, which encode WinAnsi (Windows-1252) only: Greek letters and
 * a few symbols the engineering text uses are spelt out, anything else unknown becomes "?".
 */
import type { PDFFont } from "pdf-lib";

const SPELT: Record<string, string> = {
  φ: "phi",
  γ: "gamma",
  α: "alpha",
  σ: "sigma",
  τ: "tau",
  Σ: "Sum ",
  θ: "theta",
  β: "beta",
  Δ: "Delta ",
  "′": "'",
  "″": '"',
  "≥": ">=",
  "≤": "<=",
  "−": "-",
  "✓": "ok",
  "✕": "x",
  "→": "->",
  "←": "<-",
  "≈": "~",
  ᵣ: "r",
};

// Code points WinAnsi holds beyond Latin-1's printable range.
const WIN_ANSI_EXTRA = new Set("€‚ƒ„…†‡ˆ‰Š‹ŒŽ‘’“”•–—˜™š›œžŸ");

function encodable(ch: string): boolean {
  const c = ch.codePointAt(0)!;
  return (c >= 0x20 && c <= 0x7e) || (c >= 0xa0 && c <= 0xff) || WIN_ANSI_EXTRA.has(ch);
}

/** The text with every character the standard fonts can draw; tabs and line breaks become spaces. */
export function pdfSafe(text: string): string {
  let out = "";
  for (const ch of text.replace(/[\t\r\n]+/g, " ").replace(/mα/g, "m-alpha")) {
    if (encodable(ch)) out += ch;
    else out += SPELT[ch] ?? "?";
  }
  return out;
}

/** Splits text into lines no wider than `width` points; a word longer than a line is cut. */
export function wrapText(text: string, font: PDFFont, size: number, width: number): string[] {
  const words = pdfSafe(text).split(/ +/).filter(Boolean);
  const lines: string[] = [];
  let line = "";
  const fits = (s: string) => font.widthOfTextAtSize(s, size) <= width;
  for (let word of words) {
    while (!fits(word)) {
      let cut = word.length - 1;
      while (cut > 1 && !fits(word.slice(0, cut))) cut--;
      if (line) {
        lines.push(line);
        line = "";
      }
      lines.push(word.slice(0, cut));
      word = word.slice(cut);
    }
    const next = line ? `${line} ${word}` : word;
    if (fits(next)) line = next;
    else {
      lines.push(line);
      line = word;
    }
  }
  if (line) lines.push(line);
  return lines.length ? lines : [""];
}

/** Fits one line into `width` points, ending it with "..." when it is too long. */
export function clipText(text: string, font: PDFFont, size: number, width: number): string {
  let s = pdfSafe(text);
  if (font.widthOfTextAtSize(s, size) <= width) return s;
  while (s.length > 1 && font.widthOfTextAtSize(`${s}...`, size) > width) s = s.slice(0, -1);
  return `${s}...`;
}
