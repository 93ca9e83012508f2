import { describe, expect, test } from "vitest";
import { classifyUpload, dropzoneAccept, extensionOf } from "@/lib/storage/file-types";

const bytes = (...parts: (string | number[])[]) =>
  Uint8Array.from(parts.flatMap((p) => (typeof p === "string" ? [...p].map((c) => c.charCodeAt(0)) : p)));

const PDF = bytes("%PDF-1.7\n%\u00e2\u00e3\n1 0 obj");
const PNG = bytes([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]);
const JPEG = bytes([0xff, 0xd8, 0xff, 0xe0, 0, 16], "JFIF");
const WEBP = bytes("RIFF", [0x24, 0, 0, 0], "WEBPVP8 ");
const TIFF_II = bytes([0x49, 0x49, 0x2a, 0x00, 8, 0, 0, 0]);
const TIFF_MM = bytes([0x4d, 0x4d, 0x00, 0x2a, 0, 0, 0, 8]);
const CSV = bytes("chainage_m,level_m\n0,102.5\n10,103.1\n");
const PROGRAM = bytes("MZ", [0x90, 0, 3, 0, 0, 0]);

describe("classifyUpload(name, claimedType, head)", () => {
  test.each([
    ["lab sheet.pdf", "application/pdf", PDF, "pdf"],
    ["levels.csv", "text/csv", CSV, "csv"],
    ["levels.csv", "text/plain", CSV, "csv"],
    ["levels.CSV", "application/vnd.ms-excel", CSV, "csv"],
    ["levels.csv", "text/csv; charset=utf-8", CSV, "csv"],
    ["toe.png", "image/png", PNG, "png"],
    ["crest.jpg", "image/jpeg", JPEG, "jpeg"],
    ["crest.jpeg", "image/jpeg", JPEG, "jpeg"],
    ["berm.webp", "image/webp", WEBP, "webp"],
    ["scan.tif", "image/tiff", TIFF_II, "tiff"],
    ["scan.tiff", "image/tiff", TIFF_MM, "tiff"],
    // Without a useful MIME type the extension names the claim, and the content must still match.
    ["scan.tif", "application/octet-stream", TIFF_II, "tiff"],
    ["report.pdf", "", PDF, "pdf"],
  ])("accepts %s sent as '%s'", (name, type, head, id) => {
    const result = classifyUpload(name, type, head);
    expect(result.ok && result.type.id).toBe(id);
  });

  test("accepts a PDF header after stray leading bytes within the first 1024", () => {
    const head = new Uint8Array(600);
    head.fill(0x20);
    head.set(PDF, 500);
    expect(classifyUpload("mailed.pdf", "application/pdf", head).ok).toBe(true);
  });

  test.each([
    [
      "a program renamed to .pdf",
      "report.pdf",
      "application/pdf",
      PROGRAM,
      /'report.pdf' is named as PDF but its content is not PDF/,
    ],
    [
      "a program as itself",
      "tool.exe",
      "application/x-msdownload",
      PROGRAM,
      /'tool.exe' is of type application\/x-msdownload/,
    ],
    ["a program with no type", "tool.exe", "", PROGRAM, /'tool.exe' is a \.exe/],
    ["binary content named .csv", "data.csv", "text/csv", PROGRAM, /content is not CSV/],
    ["a PDF named .csv", "data.csv", "text/csv", PDF, /content is not CSV/],
    ["a PNG claimed as JPEG", "photo.jpg", "image/jpeg", PNG, /content is not JPEG/],
    ["a PDF whose name says .png", "scan.png", "application/pdf", PDF, /does not end in \.pdf/],
    ["text/plain that is not named .csv", "notes.txt", "text/plain", CSV, /of type text\/plain/],
    ["a GIF", "anim.gif", "image/gif", bytes("GIF89a"), /of type image\/gif/],
    ["a file with no extension and no type", "README", "", CSV, /file without an extension/],
    ["a truncated PNG signature", "toe.png", "image/png", PNG.subarray(0, 4), /content is not PNG/],
  ])("refuses %s, naming the file", (_what, name, type, head, message) => {
    const result = classifyUpload(name, type, head);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.message).toMatch(message);
      expect(result.message).toContain(`'${name}'`);
    }
  });
});

describe("extensionOf(name)", () => {
  test("is the lower-case last extension, empty for none or a leading dot", () => {
    expect(extensionOf("Shear Box.B3.PDF")).toBe(".pdf");
    expect(extensionOf("README")).toBe("");
    expect(extensionOf(".hidden")).toBe("");
  });
});

describe("dropzoneAccept()", () => {
  test("lists each canonical type with its extensions, and no alias that would admit .txt files", () => {
    const accept = dropzoneAccept();
    expect(accept["text/csv"]).toEqual([".csv"]);
    expect(accept["image/jpeg"]).toEqual([".jpg", ".jpeg"]);
    expect(accept["text/plain"]).toBeUndefined();
    expect(Object.keys(accept)).toHaveLength(6);
  });
});
