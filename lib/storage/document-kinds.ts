/** What a source document is; shared by the upload form, the API and the list. */
export const DOCUMENT_KINDS = ["lab-sheet", "survey", "photo", "other"] as const;
export type DocumentKind = (typeof DOCUMENT_KINDS)[number];

export const DOCUMENT_KIND_LABELS: Record<DocumentKind, string> = {
  "lab-sheet": "Lab sheet",
  survey: "Survey file",
  photo: "Photograph",
  other: "Other",
};
