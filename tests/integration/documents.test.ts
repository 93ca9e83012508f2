import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { createHash } from "node:crypto";
import { HeadObjectCommand, ListObjectsV2Command, S3Client } from "@aws-sdk/client-s3";
import { AppClient, signedIn } from "../support/http";
import { getDb } from "@/db/index";
import { readS3Settings } from "@/lib/storage/s3-config";
import { storeDocument } from "@/lib/storage/store-document";
import { FILE_TYPES } from "@/lib/storage/file-types";

// ---- Files built here, byte by byte -------------------------------------------

/** A one-page PDF with a correct cross-reference table. */
function minimalPdf(): Uint8Array {
  const objects = [
    "<< /Type /Catalog /Pages 2 0 R >>",
    "<< /Type /Pages /Kids [3 0 R] /Count 1 >>",
    "<< /Type /Page /Parent 2 0 R /MediaBox [0 0 200 200] >>",
  ];
  let text = "%PDF-1.4\n";
  const offsets: number[] = [];
  objects.forEach((body, i) => {
    offsets.push(text.length);
    text += `${i + 1} 0 obj\n${body}\nendobj\n`;
  });
  const xref = text.length;
  text += `xref\n0 ${objects.length + 1}\n0000000000 65535 f \n`;
  for (const o of offsets) text += `${String(o).padStart(10, "0")} 00000 n \n`;
  text += `trailer\n<< /Size ${objects.length + 1} /Root 1 0 R >>\nstartxref\n${xref}\n%%EOF\n`;
  return new TextEncoder().encode(text);
}

/** A 1×1 PNG. */
const PNG_1PX = Uint8Array.from(
  Buffer.from(
    "iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==",
    "base64",
  ),
);
const CSV = new TextEncoder().encode("depth_m,moisture_pct,dry_density_kN_m3\n0.5,18.2,16.9\n1.0,19.4,16.6\n");
/** The start of a Windows program: "MZ" then NUL-padded header fields. */
const PROGRAM = Uint8Array.from([
  0x4d, 0x5a, 0x90, 0x00, 0x03, 0x00, 0x00, 0x00, 0x04, 0x00, 0x00, 0x00, 0xff, 0xff, 0x00, 0x00,
]);

// ---- Helpers --------------------------------------------------------------------

function form(
  bytes: Uint8Array,
  name: string,
  type: string,
  fields: Record<string, string> = { kind: "other" },
): FormData {
  const data = new FormData();
  data.append("file", new Blob([bytes.slice()], { type }), name);
  for (const [k, v] of Object.entries(fields)) data.append(k, v);
  return data;
}

async function upload(client: AppClient, projectId: number, body: FormData) {
  const res = await client.request(`/api/projects/${projectId}/documents`, { method: "POST", body });
  return { status: res.status, body: await res.json() };
}

const settings = readS3Settings();
const s3 = new S3Client({
  endpoint: settings.S3_ENDPOINT,
  region: settings.S3_REGION,
  forcePathStyle: true,
  credentials: { accessKeyId: settings.S3_ACCESS_KEY_ID, secretAccessKey: settings.S3_SECRET_ACCESS_KEY },
});

async function objectKeys(projectId: number): Promise<string[]> {
  const out = await s3.send(new ListObjectsV2Command({ Bucket: settings.S3_BUCKET, Prefix: `projects/${projectId}/` }));
  return (out.Contents ?? []).map((o) => o.Key!).sort();
}

async function objectExists(key: string): Promise<boolean> {
  try {
    await s3.send(new HeadObjectCommand({ Bucket: settings.S3_BUCKET, Key: key }));
    return true;
  } catch {
    return false;
  }
}

async function rowCount(projectId: number): Promise<number> {
  const row = await getDb()("documents").where({ project_id: projectId }).count({ n: "*" }).first();
  return Number(row?.n);
}

/** Runs `attempt` and checks it left neither a row nor an object behind. */
async function expectNothingStored(projectId: number, attempt: () => Promise<void>): Promise<void> {
  const [rowsBefore, keysBefore] = [await rowCount(projectId), await objectKeys(projectId)];
  await attempt();
  expect(await rowCount(projectId)).toBe(rowsBefore);
  expect(await objectKeys(projectId)).toEqual(keysBefore);
}

