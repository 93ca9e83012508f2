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
}

export interface RunExportRow extends RunSummary {
  reviewedByName: string | null;
  reviewedAt: string | null;
}
