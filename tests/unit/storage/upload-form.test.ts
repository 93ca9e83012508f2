import { describe, expect, test } from "vitest";
import { ApiError } from "@/lib/api/errors";
import { readUploadForm } from "@/lib/storage/upload-form";
import { formatBytes, MAX_UPLOAD_BYTES } from "@/lib/storage/upload-limits";

const URL_ = "http://127.0.0.1/api/projects/1/documents";

function formRequest(
  fields: Record<string, string>,
  file?: { bytes: Uint8Array; name: string; type: string },
): Request {
  const form = new FormData();
  if (file) form.append("file", new Blob([file.bytes.slice()], { type: file.type }), file.name);
  for (const [k, v] of Object.entries(fields)) form.append(k, v);
  return new Request(URL_, { method: "POST", body: form });
}

async function refusal(request: Request): Promise<ApiError> {
  const err = await readUploadForm(request).then(
    () => null,
    (e: unknown) => e,
  );
  expect(err).toBeInstanceOf(ApiError);
  return err as ApiError;
}

const csv = { bytes: new TextEncoder().encode("a,b\n1,2\n"), name: "levels.csv", type: "text/csv" };

describe("readUploadForm(request)", () => {
  test("returns the file's bytes and the parsed fields", async () => {
    const { file, fields } = await readUploadForm(
      formRequest({ kind: "survey", sectionId: "12", note: "  crest  " }, csv),
    );
    expect(file).toEqual({ name: "levels.csv", claimedType: "text/csv", bytes: csv.bytes });
    expect(fields).toEqual({ kind: "survey", sectionId: 12, materialId: undefined, note: "crest" });
  });

  test("treats empty id fields as absent", async () => {
    const { fields } = await readUploadForm(formRequest({ kind: "photo", sectionId: "", materialId: "" }, csv));
    expect(fields.sectionId).toBeUndefined();
    expect(fields.materialId).toBeUndefined();
  });

  test("refuses a body that is not multipart", async () => {
    const err = await refusal(
      new Request(URL_, { method: "POST", body: "{}", headers: { "content-type": "application/json" } }),
    );
    expect([err.status, err.code]).toEqual([400, "invalid_upload"]);
  });

  test("refuses a missing file, two files, and an empty file with the field named", async () => {
    expect((await refusal(formRequest({ kind: "other" }))).fields?.file).toEqual([
      "Choose a file to upload: the 'file' field is missing.",
    ]);
    const two = new FormData();
    two.append("file", new Blob([csv.bytes]), "a.csv");
    two.append("file", new Blob([csv.bytes]), "b.csv");
    two.append("kind", "other");
    expect((await refusal(new Request(URL_, { method: "POST", body: two }))).message).toMatch(/one file per upload/);
    const empty = await refusal(formRequest({ kind: "other" }, { ...csv, bytes: new Uint8Array(0) }));
    expect(empty.message).toBe("'levels.csv' is empty (0 bytes).");
  });

  test("refuses bad fields with each field's message", async () => {
    const err = await refusal(formRequest({ kind: "drawing", sectionId: "0", materialId: "x" }, csv));
    expect(err.status).toBe(400);
    expect(err.message).toContain("'levels.csv'");
    expect(Object.keys(err.fields ?? {}).sort()).toEqual(["kind", "materialId", "sectionId"]);
    expect(err.fields?.kind).toEqual([expect.stringMatching(/^Choose what the document is: /)]);
    expect(err.fields?.sectionId).toEqual(["sectionId must be a positive whole number."]);
    expect(err.fields?.materialId).toEqual(["materialId must be a positive whole number."]);
  });

  test("refuses a file one byte over 20 MB with 413, naming it and the limit", async () => {
    const err = await refusal(
      formRequest(
        { kind: "other" },
        { bytes: new Uint8Array(MAX_UPLOAD_BYTES + 1), name: "scan.pdf", type: "application/pdf" },
      ),
    );
    expect(err.status).toBe(413);
    expect(err.message).toBe(`'scan.pdf' is ${formatBytes(MAX_UPLOAD_BYTES + 1)}; a document may be at most 20 MB.`);
  });

  test("stops reading a streamed body without Content-Length once it passes the cap (413)", async () => {
    let sent = 0;
    const chunk = new Uint8Array(1024 * 1024);
    const endless = new ReadableStream<Uint8Array>({
      pull(controller) {
        sent += chunk.byteLength;
        controller.enqueue(chunk);
      },
    });
    const request = new Request(URL_, {
      method: "POST",
      body: endless,
      headers: { "content-type": "multipart/form-data; boundary=xyz" },
      duplex: "half",
    } as RequestInit & { duplex: "half" });
    const err = await refusal(request);
    expect(err.status).toBe(413);
    expect(sent).toBeLessThan(MAX_UPLOAD_BYTES + 4 * 1024 * 1024);
  });
});

describe("formatBytes(bytes)", () => {
  test("uses B, KB and MB with one decimal", () => {
    expect(formatBytes(512)).toBe("512 B");
    expect(formatBytes(14_540)).toBe("14.2 KB");
    expect(formatBytes(MAX_UPLOAD_BYTES)).toBe("20.0 MB");
    expect(() => formatBytes(-1)).toThrow(/non-negative/);
  });
});
