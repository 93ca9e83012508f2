import { apiRoute } from "@/lib/api/handler";
import { requireUser } from "@/lib/auth/session";
import { requireRunAccess } from "@/lib/review/run-access";
import { gatherReport } from "@/lib/report/gather-report";
import { buildRunReport } from "@/lib/report/build-report";

type Ctx = { params: Promise<{ projectId: string; runId: string }> };

/** The run's calculation report as a PDF, for any member of the project. */
export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const { access, run } = await requireRunAccess(user, await params);
  const pdf = await buildRunReport(await gatherReport(run, access.project.name, user.name));
  const name = `run-${run.id}-calculation-report.pdf`;
  return new Response(Buffer.from(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `inline; filename="${name}"`,
      "cache-control": "no-store",
    },
  });
});
