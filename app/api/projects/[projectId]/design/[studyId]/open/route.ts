import { NextResponse } from "next/server";
import { z } from "zod";
import { apiRoute, parseJson } from "@/lib/api/handler";
import { notFound } from "@/lib/api/errors";
import { openPointAsRun, openPointInEditor } from "@/lib/design/open-point";
import { fetchDesignContext } from "@/lib/design/design-context";
import { requireStudy } from "@/lib/design/study-access";

type Ctx = { params: Promise<{ projectId: string; studyId: string }> };

const openSchema = z.object({
  pointId: z.string({ error: "Choose a point of the sweep." }).min(1).max(80),
  /** "run": a section and a kept run on it; "editor": the section only. */
  target: z.enum(["run", "editor"]),
});

/**
 * Opens a sweep point as an ordinary section and, for "run", a run on it that the server searches
 * and keeps as the runs route does (lib/design/open-point.ts).
 */
export const POST = apiRoute(async (request: Request, { params }: Ctx) => {
  const { study, projectId, userId } = await requireStudy(params, "design.sweep");
  const input = await parseJson(request, openSchema);
  const point = study.sweep?.points.find((p) => p.id === input.pointId);
  if (!study.sweep || !point) throw notFound("That point of the sweep");
  const { materials, required } = await fetchDesignContext(projectId);
  const open = { projectId, userId, study: { ...study, sweep: study.sweep }, point, materials, required };
  if (input.target === "editor") {
    const { sectionId, reused } = await openPointInEditor(open);
    return NextResponse.json(
      { section: { id: sectionId, reused }, location: `/projects/${projectId}/sections/${sectionId}` },
      { status: reused ? 200 : 201 },
    );
  }
  const kept = await openPointAsRun(open);
  return NextResponse.json(
    {
      run: { id: kept.id },
      section: { id: kept.sectionId },
      preview: kept.previewCheck,
      location: `/projects/${projectId}/runs/${kept.id}`,
    },
    { status: 201 },
  );
});
