import { NextResponse } from "next/server";
import { apiRoute, parseJson } from "@/lib/api/handler";
import { ApiError } from "@/lib/api/errors";
import { jobId, storedSweepSchema, verifySweepPoint } from "@/lib/design";
import { ENGINE_VERSION } from "@/lib/stability";
import { saveDesignSweep } from "@/db/queries/design-studies";
import { fetchDesignContext } from "@/lib/design/design-context";
import { requireStudy } from "../../study-access";

type Ctx = { params: Promise<{ projectId: string; studyId: string }> };

/**
 * Keeps a sweep computed in the browser. Every point must belong to this study's embankment, and
 * every FS is re-run here on the section the server generates: a mismatch stores nothing.
 */
export const PUT = apiRoute(async (request: Request, { params }: Ctx) => {
  const { study, projectId } = await requireStudy(params, "design.sweep");
  const sweep = await parseJson(request, storedSweepSchema);
  if (sweep.engineVersion !== ENGINE_VERSION) {
    throw new ApiError(
      422,
      "result_mismatch",
      `The sweep came from engine ${sweep.engineVersion}; this server runs ${ENGINE_VERSION}. Run the sweep again.`,
    );
  }
  const p = study.parameters;
  for (const [i, point] of sweep.points.entries()) {
    const otherFaceKept =
      point.phase === "recheck" ||
      (point.face === "upstream"
        ? point.downstreamRatio === p.downstreamSlope
        : point.upstreamRatio === p.upstreamSlope);
    if (point.id !== jobId(point.caseKey, point.upstreamRatio, point.downstreamRatio, point.phase) || !otherFaceKept) {
      throw new ApiError(
        422,
        "result_mismatch",
        `Point ${i + 1} (${point.id}) does not belong to this study's embankment: reload the page and run the sweep again.`,
        { [`points.${i}`]: ["Not a point of this study."] },
      );
    }
  }
  const { materials } = await fetchDesignContext(projectId);
  for (const [i, point] of sweep.points.entries()) {
    const problem = verifySweepPoint(p, materials, point, sweep.settings);
    if (problem)
      throw new ApiError(422, "result_mismatch", `${problem} Nothing was saved.`, {
        [`points.${i}.fsBishop`]: [problem],
      });
  }
  await saveDesignSweep({ projectId, studyId: study.id, sweep });
  return NextResponse.json({ saved: sweep.points.length });
});
