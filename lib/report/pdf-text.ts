/**
 * Text for the report's embedded font (DejaVu Sans Condensed, lib/report/fonts): it draws Greek
 * letters, primes and the usual symbols, so they are kept as written. A character the font lacks
 * is spelt out where there is a plain-text form, or becomes "?", never a blank box.
 */
import type { PDFFont } from "pdf-lib";

const SPELT: Record<string, string> = {
  "✓": "ok",
  "✕": "x",
};

const charsets = new WeakMap<PDFFont, Set<number>>();

function charsetOf(font: PDFFont): Set<number> {
  let set = charsets.get(font);
  if (!set) {
    set = new Set(font.getCharacterSet());
    charsets.set(font, set);
  }
  return set;
}

/** The text with every character `font` can draw; tabs and line breaks become spaces. */
export function pdfSafe(text: string, font: PDFFont): string {
  const set = charsetOf(font);
  let out = "";
  for (const ch of text.replace(/[\t\r\n]+/g, " ")) {
    if (set.has(ch.codePointAt(0)!)) out += ch;
    else out += SPELT[ch] ?? "?";
  }
  return out;
}

/** Splits text into lines no wider than `width` points; a word longer than a line is cut. */
export function wrapText(text: string, font: PDFFont, size: number, width: number): string[] {
  const words = pdfSafe(text, font).split(/ +/).filter(Boolean);
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

/** Fits one line into `width` points, ending it with "…" when it is too long. */
export function clipText(text: string, font: PDFFont, size: number, width: number): string {
  let s = pdfSafe(text, font);
  if (font.widthOfTextAtSize(s, size) <= width) return s;
  while (s.length > 1 && font.widthOfTextAtSize(`${s}…`, size) > width) s = s.slice(0, -1);
  return `${s}…`;
}
