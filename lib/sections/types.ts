// A section and its saved versions as the pages read them (db/queries/sections.ts fills them from rows).

export interface SectionSummary {
  id: number;
  projectId: number;
  name: string;
  description: string;
  currentVersion: number;
  updatedAt: string;
  updatedByName: string;
  /** When the section was archived; null while it is in use. */
  archivedAt: string | null;
  /** Runs kept on any version of the section. */
  runCount: number;
}

export interface SectionVersionMeta {
  id: number;
  version: number;
  summary: string;
  createdAt: string;
  createdByName: string;
}

export interface SectionDetail {
  id: number;
  projectId: number;
  name: string;
  description: string;
  currentVersion: number;
  versions: SectionVersionMeta[];
}

export interface StoredVersion {
  id: number;
  sectionId: number;
  version: number;
  summary: string;
  document: unknown;
  createdAt: string;
  createdByName: string;
}
