/**
 * Helpers of the review tests (integration): the demo project, a quick run made by the engine as the
 * browser would, status moves, the checklist, and the mail the run's own SMTP fake caught.
 */
import { expect } from "vitest";
import { type AppClient } from "./http";
import { runGridSearch, type SectionDocument } from "@/lib/stability";
import { documentForRun, runSetupSchema, type RunSetup } from "@/lib/analysis/run-setup";
import { directionForFace } from "@/lib/analysis/face";
import { suggestGrid } from "@/lib/analysis/auto-grid";
import { listCaughtMail, type CaughtMail } from "@/lib/mail/caught-mail";
import { CHECKLIST_KEYS } from "@/lib/review/checklist";
export interface Demo {
  projectId: number;
  sectionId: number;
  version: number;
  document: SectionDocument;
}

export async function demoProject(client: AppClient): Promise<Demo> {
  const projects = (await (await client.request("/api/projects")).json()).projects as { id: number; name: string }[];
  const project = projects.find((p) => p.name === "Lower Wendle Reservoir embankment")!;
  const sections = (await (await client.request(`/api/projects/${project.id}/sections`)).json()).sections as {
    id: number;
    name: string;
  }[];
  const section = sections.find((s) => s.name.startsWith("Main embankment"))!;
  const body = await (await client.request(`/api/projects/${project.id}/sections/${section.id}`)).json();
  return {
    projectId: project.id,
    sectionId: section.id,
    version: body.section.currentVersion,
    document: body.document,
  };
}

let cachedBody: { setup: RunSetup; result: unknown } | null = null;
/**
 * A quick downstream run of the demo section: Bishop about 1.32, ordinary about 1.08. Its
 * required FS is 1.0, so it meets it and a plain sign-off applies; `requiredFs` over those FS
 * makes a run below the requirement.
 */
export function quickRunBody(doc: SectionDocument, requiredFs = 1.0) {
  if (!cachedBody) {
    const g = suggestGrid(doc, directionForFace(doc, "downstream"), { nx: 6, ny: 6, nr: 5 });
    // Parsed, so settings the form defaults are filled in as the browser's form would.
    const setup: RunSetup = runSetupSchema.parse({
      condition: "steady-seepage",
      face: "downstream",
      methods: ["bishop", "fellenius"],
      slices: 30,
      ordinaryForm: "classical",
      grid: g.grid,
      radii: g.radii,
      refine: false,
      requiredFs,
    });
    const result = runGridSearch(documentForRun(doc, setup));
    if (!result.ok) throw new Error("search failed");
    cachedBody = { setup, result };
  }
  return { ...cachedBody, setup: { ...cachedBody.setup, requiredFs } };
}

export async function createDraft(
  client: AppClient,
  demo: Demo,
  title: string,
  revisesRunId?: number,
  requiredFs?: number,
): Promise<number> {
  const res = await client.request(`/api/projects/${demo.projectId}/runs`, {
    method: "POST",
    json: {
      sectionId: demo.sectionId,
      sectionVersion: demo.version,
      title,
      ...quickRunBody(demo.document, requiredFs),
      revisesRunId,
    },
  });
  expect(res.status).toBe(201);
  return (await res.json()).run.id;
}

export const api = (demo: Demo, runId: number, rest = "") => `/api/projects/${demo.projectId}/runs/${runId}${rest}`;

export async function move(client: AppClient, demo: Demo, runId: number, action: string, note = "", reason?: string) {
  const json = { action, note, ...(reason !== undefined ? { belowRequiredReason: reason } : {}) };
  const res = await client.request(api(demo, runId, "/status"), { method: "POST", json });
  return { status: res.status, body: await res.json() };
}

export async function confirmChecklist(reviewer: AppClient, demo: Demo, runId: number) {
  const res = await reviewer.request(api(demo, runId, "/checklist"), {
    method: "PUT",
    json: {
      items: CHECKLIST_KEYS.map((key) => ({ key, state: "ok", note: key === "geometry" ? "Drawing D-102 rev C" : "" })),
    },
  });
  expect(res.status).toBe(200);
}

export async function review(client: AppClient, demo: Demo, runId: number) {
  return (await (await client.request(api(demo, runId, "/review"))).json()).review;
}

/** Mail caught by the run's own SMTP fake (tests/support/stack.ts) about one run. */
export async function mailAbout(runTitle: string): Promise<CaughtMail[]> {
  return (await listCaughtMail(process.env.SMTP_MAIL_DIR!)).filter((m) => m.subject.includes(runTitle));
}
