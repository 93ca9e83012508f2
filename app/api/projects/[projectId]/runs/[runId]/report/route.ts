import { apiRoute } from "@/lib/api/handler";
import { requireUser } from "@/lib/auth/session";
import { requireRunAccess } from "@/lib/review/run-access";
import { gatherReport } from "@/lib/report/gather-report";
import { buildRunReport } from "@/lib/report/build-report";
import { reportSensitivity, sensitivityQuerySchema, variationOf } from "@/lib/sensitivity/report-study";
import { ApiError } from "@/lib/api/errors";
import type { GridSearchSuccess, Method, SectionDocument } from "@/lib/stability";

type Ctx = { params: Promise<{ projectId: string; runId: string }> };

/** The run's calculation report as a PDF, for any member of the project; `?sensitivity=10|sd` adds that section. */
export const GET = apiRoute(async (request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const { access, run } = await requireRunAccess(user, await params);
  const input = await gatherReport(run, access.project.name, user.name);
  const asked = new URL(request.url).searchParams.get("sensitivity");
  if (asked !== null) {
    const q = sensitivityQuerySchema.safeParse(asked);
    if (!q.success)
      throw new ApiError(400, "bad_query", q.error.issues[0]?.message ?? "sensitivity: give 1 to 50, or sd.");
    const result = run.result as GridSearchSuccess;
    const method = result.methods.find((m) => result.results[m]) as Method | undefined;
    if (method)
      input.sensitivity = await reportSensitivity(
        run.document as SectionDocument,
        method,
        result.results[method]!.fs,
        variationOf(q.data),
      );
  }
  const pdf = await buildRunReport(input);
  const name = `run-${run.id}-calculation-report.pdf`;
  return new Response(Buffer.from(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `inline; filename="${name}"`,
      "cache-control": "no-store",
    },
  });
});
