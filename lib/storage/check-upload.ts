import "server-only";
import { materialBelongsToProject, sectionBelongsToProject } from "@/db/queries/documents";
import { ApiError } from "@/lib/api/errors";
import { classifyUpload, SNIFF_BYTES, type FileTypeSpec } from "./file-types";
import type { UploadedFile, UploadFields } from "./upload-form";

/** The allowed type the file really is; a 415 naming the file otherwise. */
export function requireAllowedType(file: UploadedFile): FileTypeSpec {
  const result = classifyUpload(file.name, file.claimedType, file.bytes.subarray(0, SNIFF_BYTES));
  if (!result.ok) throw new ApiError(415, "unsupported_file_type", result.message, { file: [result.message] });
  return result.type;
}

/** The section or material a document is attached to must be one of this project's (400 otherwise). */
export async function requireAttachTargets(projectId: number, fields: UploadFields, fileName: string): Promise<void> {
  if (fields.sectionId !== undefined && !(await sectionBelongsToProject(projectId, fields.sectionId))) {
    const message = `Section ${fields.sectionId} is not part of this project; '${fileName}' was not stored.`;
    throw new ApiError(400, "invalid_input", message, { sectionId: [message] });
  }
  if (fields.materialId !== undefined && !(await materialBelongsToProject(projectId, fields.materialId))) {
    const message = `Material ${fields.materialId} is not part of this project; '${fileName}' was not stored.`;
    throw new ApiError(400, "invalid_input", message, { materialId: [message] });
  }
}