// ---- Tests ----------------------------------------------------------------------

let engineer: AppClient;
let designer: AppClient;
let reviewer: AppClient;
let admin: AppClient;
let projectId: number;
let engineerId: number;

beforeAll(async () => {
  // The stack passes the run's own fake S3 to the app; this file must look into the same bucket.
  expect(settings.S3_BUCKET).toMatch(/^scarpline-test-/);
  [engineer, designer, reviewer, admin] = await Promise.all(
    ["engineer", "designer", "reviewer", "admin"].map((r) => signedIn(`${r}@scarpline.test`)),
  );
  const { projects } = await (await engineer.request("/api/projects")).json();
  projectId = projects[0].id;
  engineerId = (await getDb()("users").where({ email: "engineer@scarpline.test" }).first()).id;
});

afterAll(() => s3.destroy());

describe("POST then GET /api/projects/:id/documents", () => {
  test("a PDF, a CSV sent as text/plain and a PNG are stored, listed and downloaded byte for byte", async () => {
    const files = [
      {
        bytes: minimalPdf(),
        name: "shear box B-3 4.5 m.pdf",
        type: "application/pdf",
        kind: "lab-sheet",
        stored: "application/pdf",
      },
      { bytes: CSV, name: "crest levels.csv", type: "text/plain", kind: "survey", stored: "text/csv" },
      { bytes: PNG_1PX, name: "toe seepage.png", type: "image/png", kind: "photo", stored: "image/png" },
    ];
    const ids: number[] = [];
    for (const f of files) {
      const { status, body } = await upload(
        engineer,
        projectId,
        form(f.bytes, f.name, f.type, { kind: f.kind, note: "from the field book" }),
      );
      expect(status, JSON.stringify(body)).toBe(201);
      expect(body.document).toMatchObject({
        originalName: f.name,
        kind: f.kind,
        contentType: f.stored,
        sizeBytes: f.bytes.byteLength,
        sha256: createHash("sha256").update(f.bytes).digest("hex"),
        uploadedBy: engineerId,
        uploadedByName: "Demo Engineer",
        sectionId: null,
        materialId: null,
        note: "from the field book",
      });
      expect(body.document.storageKey).toBeUndefined();
      ids.push(body.document.id);
    }

    const list = await (await reviewer.request(`/api/projects/${projectId}/documents`)).json();
    expect(list.documents.map((d: { id: number }) => d.id)).toEqual(expect.arrayContaining(ids));

    // The project's documents page lists them too (rendered on the server).
    const page = await engineer.request(`/projects/${projectId}/documents`);
    expect(page.status).toBe(200);
    const html = await page.text();
    for (const f of files) expect(html).toContain(f.name);

    for (const [i, f] of files.entries()) {
      // Any member may download, here the reviewer who did not upload.
      const res = await reviewer.request(`/api/projects/${projectId}/documents/${ids[i]}`);
      expect(res.status).toBe(200);
      expect(res.headers.get("content-type")).toBe(f.stored);
      expect(res.headers.get("content-disposition")).toContain(`filename*=UTF-8''${encodeURIComponent(f.name)}`);
      expect(res.headers.get("content-disposition")).toMatch(/^attachment;/);
      expect(new Uint8Array(await res.arrayBuffer())).toEqual(f.bytes);
    }
  });

  test("a document attached to a material is listed under ?materialId= and only there", async () => {
    const [materialId] = await getDb()("materials").insert({
      project_id: projectId,
      key: `docs-clay-${Date.now()}`,
      name: "Docs test clay core",
      color: "#8a6d4b",
      parameters: "{}",
      sources: "{}",
      notes: "",
      updated_by: engineerId,
    });
    const { status, body } = await upload(
      designer,
      projectId,
      form(CSV, "atterberg limits.csv", "text/csv", { kind: "lab-sheet", materialId: String(materialId) }),
    );
    expect(status, JSON.stringify(body)).toBe(201);
    expect(body.document.materialId).toBe(materialId);
    const mine = await (await engineer.request(`/api/projects/${projectId}/documents?materialId=${materialId}`)).json();
    expect(mine.documents.map((d: { id: number }) => d.id)).toEqual([body.document.id]);
    expect(mine.documents[0].materialName).toBe("Docs test clay core");
    const bad = await engineer.request(`/api/projects/${projectId}/documents?sectionId=abc`);
    expect(bad.status).toBe(400);
    expect((await bad.json()).error.fields.sectionId).toEqual(["sectionId must be a positive whole number."]);
  });
});

