/**
 * Runs whose pore pressures come from the seepage solution of a water condition (docs/seepage.md §6):
 * the demo zoned dam's kept run, a run kept over HTTP with the browser's preview, and the PDF's words.
 */
import { beforeAll, describe, expect, test } from "vitest";
import { signedIn, type AppClient } from "../support/http";
import { pdfText } from "../support/pdf-text";
import { DEMO_PROJECT } from "@/db/seeds/demo";
import { ZONED_DAM_NAME } from "@/db/seeds/demo-zoned-dam";
import { ZONED_RUN_TITLE } from "@/db/seeds/demo-zoned-run";
import { documentForRun, waterConditionForRun, type RunSetup } from "@/lib/analysis/run-setup";
import { attachSeepage } from "@/lib/seepage-stability";
import { conductivitiesOf } from "@/lib/section-seepage/conductivities";
import { searchRecord } from "@/lib/runs/record/search-record";
import type { SectionDocument } from "@/lib/stability";

let engineer: AppClient;
let projectId: number;
let sectionId: number;
let base: string;

interface StoredRun {
  id: number;
  title: string;
  fsBishop: number | null;
  document: SectionDocument & { seepage?: unknown };
  result: {
    seepage?: { q: number; nodes: number; meshSize: number };
    setup: RunSetup;
    results: { bishop?: { fs: number } | null };
  };
}

beforeAll(async () => {
  engineer = await signedIn("engineer@scarpline.test");
  const { projects } = await (await engineer.request("/api/projects")).json();
  projectId = (projects as { id: number; name: string }[]).find((p) => p.name === DEMO_PROJECT)!.id;
  base = `/api/projects/${projectId}`;
  const { sections } = await (await engineer.request(`${base}/sections`)).json();
  sectionId = (sections as { id: number; name: string }[]).find((s) => s.name === ZONED_DAM_NAME)!.id;
});

async function runById(id: number): Promise<StoredRun> {
  return (await (await engineer.request(`${base}/runs/${id}`)).json()).run as StoredRun;
}

describe("a run on seepage water", () => {
  test("the demo zoned dam's kept run took its pore pressures from the seepage and recomputes from its frozen document", async () => {
    const { runs } = await (await engineer.request(`${base}/runs`)).json();
    const listed = (runs as { id: number; title: string }[]).find((r) => r.title === ZONED_RUN_TITLE);
    expect(listed).toBeDefined();
    const run = await runById(listed!.id);
    expect(run.document.water?.source).toBe("seepage");
    expect(run.document.seepage).toBeDefined();
    // The seepage view's solution of the same dam (docs/seepage.md §9): q about 2.2 × 10⁻⁶ m³/s per metre.
    expect(run.result.seepage?.q).toBeGreaterThan(1.5e-6);
    expect(run.result.seepage?.q).toBeLessThan(3e-6);
    // Reproducible: the one orchestrator on the stored document alone gives the stored FS to the digit.
    const again = searchRecord(run.document);
    if (!again.ok) throw new Error(JSON.stringify(again.errors));
    expect(again.result.results.bishop?.fs).toBe(run.result.results.bishop?.fs);
    expect(run.fsBishop).toBeCloseTo(again.result.results.bishop?.fs ?? NaN, 4);
  });

  test("a run kept over HTTP with water from seepage matches the browser's preview and its PDF says so", async () => {
    const got = await (await engineer.request(`${base}/sections/${sectionId}`)).json();
    const section = got.document as SectionDocument;
    const version = got.section.currentVersion as number;
    const setup: RunSetup = {
      condition: "steady-seepage",
      waterCondition: "storage-pool",
      waterSource: "seepage",
      face: "downstream",
      methods: ["bishop"],
      slices: 30,
      ordinaryForm: "classical",
      grid: { x1: 100, y1: 35, x2: 130, y2: 65, nx: 6, ny: 6 },
      radii: { tangentY1: 2, tangentY2: 16, n: 5 },
      refine: false,
      drawdownMethod: "effective",
      requiredFs: 1.5,
    };
    // The browser's preview: the same attach and orchestrator as the run form and its worker.
    const { materials } = await (await engineer.request(`${base}/materials`)).json();
    const settings = (await (await engineer.request(`${base}/sections/${sectionId}/seepage/storage-pool`)).json())
      .settings;
    const attached = attachSeepage(section, waterConditionForRun(section, setup), {
      conductivities: conductivitiesOf(materials),
      settings,
    });
    if (!attached.ok) throw new Error(JSON.stringify(attached.errors));
    const preview = searchRecord(documentForRun(attached.section, setup));
    if (!preview.ok) throw new Error(JSON.stringify(preview.errors));
    const res = await engineer.request(`${base}/runs`, {
      method: "POST",
      json: { sectionId, sectionVersion: version, title: "Seepage water, small grid", setup, result: preview.result },
    });
    expect(res.status).toBe(201);
    const body = await res.json();
    expect(body.preview).toMatchObject({ status: "matched" });
    const run = await runById(body.run.id);
    expect(run.result.results.bishop?.fs).toBe(preview.result.results.bishop?.fs);
    const pdf = await engineer.request(`${base}/runs/${run.id}/report`);
    expect(pdf.status).toBe(200);
    const text = (await pdfText(await pdf.arrayBuffer())).replace(/\s+/g, " ");
    expect(text).toContain("finite-element seepage solution");
    expect(text).toMatch(/q = 2\.\d\d × 10⁻⁶ m³\/s per metre/);
  });
});
