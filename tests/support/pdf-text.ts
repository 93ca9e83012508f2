import path from "node:path";
import { getDocument } from "pdfjs-dist/legacy/build/pdf.mjs";

/** The text of a PDF, page by page, with runs of white space collapsed (read with pdf.js). */
export async function pdfText(bytes: ArrayBuffer): Promise<string> {
  const doc = await getDocument({
    data: new Uint8Array(bytes),
    isEvalSupported: false,
    standardFontDataUrl: path.resolve("node_modules/pdfjs-dist/standard_fonts") + "/",
  }).promise;
  let text = "";
  for (let i = 1; i <= doc.numPages; i++) {
    const content = await (await doc.getPage(i)).getTextContent();
    text += content.items.map((it) => ("str" in it ? it.str : "")).join(" ") + "\n";
  }
  await doc.destroy();
  return text.replace(/\s+/g, " ");
}
