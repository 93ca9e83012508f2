import { apiRoute } from "@/lib/api/handler";
import { ApiError } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { requireRunAccess } from "@/lib/review/run-access";
import { runFs, sliceCsvFileName, sliceTableToCsv } from "@/lib/runs/view/slice-csv";
import { loadingCondition, type LoadingConditionKey } from "@/lib/analysis/required-fs";
import type { Circle, SliceRow } from "@/lib/stability";

type Ctx = { params: Promise<{ projectId: string; runId: string }> };

/** The slice table of a run's critical circle as CSV: ?method=bishop (default) or fellenius. */
export const GET = apiRoute(async (request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const { run } = await requireRunAccess(user, await params);
  const method = new URL(request.url).searchParams.get("method") ?? "bishop";
  if (method !== "bishop" && method !== "fellenius") {
    throw new ApiError(400, "invalid_input", "method must be bishop or fellenius.", {
      method: ["Use bishop or fellenius."],
    });
  }
  const table = (run.sliceTables as Partial<Record<string, { slices: SliceRow[] }>>)[method];
  if (!table)
    throw new ApiError(
      404,
      "not_found",
      `This run has no ${method === "bishop" ? "Bishop" : "ordinary-method"} slices.`,
    );
  const result = run.result as {
    methods: ("bishop" | "fellenius")[];
    results: Partial<Record<string, { circle: Circle } | null>>;
    ordinaryForm?: string;
  };
  const csv = sliceTableToCsv(table.slices, {
    method,
    title: run.title,
    section: `${run.sectionName} v${run.sectionVersion}`,
    loadCase: loadingCondition(run.loadingCondition as LoadingConditionKey)?.label ?? run.loadingCondition,
    fs: runFs(result.methods, run),
    requiredFs: run.requiredFs,
    circle: result.results[method]?.circle,
    ordinaryForm: result.ordinaryForm,
    engineVersion: run.engineVersion,
    runAt: run.createdAt,
  });
  return new Response(csv, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="${sliceCsvFileName(run.title, method)}"`,
    },
  });
});
