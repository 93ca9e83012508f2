import { describe, expect, test } from "vitest";
import { pdfPages, pdfText } from "../support/pdf-text";
import { signedIn } from "../support/http";
import { getDb } from "@/db/index";
import { CAUTION_TEXT } from "@/lib/caution";
import { demoProject, createDraft, api, move, confirmChecklist } from "../support/review";

describe("a kept run's exports: the calculation report and the runs CSV", () => {
  test("the calculation report opens as a PDF and holds the FS, the status, the reviewer and the caution", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const reviewer = await signedIn("reviewer@scarpline.test");
    const demo = await demoProject(engineer);
    const runId = await createDraft(engineer, demo, `Report check ${Date.now()}`);
    const draftPdf = await engineer.request(api(demo, runId, "/report"));
    expect(draftPdf.status).toBe(200);
    expect(draftPdf.headers.get("content-type")).toBe("application/pdf");
    expect(await pdfText(await draftPdf.arrayBuffer())).toContain("NOT SIGNED OFF (draft)");

    await move(engineer, demo, runId, "submit");
    await confirmChecklist(reviewer, demo, runId);
    await move(reviewer, demo, runId, "approve", "Checked against the drawings.");
    const run = (await (await engineer.request(api(demo, runId))).json()).run;
    const res = await reviewer.request(api(demo, runId, "/report"));
    const bytes = await res.arrayBuffer();
    expect(new TextDecoder().decode(bytes.slice(0, 5))).toBe("%PDF-");
    const text = await pdfText(bytes);
    expect(text).toContain(run.fsBishop.toFixed(3));
    expect(text).toContain(run.fsFellenius.toFixed(3));
    expect(text).toContain("1.00");
    expect(text).toMatch(/SIGNED OFF by Demo Reviewer on \d{4}-\d\d-\d\d \d\d:\d\d UTC/);
    expect(text).toContain("Main embankment, station 0+240");
    expect(text).toContain("Lower Wendle Reservoir embankment");
    expect(text).toContain(CAUTION_TEXT);
    expect(text).toContain("Slices of the critical circle");
    expect(text).toContain("Drawing D-102 rev C");
    // The slice table's headers keep the trade's symbols (effective friction angle φ′, Bishop's mα:
    // Bishop 1955, Géotechnique 5(1)), drawn by the embedded font rather than spelt out.
    expect(text).toContain("φ′");
    expect(text).toContain("mα");
    expect(text).not.toMatch(/\bphi'|m-alpha/);
    const pages = await pdfPages(bytes);
    const squeeze = (s: string) => s.replace(/\s+/g, "");
    for (const page of pages) expect(squeeze(page).split(squeeze(CAUTION_TEXT)).length - 1).toBe(1);

    const outsider = await signedIn("admin@scarpline.test");
    expect((await outsider.request(api(demo, runId, "/report"))).status).toBe(200);
    expect((await outsider.request(`/api/projects/${demo.projectId}/runs/999999/report`)).status).toBe(404);
  });

  test("the runs CSV escapes cells a spreadsheet would run as formulas", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const demo = await demoProject(engineer);
    await createDraft(engineer, demo, '=HYPERLINK("http://example.invalid","x")');
    await createDraft(engineer, demo, "@SUM(A1:A2) run");
    const res = await engineer.request(`/api/projects/${demo.projectId}/runs/export`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/text\/csv/);
    const csv = await res.text();
    expect(csv.startsWith("# Caution:") || csv.startsWith('"# Caution:')).toBe(true);
    expect(csv).toContain(`"'=HYPERLINK(""http://example.invalid"",""x"")"`);
    expect(csv).toContain("'@SUM(A1:A2) run");
    expect(csv).not.toMatch(/(^|,)=HYPERLINK/m);
    const slices = await engineer.request(
      `${api(demo, (await getDb()("runs").max({ id: "id" }).first())!.id, "/slices")}?method=bishop`,
    );
    expect(slices.status).toBe(200);
    expect(await slices.text()).toContain("Slice,x left (m)");
  });
});