describe("uploads that are refused leave nothing behind", () => {
  test("a file over 20 MB is 413, naming the file and the limit", async () => {
    const big = new Uint8Array(20 * 1024 * 1024 + 1);
    big.set(new TextEncoder().encode("%PDF-1.4\n"));
    await expectNothingStored(projectId, async () => {
      const { status, body } = await upload(engineer, projectId, form(big, "full survey scan.pdf", "application/pdf"));
      expect(status).toBe(413);
      expect(body.error.code).toBe("file_too_large");
      expect(body.error.message).toContain("'full survey scan.pdf'");
      expect(body.error.message).toContain("20 MB");
    });
  });

  test("a body far over the limit is 413 before it is read", async () => {
    await expectNothingStored(projectId, async () => {
      const { status, body } = await upload(
        engineer,
        projectId,
        form(new Uint8Array(26 * 1024 * 1024), "huge.pdf", "application/pdf"),
      );
      expect(status).toBe(413);
      expect(body.error.message).toContain("20 MB");
    });
  });

  test.each([
    { what: "a program renamed to .pdf", bytes: PROGRAM, name: "report.pdf", type: "application/pdf" },
    { what: "a program sent as a program", bytes: PROGRAM, name: "tool.exe", type: "application/x-msdownload" },
    { what: "binary content named .csv", bytes: PROGRAM, name: "levels.csv", type: "text/csv" },
    { what: "a PNG sent as JPEG", bytes: PNG_1PX, name: "photo.jpg", type: "image/jpeg" },
    { what: "a PDF whose name says .png", bytes: minimalPdf(), name: "scan.png", type: "application/pdf" },
    { what: "a text file", bytes: CSV, name: "notes.txt", type: "text/plain" },
  ])("$what is 415, naming the file", async ({ bytes, name, type }) => {
    await expectNothingStored(projectId, async () => {
      const { status, body } = await upload(engineer, projectId, form(bytes, name, type));
      expect(status).toBe(415);
      expect(body.error.code).toBe("unsupported_file_type");
      expect(body.error.message).toContain(`'${name}'`);
    });
  });

  test("bad fields, an empty file and a material of another project are 400 with the field named", async () => {
    const other = await admin.request("/api/projects", {
      method: "POST",
      json: { name: `Docs side project ${Date.now()}`, description: "Another cut slope." },
    });
    const otherId = (await other.json()).project.id;
    const [foreignMaterial] = await getDb()("materials").insert({
      project_id: otherId,
      key: "foreign-sand",
      name: "Foreign sand",
      color: "#c8b27a",
      parameters: "{}",
      sources: "{}",
      notes: "",
      updated_by: engineerId,
    });
    const cases: { body: FormData; field: string; message: RegExp }[] = [
      {
        body: form(CSV, "a.csv", "text/csv", { kind: "drawing" }),
        field: "kind",
        message: /^Choose what the document is/,
      },
      {
        body: form(CSV, "a.csv", "text/csv", { kind: "survey", sectionId: "-4" }),
        field: "sectionId",
        message: /^sectionId must be a positive whole number\.$/,
      },
      {
        body: form(CSV, "a.csv", "text/csv", { kind: "survey", sectionId: "1", materialId: "1" }),
        field: "materialId",
        message: /^Attach the document to a section or to a material, not both\.$/,
      },
      {
        body: form(new Uint8Array(0), "empty.csv", "text/csv", { kind: "survey" }),
        field: "file",
        message: /^'empty\.csv' is empty \(0 bytes\)\.$/,
      },
      {
        body: form(CSV, "a.csv", "text/csv", { kind: "lab-sheet", materialId: String(foreignMaterial) }),
        field: "materialId",
        message: /^Material \d+ is not part of this project; 'a\.csv' was not stored\.$/,
      },
      {
        body: form(CSV, "a.csv", "text/csv", { kind: "survey", sectionId: "987654" }),
        field: "sectionId",
        message: /^Section 987654 is not part of this project; 'a\.csv' was not stored\.$/,
      },
    ];
    await expectNothingStored(projectId, async () => {
      for (const c of cases) {
        const { status, body } = await upload(engineer, projectId, c.body);
        expect(status, JSON.stringify(body)).toBe(400);
        expect(body.error.fields[c.field], JSON.stringify(body)).toEqual([expect.stringMatching(c.message)]);
      }
      const notMultipart = await engineer.request(`/api/projects/${projectId}/documents`, {
        method: "POST",
        json: { kind: "other" },
      });
      expect(notMultipart.status).toBe(400);
    });
  });

  test("storeDocument() removes the object again when the row cannot be written", async () => {
    const pdf = minimalPdf();
    const pdfType = FILE_TYPES.find((t) => t.id === "pdf")!;
    await expectNothingStored(projectId, async () => {
      // A section id that does not exist fails the foreign key after the object was written.
      await expect(
        storeDocument({
          projectId,
          userId: engineerId,
          file: { name: "orphan.pdf", claimedType: "application/pdf", bytes: pdf },
          type: pdfType,
          fields: { kind: "other", sectionId: 987654, note: "" },
        }),
      ).rejects.toThrow();
    });
  });
});

