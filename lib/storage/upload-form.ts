import "server-only";
import { z } from "zod";
import { ApiError } from "@/lib/api/errors";
import { fieldErrors } from "@/lib/api/handler";
import { cleanFileName } from "./content-disposition";
import { DOCUMENT_KINDS } from "./document-kinds";
import { formatBytes, MAX_UPLOAD_BYTES, MAX_UPLOAD_LABEL, MULTIPART_OVERHEAD_BYTES } from "./upload-limits";

/**
 * A form field holding an id: absent or "" means none. "" is dropped before the check rather than
 * offered as a union branch, so a bad id answers with this message and not zod's bare "Invalid input".
 */
const optionalId = (what: string) =>
  z.preprocess(
    (v) => (v === "" ? undefined : v),
    z
      .string()
      .regex(/^[1-9]\d{0,9}$/, `${what} must be a positive whole number.`)
      .transform(Number)
      .optional(),
  );

/** The text fields sent beside the file. */
export const uploadFieldsSchema = z
  .object({
    kind: z.enum(DOCUMENT_KINDS, { error: `Choose what the document is: ${DOCUMENT_KINDS.join(", ")}.` }),
    sectionId: optionalId("sectionId"),
    materialId: optionalId("materialId"),
    note: z.string().trim().max(500, "Keep the note to 500 characters.").optional().default(""),
  })
  .refine((v) => v.sectionId === undefined || v.materialId === undefined, {
    path: ["materialId"],
    message: "Attach the document to a section or to a material, not both.",
  });

export type UploadFields = z.infer<typeof uploadFieldsSchema>;

export interface UploadedFile {
  name: string;
  claimedType: string;
  bytes: Uint8Array;
}

const MAX_NAME_LENGTH = 255;
const BODY_CAP = MAX_UPLOAD_BYTES + MULTIPART_OVERHEAD_BYTES;

const badForm = (message: string, field = "file") =>
  new ApiError(400, "invalid_upload", message, { [field]: [message] });

function tooLarge(name: string | null, bytes: number | null): ApiError {
  const what = name ? `'${name}'` : "The upload";
  const size = bytes === null ? "larger than that" : formatBytes(bytes);
  const message = `${what} is ${size}; a document may be at most ${MAX_UPLOAD_LABEL}.`;
  return new ApiError(413, "file_too_large", message, { file: [message] });
}

/** Parses the multipart body, giving up as soon as more bytes arrive than one allowed file needs. */
async function readCappedForm(request: Request, contentType: string): Promise<FormData> {
  const declared = Number(request.headers.get("content-length") ?? NaN);
  if (declared > BODY_CAP) throw tooLarge(null, declared);
  if (!request.body) throw badForm("The upload is empty: send the document in a 'file' field.");
  let seen = 0;
  const counted = request.body.pipeThrough(
    new TransformStream<Uint8Array, Uint8Array>({
      transform(chunk, controller) {
        seen += chunk.byteLength;
        // A body without (or with a false) Content-Length must not fill the server's memory.
        if (seen > BODY_CAP) controller.error(new Error("upload over the size cap"));
        else controller.enqueue(chunk);
      },
    }),
  );
  const init: RequestInit & { duplex: "half" } = {
    method: "POST",
    headers: { "content-type": contentType },
    body: counted,
    duplex: "half",
  };
  try {
    return await new Request(request.url, init).formData();
  } catch {
    if (seen > BODY_CAP) throw tooLarge(null, null);
    throw badForm("The upload could not be read: send it as multipart/form-data with a 'file' field.");
  }
}

/**
 * Reads an upload request: exactly one file (not empty, at most 20 MB) and valid fields.
 * Every refusal names the file where it is known, and nothing has been stored yet.
 */
export async function readUploadForm(request: Request): Promise<{ file: UploadedFile; fields: UploadFields }> {
  const contentType = request.headers.get("content-type") ?? "";
  if (!contentType.toLowerCase().startsWith("multipart/form-data")) {
    throw badForm("Send the document as multipart/form-data with a 'file' field.");
  }
  const form = await readCappedForm(request, contentType);
  const files = form.getAll("file");
  if (files.length === 0) throw badForm("Choose a file to upload: the 'file' field is missing.");
  if (files.length > 1) throw badForm("Send one file per upload.");
  const entry = files[0];
  if (typeof entry === "string") throw badForm("The 'file' field must carry a file, not text.");

  const name = cleanFileName(entry.name);
  if (!name) throw badForm("The file has no usable name.");
  if (name.length > MAX_NAME_LENGTH)
    throw badForm(`The file name '${name.slice(0, 40)}…' is longer than ${MAX_NAME_LENGTH} characters.`);
  if (entry.size > MAX_UPLOAD_BYTES) throw tooLarge(name, entry.size);
  if (entry.size === 0) throw badForm(`'${name}' is empty (0 bytes).`);

  const parsed = uploadFieldsSchema.safeParse({
    kind: form.get("kind") ?? undefined,
    sectionId: form.get("sectionId") ?? undefined,
    materialId: form.get("materialId") ?? undefined,
    note: form.get("note") ?? undefined,
  });
  if (!parsed.success) {
    throw new ApiError(
      400,
      "invalid_input",
      `'${name}' was not stored: some fields are not valid.`,
      fieldErrors(parsed.error),
    );
  }
  return {
    file: { name, claimedType: entry.type, bytes: new Uint8Array(await entry.arrayBuffer()) },
    fields: parsed.data,
  };
}
