import type { LabTestRecord } from "@/lib/materials/lab-kinds";

// A stored lab test set (db/queries/lab-tests.ts reads and writes it).

/** A stored lab test set: its input (`data`) and what was derived from it (`result`). */
export type LabTestSet = LabTestRecord & {
  id: number;
  projectId: number;
  materialId: number | null;
  name: string;
  createdAt: string;
  createdByName: string;
};