describe("DELETE /api/projects/:id/documents/:documentId and access", () => {
  test("a designer may not delete an engineer's document (403); the uploader may (204) and the object is gone", async () => {
    const { body } = await upload(
      engineer,
      projectId,
      form(minimalPdf(), "triaxial CU set 2.pdf", "application/pdf", { kind: "lab-sheet" }),
    );
    const id = body.document.id;
    const key = (await getDb()("documents").where({ id }).first()).storage_key;
    expect(await objectExists(key)).toBe(true);

    const refused = await designer.request(`/api/projects/${projectId}/documents/${id}`, { method: "DELETE" });
    expect(refused.status).toBe(403);
    expect((await refused.json()).error.code).toBe("forbidden");
    expect(await objectExists(key)).toBe(true);

    const done = await engineer.request(`/api/projects/${projectId}/documents/${id}`, { method: "DELETE" });
    expect(done.status).toBe(204);
    expect(await getDb()("documents").where({ id }).first()).toBeUndefined();
    expect(await objectExists(key)).toBe(false);
    expect((await engineer.request(`/api/projects/${projectId}/documents/${id}`)).status).toBe(404);
  });

  test("an administrator may delete anyone's document", async () => {
    const { body } = await upload(
      designer,
      projectId,
      form(PNG_1PX, "spillway crack.png", "image/png", { kind: "photo" }),
    );
    const res = await admin.request(`/api/projects/${projectId}/documents/${body.document.id}`, { method: "DELETE" });
    expect(res.status).toBe(204);
  });

  test("without a session the list is 401", async () => {
    const res = await new AppClient().request(`/api/projects/${projectId}/documents`);
    expect(res.status).toBe(401);
    expect((await res.json()).error.code).toBe("unauthorized");
  });

  test("someone outside the project gets 404 for the list, an upload and a download", async () => {
    const created = await admin.request("/api/projects", {
      method: "POST",
      json: { name: `Docs closed project ${Date.now()}`, description: "Nobody else is a member." },
    });
    const closedId = (await created.json()).project.id;
    const { status, body } = await upload(admin, closedId, form(CSV, "a.csv", "text/csv"));
    // Administrators see every project but do not upload (the permission matrix).
    expect(status).toBe(403);
    expect(body.error.code).toBe("forbidden");
    const [docId] = await getDb()("documents").insert({
      project_id: closedId,
      kind: "other",
      original_name: "x.csv",
      content_type: "text/csv",
      size_bytes: 3,
      storage_key: `projects/${closedId}/documents/not-stored`,
      sha256: "0".repeat(64),
      uploaded_by: engineerId,
    });
    for (const res of [
      await engineer.request(`/api/projects/${closedId}/documents`),
      await engineer.request(`/api/projects/${closedId}/documents/${docId}`),
      await engineer.request(`/api/projects/${closedId}/documents/${docId}`, { method: "DELETE" }),
      await engineer.request(`/api/projects/${closedId}/documents`, {
        method: "POST",
        body: form(CSV, "a.csv", "text/csv"),
      }),
    ]) {
      expect(res.status).toBe(404);
      expect((await res.json()).error.code).toBe("not_found");
    }
  });
});
