import "server-only";
import { readServerEnv } from "@/lib/env";
import { conditionWords } from "@/lib/vocabulary";
import type { RunDetail } from "@/lib/runs/types";
import { fetchRunComments, recordRunEvent } from "@/db/queries/review";
import { fetchNoticeRecipients, type NoticeRecipient } from "@/db/queries/notifications";
import type { TransitionAction } from "@/lib/review/status";
import type { NoticeKind } from "@/lib/review/notices";
import { commentLabel } from "@/lib/review/comment-label";
import { composeNotice, type NoticeFacts } from "./compose-notice";
import { mailFrom, mailTransport } from "./transport";

const KIND: Record<TransitionAction, NoticeKind> = {
  submit: "run-submitted",
  approve: "run-approved",
  return: "run-returned",
};

export interface TransitionNoticeInput {
  action: TransitionAction;
  run: RunDetail;
  projectName: string;
  actor: { id: number; name: string };
  note: string;
  /** Set when a run below its required FS is signed off: the reviewer's stated reason. */
  belowRequiredReason?: string | null;
  at: string;
}

async function recipientsFor(kind: NoticeKind, input: TransitionNoticeInput): Promise<NoticeRecipient[]> {
  const who =
    kind === "run-submitted"
      ? { projectId: input.run.projectId, projectRole: "reviewer" as const }
      : { userIds: [input.run.authorId] };
  // Nobody is told about what they did themselves.
  return (await fetchNoticeRecipients(kind, who)).filter((r) => r.id !== input.actor.id);
}

async function factsFor(kind: NoticeKind, input: TransitionNoticeInput): Promise<NoticeFacts> {
  const base = readServerEnv().APP_URL.replace(/\/+$/, "");
  const { run } = input;
  const runPath = `${base}/projects/${run.projectId}/runs/${run.id}`;
  const comments =
    kind === "run-returned"
      ? (await fetchRunComments(run.id)).map((c, i) => ({ label: commentLabel(c, i), body: c.body }))
      : undefined;
  return {
    projectName: input.projectName,
    runId: run.id,
    runTitle: run.title,
    section: `${run.sectionName} v${run.sectionVersion}`,
    condition: conditionWords(run.loadingCondition),
    face: run.face,
    requiredFs: run.requiredFs,
    fs: { bishop: run.fsBishop, fellenius: run.fsFellenius },
    actorName: input.actor.name,
    note: input.note,
    belowRequiredReason: input.belowRequiredReason ?? null,
    at: input.at,
    link: kind === "run-submitted" ? `${runPath}/review` : runPath,
    accountLink: `${base}/account`,
    comments,
  };
}

/**
 * Sends the notices a status change calls for and writes the outcome into the run's audit trail.
 * Never throws: the status change has already been recorded, and a mail server that is down
 * must not undo or hide it.
 */
export async function sendTransitionNotices(input: TransitionNoticeInput): Promise<void> {
  const kind = KIND[input.action];
  const runId = input.run.id;
  try {
    const recipients = await recipientsFor(kind, input);
    if (recipients.length === 0) {
      await recordRunEvent({
        runId,
        actorId: null,
        kind: "mail-skipped",
        note: `No notice sent: nobody ${kind === "run-submitted" ? "among the project's reviewers" : "(the author)"} receives “${kind}” notices.`,
      });
      return;
    }
    const message = composeNotice(kind, await factsFor(kind, input));
    const transport = mailTransport();
    for (const r of recipients) {
      const to = `${r.name} <${r.email}>`;
      try {
        await transport.sendMail({
          from: mailFrom(),
          to: { name: r.name, address: r.email },
          subject: message.subject,
          text: message.text,
        });
        await recordRunEvent({
          runId,
          actorId: null,
          kind: "mail-sent",
          note: `Notice “${message.subject}” sent to ${to}.`,
        });
      } catch (err) {
        const reason = err instanceof Error ? err.message : String(err);
        await recordRunEvent({
          runId,
          actorId: null,
          kind: "mail-failed",
          note: `Notice to ${to} could not be sent: ${reason}`,
        });
      }
    }
  } catch (err) {
    console.error("[mail] notices for run", runId, "failed", err);
    await recordRunEvent({
      runId,
      actorId: null,
      kind: "mail-failed",
      note: `Notices could not be prepared: ${err instanceof Error ? err.message : String(err)}`,
    }).catch(() => undefined);
  }
}
