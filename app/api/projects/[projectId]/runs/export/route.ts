import { apiRoute, parseId } from "@/lib/api/handler";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";
import { runsToCsv } from "@/lib/report/runs-csv";
import { fetchRunsForExport } from "@/db/queries/runs";

type Ctx = { params: Promise<{ projectId: string }> };

/** Every run of the project as CSV, with its FS, status and who decided on it. */
export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const projectId = parseId((await params).projectId, "The project");
  const { project } = await requireProjectAccess(user, projectId, "project.view");
  const csv = runsToCsv(await fetchRunsForExport(projectId), project.name);
  return new Response(csv, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="runs-project-${projectId}.csv"`,
    },
  });
});
