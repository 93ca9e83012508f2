"use client";

import { useCallback, useState } from "react";
import { useDropzone, type FileRejection } from "react-dropzone";
import { ApiClientError } from "@/lib/client/fetch-json";
import { DOCUMENT_KINDS, DOCUMENT_KIND_LABELS, type DocumentKind } from "@/lib/storage/document-kinds";
import { ALLOWED_TYPES_LABEL, dropzoneAccept } from "@/lib/storage/file-types";
import { formatBytes, MAX_UPLOAD_BYTES, MAX_UPLOAD_LABEL } from "@/lib/storage/upload-limits";
import { uploadDocument, type UploadTarget } from "./upload-document";

interface UploadOutcome {
  key: string;
  fileName: string;
  state: "uploading" | "stored" | "refused";
  message?: string;
}

export interface DocumentDropAreaProps {
  target: UploadTarget;
  /** Called after each stored file, so the list can refresh. */
  onStored: () => void;
}

/** Messages for files the drop area refuses before sending, worded like the server's. */
function describeRejection({ file, errors }: FileRejection): string {
  if (errors.some((e) => e.code === "file-too-large"))
    return `'${file.name}' is ${formatBytes(file.size)}; a document may be at most ${MAX_UPLOAD_LABEL}.`;
  if (errors.some((e) => e.code === "file-invalid-type")) return `'${file.name}' is not a ${ALLOWED_TYPES_LABEL} file.`;
  return `'${file.name}': ${errors.map((e) => e.message).join(" ")}`;
}

/** Drop (or choose) files to upload; each file is sent on its own and reports its own outcome. */
export function DocumentDropArea({ target, onStored }: DocumentDropAreaProps) {
  const [kind, setKind] = useState<DocumentKind>("lab-sheet");
  const [note, setNote] = useState("");
  const [outcomes, setOutcomes] = useState<UploadOutcome[]>([]);
  const [busy, setBusy] = useState(false);

  const update = (key: string, change: Partial<UploadOutcome>) =>
    setOutcomes((all) => all.map((o) => (o.key === key ? { ...o, ...change } : o)));

  const onDrop = useCallback(
    async (accepted: File[], rejected: FileRejection[]) => {
      const stamp = Date.now();
      const queued = accepted.map((file, i) => ({
        key: `${stamp}-${i}`,
        fileName: file.name,
        state: "uploading" as const,
      }));
      const refused = rejected.map((r, i) => ({
        key: `${stamp}-r${i}`,
        fileName: r.file.name,
        state: "refused" as const,
        message: describeRejection(r),
      }));
      setOutcomes([...queued, ...refused]);
      setBusy(true);
      // One at a time: a 20 MB file each is enough for a shared connection.
      for (const [i, file] of accepted.entries()) {
        try {
          await uploadDocument(target, file, kind, note);
          update(queued[i].key, { state: "stored" });
          onStored();
        } catch (err) {
          const message =
            err instanceof ApiClientError
              ? err.message
              : `'${file.name}' could not be sent: the server did not answer.`;
          update(queued[i].key, { state: "refused", message });
        }
      }
      setBusy(false);
    },
    [target, kind, note, onStored],
  );

  const { getRootProps, getInputProps, isDragActive } = useDropzone({
    onDrop,
    accept: dropzoneAccept(),
    maxSize: MAX_UPLOAD_BYTES,
    multiple: true,
    disabled: busy,
  });

  return (
    <div className="space-y-3" data-testid="document-upload">
      <div className="flex flex-wrap gap-3">
        <div>
          <label className="label" htmlFor="document-kind">
            Kind
          </label>
          <select
            id="document-kind"
            className="field"
            value={kind}
            onChange={(e) => setKind(e.target.value as DocumentKind)}
          >
            {DOCUMENT_KINDS.map((k) => (
              <option key={k} value={k}>
                {DOCUMENT_KIND_LABELS[k]}
              </option>
            ))}
          </select>
        </div>
        <div className="min-w-56 flex-1">
          <label className="label" htmlFor="document-note">
            Note (optional)
          </label>
          <input
            id="document-note"
            className="field"
            maxLength={500}
            value={note}
            onChange={(e) => setNote(e.target.value)}
            placeholder="e.g. borehole B-3, sample at 4.5 m"
          />
        </div>
      </div>
      <div
        {...getRootProps()}
        className={`cursor-pointer rounded-md border-2 border-dashed px-4 py-5 text-center text-sm ${isDragActive ? "border-clay-500 bg-clay-50" : "border-rule text-ink-soft"} ${busy ? "opacity-60" : ""}`}
      >
        <input {...getInputProps()} data-testid="document-input" />
        {busy
          ? "Uploading…"
          : `Drop lab sheets, survey files or photographs here, or click to choose them (${ALLOWED_TYPES_LABEL}; at most ${MAX_UPLOAD_LABEL} each).`}
      </div>
      {outcomes.length > 0 ? (
        <ul className="space-y-1 text-sm" data-testid="upload-outcomes">
          {outcomes.map((o) => (
            <li
              key={o.key}
              data-testid={`upload-${o.state}`}
              className={
                o.state === "refused" ? "text-alarm-700" : o.state === "stored" ? "text-moss-700" : "text-ink-soft"
              }
            >
              {o.state === "uploading"
                ? `Uploading '${o.fileName}'…`
                : o.state === "stored"
                  ? `'${o.fileName}' stored.`
                  : o.message}
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
