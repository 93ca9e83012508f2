import { describe, expect, test } from "vitest";
import { pdfText } from "../support/pdf-text";
import { signedIn } from "../support/http";
import { getDb } from "@/db/index";
import { type CaughtMail } from "@/lib/mail/caught-mail";
import { CAUTION_TEXT } from "@/lib/caution";
import { demoProject, createDraft, api, move, confirmChecklist, review, mailAbout } from "../support/review";

// ---- the review life of a run ---------------------------------------------------------------

describe("review of a run, against MariaDB and the real SMTP fake", () => {
  test("draft → submitted → returned; revision → submitted → approved, with mail, audit trail and refusals", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const reviewer = await signedIn("reviewer@scarpline.test");
    const designer = await signedIn("designer@scarpline.test");
    const demo = await demoProject(engineer);
    const title = `Steady seepage check ${Date.now()}`;
    const first = await createDraft(engineer, demo, title);

    // Refused before submission: reviewers cannot decide on a draft, nobody but the author submits.
    expect((await move(reviewer, demo, first, "approve")).status).toBe(409);
    const bySomeoneElse = await move(designer, demo, first, "submit");
    expect(bySomeoneElse.status).toBe(403);
    expect(bySomeoneElse.body.error.code).toBe("not_author");

    const submitted = await move(engineer, demo, first, "submit", "Please check the foundation strengths.");
    expect(submitted.status).toBe(200);
    expect(submitted.body.run.status).toBe("submitted");
    expect((await move(engineer, demo, first, "submit")).status).toBe(409);

    // The reviewer is told, with a link to the review page.
    const [toReviewer] = await mailAbout(title);
    expect(toReviewer.envelope.to).toEqual(["reviewer@scarpline.test"]);
    expect(toReviewer.subject).toBe(`Review requested: ${title} — Lower Wendle Reservoir embankment`);
    expect(toReviewer.text).toMatch(
      new RegExp(`http://127\\.0\\.0\\.1:\\d+/projects/${demo.projectId}/runs/${first}/review`),
    );
    expect(toReviewer.text).toContain("Please check the foundation strengths.");
    expect(toReviewer.text).toContain(CAUTION_TEXT);

    // A designer may not decide; an engineer may not either.
    const byDesigner = await move(designer, demo, first, "approve");
    expect(byDesigner.status).toBe(403);
    expect(byDesigner.body.error.message).toMatch(/Only reviewers/);
    expect((await move(engineer, demo, first, "return", "Looks fine to me")).status).toBe(403);
    expect(
      (
        await designer.request(api(demo, first, "/checklist"), {
          method: "PUT",
          json: { items: [{ key: "fs", state: "ok" }] },
        })
      ).status,
    ).toBe(403);

    // Sign-off needs the checklist; a return needs a note.
    const early = await move(reviewer, demo, first, "approve");
    expect(early.status).toBe(409);
    expect(early.body.error.code).toBe("checklist_open");
    const noNote = await move(reviewer, demo, first, "return", " ");
    expect(noNote.status).toBe(422);
    expect(noNote.body.error.code).toBe("note_required");
    expect(noNote.body.error.fields.note).toEqual([expect.stringMatching(/a returned run needs a note/)]);

    // Pinned comments: a place on the section and a slice; a slice that does not exist is refused.
    const place = await reviewer.request(api(demo, first, "/comments"), {
      method: "POST",
      json: { body: "Toe drain level differs from drawing D-102.", pin: { x: 62.5, y: 4.25 } },
    });
    expect(place.status).toBe(201);
    const slice = await reviewer.request(api(demo, first, "/comments"), {
      method: "POST",
      json: { body: "Pore pressure on this slice looks high.", slice: { number: 5, method: "bishop" } },
    });
    expect(slice.status).toBe(201);
    const badSlice = await reviewer.request(api(demo, first, "/comments"), {
      method: "POST",
      json: { body: "x", slice: { number: 9999, method: "bishop" } },
    });
    expect(badSlice.status).toBe(400);
    expect((await badSlice.json()).error.fields["slice.number"]).toEqual([
      expect.stringMatching(/^Use a slice from 1 to \d+\.$/),
    ]);

    const returned = await move(reviewer, demo, first, "return", "Recheck the toe drain and resubmit.");
    expect(returned.status).toBe(200);
    expect(returned.body.run.status).toBe("returned");

    // The author is told, with the comments and a link to the run.
    const toAuthor = (await mailAbout(title)).find((m) => m.subject.startsWith("Returned with comments"))!;
    expect(toAuthor.envelope.to).toEqual(["engineer@scarpline.test"]);
    expect(toAuthor.text).toContain("Recheck the toe drain and resubmit.");
    expect(toAuthor.text).toContain("#1 at x = 62.5 m, y = 4.3 m: Toe drain level differs from drawing D-102.");
    expect(toAuthor.text).toContain("#2 on slice 5 (Bishop): Pore pressure on this slice looks high.");
    expect(toAuthor.text).toMatch(new RegExp(`/projects/${demo.projectId}/runs/${first}\\b(?!/review)`));

    // A returned run stays returned: it cannot be submitted again, renamed or deleted.
    expect((await move(engineer, demo, first, "submit")).status).toBe(409);
    expect((await engineer.request(api(demo, first), { method: "PATCH", json: { title: "New name" } })).status).toBe(
      409,
    );
    expect((await engineer.request(api(demo, first), { method: "DELETE" })).status).toBe(409);

    // The revision is a new run linked to the returned one.
    const revTitle = `${title} rev B`;
    const second = await createDraft(engineer, demo, revTitle, first);
    expect((await move(engineer, demo, second, "submit")).status).toBe(200);
    const chain = (await review(engineer, demo, second)).chain as { id: number; status: string }[];
    expect(chain.map((c) => [c.id, c.status])).toEqual([
      [first, "returned"],
      [second, "submitted"],
    ]);

    await confirmChecklist(reviewer, demo, second);
    const approved = await move(reviewer, demo, second, "approve", "Agrees with the drawings and the lab sets.");
    expect(approved.status).toBe(200);
    expect(approved.body.run.status).toBe("approved");
    const signedOff = (await mailAbout(revTitle)).find((m) => m.subject.startsWith("Signed off"))!;
    expect(signedOff.envelope.to).toEqual(["engineer@scarpline.test"]);
    expect(signedOff.text).toContain("Demo Reviewer signed off your run");
    expect(signedOff.text).toMatch(new RegExp(`/projects/${demo.projectId}/runs/${second}`));

    // The audit trail has every change with who did it.
    const events = (await review(engineer, demo, second)).events as {
      kind: string;
      toStatus: string | null;
      actorName: string | null;
      createdAt: string;
    }[];
    const statusEvents = events.filter((e) => e.kind === "status").map((e) => [e.toStatus, e.actorName]);
    expect(statusEvents).toEqual([
      ["submitted", "Demo Engineer"],
      ["approved", "Demo Reviewer"],
    ]);
    expect(events.some((e) => e.kind === "checklist" && e.actorName === "Demo Reviewer")).toBe(true);
    expect(events.filter((e) => e.kind === "mail-sent")).toHaveLength(2);
    const firstEvents = (await review(engineer, demo, first)).events as { kind: string }[];
    expect(firstEvents.filter((e) => e.kind === "comment")).toHaveLength(2);

    // An approved run and its inputs are frozen for everyone, and in the database itself.
    expect((await move(reviewer, demo, second, "return", "Changed my mind")).status).toBe(409);
    const rename = await engineer.request(api(demo, second), {
      method: "PATCH",
      json: { title: "Renamed after sign-off" },
    });
    expect(rename.status).toBe(409);
    expect((await rename.json()).error.message).toMatch(/signed off/);
    expect((await engineer.request(api(demo, second), { method: "DELETE" })).status).toBe(409);
    expect(
      (await reviewer.request(api(demo, second, "/comments"), { method: "POST", json: { body: "late" } })).status,
    ).toBe(409);
    const admin = await signedIn("admin@scarpline.test");
    expect((await admin.request(api(demo, second), { method: "DELETE" })).status).toBe(409);
    await expect(getDb()("runs").where({ id: second }).update({ fs_bishop: 9.99 })).rejects.toThrow(
      /signed-off run cannot be changed/,
    );
    await expect(getDb()("runs").where({ id: second }).delete()).rejects.toThrow(/only a draft run can be deleted/);
    const row = await getDb()("runs").where({ id: second }).first();
    expect(row.status).toBe("approved");
    expect(row.title).toBe(revTitle);
  });

  test("a run below its required FS is signed off only with a reason, and every view says so", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const reviewer = await signedIn("reviewer@scarpline.test");
    const demo = await demoProject(engineer);
    const title = `Below required ${Date.now()}`;
    // Bishop about 1.32 and ordinary about 1.08 against 1.5: below the requirement.
    const runId = await createDraft(engineer, demo, title, undefined, 1.5);
    expect((await move(engineer, demo, runId, "submit")).status).toBe(200);
    await confirmChecklist(reviewer, demo, runId);

    // Without a reason, or with a stray word, the sign-off is refused and nothing changes.
    for (const reason of [undefined, "ok"]) {
      const refused = await move(reviewer, demo, runId, "approve", "", reason);
      expect(refused.status).toBe(422);
      expect(refused.body.error.fields.belowRequiredReason[0]).toMatch(/below the required 1\.50/);
    }
    expect((await (await engineer.request(api(demo, runId))).json()).run.status).toBe("submitted");

    const reason = "Accepted as the record of a failing case; redesign follows in revision B.";
    expect((await move(reviewer, demo, runId, "approve", "", reason)).status).toBe(200);
    const { run } = await (await engineer.request(api(demo, runId))).json();
    expect(run).toMatchObject({ status: "approved", belowRequiredReason: reason });

    // The runs list carries it; the runs CSV says it in words.
    const listed = (await (await engineer.request(`/api/projects/${demo.projectId}/runs`)).json()).runs as {
      id: number;
      belowRequiredReason: string | null;
    }[];
    expect(listed.find((r) => r.id === runId)?.belowRequiredReason).toBe(reason);
    const csv = await (await engineer.request(`/api/projects/${demo.projectId}/runs/export`)).text();
    const line = csv.split("\r\n").find((l) => l.startsWith(`${runId},`))!;
    expect(line).toContain("signed off — below the required FS");

    // The audit trail keeps the reason with the sign-off.
    const events = (await review(engineer, demo, runId)).events as { kind: string; toStatus: string; note: string }[];
    expect(events.find((e) => e.toStatus === "approved")?.note).toContain(reason);

    // The PDF says it where the status stands, never a plain "SIGNED OFF" above a failing verdict.
    const text = await pdfText(await (await reviewer.request(api(demo, runId, "/report"))).arrayBuffer());
    expect(text).toContain("SIGNED OFF — BELOW THE REQUIRED FS, by Demo Reviewer");
    expect(text).toContain(`Reason: ${reason}`);
    expect(text).not.toMatch(/Review status: SIGNED OFF by/);
    expect(text).toContain("below the required 1.50");
  });

  test("a run that meets its required FS needs no reason, and none is stored", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const reviewer = await signedIn("reviewer@scarpline.test");
    const demo = await demoProject(engineer);
    const runId = await createDraft(engineer, demo, `Meets required ${Date.now()}`);
    await move(engineer, demo, runId, "submit");
    await confirmChecklist(reviewer, demo, runId);
    expect((await move(reviewer, demo, runId, "approve", "", "A reason nobody asked for.")).status).toBe(200);
    const { run } = await (await engineer.request(api(demo, runId))).json();
    expect(run).toMatchObject({ status: "approved", belowRequiredReason: null });
  });

  test("the slice CSV of a kept run states both methods' FS in its header", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const demo = await demoProject(engineer);
    const runId = await createDraft(engineer, demo, `Slice CSV ${Date.now()}`);
    const { run } = await (await engineer.request(api(demo, runId))).json();
    for (const method of ["bishop", "fellenius"]) {
      const csv = await (await engineer.request(api(demo, runId, `/slices?method=${method}`))).text();
      const fsLine = csv.split("\r\n").find((l) => l.startsWith("# FS:"));
      expect(fsLine).toBe(
        `# FS: Bishop ${run.fsBishop.toFixed(3)}; ordinary ${run.fsFellenius.toFixed(3)} (classical form)`,
      );
    }
  });

  test("nobody reviews their own run, even with a reviewer's role in the project", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const demo = await demoProject(engineer);
    const runId = await createDraft(engineer, demo, `Self-review attempt ${Date.now()}`);
    expect((await move(engineer, demo, runId, "submit")).status).toBe(200);
    const engineerRow = await getDb()("users").where({ email: "engineer@scarpline.test" }).first();
    const membership = { project_id: demo.projectId, user_id: engineerRow.id };
    await getDb()("project_members").where(membership).update({ role: "reviewer" });
    try {
      const self = await move(engineer, demo, runId, "approve");
      expect(self.status).toBe(403);
      expect(self.body.error.code).toBe("self_review");
      const checklist = await engineer.request(api(demo, runId, "/checklist"), {
        method: "PUT",
        json: { items: [{ key: "fs", state: "ok" }] },
      });
      expect(checklist.status).toBe(403);
    } finally {
      await getDb()("project_members").where(membership).update({ role: "engineer" });
    }
    expect((await getDb()("runs").where({ id: runId }).first()).status).toBe("submitted");
  });

  test("a draft can be renamed and deleted by its author only", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const designer = await signedIn("designer@scarpline.test");
    const demo = await demoProject(engineer);
    const runId = await createDraft(engineer, demo, `Draft to tidy ${Date.now()}`);
    expect((await designer.request(api(demo, runId), { method: "PATCH", json: { title: "Not mine" } })).status).toBe(
      403,
    );
    const bad = await engineer.request(api(demo, runId), { method: "PATCH", json: { title: "x" } });
    expect(bad.status).toBe(400);
    expect((await bad.json()).error.fields.title).toEqual(["At least 3 characters."]);
    expect(
      (await engineer.request(api(demo, runId), { method: "PATCH", json: { title: "Tidied draft name" } })).status,
    ).toBe(200);
    expect((await getDb()("runs").where({ id: runId }).first()).title).toBe("Tidied draft name");
    expect((await designer.request(api(demo, runId), { method: "DELETE" })).status).toBe(403);
    expect((await engineer.request(api(demo, runId), { method: "DELETE" })).status).toBe(204);
    expect(await getDb()("runs").where({ id: runId }).first()).toBeUndefined();
  });

  test("a reviewer who turned the notice off gets no mail, and the trail says so", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const reviewer = await signedIn("reviewer@scarpline.test");
    const demo = await demoProject(engineer);
    const off = await reviewer.request("/api/account/notifications", {
      method: "PUT",
      json: { preferences: [{ kind: "run-submitted", enabled: false }] },
    });
    expect((await off.json()).preferences).toEqual({
      "run-submitted": false,
      "run-approved": true,
      "run-returned": true,
    });
    const bad = await reviewer.request("/api/account/notifications", {
      method: "PUT",
      json: { preferences: [{ kind: "everything", enabled: true }] },
    });
    expect(bad.status).toBe(400);
    try {
      const title = `Quiet submission ${Date.now()}`;
      const runId = await createDraft(engineer, demo, title);
      expect((await move(engineer, demo, runId, "submit")).status).toBe(200);
      expect(await mailAbout(title)).toEqual([]);
      const events = (await review(engineer, demo, runId)).events as { kind: string }[];
      expect(events.map((e) => e.kind)).toEqual(["status", "mail-skipped"]);
    } finally {
      await reviewer.request("/api/account/notifications", {
        method: "PUT",
        json: { preferences: [{ kind: "run-submitted", enabled: true }] },
      });
    }
  });

  test("the mail log is for administrators only", async () => {
    const admin = await signedIn("admin@scarpline.test");
    const engineer = await signedIn("engineer@scarpline.test");
    expect((await engineer.request("/api/admin/mail")).status).toBe(403);
    const res = await admin.request("/api/admin/mail");
    expect(res.status).toBe(200);
    const { messages } = (await res.json()) as { messages: CaughtMail[] };
    expect(messages.some((m) => m.subject.startsWith("Review requested:"))).toBe(true);
  });
});
