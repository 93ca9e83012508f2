import { apiRoute, parseId } from "@/lib/api/handler";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";
import { libraryToCsv } from "@/lib/materials/engine-material";
import { fetchMaterialsOfProject } from "@/db/queries/materials";

type Ctx = { params: Promise<{ projectId: string }> };

/** The library as a materials CSV, in the format the import reads. */
export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const projectId = parseId((await params).projectId, "The project");
  await requireProjectAccess(user, projectId, "project.view");
  const csv = libraryToCsv(await fetchMaterialsOfProject(projectId));
  return new Response(csv, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="materials-project-${projectId}.csv"`,
    },
  });
});
