/**
 * The words of each review notice, as plain text that reads the same in any mail program.
 * Pure: the sender gathers the facts and the links.
 */
import { CAUTION_TEXT } from "@/lib/caution";
import type { NoticeKind } from "@/lib/review/notices";
import { formatDateTime } from "@/lib/format";
import { faceWords } from "@/lib/vocabulary";

export interface NoticeFacts {
  projectName: string;
  runId: number;
  runTitle: string;
  /** "Main embankment, station 0+240 v1" */
  section: string;
  condition: string;
  face: string;
  requiredFs: number;
  fs: { bishop: number | null; fellenius: number | null };
  /** Who submitted, approved or returned. */
  actorName: string;
  note: string;
  /** Set when a run below its required FS was signed off on purpose: the reviewer's reason. */
  belowRequiredReason?: string | null;
  /** ISO 8601 */
  at: string;
  /** Where the recipient acts: the review page for reviewers, the run page for the author. */
  link: string;
  accountLink: string;
  /** Comments the reviewer left, for a returned run. */
  comments?: { label: string; body: string }[];
}

export interface ComposedNotice {
  subject: string;
  text: string;
}

const fsLine = (label: string, fs: number | null, required: number) =>
  fs === null
    ? null
    : `  ${label}: FS ${fs.toFixed(3)} ${fs >= required ? "meets" : "is below"} the required ${required.toFixed(2)}`;

function runLines(f: NoticeFacts): string[] {
  return [
    `Project:           ${f.projectName}`,
    `Run:               ${f.runTitle} (run ${f.runId})`,
    `Section:           ${f.section}`,
    `Loading condition: ${f.condition}, ${faceWords(f.face, true)}`,
    "Factors of safety:",
    ...[
      fsLine("Bishop's simplified", f.fs.bishop, f.requiredFs),
      fsLine("Ordinary method", f.fs.fellenius, f.requiredFs),
    ].filter((l): l is string => l !== null),
  ];
}

const when = (iso: string) => formatDateTime(iso);

export function composeNotice(kind: NoticeKind, f: NoticeFacts): ComposedNotice {
  const note = f.note.trim();
  let subject: string;
  let opening: string[];
  let action: string;
  switch (kind) {
    case "run-submitted":
      subject = `Review requested: ${f.runTitle} — ${f.projectName}`;
      opening = [
        `${f.actorName} submitted a run for review on ${when(f.at)}.`,
        ...(note ? ["", `Note from the author: ${note}`] : []),
      ];
      action = `Open the review: ${f.link}`;
      break;
    case "run-approved": {
      const below = f.belowRequiredReason?.trim();
      subject = below
        ? `Signed off — below the required FS: ${f.runTitle} — ${f.projectName}`
        : `Signed off: ${f.runTitle} — ${f.projectName}`;
      opening = [
        below
          ? `${f.actorName} signed off your run on ${when(f.at)} although it is below the required factor of ` +
            `safety. Its record is now frozen.`
          : `${f.actorName} signed off your run on ${when(f.at)}. Its record is now frozen.`,
        ...(below ? ["", `Reason for signing off below the required FS: ${below}`] : []),
        ...(note ? ["", `Reviewer's note: ${note}`] : []),
      ];
      action = `Open the run and its calculation report: ${f.link}`;
      break;
    }
    case "run-returned":
      subject = `Returned with comments: ${f.runTitle} — ${f.projectName}`;
      opening = [`${f.actorName} returned your run with comments on ${when(f.at)}.`, "", `Reviewer's note: ${note}`];
      if (f.comments && f.comments.length > 0) {
        opening.push("", "Comments:", ...f.comments.map((c) => `  ${c.label}: ${c.body}`));
      }
      action = `Open the run, then revise it as a new run and submit that one: ${f.link}`;
      break;
  }
  const text = [
    ...opening,
    "",
    ...runLines(f),
    "",
    action,
    "",
    `Caution: ${CAUTION_TEXT}`,
    "",
    `You receive this because of your notice settings: ${f.accountLink}`,
    "",
  ].join("\n");
  return { subject, text };
}
