import { NextResponse } from "next/server";
import { apiRoute, parseId, parseJson } from "@/lib/api/handler";
import { ApiError, notFound } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";
import { createRunSchema } from "@/lib/validations/run";
import { documentForRun, UnknownWaterConditionError, waterConditionForRun } from "@/lib/analysis/run-setup";
import { loadingCondition } from "@/lib/analysis/required-fs";
import { verifyCriticalCircles } from "@/lib/run-records/verify";
import { ENGINE_VERSION, validateSection, type SectionDocument } from "@/lib/stability";
import { fetchSection, fetchSectionVersion } from "@/db/queries/sections";
import { createRun, fetchRunsOfProject } from "@/db/queries/runs";

type Ctx = { params: Promise<{ projectId: string }> };

export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const projectId = parseId((await params).projectId, "The project");
  await requireProjectAccess(user, projectId, "project.view");
  return NextResponse.json({ runs: await fetchRunsOfProject(projectId) });
});

/**
 * Saves a run computed in the browser. The server rebuilds the analysed document from the stored
 * section version, re-runs each critical circle and refuses a result whose FS does not match.
 */
export const POST = apiRoute(async (request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const projectId = parseId((await params).projectId, "The project");
  await requireProjectAccess(user, projectId, "run.create");
  const input = await parseJson(request, createRunSchema);

  const section = await fetchSection(projectId, input.sectionId);
  if (!section) throw notFound("The section");
  const version = await fetchSectionVersion(section.id, input.sectionVersion);
  if (!version) throw notFound("The section version");

  const water = waterConditionOrRefuse(version.document as SectionDocument, input.setup);
  const doc = documentForRun(version.document as SectionDocument, input.setup, water);
  const valid = validateSection(doc);
  if (!valid.ok) {
    throw new ApiError(400, "invalid_section", "The section and set-up do not validate.", {
      setup: valid.errors.map((e) => `${e.path}: ${e.message}`),
    });
  }
  const verified = verifyCriticalCircles(valid.section, input.result);
  if (!verified.ok)
    throw new ApiError(422, "result_mismatch", verified.message, { [verified.field]: [verified.message] });

  const fsOf = (m: "bishop" | "fellenius") => verified.circles.find((c) => c.method === m)?.fs ?? null;
  const condition = loadingCondition(input.setup.condition);
  const id = await createRun({
    projectId,
    sectionId: section.id,
    sectionVersionId: version.id,
    title: input.title,
    loadingCondition: condition.key,
    waterCondition: { id: water.id, name: water.name },
    loadCase: condition.engineCase,
    face: input.setup.face,
    methods: input.setup.methods,
    requiredFs: input.setup.requiredFs,
    fsBishop: fsOf("bishop"),
    fsFellenius: fsOf("fellenius"),
    engineVersion: ENGINE_VERSION,
    document: valid.section,
    result: { ...input.result, setup: input.setup },
    sliceTables: Object.fromEntries(
      verified.circles.map((c) => [c.method, { slices: c.slices, minMAlpha: c.minMAlpha }]),
    ),
    userId: user.id,
    revisesRunId: input.revisesRunId ?? null,
  });
  return NextResponse.json({ run: { id } }, { status: 201 });
});

/** The water condition the set-up names (or its loading condition's usual one); 400 if the version lacks it. */
function waterConditionOrRefuse(section: SectionDocument, setup: Parameters<typeof waterConditionForRun>[1]) {
  try {
    return waterConditionForRun(section, setup);
  } catch (err) {
    if (err instanceof UnknownWaterConditionError)
      throw new ApiError(400, "unknown_water_condition", err.message, { "setup.waterCondition": [err.message] });
    throw err;
  }
}
