import { NextResponse } from "next/server";
import { apiRoute, parseJson } from "@/lib/api/handler";
import { ApiError } from "@/lib/api/errors";
import { storedSweepSchema } from "@/lib/design";
import { recomputeBrowserSweep } from "@/lib/design/keep-sweep";
import { saveDesignSweep } from "@/db/queries/design-studies";
import { fetchDesignContext } from "@/lib/design/design-context";
import { requireStudy } from "../../study-access";

type Ctx = { params: Promise<{ projectId: string; studyId: string }> };

/**
 * Keeps a sweep computed in the browser as a preview: the server runs the same sweep itself and
 * keeps its own points; `preview` in the answer says where the browser's differed.
 */
export const PUT = apiRoute(async (request: Request, { params }: Ctx) => {
  const { study, projectId } = await requireStudy(params, "design.sweep");
  const sent = await parseJson(request, storedSweepSchema);
  const context = await fetchDesignContext(projectId);
  const kept = await recomputeBrowserSweep({
    params: study.parameters,
    materials: context.materials,
    required: context.required,
    sent,
    isCancelled: () => request.signal.aborted,
  });
  if (!kept)
    throw new ApiError(409, "cancelled", "The request was closed before the sweep was checked; nothing was kept.");
  await saveDesignSweep({ projectId, studyId: study.id, sweep: kept.sweep });
  return NextResponse.json({ saved: kept.sweep.points.length, sweep: kept.sweep, preview: kept.check });
});
