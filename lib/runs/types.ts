// A stored run as the pages, the review and the exports read it (db/queries/runs.ts fills it from rows).

export interface RunSummary {
  id: number;
  projectId: number;
  sectionId: number;
  sectionName: string;
  sectionVersion: number;
  title: string;
  status: "draft" | "submitted" | "returned" | "approved";
  loadCase: "steady" | "drawdown" | "undrained";
  face: "upstream" | "downstream";
  methods: string[];
  requiredFs: number;
  fsBishop: number | null;
  fsFellenius: number | null;
  authorId: number;
  authorName: string;
  createdAt: string;
  revisesRunId: number | null;
  loadingCondition: string;
  /** The section's water condition the run analysed; null for runs kept before named conditions. */
  waterCondition: { id: string; name: string } | null;
  /** Set when the run was signed off below its required FS: the reviewer's reason. */
  belowRequiredReason: string | null;
}

export interface RunDetail extends RunSummary {
  engineVersion: string;
  document: unknown;
  result: unknown;
  sliceTables: unknown;
}

export interface ChainLink {
  id: number;
  title: string;
  status: RunSummary["status"];
  createdAt: string;
  /** Signed off below the required FS. */
  belowRequired: boolean;
}

export interface RunExportRow extends RunSummary {
  reviewedByName: string | null;
  reviewedAt: string | null;
}
