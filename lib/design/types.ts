import type { EmbankmentParams } from "./parameters";
import type { StoredSweep } from "./sweep-results";

// A design study as the pages read it (db/queries/design-studies.ts fills it from rows).

export interface DesignStudySummary {
  id: number;
  projectId: number;
  name: string;
  createdByName: string;
  createdAt: string;
  updatedAt: string;
  hasSweep: boolean;
}

export interface DesignStudy extends DesignStudySummary {
  parameters: EmbankmentParams;
  sweep: StoredSweep | null;
}
