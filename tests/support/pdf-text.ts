import path from "node:path";
import { getDocument } from "pdfjs-dist/legacy/build/pdf.mjs";

/** The text of each page of a PDF, runs of white space collapsed (read with pdf.js). */
export async function pdfPages(bytes: ArrayBuffer | Uint8Array): Promise<string[]> {
  const doc = await getDocument({
    // A copy: pdf.js takes the buffer it is given, and the caller may read the same bytes again.
    data: new Uint8Array(bytes).slice(),
    isEvalSupported: false,
    standardFontDataUrl: path.resolve("node_modules/pdfjs-dist/standard_fonts") + "/",
  }).promise;
  const pages: string[] = [];
  for (let i = 1; i <= doc.numPages; i++) {
    const content = await (await doc.getPage(i)).getTextContent();
    pages.push(
      content.items
        .map((it) => ("str" in it ? it.str : ""))
        .join(" ")
        .replace(/\s+/g, " "),
    );
  }
  await doc.destroy();
  return pages;
}

/** The text of a PDF, page by page, with runs of white space collapsed (read with pdf.js). */
export async function pdfText(bytes: ArrayBuffer | Uint8Array): Promise<string> {
  return (await pdfPages(bytes)).join(" \n").replace(/\s+/g, " ");
}
