"use client";

import { useDropzone } from "react-dropzone";

export interface CsvDropZoneProps {
  onText: (text: string, fileName: string) => void;
  onRejected: (message: string) => void;
  label: string;
  testId?: string;
}

/** A drop area (or click to choose) for one CSV file; hands its text to `onText`. */
export function CsvDropZone({ onText, onRejected, label, testId }: CsvDropZoneProps) {
  const { getRootProps, getInputProps, isDragActive } = useDropzone({
    multiple: false,
    maxSize: 200_000,
    accept: { "text/csv": [".csv"], "text/plain": [".txt", ".csv"] },
    onDropAccepted: async ([file]) => onText(await file.text(), file.name),
    onDropRejected: ([rejection]) =>
      onRejected(`${rejection.file.name}: ${rejection.errors.map((e) => e.message).join("; ")}`),
  });
  return (
    <div
      {...getRootProps()}
      className={`cursor-pointer rounded-lg border-2 border-dashed px-4 py-6 text-center text-sm transition-colors ${isDragActive ? "border-clay-500 bg-clay-50" : "border-rule bg-paper-raised hover:bg-paper-sunk"}`}
      data-testid={testId}
    >
      <input {...getInputProps()} />
      <p className="text-ink-soft">{isDragActive ? "Drop the file here" : label}</p>
    </div>
  );
}

/** A link that downloads `text` as a CSV file without a round trip to the server. */
export function CsvDownloadLink({
  text,
  fileName,
  children,
}: {
  text: string;
  fileName: string;
  children: React.ReactNode;
}) {
  return (
    <a className="btn-quiet" href={`data:text/csv;charset=utf-8,${encodeURIComponent(text)}`} download={fileName}>
      {children}
    </a>
  );
}
